import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { archivePart, getPart, updatePart } from '@/db/queries/parts';
import { partHeaderSchema, recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });

export const GET = apiRoute({ permission: 'parts.read', params }, async (ctx, { params: p }) => ({ part: await getPart(ctx, p.id) }));

export const PUT = apiRoute({ permission: 'parts.edit', params, body: partHeaderSchema }, async (ctx, { params: p, body }) => {
  await updatePart(ctx, p.id, body);
  return { ok: true };
});

export const DELETE = apiRoute({ permission: 'parts.edit', params }, async (ctx, { params: p }) => {
  await archivePart(ctx, p.id);
  return { ok: true };
});
