import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { addProbeEvent } from '@/db/queries/probes';
import { probeEventSchema } from '@/lib/validation/probes';
import { recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });

/** Logs a stylus change or a collision: the probe needs calibrating again. */
export const POST = apiRoute({ permission: 'probes.calibrate', params, body: probeEventSchema }, async (ctx, { params: p, body }) =>
  Response.json(await addProbeEvent(ctx, p.id, body), { status: 201 }));
