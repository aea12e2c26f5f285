import Link from 'next/link';
import type { ReactNode } from 'react';

/** Tabs between the admin pages. Each page checks its own permission. */
export default function AdminLayout({ children }: { children: ReactNode }) {
  return (
    <div>
      <nav aria-label="Admin" className="mb-5 flex gap-1 border-b border-line">
        <Link href="/admin/people" className="border-b-2 border-transparent px-3 py-2 text-small font-medium hover:border-line-strong">People</Link>
        <Link href="/admin/audit" className="border-b-2 border-transparent px-3 py-2 text-small font-medium hover:border-line-strong">Audit log</Link>
      </nav>
      {children}
    </div>
  );
}
