import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { getRevision } from '@/db/queries/revisions';
import { recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });

/** A revision's text, findings and plan (drafts only for those who may read them). */
export const GET = apiRoute({ permission: 'programs.read', params }, async (ctx, { params: p }) => ({ revision: await getRevision(ctx, p.id) }));
