import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { getProgram } from '@/db/queries/programs';
import { recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });

export const GET = apiRoute({ permission: 'programs.read', params }, async (ctx, { params: p }) => ({ program: await getProgram(ctx, p.id) }));
