import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { removeDatum } from '@/db/queries/parts';
import { datumLetterSchema, recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema, letter: datumLetterSchema });

export const DELETE = apiRoute({ permission: 'parts.edit', params }, async (ctx, { params: p }) => {
  await removeDatum(ctx, p.id, p.letter);
  return { ok: true };
});
