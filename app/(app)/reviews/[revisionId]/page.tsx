import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getRevisionRowOrThrow, getRevisionContentOrThrow, listDecisions, listProgramRevisions } from '@/db/queries/reviews';
import { getDb } from '@/db/client';
import { ReviewDetail } from '@/components/review/review-detail';
import { compareRevisions } from '@/lib/server/reviews/compare-revisions';
import { isAppError } from '@/lib/server/app-error';
import { requirePageUser } from '@/lib/server/session';

export const metadata = { title: 'Review' };

const uuid = z.uuid();

export default async function ReviewPage({ params, searchParams }: { params: Promise<{ revisionId: string }>; searchParams: Promise<{ against?: string }> }) {
  const user = await requirePageUser('revisions.read');
  const ctx = { user, ip: null };
  const { revisionId } = await params;
  const { against } = await searchParams;
  if (!uuid.safeParse(revisionId).success) notFound();
  try {
    const rev = await getRevisionRowOrThrow(getDb(), ctx, revisionId);
    const [others, decisions, content] = await Promise.all([listProgramRevisions(ctx, rev.programId), listDecisions(ctx, revisionId), getRevisionContentOrThrow(ctx, revisionId)]);
    const previous = others.find((o) => o.number < rev.number);
    const baseId = against && uuid.safeParse(against).success && others.some((o) => o.id === against) ? against : previous?.id ?? revisionId;
    const comparison = await compareRevisions(ctx, baseId, revisionId);
    return <ReviewDetail user={user} rev={rev} others={others} decisions={decisions} comparison={comparison} findings={content.findings} />;
  } catch (error) {
    if (isAppError(error) && error.code === 'not-found') notFound();
    throw error;
  }
}
