import type { ReactNode } from 'react';
import { forbidden, notFound } from 'next/navigation';
import { getRevision } from '@/db/queries/revisions';
import { isAppError } from '@/lib/server/app-error';
import { requirePageCtx } from '@/lib/server/session';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Checks that the person may open this revision (setup technicians: approved only)
 * before the loading boundary streams, so a refusal is a real 403 and a revision
 * of another workspace a real 404. The page checks again itself.
 */
export default async function RevisionLayout({ children, params }: { children: ReactNode; params: Promise<{ revisionId: string }> }) {
  const ctx = await requirePageCtx('programs.read');
  const { revisionId } = await params;
  if (!UUID.test(revisionId)) notFound();
  await getRevision(ctx, revisionId).catch((e: unknown) => {
    if (isAppError(e) && e.code === 'not-found') notFound();
    if (isAppError(e) && e.code === 'forbidden') forbidden();
    throw e;
  });
  return children;
}
