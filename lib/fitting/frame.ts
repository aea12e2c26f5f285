/**
 * An orthonormal frame about a unit vector, chosen deterministically, for fits that
 * work in a plane or about an axis.
 */
import { cross, perpendicular, type Vec3 } from '../geometry/vec3';

/** Two unit vectors completing the unit vector `w` to a right-handed orthonormal frame (u, v, w). */
export function completeFrame(w: Vec3): { u: Vec3; v: Vec3 } {
  const u = perpendicular(w);
  return { u, v: cross(w, u) };
}
