/**
 * Small Float64 vector helpers for the fitting and evaluation engine. Plain tuples in,
 * new tuples out (no shared scratch state). Part frame P, millimetres.
 */
import type { Vec3 } from '../kinematics/schema';

export type { Vec3 };

export const add = (a: Vec3, b: Vec3): Vec3 => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
export const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
export const scale = (a: Vec3, s: number): Vec3 => [a[0] * s, a[1] * s, a[2] * s];
export const addScaled = (a: Vec3, b: Vec3, s: number): Vec3 => [a[0] + b[0] * s, a[1] + b[1] * s, a[2] + b[2] * s];
export const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
export const cross = (a: Vec3, b: Vec3): Vec3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
export const norm = (a: Vec3): number => Math.hypot(a[0], a[1], a[2]);

/** Unit vector along `a`; the caller guarantees a non-zero length (check with `norm` first). */
export function normalize(a: Vec3): Vec3 {
  const n = norm(a);
  return [a[0] / n, a[1] / n, a[2] / n];
}

/** Component of `a` perpendicular to the unit vector `u`. */
export const reject = (a: Vec3, u: Vec3): Vec3 => addScaled(a, u, -dot(a, u));

/** Two unit vectors completing the unit vector `w` to a right-handed orthonormal frame (u, v, w). */
export function completeFrame(w: Vec3): { u: Vec3; v: Vec3 } {
  const seed: Vec3 = Math.abs(w[0]) < 0.6 ? [1, 0, 0] : Math.abs(w[1]) < 0.6 ? [0, 1, 0] : [0, 0, 1];
  const u = normalize(reject(seed, w));
  return { u, v: cross(w, u) };
}

/** Absolute comparison with a named tolerance (never `===` on computed floats). */
export const approxEqual = (a: number, b: number, tol: number): boolean => Math.abs(a - b) <= tol;

/** Rodrigues rotation of `p` by `angleRad` about the line through `point` along the unit `axis`. */
export function rotateAboutLine(p: Vec3, point: Vec3, axis: Vec3, angleRad: number): Vec3 {
  const v = sub(p, point);
  const c = Math.cos(angleRad);
  const s = Math.sin(angleRad);
  const k = dot(axis, v) * (1 - c);
  const x = cross(axis, v);
  return [
    point[0] + v[0] * c + x[0] * s + axis[0] * k,
    point[1] + v[1] * c + x[1] * s + axis[1] * k,
    point[2] + v[2] * c + x[2] * s + axis[2] * k,
  ];
}
