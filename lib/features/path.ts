/**
 * The probe's path around one feature, in the part frame P (mm), shared by the planner
 * (to check every point against the travel limits) and the program builder (to emit it).
 *
 *   safe-in ─(along the tool axis)─▶ entry ─▶ for each touch point:
 *       interior (bore, slot): straight to its start (the free space inside is convex);
 *       exterior: across at the feature's clearance, down along the axis to its start,
 *       and back up after the retract;
 *   ─▶ exit ─(along the tool axis)─▶ safe-out.
 * Entry and exit of an interior feature are its clearance point on the axis; of an
 * exterior one, the clearance points above its first and last starts.
 */
import { addScaled, type Vec3 } from '../geometry/vec3';
import type { Feature } from './schema';
import { featureAxis, featureTop, isInterior } from './feature-geometry';
import { liftAbove, ontoHeight } from './clearance';

export interface FeaturePath {
  safeIn: Vec3;
  entry: Vec3;
  /** Points passed before reaching each start, and after retracting from it. */
  before: Vec3[][];
  after: Vec3[][];
  exit: Vec3;
  safeOut: Vec3;
}

/**
 * @param clearanceMm the feature's clearance above its top (featureClearance)
 * @param safeH the safe-plane height along `toolAxis` (safeHeight)
 */
export function featurePath(f: Feature, starts: Vec3[], clearanceMm: number, toolAxis: Vec3, safeH: number): FeaturePath {
  if (isInterior(f)) {
    const entry = addScaled(featureTop(f), featureAxis(f), clearanceMm);
    return {
      safeIn: ontoHeight(entry, toolAxis, safeH),
      entry,
      before: starts.map(() => []),
      after: starts.map(() => []),
      exit: entry,
      safeOut: ontoHeight(entry, toolAxis, safeH),
    };
  }
  const n = featureAxis(f);
  const top = featureTop(f);
  const lifts = starts.map((s) => liftAbove(s, n, top, clearanceMm));
  const first = lifts[0] ?? top;
  const last = lifts[lifts.length - 1] ?? first;
  return {
    safeIn: ontoHeight(first, toolAxis, safeH),
    entry: first,
    before: lifts.map((l) => [l]),
    after: lifts.map((l) => [l]),
    exit: last,
    safeOut: ontoHeight(last, toolAxis, safeH),
  };
}
