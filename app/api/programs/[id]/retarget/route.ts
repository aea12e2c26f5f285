import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { retargetProgram } from '@/lib/server/programs/generate-revision';
import { recordIdSchema } from '@/lib/validation/parts';
import { retargetSchema } from '@/lib/validation/programs';

const params = z.object({ id: recordIdSchema });

/** The same part's routine generated for another machine: a new program linked to this one. */
export const POST = apiRoute({ permission: 'programs.generate', params, body: retargetSchema }, async (ctx, { params: p, body }) =>
  Response.json(await retargetProgram(ctx, p.id, body), { status: 201 }));
