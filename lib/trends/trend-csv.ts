/** CSV export of a run chart: one row per run, then the statistics as `#` notes. */
import Papa from 'papaparse';
import type { Trend } from './series';

const num = (v: number | null, digits = 6): string => (v === null ? '' : String(Number(v.toFixed(digits))));

export function trendCsv(trend: Trend): string {
  const rows = trend.points.map((p) => [String(p.index), p.measuredAt, p.serial ?? '', p.runUuid, num(p.value), p.status]);
  const body = Papa.unparse(
    { fields: ['index', 'measured_at', 'serial', 'run_uuid', 'value', 'status'], data: rows },
    { newline: '\n' },
  );
  const s = trend.stats;
  const notes = [
    `# ${trend.label} ${trend.characteristic}`,
    `# lower limit ${num(trend.limits.lower)}; upper limit ${num(trend.limits.upper)}`,
    `# n ${s.n}; mean ${num(s.mean)}; sd ${num(s.sd)}`,
    s.cpk === null
      ? `# Cp/Cpk not given (${s.reason ?? 'unknown'}; needs at least ${s.minimumN} values)`
      : `# Cp ${num(s.cp, 3)}; Cpk ${num(s.cpk, 3)}${s.preliminary ? ' (preliminary)' : ''}`,
    `# simulated runs left out: ${trend.simulatedLeftOut}`,
  ];
  return `${body}\n${notes.join('\n')}\n`;
}
