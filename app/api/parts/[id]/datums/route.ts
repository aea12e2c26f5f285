import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { setDatum } from '@/db/queries/parts';
import { assignDatumSchema, recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });

/** Assigns a datum letter to a feature (moving it if the letter was elsewhere). */
export const PUT = apiRoute({ permission: 'parts.edit', params, body: assignDatumSchema }, async (ctx, { params: p, body }) => {
  await setDatum(ctx, p.id, body.letter, body.featureId);
  return { ok: true };
});
