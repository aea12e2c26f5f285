import type { ReactNode } from 'react';
import { requirePageUser } from '@/lib/server/session';

/**
 * Checks the section's permission before the section's loading boundary streams,
 * so a refusal is answered with a real 403 status. Pages check again themselves.
 */
export default async function MachinesLayout({ children }: { children: ReactNode }) {
  await requirePageUser('machines.read');
  return children;
}
