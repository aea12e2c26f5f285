import { apiRoute } from '@/lib/server/route';
import { createPart, listParts } from '@/db/queries/parts';
import { partHeaderSchema } from '@/lib/validation/parts';

export const GET = apiRoute({ permission: 'parts.read' }, async (ctx) => ({ parts: await listParts(ctx) }));

export const POST = apiRoute({ permission: 'parts.edit', body: partHeaderSchema }, async (ctx, { body }) =>
  Response.json(await createPart(ctx, body), { status: 201 }));
