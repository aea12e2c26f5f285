/**
 * Conformance decisions by the ISO 14253-1 default rule [from memory, REFERENCES.md §7]:
 * conformance is proven only inside the specification zone shrunk by U at each limit,
 * nonconformance only outside the zone grown by U; in between neither is proven
 * (`marginal`). A result proven conforming but past the workspace's warning share of
 * its tolerance is `marginal` too (our word; default share 80 %).
 */
export type Status = 'conforming' | 'marginal' | 'nonconforming' | 'not-evaluated';

export const DEFAULT_WARNING_SHARE = 0.8;

export interface DecisionRule {
  rule: 'ISO 14253-1 default (guard bands of U)';
  U: number;
  /** Values proven conforming: [low, high] (null where the specification has no limit). */
  conformanceZone: [number | null, number | null] | null;
  /** Specification limits grown by U; outside them nonconformance is proven. */
  nonconformanceBeyond: [number | null, number | null];
  warningShare: number;
  /** Share of the tolerance the value uses (0 at the middle or at zero, 1 at a limit). */
  toleranceUsed: number | null;
}

export interface Decision { status: Status; decisionRule: DecisionRule; reason: string }

/**
 * `lower`/`upper` are the specification limits on the value (a geometric tolerance has
 * upper only: its zone runs from 0, which is its ideal). Inclusive at the shrunk limits.
 */
export function decide(value: number, lower: number | null, upper: number | null, U: number, warningShare = DEFAULT_WARNING_SHARE): Decision {
  const cLo = lower === null ? null : lower + U;
  const cHi = upper === null ? null : upper - U;
  const empty = cLo !== null && cHi !== null && cLo > cHi;
  const used = toleranceUsed(value, lower, upper);
  const decisionRule: DecisionRule = {
    rule: 'ISO 14253-1 default (guard bands of U)', U,
    conformanceZone: empty ? null : [cLo, cHi],
    nonconformanceBeyond: [lower === null ? null : lower - U, upper === null ? null : upper + U],
    warningShare, toleranceUsed: used,
  };
  if ((lower !== null && value < lower - U) || (upper !== null && value > upper + U)) {
    return { status: 'nonconforming', decisionRule, reason: 'outside the specification zone grown by U' };
  }
  const proven = !empty && (cLo === null || value >= cLo) && (cHi === null || value <= cHi);
  if (!proven) {
    return { status: 'marginal', decisionRule, reason: empty ? 'U is at least half the tolerance: conformance cannot be proven' : 'within U of a limit: neither conformance nor nonconformance is proven' };
  }
  if (used !== null && used > warningShare) {
    return { status: 'marginal', decisionRule, reason: `conforming, but uses ${(used * 100).toFixed(0)} % of the tolerance (warning share ${(warningShare * 100).toFixed(0)} %)` };
  }
  return { status: 'conforming', decisionRule, reason: 'inside the specification zone shrunk by U' };
}

function toleranceUsed(value: number, lower: number | null, upper: number | null): number | null {
  if (lower !== null && upper !== null) {
    const half = (upper - lower) / 2;
    return half > 0 ? Math.abs(value - (upper + lower) / 2) / half : null;
  }
  if (upper !== null && upper > 0) return Math.max(0, value) / upper;
  return null;
}
