import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { getMachineVersionOrThrow } from '@/db/queries/machines';
import { getDb } from '@/db/client';
import { tryForward, tryInverse } from '@/lib/server/machines/try-pose';
import { fkRequestSchema, ikRequestSchema } from '@/lib/validation/machines';
import { recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });
const body = z.discriminatedUnion('mode', [
  fkRequestSchema.extend({ mode: z.literal('fk') }),
  ikRequestSchema.extend({ mode: z.literal('ik') }),
]);

/** Try a pose on the machine's current version (forward or inverse). */
export const POST = apiRoute({ permission: 'machines.read', params, body }, async (ctx, { params: p, body: b }) => {
  const { model } = await getMachineVersionOrThrow(getDb(), ctx, p.id);
  return b.mode === 'fk' ? tryForward(model, b) : tryInverse(model, b);
});
