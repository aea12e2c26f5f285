'use client';

import { useEffect } from 'react';

/** A section failed to render. The details are in the server log; the person gets a retry. */
export default function SectionError({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <section role="alert" className="card border border-danger/40 p-6">
      <h1 className="text-title text-danger">This page could not be shown</h1>
      <p className="mt-2 text-body text-ink-muted">
        Something went wrong while loading it. Nothing you entered was saved half-way. Try again; if it keeps happening,
        tell your admin{error.digest ? <> and quote reference <code className="text-small">{error.digest}</code></> : null}.
      </p>
      <button type="button" className="btn-primary mt-4" onClick={reset}>Try again</button>
    </section>
  );
}
