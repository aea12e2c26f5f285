import { listParts } from '@/db/queries/parts';
import { apiRoute } from '@/lib/server/route';

export const GET = apiRoute({ permission: 'parts.read' }, async (ctx) => ({ parts: await listParts(ctx) }));
