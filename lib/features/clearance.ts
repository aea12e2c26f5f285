/**
 * Clearance geometry shared by the planner, the program builder and the verifier.
 * Part frame P, mm. A point's height along a unit direction t is p·t.
 *
 * - Feature clearance: the probe's `clearance` above the feature's top along its axis;
 *   for a plane, raised above anything standing on it (a boss or web on the face).
 * - Safe plane for a tool axis t: `clearance` above the highest point of every
 *   feature's bounding sphere along t. The part model holds only its features, so
 *   this envelope stands in for the part; fixtures and clamps are the setup
 *   technician's to clear (the program's caution says so).
 */
import { addScaled, dot, type Vec3 } from '../geometry/vec3';
import type { Feature, Part, Probe } from './schema';
import { boundingSphere, featureAxis, featureTop } from './feature-geometry';
import { footprintsOnPlane } from './footprints';

export const probeRadius = (probe: Probe): number => (probe.effectiveDiameter ?? probe.stylusDiameter) / 2;

/** Clearance height of a feature above its top, along its axis (mm). */
export function featureClearance(f: Feature, part: Part, probe: Probe): number {
  if (f.type !== 'plane') return probe.clearance;
  let protrude = 0;
  for (const fp of footprintsOnPlane(f, part, probeRadius(probe))) protrude = Math.max(protrude, fp.height);
  return protrude + probe.clearance;
}

/** The point above `p` along the feature's axis at the feature's clearance height. */
export function liftToClearance(f: Feature, p: Vec3, clearanceMm: number): Vec3 {
  const n = featureAxis(f);
  const top = featureTop(f);
  const h = dot([p[0] - top[0], p[1] - top[1], p[2] - top[2]], n);
  return addScaled(p, n, clearanceMm - h);
}

/** Height along unit `t` of the safe plane above all features (absolute p·t value). */
export function safeHeight(part: Part, probe: Probe, t: Vec3): number {
  let h = -Infinity;
  for (const f of part.features) {
    const s = boundingSphere(f);
    h = Math.max(h, dot(s.c, t) + s.r);
  }
  return (Number.isFinite(h) ? h : 0) + probe.clearance;
}

/** `p` moved along unit `t` onto the plane p·t = height. */
export const ontoHeight = (p: Vec3, t: Vec3, height: number): Vec3 => addScaled(p, t, height - dot(p, t));
