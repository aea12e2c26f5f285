/**
 * Minimum-zone flatness and roundness: never above the least-squares form, and never
 * above an independent brute-force search (a dense grid of zone orientations or
 * centres) — which it must match closely, since the grid can only approach the optimum.
 */
import { describe, expect, it } from 'vitest';
import { fitShape } from '@/lib/fitting/fit-shape';
import { fitCircle } from '@/lib/fitting/circle';
import { fitPlane } from '@/lib/fitting/line-plane';
import type { Vec3 } from '@/lib/geometry/vec3';
import { createRng } from '@/lib/evaluation/prng';

function gridWidthPlane(points: Vec3[]): number {
  // Brute force: zone normals (a, b, 1) on a grid, narrowed step by step about the best.
  let best = { w: Infinity, a: 0, b: 0 };
  let span = 2e-3;
  for (let level = 0; level < 14; level++) {
    const c = best.w === Infinity ? { a: 0, b: 0 } : best;
    for (let i = -15; i <= 15; i++) for (let j = -15; j <= 15; j++) {
      const a = c.a + (i / 15) * span, b = c.b + (j / 15) * span;
      const s = Math.sqrt(1 + a * a + b * b);
      let lo = Infinity, hi = -Infinity;
      for (const p of points) { const v = (p[2] - a * p[0] - b * p[1]) / s; lo = Math.min(lo, v); hi = Math.max(hi, v); }
      if (hi - lo < best.w) best = { w: hi - lo, a, b };
    }
    span /= 2.5;
  }
  return best.w;
}

function gridWidthCircle(points: Vec3[], c0: Vec3): number {
  let best = { w: Infinity, x: c0[0], y: c0[1] };
  let span = 0.05;
  for (let level = 0; level < 14; level++) {
    const c = { x: best.x, y: best.y };
    for (let i = -15; i <= 15; i++) for (let j = -15; j <= 15; j++) {
      const x = c.x + (i / 15) * span, y = c.y + (j / 15) * span;
      let lo = Infinity, hi = -Infinity;
      for (const p of points) { const r = Math.hypot(p[0] - x, p[1] - y); lo = Math.min(lo, r); hi = Math.max(hi, r); }
      if (hi - lo < best.w) best = { w: hi - lo, x, y };
    }
    span /= 2.5;
  }
  return best.w;
}

describe('minimum zone against least squares and a brute-force search', () => {
  it('flatness on 20 seeded random sets of 9–40 points', () => {
    for (let seed = 1; seed <= 20; seed++) {
      const rng = createRng(seed);
      const n = 9 + Math.floor(rng.next() * 32);
      const pts: Vec3[] = Array.from({ length: n }, () => [rng.next() * 100, rng.next() * 60, 5 + 0.0002 * rng.next() * 100 + rng.normal(0.004)]);
      const ls = fitPlane(pts);
      const mz = fitShape({ shape: 'plane', points: pts, method: 'minimum-zone' });
      const brute = gridWidthPlane(pts);
      expect(mz.form).toBeLessThanOrEqual(ls.form + 1e-15);
      expect(mz.form).toBeLessThanOrEqual(brute + 1e-9);
      expect(brute - mz.form).toBeLessThan(1e-6);
    }
  });
  it('roundness on 20 seeded random sets of 7–40 points (lobed and noisy)', () => {
    for (let seed = 1; seed <= 20; seed++) {
      const rng = createRng(100 + seed);
      const n = 7 + Math.floor(rng.next() * 34);
      const lobes = 2 + Math.floor(rng.next() * 4);
      const pts: Vec3[] = Array.from({ length: n }, (_, i) => {
        const a = (2 * Math.PI * (i + 0.3 * rng.next())) / n;
        const r = 10 + 0.005 * Math.cos(lobes * a) + rng.normal(0.002);
        return [3 + r * Math.cos(a), -2 + r * Math.sin(a), 0];
      });
      const ls = fitCircle(pts);
      const mz = fitShape({ shape: 'circle', points: pts, method: 'minimum-zone' });
      const brute = gridWidthCircle(pts, ls.center);
      expect(mz.form).toBeLessThanOrEqual(ls.form + 1e-15);
      expect(mz.form).toBeLessThanOrEqual(brute + 1e-9);
      expect(brute - mz.form).toBeLessThan(1e-6);
    }
  });
  it('a large set (300 points) still settles, through the working-set rounds', () => {
    const rng = createRng(5);
    const pts: Vec3[] = Array.from({ length: 300 }, () => [rng.next() * 100, rng.next() * 100, rng.normal(0.003)]);
    const mz = fitShape({ shape: 'plane', points: pts, method: 'minimum-zone' });
    expect(mz.form).toBeLessThanOrEqual(fitPlane(pts).form);
    expect(mz.minimumZone?.rounds).toBeGreaterThanOrEqual(1);
    expect(gridWidthPlane(pts) - mz.form).toBeLessThan(1e-6);
  });
});
