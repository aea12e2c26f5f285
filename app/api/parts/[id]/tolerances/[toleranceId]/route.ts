import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { deleteTolerance } from '@/db/queries/parts';
import { recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema, toleranceId: recordIdSchema });

export const DELETE = apiRoute({ permission: 'parts.edit', params }, async (ctx, { params: p }) => {
  await deleteTolerance(ctx, p.id, p.toleranceId);
  return { ok: true };
});
