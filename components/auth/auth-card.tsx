import type { ReactNode } from 'react';

/** The frame of the signed-out pages (sign-in, invitation). */
export function AuthCard({ title, intro, children, footer }: { title: string; intro?: ReactNode; children: ReactNode; footer?: ReactNode }) {
  return (
    <main className="flex min-h-dvh items-center justify-center px-4 py-10">
      <div className="w-full max-w-sm">
        <div className="mb-6 flex items-center gap-2 text-brand">
          <svg viewBox="0 0 24 24" width={28} height={28} aria-hidden>
            <circle cx="12" cy="15" r="5" fill="none" stroke="currentColor" strokeWidth="2" />
            <path d="M12 2v8" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
            <circle cx="12" cy="15" r="1.6" fill="currentColor" />
          </svg>
          <span className="text-title text-ink">Probity</span>
        </div>
        <div className="card p-6">
          <h1 className="text-heading">{title}</h1>
          {intro ? <div className="mt-1 text-small text-ink-muted">{intro}</div> : null}
          <div className="mt-5">{children}</div>
        </div>
        {footer ? <div className="mt-4 text-caption text-ink-muted">{footer}</div> : null}
      </div>
    </main>
  );
}
