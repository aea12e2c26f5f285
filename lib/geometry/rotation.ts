/**
 * 3×3 rotation matrices, row-major `[r00, r01, r02, r10, …]`, Float64.
 * `axisAngle(w, θ)` is a right-hand-rule rotation by θ radians about unit `w`
 * (Rodrigues' formula; Murray, Li & Sastry 1994, eq. 2.14).
 */
import type { Vec3 } from './vec3';

export type Mat3 = [number, number, number, number, number, number, number, number, number];

export function axisAngle(w: Vec3, theta: number): Mat3 {
  const c = Math.cos(theta);
  const s = Math.sin(theta);
  const v = 1 - c;
  const [x, y, z] = w;
  return [
    c + x * x * v, x * y * v - z * s, x * z * v + y * s,
    y * x * v + z * s, c + y * y * v, y * z * v - x * s,
    z * x * v - y * s, z * y * v + x * s, c + z * z * v,
  ];
}

export const applyMat = (m: Mat3, a: Vec3): Vec3 => [
  m[0] * a[0] + m[1] * a[1] + m[2] * a[2],
  m[3] * a[0] + m[4] * a[1] + m[5] * a[2],
  m[6] * a[0] + m[7] * a[1] + m[8] * a[2],
];

/** Applies the transpose (the inverse of a rotation). */
export const applyMatT = (m: Mat3, a: Vec3): Vec3 => [
  m[0] * a[0] + m[3] * a[1] + m[6] * a[2],
  m[1] * a[0] + m[4] * a[1] + m[7] * a[2],
  m[2] * a[0] + m[5] * a[1] + m[8] * a[2],
];

/** Matrix whose columns are x, y, z. */
export const fromColumns = (x: Vec3, y: Vec3, z: Vec3): Mat3 => [x[0], y[0], z[0], x[1], y[1], z[1], x[2], y[2], z[2]];

export const DEG = Math.PI / 180;
export const toRad = (deg: number): number => deg * DEG;
export const toDeg = (rad: number): number => rad / DEG;

/** Wraps degrees into (-180, 180]. */
export function wrapDeg(a: number): number {
  let r = a % 360;
  if (r <= -180) r += 360;
  else if (r > 180) r -= 360;
  return r;
}
