/**
 * A run chart's data for one part characteristic: the real runs' values in time order
 * (simulated runs are kept out), the limits, and the statistics. Times are ISO 8601
 * strings passed in, compared as text (they sort in time order when all are UTC "Z").
 */
import { capability, type Capability, type Limits } from './capability';

export interface TrendInput {
  runUuid: string;
  /** When the part was measured, ISO 8601 UTC. */
  measuredAt: string;
  serial: string | null;
  value: number;
  status: string;
  simulated: boolean;
}

export interface TrendPoint extends Omit<TrendInput, 'simulated'> {
  /** 1-based position on the run chart. */
  index: number;
}

export interface Trend {
  characteristic: string;
  label: string;
  limits: Limits;
  points: TrendPoint[];
  /** Simulated runs left out of the chart and the statistics. */
  simulatedLeftOut: number;
  stats: Capability;
}

export function buildTrend(
  meta: { characteristic: string; label: string; limits: Limits },
  inputs: readonly TrendInput[],
  minimumN?: number,
): Trend {
  const real = inputs.filter((p) => !p.simulated && Number.isFinite(p.value));
  const sorted = [...real].sort((a, b) => (a.measuredAt < b.measuredAt ? -1 : a.measuredAt > b.measuredAt ? 1 : 0));
  const points = sorted.map(({ simulated: _s, ...p }, i) => ({ ...p, index: i + 1 }));
  return {
    ...meta,
    points,
    simulatedLeftOut: inputs.filter((p) => p.simulated).length,
    stats: capability(points.map((p) => p.value), meta.limits, minimumN),
  };
}
