import type { ReactNode } from 'react';

/** A section with nothing in it yet: say plainly what will appear here and who puts it there. */
export function EmptyState({ title, children, icon }: { title: string; children: ReactNode; icon?: ReactNode }) {
  return (
    <section className="card flex flex-col items-start gap-3 border border-dashed border-line-strong p-6 shadow-none" aria-label={title}>
      {icon ? <div className="rounded-full bg-brand-soft p-2.5 text-brand">{icon}</div> : null}
      <h2 className="text-title">{title}</h2>
      <div className="max-w-2xl space-y-2 text-body text-ink-muted">{children}</div>
    </section>
  );
}
