/**
 * Clearance geometry shared by the planner, the program builder and the verifier.
 * Part frame P, mm. A point's height along a unit direction t is p·t.
 *
 * - Feature clearance: the probe's `clearance` above the feature's top along its axis;
 *   for a plane, raised above anything standing on it (a boss or web on the face).
 * - The safe plane is also at least 1 mm above every feature clearance point (safeHeight).
 * - Safe plane for a tool axis t: `clearance` above the highest point of every
 *   feature along t (heightAlong). The part model holds only its features, so
 *   this envelope stands in for the part; fixtures and clamps are the setup
 *   technician's to clear (the program's caution says so).
 */
import { addScaled, dot, type Vec3 } from '../geometry/vec3';
import type { Feature, Part, Probe } from './schema';
import { featureAxis, featureFrame, featureTop, heightAlongIn, isInterior } from './feature-geometry';
import { footprintSources, footprintsOnPlane, type FootprintSources } from './footprints';

export const probeRadius = (probe: Probe): number => (probe.effectiveDiameter ?? probe.stylusDiameter) / 2;

/**
 * Clearance height of a feature above its top, along its axis (mm). For an exterior
 * feature also at least 1 mm above the highest start (ball radius + approach above a
 * plane or a pole), so the moves up from a start are never too short to be probe moves.
 */
export function featureClearance(f: Feature, sources: FootprintSources, probe: Probe): number {
  if (isInterior(f)) return probe.clearance;
  const aboveStarts = probeRadius(probe) + probe.approach + 1;
  let protrude = 0;
  if (f.type === 'plane') for (const fp of footprintsOnPlane(f, sources, probeRadius(probe))) protrude = Math.max(protrude, fp.height);
  return Math.max(protrude + probe.clearance, aboveStarts);
}

/** The point above `p` along a feature's axis `n` at the clearance height above its `top` (featureAxis, featureTop). */
export function liftAbove(p: Vec3, n: Vec3, top: Vec3, clearanceMm: number): Vec3 {
  const h = (p[0] - top[0]) * n[0] + (p[1] - top[1]) * n[1] + (p[2] - top[2]) * n[2];
  return addScaled(p, n, clearanceMm - h);
}

/** Every feature's clearance (featureClearance), by feature uuid: compute once per part. */
export const partClearances = (part: Part, probe: Probe): Map<string, number> => partClearancesFrom(part, probe, footprintSources(part));

/** `partClearances` with the part's footprint sources given (and the footprints they hold reused). */
export const partClearancesFrom = (part: Part, probe: Probe, sources: FootprintSources): Map<string, number> =>
  new Map(part.features.map((f) => [f.uuid, featureClearance(f, sources, probe)]));

/**
 * Height along unit `t` of the safe plane (absolute p·t value): `clearance` above every
 * feature's highest point, and 1 mm above every feature's clearance point.
 */
export const safeHeight = (part: Part, probe: Probe, t: Vec3, clearances: Map<string, number>): number =>
  safeHeights(part, probe, clearances)(t);

/** `safeHeight` for many tool axes: each feature's frame and clearance point found once. */
export function safeHeights(part: Part, probe: Probe, clearances: Map<string, number>): (t: Vec3) => number {
  const prepared = part.features.map((f) => ({
    f,
    frame: featureFrame(f),
    entry: addScaled(featureTop(f), featureAxis(f), clearances.get(f.uuid) ?? probe.clearance),
  }));
  return (t) => {
    let h = -Infinity;
    for (const { f, frame, entry } of prepared) {
      h = Math.max(h, heightAlongIn(f, frame, t) + probe.clearance);
      h = Math.max(h, dot(entry, t) + 1);
    }
    return Number.isFinite(h) ? h : probe.clearance;
  };
}

/** `p` moved along unit `t` onto the plane p·t = height. */
export const ontoHeight = (p: Vec3, t: Vec3, height: number): Vec3 => addScaled(p, t, height - dot(p, t));
