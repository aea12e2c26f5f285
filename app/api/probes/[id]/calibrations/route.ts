import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { addCalibration } from '@/db/queries/probes';
import { calibrationSchema } from '@/lib/validation/probes';
import { recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });

export const POST = apiRoute({ permission: 'probes.calibrate', params, body: calibrationSchema }, async (ctx, { params: p, body }) =>
  Response.json(await addCalibration(ctx, p.id, body), { status: 201 }));
