import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { PageHeader } from '@/components/ui/page-header';
import { MachineScreen } from '@/components/machines/machine-screen';
import { getMachine } from '@/db/queries/machines';
import { postIds } from '@/postprocessors/index';
import { can } from '@/lib/auth/permissions';
import { isAppError } from '@/lib/server/app-error';
import { requirePageCtx } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Machine' };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export default async function MachinePage({ params }: { params: Promise<{ machineId: string }> }) {
  const ctx = await requirePageCtx('machines.read');
  const { machineId } = await params;
  if (!UUID.test(machineId)) notFound();
  const machine = await getMachine(ctx, machineId).catch((e: unknown) => {
    if (isAppError(e) && e.code === 'not-found') notFound();
    throw e;
  });
  const posts = postIds.includes(machine.record.post) ? postIds : [machine.record.post, ...postIds];
  return (
    <>
      <PageHeader title={machine.name} description={machine.notes || 'Machine model, versions, 3D view and poses.'} />
      <MachineScreen machine={machine} canEdit={can(ctx.user, 'machines.edit')} posts={posts} />
    </>
  );
}
