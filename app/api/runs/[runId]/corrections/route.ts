import { z } from 'zod';
import { setCorrectionApplied } from '@/db/queries/runs';
import { apiRoute } from '@/lib/server/route';

/** POST /api/runs/:runId/corrections { group, applied } — the setup technician marks a proposal entered or not. */
export const POST = apiRoute(
  { permission: 'results.upload', params: z.object({ runId: z.uuid() }), body: z.object({ group: z.number().int().min(0), applied: z.boolean() }) },
  (ctx, { params, body }) => setCorrectionApplied(ctx, params.runId, body.group, body.applied),
);
