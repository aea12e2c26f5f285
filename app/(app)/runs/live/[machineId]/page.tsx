import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { AutoRefresh } from '@/components/runs/auto-refresh';
import { StatusBadge } from '@/components/ui/status-badge';
import { isAppError } from '@/lib/server/app-error';
import { machineLive } from '@/lib/server/runs/machine-live';
import { requirePageUser } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Machine live' };
export const dynamic = 'force-dynamic';

export default async function MachineLivePage({ params }: { params: Promise<{ machineId: string }> }) {
  const user = await requirePageUser('results.read');
  const { machineId } = await params;
  if (!z.uuid().safeParse(machineId).success) notFound();
  try {
    const live = await machineLive({ user, ip: null }, machineId);
    return (
      <div className="mx-auto max-w-md space-y-3" data-testid="machine-live">
        <h1 className="text-heading">{live.machineName}</h1>
        <AutoRefresh />
        {live.run ? (
          <>
            <p className="text-body"><Link className="text-brand underline" href={`/runs/${live.run.id}`}>Serial {live.run.serial}</Link> · {live.run.partNumber} · {live.run.programName} rev {live.run.revisionNumber}<br /><span className="text-small text-ink-muted">{live.run.measuredAt.slice(0, 16).replace('T', ' ')} UTC</span></p>
            <ul className="space-y-2">
              {live.results.map((r) => (
                <li key={r.id} className="card flex items-center justify-between gap-2 p-3 text-body">
                  <span><strong className="text-title">{r.label}</strong> {r.characteristic}<br /><span className="font-mono text-small">{r.value === null ? '—' : r.value.toFixed(4)}</span></span>
                  <StatusBadge state={r.status} className="text-small" />
                </li>
              ))}
            </ul>
          </>
        ) : <p className="text-body text-ink-muted">No run on this machine yet.</p>}
      </div>
    );
  } catch (error) {
    if (isAppError(error) && error.code === 'not-found') notFound();
    throw error;
  }
}
