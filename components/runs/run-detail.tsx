/** One run: header, cautions, results per tolerance, 3D deviations, corrections, virtual run. */
import Link from 'next/link';
import { PageHeader } from '@/components/ui/page-header';
import { can } from '@/lib/auth/permissions';
import type { SessionUser } from '@/lib/server/context';
import type { loadRunDetail } from '@/lib/server/runs/run-detail';
import { CorrectionsPanel } from './corrections-panel';
import { DeviationView3D } from './lazy-deviation-view';
import { ResultsTable } from './results-table';
import { SafetyNote } from './runs-screen';
import { VirtualRunForm } from './virtual-run-form';

type Detail = Awaited<ReturnType<typeof loadRunDetail>>;

export function RunDetail({ user, detail }: { user: SessionUser; detail: Detail }) {
  const { run, results, corrections, points, context, missing } = detail;
  return (
    <div className="space-y-6">
      <PageHeader
        title={`${run.partNumber} · serial ${run.serial}`}
        description={<>{run.programName} revision {run.revisionNumber} on {run.machineName}, measured {run.measuredAt.slice(0, 16).replace('T', ' ')} UTC by {run.uploadedBy}.{' '}
          {run.temperatureC !== null ? `Part at ${run.temperatureC} °C.` : 'No part temperature given: lengths not corrected to 20 °C.'}</>}
        actions={<>
          <Link className="btn-secondary" href={`/trends/${run.partId}`}>Trends</Link>
          <Link className="btn-secondary" href={`/runs/live/${run.machineId}`}>Machine live page</Link>
        </>}
      />
      {run.simulated ? <p className="rounded-card border-2 border-dashed border-ink p-3 font-semibold" data-testid="simulated-banner">Simulated run — made by the simulator from an error model, not measured on a machine. Kept out of trends; its corrections are for study only.</p> : null}
      <SafetyNote />
      <section aria-labelledby="results-heading" className="space-y-2">
        <h2 id="results-heading" className="text-title">Results per tolerance</h2>
        <ResultsTable rows={results} />
      </section>
      <section aria-labelledby="points-heading" className="space-y-2">
        <h2 id="points-heading" className="text-title">Measured points</h2>
        <p className="text-small text-ink-muted">{points.length} points{missing > 0 ? `, ${missing} touch points without a measurement` : ''}.</p>
        <DeviationView3D features={context.part.engine.features} touchPoints={context.plan.touchPoints} points={points.map(({ uuid, point, deviation }) => ({ uuid, point, deviation }))} />
      </section>
      <section aria-labelledby="corr-heading" className="space-y-2">
        <h2 id="corr-heading" className="text-title">Proposed corrections</h2>
        <p className="text-small text-ink-muted">Each proposal has a dead band (no change inside it) and a cap (past it, nothing is written: a person decides). Enter lines at the control only after checking them; then mark them entered.</p>
        <CorrectionsPanel runId={run.id} rows={corrections} mayApply={can(user, 'results.upload')} simulated={run.simulated} />
      </section>
      {can(user, 'programs.generate') ? (
        <section aria-labelledby="virtual-heading" className="space-y-2">
          <h2 id="virtual-heading" className="text-title">Try a virtual run of this revision</h2>
          <VirtualRunForm revisionId={run.revisionId} features={context.part.engine.features.map((f) => ({ uuid: f.uuid, label: f.label, type: f.type }))} />
        </section>
      ) : null}
    </div>
  );
}
