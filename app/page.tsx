import { redirect } from 'next/navigation';
import { navFor } from '@/components/shell/nav-items';
import { getSessionUser } from '@/lib/server/session';

export default async function Home() {
  const user = await getSessionUser();
  if (!user) redirect('/sign-in');
  redirect(navFor(user)[0]?.href ?? '/sign-in');
}
