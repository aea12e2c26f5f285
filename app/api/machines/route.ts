import { apiRoute } from '@/lib/server/route';
import { createMachine, listMachines } from '@/db/queries/machines';
import { machineRecordSchema } from '@/lib/validation/machines';

export const GET = apiRoute({ permission: 'machines.read' }, async (ctx) => ({ machines: await listMachines(ctx) }));

export const POST = apiRoute({ permission: 'machines.edit', body: machineRecordSchema }, async (ctx, { body }) => {
  const { id } = await createMachine(ctx, body);
  return Response.json({ id }, { status: 201 });
});
