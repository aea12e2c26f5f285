/**
 * Brings parsed result records into the part frame P. A TRIP record holds axis values in
 * the machine frame M; forward kinematics at the recorded rotary angles gives the stylus-
 * ball centre in P (spec/engine-cli.md, "Forward kinematics"). CSV rows are already in P.
 * The forward kinematics is passed in, so this stays independent of a machine's layout.
 *
 * A recorded rotary angle that differs from the plan's means the program that ran is not
 * the revision's plan (or the control was moved by hand): reported as a warning with the
 * line, because the point itself is still correct through fk.
 */
import type { AxisValues, Vec3 } from '../kinematics/schema';
import type { Plan } from './plan-schema';
import type { ResultRecord } from './results-parse';

export type ForwardTip = (axes: AxisValues) => Vec3;

export interface PartFrameMeasurement {
  uuid: string;
  line: number;
  /** Stylus-ball centre at the trip, part frame P, mm. */
  point: Vec3;
  /** The axis values as recorded (TRIP records only). */
  axes?: AxisValues;
}

export interface FrameWarning {
  line: number;
  uuid: string;
  message: string;
}

/** Rotary agreement: 0.001° (a recorded value is printed to 3 or 4 decimals). */
export const ROTARY_MATCH_DEG = 1e-3;

function angleDifferenceDeg(a: number, b: number): number {
  const d = (((a - b) % 360) + 540) % 360 - 180;
  return Math.abs(d);
}

export function toPartFrame(
  records: readonly ResultRecord[],
  plan: Plan,
  forwardTip: ForwardTip,
): { measurements: PartFrameMeasurement[]; warnings: FrameWarning[] } {
  const planned = new Map(plan.touchPoints.map((tp) => [tp.uuid, tp.axes]));
  const measurements: PartFrameMeasurement[] = [];
  const warnings: FrameWarning[] = [];
  for (const r of records) {
    if (r.kind === 'point') {
      measurements.push({ uuid: r.uuid, line: r.line, point: r.point });
      continue;
    }
    const plannedAxes = planned.get(r.uuid) ?? {};
    for (const [word, value] of Object.entries(r.axes)) {
      if ('XYZ'.includes(word)) continue;
      const p = plannedAxes[word];
      if (p !== undefined && angleDifferenceDeg(value, p) > ROTARY_MATCH_DEG) {
        warnings.push({ line: r.line, uuid: r.uuid, message: `line ${r.line}: ${word} was ${value}° at the trip, the plan has ${p}°` });
      }
    }
    measurements.push({ uuid: r.uuid, line: r.line, point: forwardTip(r.axes), axes: r.axes });
  }
  return { measurements, warnings };
}
