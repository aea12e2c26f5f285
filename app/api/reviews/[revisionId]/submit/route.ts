import { z } from 'zod';
import { submitRevision } from '@/lib/server/reviews/submit-revision';
import { apiRoute } from '@/lib/server/route';

export const POST = apiRoute(
  { permission: 'revisions.submit', params: z.object({ revisionId: z.uuid() }) },
  (ctx, { params }) => submitRevision(ctx, params.revisionId),
);
