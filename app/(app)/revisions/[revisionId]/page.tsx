import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { PageHeader } from '@/components/ui/page-header';
import { RevisionScreen } from '@/components/programs/revision-screen';
import { getRevision } from '@/db/queries/revisions';
import { getProgram } from '@/db/queries/programs';
import { enginePart } from '@/db/queries/parts';
import { getProbe } from '@/db/queries/probes';
import { getDb } from '@/db/client';
import { adviseCapability } from '@/lib/evaluation/capability-advice';
import { can } from '@/lib/auth/permissions';
import { isAppError } from '@/lib/server/app-error';
import { requirePageCtx } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Revision' };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export default async function RevisionPage({ params }: { params: Promise<{ revisionId: string }> }) {
  const ctx = await requirePageCtx('programs.read');
  const { revisionId } = await params;
  if (!UUID.test(revisionId)) notFound();
  const revision = await getRevision(ctx, revisionId).catch((e: unknown) => {
    if (isAppError(e) && e.code === 'not-found') notFound();
    throw e;
  });
  const programId = revision.programId;
  const program = await getProgram(ctx, programId);
  const [part, probe] = await Promise.all([enginePart(getDb(), ctx, program.partId), getProbe(ctx, program.probeId)]);
  const labelOf = new Map(part.features.map((f) => [f.uuid, f.label]));
  const advice = adviseCapability(part, revision.plan, { probeRepeatability2Sigma: probe.repeatabilityMm }).map((a) => ({
    key: a.toleranceUuid, feature: labelOf.get(a.featureUuid) ?? '?', characteristic: a.characteristic, points: a.points,
    tur: a.capability?.tur ?? null, where: a.capability?.advice ?? null, message: a.message,
  }));
  return (
    <>
      <PageHeader title={`${revision.programName} — revision ${revision.number}`}
        description={<><Link className="text-brand hover:underline" href={`/programs/${programId}`}>All revisions</Link> · {program.part} on {program.machine} v{program.machineVersion} · post {revision.post}</>} />
      <RevisionScreen revision={revision} features={part.features} advice={advice} canEdit={can(ctx.user, 'programs.edit')} />
    </>
  );
}
