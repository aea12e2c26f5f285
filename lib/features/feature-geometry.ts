/**
 * Geometry of a nominal feature in the part frame P (mm): its local frame, top, extent
 * and the free space inside a bore or slot.
 *
 * Local frame: `n` = the feature's axis (a plane's normal), unit, out of the material
 * toward the probe; `e1` = the reference direction in the plane ⟂ n (a plane's uDir,
 * a slot's or web's widthDir, else part X projected — see `perpendicular`); e2 = n × e1
 * (right-handed). Heights are measured along n.
 */
import { addScaled, cross, dot, normalize, norm, perpendicular, reject, type Vec3 } from '../geometry/vec3';
import type { Feature } from './schema';

export interface FeatureFrame { n: Vec3; e1: Vec3; e2: Vec3 }

export function featureAxis(f: Feature): Vec3 {
  return normalize(f.type === 'plane' ? f.normal : f.axis);
}

export function featureFrame(f: Feature): FeatureFrame {
  const n = featureAxis(f);
  let ref: Vec3 | undefined;
  if (f.type === 'plane') ref = f.uDir;
  else if (f.type === 'slot' || f.type === 'web') ref = f.widthDir;
  let e1 = ref ? reject(ref, n) : perpendicular(n);
  if (norm(e1) < 1e-9) e1 = perpendicular(n);
  e1 = normalize(e1);
  return { n, e1, e2: cross(n, e1) };
}

/** The feature's reference point on its axis: a plane's origin, a sphere's centre, else `center` (top). */
export const featureOrigin = (f: Feature): Vec3 => (f.type === 'plane' ? f.origin : f.center);

/** Highest nominal point of the feature along its own axis (the top face / edge / pole). */
export function featureTop(f: Feature): Vec3 {
  if (f.type === 'sphere') return addScaled(f.center, featureAxis(f), f.diameter / 2);
  return featureOrigin(f);
}

/** Interior features (bore, slot): the probe works inside them, where straight moves between starts stay clear. */
export const isInterior = (f: Feature): boolean => f.type === 'bore' || f.type === 'slot';

/** The highest nominal point of the feature along unit `t` (max p·t over its solid extent). */
export const heightAlong = (f: Feature, t: Vec3): number => heightAlongIn(f, featureFrame(f), t);

/** `heightAlong` with the feature's frame (`featureFrame(f)`) given, for many directions. */
export function heightAlongIn(f: Feature, fr: FeatureFrame, t: Vec3): number {
  const side = (v: Vec3) => Math.abs(dot(v, t));
  switch (f.type) {
    case 'plane': return dot(f.origin, t) + (f.size[0] / 2) * side(fr.e1) + (f.size[1] / 2) * side(fr.e2);
    case 'sphere': return dot(f.center, t) + f.diameter / 2;
    case 'bore':
    case 'boss': {
      const len = f.type === 'bore' ? f.depth : f.height;
      const radial = (f.diameter / 2) * Math.sqrt(Math.max(0, 1 - dot(fr.n, t) ** 2));
      return Math.max(dot(f.center, t), dot(addScaled(f.center, fr.n, -len), t)) + radial;
    }
    case 'slot':
    case 'web':
      return Math.max(dot(f.center, t), dot(addScaled(f.center, fr.n, -f.depth), t)) + (f.width / 2) * side(fr.e1) + (f.length / 2) * side(fr.e2);
  }
}

/**
 * Whether part-frame point `p` (a stylus-ball centre) is in the free space of an interior
 * feature: inside the bore or slot shrunk by the ball radius `r` (plus `tol`), at any
 * height above its floor. Exterior features have no such space (false).
 */
export function inFreeSpace(f: Feature, frame: FeatureFrame, p: Vec3, r: number, tol: number): boolean {
  if (f.type !== 'bore' && f.type !== 'slot') return false;
  const d = [p[0] - f.center[0], p[1] - f.center[1], p[2] - f.center[2]] as Vec3;
  const h = dot(d, frame.n);
  if (f.type === 'bore') {
    if (h < -f.depth + r - tol) return false;
    const radial = norm(addScaled(d, frame.n, -h));
    return radial <= f.diameter / 2 - r + tol;
  }
  if (h < -f.depth + r - tol) return false;
  const w = Math.abs(dot(d, frame.e1));
  const l = Math.abs(dot(d, frame.e2));
  if (w > f.width / 2 - r + tol) return false;
  if (l <= f.length / 2 - f.width / 2) return true;
  // rounded ends (conservative for square ends too)
  return Math.hypot(w, l - (f.length / 2 - f.width / 2)) <= f.width / 2 - r + tol;
}

/** Canonical text of a feature's geometry (fixed key order, no label or planning options). */
export function geometryKey(f: Feature): string {
  switch (f.type) {
    case 'plane': return JSON.stringify([f.type, f.origin, f.normal, f.uDir, f.size]);
    case 'bore': return JSON.stringify([f.type, f.center, f.axis, f.diameter, f.depth]);
    case 'boss': return JSON.stringify([f.type, f.center, f.axis, f.diameter, f.height]);
    case 'slot':
    case 'web': return JSON.stringify([f.type, f.center, f.axis, f.widthDir, f.width, f.length, f.depth]);
    case 'sphere': return JSON.stringify([f.type, f.center, f.axis, f.diameter]);
  }
}
