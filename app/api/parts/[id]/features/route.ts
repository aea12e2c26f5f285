import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { addFeature } from '@/db/queries/parts';
import { featureInputSchema, recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });

export const POST = apiRoute({ permission: 'parts.edit', params, body: featureInputSchema }, async (ctx, { params: p, body }) =>
  Response.json(await addFeature(ctx, p.id, body), { status: 201 }));
