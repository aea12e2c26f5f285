import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { loadPartTrends } from '@/db/queries/trends';
import { TrendCard } from '@/components/trends/trend-card';
import { PageHeader } from '@/components/ui/page-header';
import { isAppError } from '@/lib/server/app-error';
import { requirePageUser } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Trends' };

export default async function TrendsPage({ params }: { params: Promise<{ partId: string }> }) {
  const user = await requirePageUser('results.read');
  const { partId } = await params;
  if (!z.uuid().safeParse(partId).success) notFound();
  try {
    const { part, trends } = await loadPartTrends({ user, ip: null }, partId);
    return (
      <div className="space-y-4">
        <PageHeader title={`Trends — ${part.number} rev ${part.revision}`} description={`${part.name}: every characteristic across the real runs of all its programs, in time order.`} />
        {trends.length === 0 ? <p className="text-small text-ink-muted">This part has no tolerances.</p> : trends.map((t) => <TrendCard key={t.toleranceId} trend={t} partId={part.id} toleranceId={t.toleranceId} />)}
      </div>
    );
  } catch (error) {
    if (isAppError(error) && error.code === 'not-found') notFound();
    throw error;
  }
}
