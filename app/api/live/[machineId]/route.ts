import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { machineLive } from '@/lib/server/runs/machine-live';

/** GET /api/live/:machineId — the machine's latest real run and its statuses. */
export const GET = apiRoute(
  { permission: 'results.read', params: z.object({ machineId: z.uuid() }) },
  (ctx, { params }) => machineLive(ctx, params.machineId),
);
