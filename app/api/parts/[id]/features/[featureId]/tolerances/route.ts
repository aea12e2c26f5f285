import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { addTolerance } from '@/db/queries/parts';
import { recordIdSchema, toleranceInputSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema, featureId: recordIdSchema });

export const POST = apiRoute({ permission: 'parts.edit', params, body: toleranceInputSchema }, async (ctx, { params: p, body }) =>
  Response.json(await addTolerance(ctx, p.id, p.featureId, body), { status: 201 }));
