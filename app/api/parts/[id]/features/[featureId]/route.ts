import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { deleteFeature, updateFeature } from '@/db/queries/parts';
import { featureInputSchema, recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema, featureId: recordIdSchema });

export const PUT = apiRoute({ permission: 'parts.edit', params, body: featureInputSchema }, async (ctx, { params: p, body }) => {
  await updateFeature(ctx, p.id, p.featureId, body);
  return { ok: true };
});

export const DELETE = apiRoute({ permission: 'parts.edit', params }, async (ctx, { params: p }) => {
  await deleteFeature(ctx, p.id, p.featureId);
  return { ok: true };
});
