import { z } from 'zod';
import { listRevisionsByStatus } from '@/db/queries/reviews';
import { REVISION_STATUSES } from '@/db/schema';
import { apiRoute } from '@/lib/server/route';

/** GET /api/reviews?status=in-review — revisions by status (default: waiting for review). */
export const GET = apiRoute(
  { permission: 'revisions.read', query: z.object({ status: z.enum(REVISION_STATUSES).default('in-review') }) },
  async (ctx, { query }) => ({ revisions: await listRevisionsByStatus(ctx, [query.status]) }),
);
