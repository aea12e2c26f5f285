import { z } from 'zod';
import { getPart } from '@/db/queries/parts';
import { apiRoute } from '@/lib/server/route';

export const GET = apiRoute({ permission: 'parts.read', params: z.object({ partId: z.uuid('must be a part id (UUID)') }) },
  async (ctx, { params }) => ({ part: await getPart(ctx, params.partId) }));
