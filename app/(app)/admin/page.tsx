import { redirect } from 'next/navigation';
import { requirePageUser } from '@/lib/server/session';

export default async function AdminPage() {
  await requirePageUser('users.manage');
  redirect('/admin/people');
}
