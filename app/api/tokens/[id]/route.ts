import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { revokeToken } from '@/db/queries/tokens';
import { recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });

export const DELETE = apiRoute({ permission: 'parts.read', params }, async (ctx, { params: p }) => {
  await revokeToken(ctx, p.id);
  return { ok: true };
});
