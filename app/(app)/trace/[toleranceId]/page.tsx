import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { loadTrace } from '@/db/queries/results';
import { TraceView } from '@/components/trace/trace-view';
import { PageHeader } from '@/components/ui/page-header';
import { isAppError } from '@/lib/server/app-error';
import { requirePageUser } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Trace' };

export default async function TracePage({ params }: { params: Promise<{ toleranceId: string }> }) {
  const user = await requirePageUser('results.read');
  const { toleranceId } = await params;
  if (!z.uuid().safeParse(toleranceId).success) notFound();
  try {
    const trace = await loadTrace({ user, ip: null }, toleranceId);
    const t = trace.tolerance;
    return (
      <div className="space-y-4">
        <PageHeader title={`Trace — ${t.partNumber}, balloon ${t.featureLabel} ${t.characteristic}`} description={`The ${t.featureType} ${t.featureLabel}: where it is touched, by which program lines, what was measured, the verdicts and the corrections they led to.`}
          actions={<Link className="btn-secondary" href={`/trends/${t.partId}`}>Trends</Link>} />
        <TraceView trace={trace} />
      </div>
    );
  } catch (error) {
    if (isAppError(error) && error.code === 'not-found') notFound();
    throw error;
  }
}
