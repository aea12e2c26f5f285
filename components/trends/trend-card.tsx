/** One characteristic's trend: the chart, the statistics with the minimum n stated, CSV export. */
import type { Trend } from '@/lib/trends/series';
import { MIN_VALUES_FOR_CAPABILITY, FULL_STUDY_VALUES } from '@/lib/trends/capability';
import { RunChart } from './run-chart';

const f = (v: number | null, d = 4) => (v === null ? '—' : v.toFixed(d));

export function TrendCard({ trend, partId, toleranceId }: { trend: Trend; partId: string; toleranceId: string }) {
  const s = trend.stats;
  return (
    <section className="card space-y-2 p-4" aria-label={`${trend.label} ${trend.characteristic}`} data-testid="trend-card">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 className="text-title">{trend.label} · {trend.characteristic}</h2>
        <a className="btn-secondary" href={`/api/trends/${partId}?tolerance=${toleranceId}&format=csv`} download>Export CSV</a>
      </div>
      {trend.points.length === 0 ? <p className="text-small text-ink-muted">No measured runs yet.</p> : <RunChart trend={trend} />}
      <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-small sm:grid-cols-6" data-testid="trend-stats">
        <div><dt className="text-ink-muted">runs (n)</dt><dd className="font-mono">{s.n}</dd></div>
        <div><dt className="text-ink-muted">mean</dt><dd className="font-mono">{f(s.mean)}</dd></div>
        <div><dt className="text-ink-muted">std. deviation</dt><dd className="font-mono">{f(s.sd, 5)}</dd></div>
        <div><dt className="text-ink-muted">Cp</dt><dd className="font-mono" data-testid="cp">{s.cp === null ? '—' : s.cp.toFixed(2)}</dd></div>
        <div><dt className="text-ink-muted">Cpk</dt><dd className="font-mono" data-testid="cpk">{s.cpk === null ? '—' : s.cpk.toFixed(2)}</dd></div>
        <div><dt className="text-ink-muted">Cpk 95 %</dt><dd className="font-mono">{s.cpkInterval ? `${s.cpkInterval[0].toFixed(2)} to ${s.cpkInterval[1].toFixed(2)}` : '—'}</dd></div>
      </dl>
      <p className="text-caption text-ink-muted">
        Cp and Cpk are given from {MIN_VALUES_FOR_CAPABILITY} real runs on (common practice: fewer say little) and are preliminary below {FULL_STUDY_VALUES}.
        {s.reason === 'too-few-values' ? ` ${MIN_VALUES_FOR_CAPABILITY - s.n} more run${MIN_VALUES_FOR_CAPABILITY - s.n === 1 ? '' : 's'} needed.` : ''}
        {s.reason === 'no-spread' ? ' All values are equal: no spread to judge.' : ''}
        {s.cpk !== null && s.preliminary ? ' Preliminary.' : ''}
        {trend.limits.lower === null && trend.limits.upper !== null ? ' One-sided tolerance: Cp does not apply.' : ''}
        {trend.simulatedLeftOut > 0 ? ` ${trend.simulatedLeftOut} simulated run${trend.simulatedLeftOut === 1 ? '' : 's'} left out.` : ''}
      </p>
    </section>
  );
}
