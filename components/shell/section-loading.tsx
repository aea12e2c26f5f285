/** Skeleton shown while a section's server component loads. */
export function SectionLoading({ label }: { label: string }) {
  return (
    <div role="status" aria-live="polite" className="animate-pulse space-y-4">
      <span className="sr-only">Loading {label}…</span>
      <div className="h-8 w-48 rounded-control bg-sunken" />
      <div className="h-4 w-96 max-w-full rounded-control bg-sunken" />
      <div className="card h-48" />
    </div>
  );
}
