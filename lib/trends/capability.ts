/**
 * Run-chart statistics per characteristic: mean, sample standard deviation (n − 1),
 * and the process capability indices once there are enough values.
 *
 *   Cp  = (USL − LSL) / 6s                 two-sided limits only
 *   Cpk = min(USL − x̄, x̄ − LSL) / 3s        one-sided: the side that exists
 *
 * Source for the definitions: D. C. Montgomery, Introduction to Statistical Quality
 * Control, ch. "Process and measurement system capability analysis" (from memory).
 * These indices assume a stable, roughly normal process; a form or position value is
 * bounded by zero and skewed, so its Cpk is a guide, not a guarantee.
 *
 * Minimum count (common practice): capability is not stated from fewer than
 * MIN_VALUES_FOR_CAPABILITY values, and is marked preliminary below
 * FULL_STUDY_VALUES — capability studies usually ask for 25 or more subgroups or
 * about 30–100 individual values. Below 10 the 95 % interval of Cpk is wider than ±0.65
 * around 1.33 (Bissell's approximation below), which says little.
 */

export const MIN_VALUES_FOR_CAPABILITY = 10;
export const FULL_STUDY_VALUES = 30;
/** A spread below this share of the mean is rounding, not process variation. */
const NO_SPREAD_RELATIVE = 1e-12;
/** Standard normal 0.975 quantile, for two-sided 95 % intervals. */
const Z_975 = 1.959963984540054;

export interface Limits {
  lower: number | null;
  upper: number | null;
}

export interface BasicStats {
  n: number;
  mean: number | null;
  /** Sample standard deviation (n − 1 in the denominator); null below 2 values. */
  sd: number | null;
  min: number | null;
  max: number | null;
}

export type CapabilityReason = 'too-few-values' | 'no-limits' | 'no-spread';

export interface Capability extends BasicStats {
  cp: number | null;
  cpk: number | null;
  /** Approximate 95 % interval of Cpk (Bissell 1990); null when Cpk is. */
  cpkInterval: [number, number] | null;
  preliminary: boolean;
  /** Why Cp/Cpk are not given, when they are not. */
  reason: CapabilityReason | null;
  minimumN: number;
}

export function basicStats(values: readonly number[]): BasicStats {
  const n = values.length;
  if (n === 0) return { n, mean: null, sd: null, min: null, max: null };
  let sum = 0;
  for (const v of values) sum += v;
  const mean = sum / n;
  let ss = 0; // two-pass: squared deviations from the mean, no cancellation
  for (const v of values) ss += (v - mean) ** 2;
  const min = Math.min(...values);
  const max = Math.max(...values);
  // Equal values have no spread; the rounding of the mean would otherwise leave ~1e-15.
  const sd = n > 1 ? (min === max ? 0 : Math.sqrt(ss / (n - 1))) : null;
  return { n, mean: min === max ? min : mean, sd, min, max };
}

/**
 * Approximate 95 % confidence interval of Cpk:
 * Cpk ± z·√(1/(9n) + Cpk²/(2(n − 1))).
 * Source: A. F. Bissell, "How reliable is your capability index?", Applied Statistics
 * 39(3) (1990) 331–340 (from memory).
 */
export function cpkInterval(cpk: number, n: number): [number, number] {
  const half = Z_975 * Math.sqrt(1 / (9 * n) + (cpk * cpk) / (2 * (n - 1)));
  return [cpk - half, cpk + half];
}

export function capability(values: readonly number[], limits: Limits, minimumN = MIN_VALUES_FOR_CAPABILITY): Capability {
  const stats = basicStats(values);
  const base = { ...stats, cp: null, cpk: null, cpkInterval: null, preliminary: stats.n < FULL_STUDY_VALUES, minimumN };
  if (limits.lower === null && limits.upper === null) return { ...base, reason: 'no-limits' };
  if (stats.n < minimumN || stats.mean === null || stats.sd === null) return { ...base, reason: 'too-few-values' };
  if (!(stats.sd > NO_SPREAD_RELATIVE * Math.max(1, Math.abs(stats.mean)))) return { ...base, reason: 'no-spread' };
  const { mean, sd } = stats;
  const cp = limits.lower !== null && limits.upper !== null ? (limits.upper - limits.lower) / (6 * sd) : null;
  const sides = [
    limits.upper !== null ? (limits.upper - mean) / (3 * sd) : Infinity,
    limits.lower !== null ? (mean - limits.lower) / (3 * sd) : Infinity,
  ];
  const cpk = Math.min(...sides);
  return { ...base, cp, cpk, cpkInterval: cpkInterval(cpk, stats.n), reason: null };
}
