import { z } from 'zod';
import { compareRevisions } from '@/lib/server/reviews/compare-revisions';
import { apiRoute } from '@/lib/server/route';

/** GET /api/reviews/:revisionId/diff?against=:otherRevisionId — texts and the point-by-point table. */
export const GET = apiRoute(
  { permission: 'revisions.read', params: z.object({ revisionId: z.uuid() }), query: z.object({ against: z.uuid() }) },
  (ctx, { params, query }) => compareRevisions(ctx, query.against, params.revisionId),
);
