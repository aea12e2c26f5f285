import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { PageHeader } from '@/components/ui/page-header';
import { ProbeScreen } from '@/components/probes/probe-screen';
import { getProbe } from '@/db/queries/probes';
import { can } from '@/lib/auth/permissions';
import { isAppError } from '@/lib/server/app-error';
import { requirePageCtx } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Probe' };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export default async function ProbePage({ params }: { params: Promise<{ probeId: string }> }) {
  const ctx = await requirePageCtx('probes.read');
  const { probeId } = await params;
  if (!UUID.test(probeId)) notFound();
  const probe = await getProbe(ctx, probeId).catch((e: unknown) => {
    if (isAppError(e) && e.code === 'not-found') notFound();
    throw e;
  });
  return (
    <>
      <PageHeader title={probe.name} description="Parameters, calibrations and events." />
      <ProbeScreen probe={probe} canEdit={can(ctx.user, 'probes.edit')} canCalibrate={can(ctx.user, 'probes.calibrate')} today={new Date().toISOString().slice(0, 10)} />
    </>
  );
}
