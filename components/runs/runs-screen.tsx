/** The Runs section: ready-to-run revisions (package, upload) and the latest runs. */
import Link from 'next/link';
import { listApprovedRevisions, listRuns, type RunListRow } from '@/db/queries/runs';
import { StatusBadge } from '@/components/ui/status-badge';
import { PageHeader } from '@/components/ui/page-header';
import { SAFETY_CAUTIONS, SAFETY_HEADLINE } from '@/lib/packaging/cautions';
import { can } from '@/lib/auth/permissions';
import type { Ctx } from '@/lib/server/context';
import { UploadForm } from './upload-form';

function Counts({ c }: { c: RunListRow['counts'] }) {
  const states = (['nonconforming', 'marginal', 'conforming', 'not-evaluated'] as const).filter((s) => c[s] > 0);
  return <span className="flex flex-wrap gap-1">{states.map((s) => <span key={s} className="inline-flex items-center gap-1"><StatusBadge state={s} /><span className="font-mono text-caption">×{c[s]}</span></span>)}</span>;
}

export function SafetyNote() {
  return (
    <aside className="rounded-card border-2 border-ink bg-surface p-3 text-small" aria-label="Safety">
      <p className="font-semibold">⚠ {SAFETY_HEADLINE}</p>
      <ul className="mt-1 list-disc pl-5">{SAFETY_CAUTIONS.map((c) => <li key={c}>{c}</li>)}</ul>
    </aside>
  );
}

export async function RunsScreen({ ctx, revisionId }: { ctx: Ctx; revisionId?: string }) {
  const mayUpload = can(ctx.user, 'results.upload');
  const mayDownload = can(ctx.user, 'packages.download');
  const [runs, approved] = await Promise.all([listRuns(ctx), mayUpload || mayDownload ? listApprovedRevisions(ctx) : Promise.resolve([])]);
  const machines = [...new Map(runs.map((r) => [r.machineId, r])).values()];
  return (
    <div className="space-y-8">
      <PageHeader title="Runs" description="Approved programs ready for the machine, and the results brought back from it, evaluated against each tolerance." />
      {mayUpload || mayDownload ? (
        <section aria-labelledby="ready-heading" className="space-y-3">
          <h2 id="ready-heading" className="text-title">Ready to run</h2>
          <SafetyNote />
          {approved.length === 0 ? <p className="text-small text-ink-muted">No approved revision yet.</p> : (
            <div className="card overflow-x-auto"><table className="data-table"><thead><tr><th scope="col">Part · program</th><th scope="col">Rev.</th><th scope="col">Machine</th><th scope="col">Approved (UTC)</th><th scope="col"><span className="sr-only">Package</span></th></tr></thead>
              <tbody>{approved.map((a) => (
                <tr key={a.id}><td>{a.partNumber} · {a.programName}</td><td className="font-mono">{a.number}</td><td>{a.machineName}</td><td>{a.approvedAt?.slice(0, 16).replace('T', ' ') ?? '—'}</td>
                  <td>{mayDownload ? <a className="btn-secondary" href={`/api/packages/${a.id}`} download>Download package</a> : null}</td></tr>
              ))}</tbody></table></div>
          )}
          {mayUpload && approved.length > 0 ? (
            <UploadForm defaultRevisionId={revisionId} choices={approved.map((a) => ({ id: a.id, label: `${a.partNumber} · ${a.programName} rev ${a.number}`, machineName: a.machineName }))} />
          ) : null}
        </section>
      ) : null}
      <section aria-labelledby="runs-heading" className="space-y-3">
        <h2 id="runs-heading" className="text-title">Latest runs</h2>
        {runs.length === 0 ? <p className="text-small text-ink-muted">No runs yet: results appear here once the control&apos;s output of an approved program is uploaded.</p> : (
          <div className="card overflow-x-auto"><table className="data-table" data-testid="runs-table"><thead><tr><th scope="col">Serial</th><th scope="col">Part · program</th><th scope="col">Machine</th><th scope="col">Measured (UTC)</th><th scope="col">Results</th></tr></thead>
            <tbody>{runs.map((r) => (
              <tr key={r.id}>
                <td><Link className="font-medium text-brand underline-offset-2 hover:underline" href={`/runs/${r.id}`}>{r.serial}</Link>{r.simulated ? <span className="ml-2 rounded-full border border-dashed border-ink-muted px-2 text-caption">simulated</span> : null}</td>
                <td>{r.partNumber} · {r.programName} rev {r.revisionNumber}</td><td>{r.machineName}</td>
                <td className="whitespace-nowrap">{r.measuredAt.slice(0, 16).replace('T', ' ')}</td><td><Counts c={r.counts} /></td>
              </tr>
            ))}</tbody></table></div>
        )}
        {machines.length > 0 ? <p className="text-small">Live page per machine (for a phone at the machine): {machines.map((m, i) => <span key={m.machineId}>{i > 0 ? ', ' : ''}<Link className="text-brand underline" href={`/runs/live/${m.machineId}`}>{m.machineName}</Link></span>)}</p> : null}
      </section>
    </div>
  );
}

