/**
 * Test-uncertainty ratio, on-machine vs CMM advice, and the global false-accept
 * (consumer's) risk of a normal process measured with a normal error, by the integral
 * of JCGM 106:2012 §9 evaluated with composite Simpson's rule.
 */
export interface Capability {
  span: number;
  U: number;
  /** TUR = span / (2U) [published: ANSI/NCSL Z540.3 handbook, via Morehouse]. */
  tur: number;
  advice: 'on-machine' | 'cmm';
  message: string;
}

/** The ratio at or above which measuring on the machine is advised (Z540.3 §5.3(b): 4:1). */
export const MIN_TUR = 4;

export function capability(span: number, U: number, minTur = MIN_TUR): Capability {
  const tur = U > 0 ? span / (2 * U) : Number.MAX_VALUE;
  const advice = tur >= minTur ? 'on-machine' : 'cmm';
  const turText = U > 0 ? tur.toFixed(2) : 'unbounded';
  return {
    span, U, tur, advice,
    message: advice === 'on-machine'
      ? `TUR ${turText}:1 (span ${span.toFixed(4)} mm, U ${U.toFixed(4)} mm) — measure on the machine`
      : `TUR ${turText}:1 is below ${minTur}:1 (span ${span.toFixed(4)} mm, U ${U.toFixed(4)} mm) — send to the CMM`,
  };
}

/** Standard normal cumulative distribution (via erfc, Numerical Recipes' Chebyshev fit, |ε| < 1.2e-7). */
export function normalCdf(x: number): number {
  const z = Math.abs(x) / Math.SQRT2;
  const t = 1 / (1 + 0.5 * z);
  const erfc = t * Math.exp(-z * z - 1.26551223 + t * (1.00002368 + t * (0.37409196 + t * (0.09678418 + t * (-0.18628806 + t * (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))));
  return x >= 0 ? 1 - erfc / 2 : erfc / 2;
}

export interface RiskInput {
  lower: number;
  upper: number;
  processMean: number;
  processSigma: number;
  /** Standard uncertainty of measurement, u = U/2. */
  u: number;
  /** Acceptance limits (default: the specification limits, simple acceptance). */
  acceptLower?: number;
  acceptUpper?: number;
}

/** Probability that a part outside the specification is measured inside the acceptance zone. */
export function falseAcceptRisk(r: RiskInput): number {
  const aLo = r.acceptLower ?? r.lower;
  const aHi = r.acceptUpper ?? r.upper;
  const pdf = (y: number): number => Math.exp(-(((y - r.processMean) / r.processSigma) ** 2) / 2) / (r.processSigma * Math.sqrt(2 * Math.PI));
  const accepted = (y: number): number => normalCdf((aHi - y) / r.u) - normalCdf((aLo - y) / r.u);
  const f = (y: number): number => pdf(y) * accepted(y);
  const reach = 10 * r.processSigma;
  return simpson(f, r.processMean - reach, Math.min(r.lower, r.processMean + reach)) + simpson(f, Math.max(r.upper, r.processMean - reach), r.processMean + reach);
}

function simpson(f: (x: number) => number, a: number, b: number, n = 4000): number {
  if (!(b > a)) return 0;
  const h = (b - a) / n;
  let s = f(a) + f(b);
  for (let i = 1; i < n; i++) s += (i % 2 ? 4 : 2) * f(a + i * h);
  return (s * h) / 3;
}
