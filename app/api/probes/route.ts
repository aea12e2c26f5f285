import { apiRoute } from '@/lib/server/route';
import { createProbe, listProbes } from '@/db/queries/probes';
import { probeRecordSchema } from '@/lib/validation/probes';

export const GET = apiRoute({ permission: 'probes.read' }, async (ctx) => ({ probes: await listProbes(ctx) }));

export const POST = apiRoute({ permission: 'probes.edit', body: probeRecordSchema }, async (ctx, { body }) =>
  Response.json(await createProbe(ctx, body), { status: 201 }));
