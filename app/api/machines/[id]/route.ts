import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { archiveMachine, getMachine, updateMachine } from '@/db/queries/machines';
import { updateMachineSchema } from '@/lib/validation/machines';
import { recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });

export const GET = apiRoute({ permission: 'machines.read', params }, async (ctx, { params: p }) => ({ machine: await getMachine(ctx, p.id) }));

export const PUT = apiRoute({ permission: 'machines.edit', params, body: updateMachineSchema }, async (ctx, { params: p, body }) =>
  updateMachine(ctx, p.id, body));

export const DELETE = apiRoute({ permission: 'machines.edit', params }, async (ctx, { params: p }) => {
  await archiveMachine(ctx, p.id);
  return { ok: true };
});
