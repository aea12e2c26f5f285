import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { getProgram } from '@/db/queries/programs';
import { saveEditedRevision } from '@/db/queries/revisions';
import { checkEditedText } from '@/lib/server/programs/generate-revision';
import { recordIdSchema } from '@/lib/validation/parts';
import { saveRevisionSchema } from '@/lib/validation/programs';

const params = z.object({ id: recordIdSchema });

export const GET = apiRoute({ permission: 'programs.read', params }, async (ctx, { params: p }) => ({ revisions: (await getProgram(ctx, p.id)).revisions }));

/** Saves an edited text as a new revision; 409 when the base is no longer the latest. */
export const POST = apiRoute({ permission: 'programs.edit', params, body: saveRevisionSchema }, async (ctx, { params: p, body }) =>
  Response.json(await saveEditedRevision(ctx, p.id, body, (text, plan) => checkEditedText(ctx, p.id, text, plan)), { status: 201 }));
