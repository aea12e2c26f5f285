import type { Metadata } from 'next';
import { notFound } from 'next/navigation';
import { PageHeader } from '@/components/ui/page-header';
import { ProgramScreen } from '@/components/programs/program-screen';
import { getProgram } from '@/db/queries/programs';
import { machineChoices } from '@/db/queries/machines';
import { getProbe } from '@/db/queries/probes';
import { can } from '@/lib/auth/permissions';
import { isAppError } from '@/lib/server/app-error';
import { requirePageCtx } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Program' };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export default async function ProgramPage({ params, searchParams }: { params: Promise<{ programId: string }>; searchParams: Promise<{ generate?: string }> }) {
  const ctx = await requirePageCtx('programs.read');
  const { programId } = await params;
  if (!UUID.test(programId)) notFound();
  const program = await getProgram(ctx, programId).catch((e: unknown) => {
    if (isAppError(e) && e.code === 'not-found') notFound();
    throw e;
  });
  const canGenerate = can(ctx.user, 'programs.generate');
  const [machines, probe] = await Promise.all([canGenerate ? machineChoices(ctx) : Promise.resolve([]), getProbe(ctx, program.probeId)]);
  const auto = (await searchParams).generate === '1';
  return (
    <>
      <PageHeader title={program.name} description={`${program.part} on ${program.machine}`} />
      <ProgramScreen program={program} canGenerate={canGenerate} autoGenerate={auto} machines={machines} probeWarning={probe.status.state === 'stale' ? probe.status.message : null} />
    </>
  );
}
