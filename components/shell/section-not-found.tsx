import Link from 'next/link';

export function SectionNotFound({ what, backHref, backLabel }: { what: string; backHref: string; backLabel: string }) {
  return (
    <section className="card p-6">
      <p className="text-caption font-semibold uppercase tracking-wide text-ink-faint">404</p>
      <h1 className="mt-1 text-heading">{what} not found</h1>
      <p className="mt-2 text-body text-ink-muted">
        It may have been removed, or it belongs to another workspace. Check the address, or go back to the list.
      </p>
      <Link href={backHref} className="btn-secondary mt-4">{backLabel}</Link>
    </section>
  );
}
