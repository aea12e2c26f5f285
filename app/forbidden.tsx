import Link from 'next/link';
import { LockIcon } from '@/components/ui/icons';

/** Shown with HTTP 403 when a signed-in person opens a page their roles do not allow. */
export default function Forbidden() {
  return (
    <main className="flex justify-center px-4 py-16">
      <section className="card max-w-md p-6" aria-labelledby="forbidden-title">
        <div className="mb-3 inline-flex rounded-full bg-danger-soft p-2.5 text-danger"><LockIcon /></div>
        <p className="text-caption font-semibold uppercase tracking-wide text-ink-faint">403 · Not allowed</p>
        <h1 id="forbidden-title" className="mt-1 text-heading">Your roles do not include this page</h1>
        <p className="mt-2 text-body text-ink-muted">
          You are signed in, but this part of Probity needs a role you do not hold. Ask a workspace admin if you need it.
        </p>
        <Link href="/" className="btn-primary mt-5">Back to your start page</Link>
      </section>
    </main>
  );
}
