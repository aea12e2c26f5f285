import Link from 'next/link';
import type { ReactNode } from 'react';
import { requirePageUser } from '@/lib/server/session';

/**
 * Tabs between the admin pages. The permission is checked here, before the section's
 * loading boundary streams, so a refusal gets a real 403; each page checks again.
 */
export default async function AdminLayout({ children }: { children: ReactNode }) {
  await requirePageUser('users.manage');
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
