import type { ReactNode } from 'react';
import { AppShell } from '@/components/shell/app-shell';
import { requirePageUser } from '@/lib/server/session';

export default async function SignedInLayout({ children }: { children: ReactNode }) {
  const user = await requirePageUser();
  return <AppShell user={user}>{children}</AppShell>;
}
