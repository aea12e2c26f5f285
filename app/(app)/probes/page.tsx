import type { Metadata } from 'next';
import { PageHeader } from '@/components/ui/page-header';
import { ProbesList } from '@/components/probes/probes-list';
import { listProbes } from '@/db/queries/probes';
import { can } from '@/lib/auth/permissions';
import { requirePageCtx } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Probes' };

export default async function ProbesPage() {
  const ctx = await requirePageCtx('probes.read');
  const rows = await listProbes(ctx);
  return (
    <>
      <PageHeader title="Probes" description="Touch probes with their stylus, feeds and calibration history; a stale calibration is flagged wherever the probe is chosen." />
      <ProbesList rows={rows} canEdit={can(ctx.user, 'probes.edit')} />
    </>
  );
}
