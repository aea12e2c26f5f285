import { z } from 'zod';
import { getRunHeaderOrThrow, listRunCorrections, listRunMeasurements, listRunResults } from '@/db/queries/runs';
import { apiRoute } from '@/lib/server/route';

/** GET /api/runs/:runId — the run, its results, measurements and corrections. */
export const GET = apiRoute(
  { permission: 'results.read', params: z.object({ runId: z.uuid() }) },
  async (ctx, { params }) => {
    const run = await getRunHeaderOrThrow(ctx, params.runId);
    const [results, measurements, corrections] = await Promise.all([
      listRunResults(ctx, params.runId), listRunMeasurements(ctx, params.runId), listRunCorrections(ctx, params.runId),
    ]);
    return { run, results, measurements, corrections };
  },
);
