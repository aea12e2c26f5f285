import type { Metadata } from 'next';
import { ReviewsScreen } from '@/components/review/reviews-screen';
import { requirePageUser } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Reviews' };

export default async function ReviewsPage() {
  const user = await requirePageUser('revisions.read');
  return <ReviewsScreen ctx={{ user, ip: null }} />;
}
