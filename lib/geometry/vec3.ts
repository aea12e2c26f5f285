/**
 * Plain 3-vector arithmetic on `[x, y, z]` tuples, Float64 (JavaScript numbers).
 * Frame-agnostic: callers say which frame a vector is in. Right-handed cross product.
 */
import type { Vec3 } from '../kinematics/schema';

export type { Vec3 };

export const add = (a: Vec3, b: Vec3): Vec3 => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
export const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
export const scale = (a: Vec3, s: number): Vec3 => [a[0] * s, a[1] * s, a[2] * s];
/** a + b·s */
export const addScaled = (a: Vec3, b: Vec3, s: number): Vec3 => [a[0] + b[0] * s, a[1] + b[1] * s, a[2] + b[2] * s];
export const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
export const cross = (a: Vec3, b: Vec3): Vec3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
export const norm = (a: Vec3): number => Math.hypot(a[0], a[1], a[2]);
export const distance = (a: Vec3, b: Vec3): number => Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);

/** Unit vector along `a`; a zero-length vector is a degeneracy, reported, never nudged. */
export function normalize(a: Vec3): Vec3 {
  const n = norm(a);
  if (!(n > 1e-12)) throw new GeometryError('ZERO_VECTOR', 'a direction vector has zero length');
  return [a[0] / n, a[1] / n, a[2] / n];
}

/** The component of `a` orthogonal to the unit vector `u`. */
export const reject = (a: Vec3, u: Vec3): Vec3 => addScaled(a, u, -dot(a, u));

/** Absolute tolerance comparison (CONVENTIONS engine rule 5). */
export const approxEqual = (a: number, b: number, tol: number): boolean => Math.abs(a - b) <= tol;
export const approxEqualVec = (a: Vec3, b: Vec3, tol: number): boolean =>
  Math.abs(a[0] - b[0]) <= tol && Math.abs(a[1] - b[1]) <= tol && Math.abs(a[2] - b[2]) <= tol;

/**
 * Any unit vector orthogonal to unit `n`, chosen deterministically: part X projected
 * onto the plane ⟂ n, or part Y when n lies within ~8° of X.
 */
export function perpendicular(n: Vec3): Vec3 {
  const ref: Vec3 = Math.abs(n[0]) < 0.99 ? [1, 0, 0] : [0, 1, 0];
  return normalize(reject(ref, n));
}

/** A typed degeneracy or engine-level failure with a machine-readable code. */
export class GeometryError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly path?: string,
  ) {
    super(message);
    this.name = 'GeometryError';
  }
}
