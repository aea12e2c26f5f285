import { apiRoute } from '@/lib/server/route';
import { createProgram, listPrograms } from '@/db/queries/programs';
import { createProgramSchema } from '@/lib/validation/programs';

export const GET = apiRoute({ permission: 'programs.read' }, async (ctx) => ({ programs: await listPrograms(ctx) }));

/** Creates the program record; POST /api/programs/{id}/generate then makes revision 1. */
export const POST = apiRoute({ permission: 'programs.generate', body: createProgramSchema }, async (ctx, { body }) =>
  Response.json(await createProgram(ctx, body), { status: 201 }));
