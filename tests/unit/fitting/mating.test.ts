import { describe, expect, it } from 'vitest';
import { circumscribedCircle, inscribedCircle } from '@/lib/fitting/mating';
import { completeFrame } from '@/lib/fitting/frame';
import { FitError } from '@/lib/fitting/types';
import { fitCircle } from '@/lib/fitting/circle';
import { addScaled, dot, normalize, sub, type Vec3 } from '@/lib/geometry/vec3';
import { createRng } from '@/lib/evaluation/prng';

const axis = normalize([0.1, -0.2, 1]);
const { u, v } = completeFrame(axis);
const center: Vec3 = [12, -7, 30];
const at = (a: number, r: number, h = 0): Vec3 => addScaled(addScaled(addScaled(center, u, r * Math.cos(a)), v, r * Math.sin(a)), axis, h);

/** Independent oracle: every triple (and pair) of points, kept when valid, best radius. */
function bruteForce(pts: Vec3[], inscribed: boolean): number {
  const p2 = pts.map((p) => { const d: Vec3 = [p[0] - center[0], p[1] - center[1], p[2] - center[2]]; return [d[0] * u[0] + d[1] * u[1] + d[2] * u[2], d[0] * v[0] + d[1] * v[1] + d[2] * v[2]]; });
  const circles: { c: number[]; r: number }[] = [];
  for (let i = 0; i < p2.length; i++) {
    for (let j = i + 1; j < p2.length; j++) {
      const [a, b] = [p2[i]!, p2[j]!];
      circles.push({ c: [(a[0]! + b[0]!) / 2, (a[1]! + b[1]!) / 2], r: Math.hypot(a[0]! - b[0]!, a[1]! - b[1]!) / 2 });
      for (let k = j + 1; k < p2.length; k++) {
        const c = p2[k]!;
        // circumcentre by solving the two perpendicular-bisector equations
        const a11 = 2 * (b[0]! - a[0]!), a12 = 2 * (b[1]! - a[1]!), a21 = 2 * (c[0]! - a[0]!), a22 = 2 * (c[1]! - a[1]!);
        const r1 = b[0]! ** 2 + b[1]! ** 2 - a[0]! ** 2 - a[1]! ** 2, r2 = c[0]! ** 2 + c[1]! ** 2 - a[0]! ** 2 - a[1]! ** 2;
        const det = a11 * a22 - a12 * a21;
        if (Math.abs(det) < 1e-12) continue;
        const o = [(r1 * a22 - a12 * r2) / det, (a11 * r2 - a21 * r1) / det];
        circles.push({ c: o, r: Math.hypot(a[0]! - o[0]!, a[1]! - o[1]!) });
      }
    }
  }
  const d = (c: number[], p: number[]) => Math.hypot(c[0]! - p[0]!, c[1]! - p[1]!);
  if (inscribed) {
    // largest circle with no point inside whose centre the points surround (no open half-plane around it empty)
    const surrounded = (c: number[]) => {
      const angles = p2.map((p) => Math.atan2(p[1]! - c[1]!, p[0]! - c[0]!)).sort((x, y) => x - y);
      let gap = angles[0]! + 2 * Math.PI - angles[angles.length - 1]!;
      for (let i = 1; i < angles.length; i++) gap = Math.max(gap, angles[i]! - angles[i - 1]!);
      return gap <= Math.PI + 1e-9;
    };
    return 2 * Math.max(...circles.filter((k) => p2.every((p) => d(k.c, p) >= k.r - 1e-9) && surrounded(k.c)).map((k) => k.r));
  }
  return 2 * Math.min(...circles.filter((k) => p2.every((p) => d(k.c, p) <= k.r + 1e-9)).map((k) => k.r));
}

describe('mating circles', () => {
  it('a ring with three points pushed in (out) at 120°: the inscribed (circumscribed) circle runs through them, about the true centre', () => {
    const ring = Array.from({ length: 24 }, (_, i) => (i * 2 * Math.PI) / 24);
    const pushed = (d: number) => ring.map((a, i) => at(a, i % 8 === 3 ? 10 + d : 10, (i % 3) * 2));
    const hole = inscribedCircle(pushed(-0.01), at(0.3, 0.05), axis);
    expect(hole.diameter).toBeCloseTo(2 * 9.99, 10);
    expect(hole.supports.sort((a, b) => a - b)).toEqual([3, 11, 19]);
    const pin = circumscribedCircle(pushed(0.01), at(0.3, 0.05), axis);
    expect(pin.diameter).toBeCloseTo(2 * 10.01, 10);
    // the centre found is the true one, on the line of the axis through it
    const off = (c: Vec3) => { const d = sub(c, center); return Math.hypot(dot(d, u), dot(d, v)); };
    expect(off(hole.center)).toBeLessThan(1e-9);
    expect(off(pin.center)).toBeLessThan(1e-9);
  });

  it('agrees with a brute-force search over every pair and triple, and brackets the least-squares size, on 40 seeded noisy rings', () => {
    const rng = createRng(31);
    for (let trial = 0; trial < 40; trial++) {
      const n = 5 + (trial % 12);
      const pts = Array.from({ length: n }, (_, i) => at((i * 2 * Math.PI) / n + rng.normal(0.05), 8 + rng.normal(0.01)));
      const start = at(1, 0.02);
      const hole = inscribedCircle(pts, start, axis);
      const pin = circumscribedCircle(pts, start, axis);
      expect(hole.diameter).toBeCloseTo(bruteForce(pts, true), 9);
      expect(pin.diameter).toBeCloseTo(bruteForce(pts, false), 9);
      const ls = 2 * fitCircle(pts, axis).radius;
      expect(hole.diameter).toBeLessThanOrEqual(ls + 1e-12);
      expect(pin.diameter).toBeGreaterThanOrEqual(ls - 1e-12);
    }
  });

  it('3,000 points on ten levels: the working set stays small and the answer is exact', () => {
    const rng = createRng(32);
    const pts = Array.from({ length: 3000 }, (_, i) => at((i * 2 * Math.PI) / 300, 15 + rng.normal(0.001), Math.floor(i / 300)));
    const hole = inscribedCircle(pts, at(0, 0), axis);
    const dist = (p: Vec3) => { const d = sub(p, hole.center); return Math.hypot(dot(d, u), dot(d, v)); };
    // no point inside, the supports on the circle
    expect(Math.min(...pts.map(dist))).toBeGreaterThanOrEqual(hole.diameter / 2 - 1e-9);
    for (const s of hole.supports) expect(dist(pts[s]!)).toBeCloseTo(hole.diameter / 2, 9);
  });

  it('refuses too few points and points that do not surround a centre, with a typed error', () => {
    expect(() => inscribedCircle([at(0, 5), at(1, 5)], center, axis)).toThrow(FitError);
    expect(() => circumscribedCircle([at(0, 5)], center, axis)).toThrow(FitError);
    const arc = Array.from({ length: 9 }, (_, i) => at((i * Math.PI) / 12, 5));
    expect(() => inscribedCircle(arc, center, axis)).toThrow(/do not surround/);
  });
});
