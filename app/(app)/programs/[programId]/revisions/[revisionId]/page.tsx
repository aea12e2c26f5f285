import type { Metadata } from 'next';
import Link from 'next/link';
import { forbidden, notFound } from 'next/navigation';
import { PageHeader } from '@/components/ui/page-header';
import { RevisionScreen } from '@/components/programs/revision-screen';
import { getRevision } from '@/db/queries/revisions';
import { getProgram } from '@/db/queries/programs';
import { getPart } from '@/db/queries/parts';
import { can } from '@/lib/auth/permissions';
import { isAppError } from '@/lib/server/app-error';
import { requirePageCtx } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Revision' };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export default async function RevisionPage({ params }: { params: Promise<{ programId: string; revisionId: string }> }) {
  const ctx = await requirePageCtx('programs.read');
  const { programId, revisionId } = await params;
  if (!UUID.test(programId) || !UUID.test(revisionId)) notFound();
  const revision = await getRevision(ctx, revisionId).catch((e: unknown) => {
    if (isAppError(e) && e.code === 'not-found') notFound();
    if (isAppError(e) && e.code === 'forbidden') forbidden();
    throw e;
  });
  if (revision.programId !== programId) notFound();
  const program = await getProgram(ctx, programId);
  const part = await getPart(ctx, program.partId);
  return (
    <>
      <PageHeader title={`${revision.programName} — revision ${revision.number}`}
        description={<><Link className="text-brand hover:underline" href={`/programs/${programId}`}>All revisions</Link> · {program.part} on {program.machine} v{program.machineVersion} · post {revision.post}</>} />
      <RevisionScreen revision={revision} features={part.features} canEdit={can(ctx.user, 'programs.edit')} />
    </>
  );
}
