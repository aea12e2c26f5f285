/** Per tolerance: status (colour + icon + word), value, limits, bonus, U, rule, deviation bar, temperature. */
import Link from 'next/link';
import type { ResultRow } from '@/db/queries/runs';
import { StatusBadge } from '@/components/ui/status-badge';
import { DeviationBar } from './deviation-bar';

const f4 = (v: number | null | undefined) => (v === null || v === undefined ? '—' : v.toFixed(4));

interface TempCorrection { applied?: boolean; correction?: number; note?: string }

export function ResultsTable({ rows }: { rows: ResultRow[] }) {
  const sorted = [...rows].sort((a, b) => String(a.details.label ?? '').localeCompare(String(b.details.label ?? ''), 'en', { numeric: true }));
  return (
    <div className="card overflow-x-auto">
      <table className="data-table" data-testid="results-table">
        <thead>
          <tr><th scope="col">Balloon</th><th scope="col">Characteristic</th><th scope="col">Status</th><th scope="col">Value</th><th scope="col">Limits</th><th scope="col">Bonus</th><th scope="col">U (k=2)</th><th scope="col">Where in the zone</th><th scope="col">Decision rule · temperature</th></tr>
        </thead>
        <tbody>
          {sorted.map((r) => {
            const t = (r.details.temperatureCorrection ?? null) as TempCorrection | null;
            const message = typeof r.details.message === 'string' ? r.details.message : null;
            return (
              <tr key={r.id} data-characteristic={r.characteristic} data-status={r.status}>
                <td className="font-semibold">{String(r.details.label ?? '?')}</td>
                <td><Link className="text-brand underline-offset-2 hover:underline" href={`/trace/${r.toleranceId}`} title="Trace this tolerance">{r.characteristic}</Link>{r.details.materialCondition && r.details.materialCondition !== 'RFS' ? ` (${String(r.details.materialCondition)})` : ''}</td>
                <td><StatusBadge state={r.status} />{message ? <p className="mt-1 max-w-xs text-caption text-ink-muted">{message}</p> : null}</td>
                <td className="font-mono" data-testid="result-value">{f4(r.value)}</td>
                <td className="whitespace-nowrap font-mono">{r.upper === null ? '—' : `${r.lower !== null ? `${f4(r.lower)} … ` : '≤ '}${f4(r.upper)}`}</td>
                <td className="font-mono" data-testid="result-bonus">{r.bonus !== null ? f4(r.bonus) : '—'}</td>
                <td className="font-mono">{f4(r.uncertainty)}</td>
                <td><DeviationBar value={r.value} lower={r.lower} upper={r.upper} U={r.uncertainty} /></td>
                <td className="text-caption">
                  {r.decisionRule === 'iso-14253-1-default' ? 'ISO 14253-1 default: guard bands of U at each limit' : 'no decision rule (not evaluated)'}
                  {t ? <p className="mt-1 text-ink-muted">{t.applied ? `to 20 °C: ${f4(t.correction)} mm` : ''}{t.note ? ` ${t.note}` : ''}</p> : null}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
