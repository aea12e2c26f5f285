/** A tolerance traced: touch points → program lines → measurements → results → corrections. */
import Link from 'next/link';
import type { ResultState } from '@/components/ui/status-badge';
import { StatusBadge } from '@/components/ui/status-badge';
import type { Trace } from '@/db/queries/results';

const f4 = (v: number | null) => (v === null ? '—' : v.toFixed(4));

export function TraceView({ trace }: { trace: Trace }) {
  const t = trace.tolerance;
  const lineOf = new Map(trace.revisions.flatMap((r) => r.points.map((p) => [`${r.id}:${p.uuid}`, p.lines?.recordLine ?? null] as const)));
  return (
    <div className="space-y-6">
      <ol className="flex flex-wrap gap-2 text-caption text-ink-muted" aria-label="Trace steps">
        {['tolerance', 'touch points', 'program lines', 'measurements', 'results', 'corrections'].map((s, i) => <li key={s}>{i > 0 ? '→ ' : ''}{s}</li>)}
      </ol>
      <section aria-labelledby="tp-heading" className="space-y-2">
        <h2 id="tp-heading" className="text-title">Touch points and the program lines that measure them</h2>
        {trace.revisions.length === 0 ? <p className="text-small text-ink-muted">No program measures this part yet.</p> : trace.revisions.map((r) => (
          <details key={r.id} className="card p-3" open={r === trace.revisions[0]} data-testid="trace-revision">
            <summary className="cursor-pointer font-medium"><Link className="text-brand underline" href={`/reviews/${r.id}`}>{r.programName} revision {r.number}</Link> ({r.status}) · {r.points.length} touch points on {t.featureLabel}</summary>
            <table className="data-table mt-2"><thead><tr><th scope="col">#</th><th scope="col">Touch point</th><th scope="col">Surface (mm)</th><th scope="col">Lines</th></tr></thead>
              <tbody>{r.points.map((p) => (
                <tr key={p.uuid} id={`tp-${p.uuid}`}>
                  <td className="font-mono">{p.seq}</td><td className="font-mono text-caption">{p.uuid}</td><td className="font-mono">{p.surface.map((v) => v.toFixed(3)).join(', ')}</td>
                  <td>{p.lines ? <details><summary className="cursor-pointer font-mono">{p.lines.from}–{p.lines.to}</summary><pre className="mt-1 max-w-xl overflow-x-auto bg-sunken p-2 text-caption">{p.text.map((l, i) => `${String((p.lines?.from ?? 0) + i).padStart(5)}  ${l}`).join('\n')}</pre></details> : 'not found in the text'}</td>
                </tr>
              ))}</tbody></table>
          </details>
        ))}
      </section>
      <section aria-labelledby="runs-heading" className="space-y-2">
        <h2 id="runs-heading" className="text-title">Measurements, results and corrections per run</h2>
        {trace.runs.length === 0 ? <p className="text-small text-ink-muted">No runs yet.</p> : (
          <div className="card overflow-x-auto"><table className="data-table" data-testid="trace-runs"><thead><tr><th scope="col">Run</th><th scope="col">Measurements</th><th scope="col">Result</th><th scope="col">Corrections</th></tr></thead>
            <tbody>{trace.runs.map((run) => (
              <tr key={run.id}>
                <td><Link className="text-brand underline" href={`/runs/${run.id}`}>{run.serial}</Link>{run.simulated ? ' (simulated)' : ''}<br /><span className="text-caption text-ink-muted">{run.at.slice(0, 16).replace('T', ' ')} UTC</span></td>
                <td className="text-caption"><ul>{run.measurements.map((m) => <li key={m.uuid} className="font-mono">{m.uuid.slice(0, 8)}… ({f4(m.x)}, {f4(m.y)}, {f4(m.z)}){m.line ? ` · file line ${m.line}` : ''}{lineOf.get(`${run.revisionId}:${m.uuid}`) ? ` · program line ${lineOf.get(`${run.revisionId}:${m.uuid}`)}` : ''}</li>)}</ul></td>
                <td>{run.result ? <><StatusBadge state={run.result.status as ResultState} /><p className="font-mono text-caption">{f4(run.result.value)} (limits {run.result.lower !== null ? `${f4(run.result.lower)}…` : '≤'}{f4(run.result.upper)}{run.result.bonus !== null ? `, bonus ${f4(run.result.bonus)}` : ''})</p></> : '—'}</td>
                <td className="text-caption">{run.corrections.length === 0 ? 'none' : <ul>{run.corrections.map((c, i) => <li key={i}>{c.register}: {c.oldValue === null ? '—' : c.oldValue.toFixed(4)} → {c.newValue.toFixed(4)} · {c.state === 'apply' ? (c.applied ? 'entered' : 'proposed, not entered') : c.state}</li>)}</ul>}</td>
              </tr>
            ))}</tbody></table></div>
        )}
      </section>
    </div>
  );
}
