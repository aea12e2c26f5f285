import { z } from 'zod';
import { decideRevision, decisionSchema } from '@/lib/server/reviews/decide-revision';
import { apiRoute } from '@/lib/server/route';

export const POST = apiRoute(
  { permission: 'revisions.approve', params: z.object({ revisionId: z.uuid() }), body: decisionSchema },
  (ctx, { params, body }) => decideRevision(ctx, params.revisionId, body),
);
