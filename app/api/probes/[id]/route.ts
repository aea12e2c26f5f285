import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { archiveProbe, getProbe, updateProbe } from '@/db/queries/probes';
import { probeRecordSchema } from '@/lib/validation/probes';
import { recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });

export const GET = apiRoute({ permission: 'probes.read', params }, async (ctx, { params: p }) => ({ probe: await getProbe(ctx, p.id) }));

export const PUT = apiRoute({ permission: 'probes.edit', params, body: probeRecordSchema }, async (ctx, { params: p, body }) => {
  await updateProbe(ctx, p.id, body);
  return { ok: true };
});

export const DELETE = apiRoute({ permission: 'probes.edit', params }, async (ctx, { params: p }) => {
  await archiveProbe(ctx, p.id);
  return { ok: true };
});
