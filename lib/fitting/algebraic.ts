/**
 * Algebraic circle and sphere fits. Used only as starting values for the geometric
 * fits (and, in the tests, to show how far they are from them): Kåsa's linear form
 * x² + y² + D x + E y + F = 0 solved by QR, and the form a(x² + y²) + b₁x + b₂y + c = 0
 * with ‖(a, b₁, b₂, c)‖ = 1 (Gander, Golub & Strebel, BIT 34 (1994) §2).
 */
import { householderQr, solveUpper, symmetricEigen } from './linalg';
import { FitError } from './types';

export interface Circle2 { a: number; b: number; r: number }

/** Kåsa fit of 2-D points given as x and y arrays. */
export function kasaCircle(xs: ArrayLike<number>, ys: ArrayLike<number>): Circle2 {
  const m = xs.length;
  if (m < 3) throw new FitError('TOO_FEW_POINTS', `a circle needs at least 3 points; got ${m}`);
  let mx = 0, my = 0;
  for (let i = 0; i < m; i++) { mx += xs[i] as number; my += ys[i] as number; }
  mx /= m; my /= m;
  const a = new Float64Array(3 * m);
  const rhs = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    const x = (xs[i] as number) - mx;
    const y = (ys[i] as number) - my;
    a[i] = x; a[m + i] = y; a[2 * m + i] = 1;
    rhs[i] = -(x * x + y * y);
  }
  const qr = householderQr(a, rhs, m, 3);
  if (qr.rank < 3) throw new FitError('COLLINEAR_POINTS', 'the points lie on one line: no circle is defined');
  const [d, e, f] = solveUpper(qr.r, qr.qtb, 3) as unknown as [number, number, number];
  const ca = -d / 2;
  const cb = -e / 2;
  const r2 = ca * ca + cb * cb - f;
  if (!(r2 > 0)) throw new FitError('COLLINEAR_POINTS', 'the points give no real circle');
  return { a: ca + mx, b: cb + my, r: Math.sqrt(r2) };
}

/** The ‖u‖ = 1 algebraic circle (smallest right singular vector of B). */
export function unitNormCircle(xs: ArrayLike<number>, ys: ArrayLike<number>): Circle2 {
  const m = xs.length;
  if (m < 3) throw new FitError('TOO_FEW_POINTS', `a circle needs at least 3 points; got ${m}`);
  const btb = new Array<number>(16).fill(0);
  for (let i = 0; i < m; i++) {
    const x = xs[i] as number;
    const y = ys[i] as number;
    const row = [x * x + y * y, x, y, 1];
    for (let p = 0; p < 4; p++) for (let q = 0; q < 4; q++) btb[p * 4 + q] = (btb[p * 4 + q] as number) + (row[p] as number) * (row[q] as number);
  }
  const u = symmetricEigen(btb, 4).vectors[0] as number[];
  const [a, b1, b2, c] = u as [number, number, number, number];
  if (Math.abs(a) < 1e-300) throw new FitError('COLLINEAR_POINTS', 'the points lie on one line: no circle is defined');
  const ca = -b1 / (2 * a);
  const cb = -b2 / (2 * a);
  return { a: ca, b: cb, r: Math.sqrt(ca * ca + cb * cb - c / a) };
}

export interface Sphere4 { a: number; b: number; c: number; r: number }

/** Linear sphere fit x² + y² + z² + D x + E y + F z + G = 0 about the centroid. */
export function algebraicSphere(xyz: Float64Array): Sphere4 {
  const m = Math.floor(xyz.length / 3);
  let mx = 0, my = 0, mz = 0;
  for (let i = 0; i < m; i++) { mx += xyz[3 * i] as number; my += xyz[3 * i + 1] as number; mz += xyz[3 * i + 2] as number; }
  mx /= m; my /= m; mz /= m;
  const a = new Float64Array(4 * m);
  const rhs = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    const x = (xyz[3 * i] as number) - mx;
    const y = (xyz[3 * i + 1] as number) - my;
    const z = (xyz[3 * i + 2] as number) - mz;
    a[i] = x; a[m + i] = y; a[2 * m + i] = z; a[3 * m + i] = 1;
    rhs[i] = -(x * x + y * y + z * z);
  }
  const qr = householderQr(a, rhs, m, 4);
  if (qr.rank < 4) throw new FitError('COPLANAR_POINTS', 'the points lie in one plane: no sphere is defined');
  const s = solveUpper(qr.r, qr.qtb, 4);
  const ca = -(s[0] as number) / 2;
  const cb = -(s[1] as number) / 2;
  const cc = -(s[2] as number) / 2;
  const r2 = ca * ca + cb * cb + cc * cc - (s[3] as number);
  if (!(r2 > 0)) throw new FitError('COPLANAR_POINTS', 'the points give no real sphere');
  return { a: ca + mx, b: cb + my, c: cc + mz, r: Math.sqrt(r2) };
}
