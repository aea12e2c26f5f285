/**
 * How each controller dialect writes offsets: absolute `G10` lines (never incremental),
 * as data so a new dialect is a new entry, not a new code path. Placeholders in braces
 * are filled with numbers already rounded to `decimals`.
 * `ngc`: RS274/NGC family — G10 L2 P<n> sets coordinate system n (1 = G54) [published,
 * NISTIR 6556 §3.2.1 for the parameter layout; LinuxCNC G-code docs for L2/L1]; L1 writes
 * the tool table (it has no separate wear register, so the radius itself is written).
 * `iso-skip`: ISO-style controls — G10 L2 P<n> for work offsets, G10 L13 P<tool> R for the
 * cutter-radius wear register (memory C layout) [from memory; check the control's manual].
 */
export interface CorrectionDialect {
  id: string;
  workOffset: string;
  radiusWear: string;
  radiusNote: string;
  decimals: number;
}

export const CORRECTION_DIALECTS: Record<string, CorrectionDialect> = {
  ngc: {
    id: 'ngc',
    workOffset: 'G10 L2 P{register} X{x} Y{y} Z{z}',
    radiusWear: 'G10 L1 P{tool} R{value}',
    radiusNote: 'tool-table radius (this dialect keeps no separate wear register)',
    decimals: 4,
  },
  'iso-skip': {
    id: 'iso-skip',
    workOffset: 'G10 L2 P{register} X{x} Y{y} Z{z}',
    radiusWear: 'G10 L13 P{tool} R{value}',
    radiusNote: 'cutter-radius wear register',
    decimals: 4,
  },
};

export function formatNumber(v: number, decimals: number): string {
  const s = (Math.abs(v) < 0.5 * 10 ** -decimals ? 0 : v).toFixed(decimals);
  return s;
}

export function fillTemplate(template: string, values: Record<string, string>): string {
  return template.replace(/\{(\w+)\}/g, (_, k: string) => values[k] ?? `{${k}}`);
}

/** Work-offset register number to its G-code name (1 = G54 … 6 = G59, then G59.1 …). */
export function registerName(n: number): string {
  return n <= 6 ? `G${53 + n}` : `G59.${n - 6}`;
}
