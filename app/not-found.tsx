import Link from 'next/link';

export default function NotFound() {
  return (
    <main className="flex justify-center px-4 py-16">
      <section className="card max-w-md p-6">
        <p className="text-caption font-semibold uppercase tracking-wide text-ink-faint">404</p>
        <h1 className="mt-1 text-heading">Nothing at this address</h1>
        <p className="mt-2 text-body text-ink-muted">Check the address, or start again from your start page.</p>
        <Link href="/" className="btn-primary mt-5">Go to Probity</Link>
      </section>
    </main>
  );
}
