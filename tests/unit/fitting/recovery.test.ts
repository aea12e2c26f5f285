/**
 * Fits recover known parameters from seeded noisy data (CONVENTIONS engine rule 8), and
 * degenerate inputs come back as typed errors, never NaN.
 */
import { describe, expect, it } from 'vitest';
import { fitCircle } from '@/lib/fitting/circle';
import { fitCylinder } from '@/lib/fitting/cylinder';
import { fitShape } from '@/lib/fitting/fit-shape';
import { fitLine, fitPlane } from '@/lib/fitting/line-plane';
import { fitSphere } from '@/lib/fitting/sphere';
import { FitError } from '@/lib/fitting/types';
import { addScaled, cross, dot, normalize, type Vec3 } from '@/lib/geometry/vec3';
import { completeFrame } from '@/lib/fitting/frame';
import { createRng } from '@/lib/evaluation/prng';

const sigma = 0.001;

function circlePoints(seed: number, c: Vec3, n: Vec3, r: number, count: number, z = 0): Vec3[] {
  const rng = createRng(seed);
  const { u, v } = completeFrame(normalize(n));
  return Array.from({ length: count }, (_, i) => {
    const a = (2 * Math.PI * i) / count + 0.3;
    const rr = r + rng.normal(sigma);
    return addScaled(addScaled(addScaled(c, u, rr * Math.cos(a)), v, rr * Math.sin(a)), normalize(n), z);
  });
}

describe('recovery of known parameters from seeded noisy data (σ = 1 µm)', () => {
  it('plane', () => {
    const rng = createRng(7);
    const n = normalize([0.1, -0.2, 1]);
    const { u, v } = completeFrame(n);
    const pts = Array.from({ length: 200 }, () => addScaled(addScaled(addScaled([100, 50, 20], u, rng.next() * 80 - 40), v, rng.next() * 60 - 30), n, rng.normal(sigma)));
    const f = fitPlane(pts);
    expect(Math.acos(Math.min(1, dot(f.normal, n)))).toBeLessThan(1e-4);
    expect(Math.abs(dot(f.origin, n) - dot([100, 50, 20], n))).toBeLessThan(3e-4);
    expect(f.residuals.rms).toBeGreaterThan(0.5 * sigma);
    expect(f.residuals.rms).toBeLessThan(1.5 * sigma);
  });
  it('line', () => {
    const rng = createRng(8);
    const d = normalize([1, 2, 3]);
    const pts = Array.from({ length: 50 }, (_, i) => addScaled(addScaled([1, 2, 3], d, i - 25), [rng.normal(sigma), rng.normal(sigma), rng.normal(sigma)], 1));
    const f = fitLine(pts);
    expect(Math.abs(dot(f.direction, d))).toBeGreaterThan(1 - 1e-8);
  });
  it('circle in a tilted plane', () => {
    const f = fitCircle(circlePoints(9, [10, -5, 3], [0.2, 0.1, 1], 12.5, 36));
    expect(f.radius).toBeCloseTo(12.5, 3);
    expect(Math.hypot(f.center[0] - 10, f.center[1] + 5, f.center[2] - 3)).toBeLessThan(1e-3);
    expect(f.solver.converged).toBe(true);
  });
  it('sphere', () => {
    const rng = createRng(10);
    const pts: Vec3[] = Array.from({ length: 60 }, () => {
      const dir = normalize([rng.normal(), rng.normal(), Math.abs(rng.normal()) + 0.2]);
      return addScaled([5, 6, 7], dir, 9.525 + rng.normal(sigma));
    });
    const f = fitSphere(pts);
    expect(f.radius).toBeCloseTo(9.525, 3);
    expect(Math.hypot(f.center[0] - 5, f.center[1] - 6, f.center[2] - 7)).toBeLessThan(1.5e-3);
  });
  it('cylinder: tilted axis on four levels, with and without an axis hint', () => {
    const axis = normalize([0.01, -0.02, 1]);
    const pts = [0, -5, -10, -15].flatMap((z, k) => circlePoints(20 + k, [30, 40, 0], axis, 6, 11, z));
    for (const hint of [undefined, [0, 0, 1] as Vec3]) {
      const f = fitCylinder(pts, hint);
      expect(f.radius).toBeCloseTo(6, 3);
      expect(Math.abs(dot(f.axis, axis))).toBeGreaterThan(1 - 1e-6);
      const off = cross(addScaled(f.origin, [-30, -40, 0], 1), axis);
      expect(Math.hypot(...off)).toBeLessThan(2e-3);
    }
  });
});

describe('degenerate inputs are typed errors', () => {
  const code = (fn: () => unknown): string => {
    try { fn(); } catch (e) { if (e instanceof FitError) return e.code; throw e; }
    return 'no error';
  };
  it('collinear points for a circle', () => {
    expect(code(() => fitCircle([[0, 0, 0], [1, 1, 1], [2, 2, 2], [3, 3, 3]]))).toBe('COLLINEAR_POINTS');
  });
  it('too few points', () => {
    expect(code(() => fitCircle([[0, 0, 0], [1, 0, 0]]))).toBe('TOO_FEW_POINTS');
    expect(code(() => fitCylinder([[0, 0, 0], [1, 0, 0], [0, 1, 0], [0, 0, 1]]))).toBe('TOO_FEW_POINTS');
    expect(code(() => fitPlane([[0, 0, 0], [1, 0, 0]]))).toBe('TOO_FEW_POINTS');
  });
  it('coplanar points for a sphere', () => {
    expect(code(() => fitSphere(circlePoints(3, [0, 0, 0], [0, 0, 1], 5, 8)))).toBe('COPLANAR_POINTS');
  });
  it('one level only for a cylinder', () => {
    expect(code(() => fitCylinder(circlePoints(4, [0, 0, 0], [0, 0, 1], 5, 12), [0, 0, 1]))).toBe('COPLANAR_POINTS');
  });
  it('coincident and non-finite points', () => {
    expect(code(() => fitPlane([[1, 1, 1], [1, 1, 1], [1, 1, 1]]))).toBe('COINCIDENT_POINTS');
    expect(code(() => fitPlane([[0, 0, 0], [1, 0, 0], [0, Number.NaN, 0]]))).toBe('NOT_FINITE');
  });
  it('minimum zone asked of a sphere', () => {
    expect(code(() => fitShape({ shape: 'sphere', points: [[0, 0, 1], [1, 0, 0], [0, 1, 0], [0, 0, -1]], method: 'minimum-zone' }))).toBe('UNSUPPORTED_METHOD');
  });
});
