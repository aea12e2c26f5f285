import { z } from 'zod';
import { loadTrace } from '@/db/queries/results';
import { apiRoute } from '@/lib/server/route';

/** GET /api/trace/:toleranceId — touch points, program lines, measurements, results, corrections. */
export const GET = apiRoute(
  { permission: 'results.read', params: z.object({ toleranceId: z.uuid() }) },
  (ctx, { params }) => loadTrace(ctx, params.toleranceId),
);
