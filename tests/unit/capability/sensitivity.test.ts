/**
 * The repeatability sensitivities of the budget, checked by seeded Monte Carlo: a
 * least-squares circle from n evenly spread points with noise σ has a radius spread of
 * σ/√n and a centre-coordinate spread of σ·√(2/n).
 */
import { describe, expect, it } from 'vitest';
import { fitCircle } from '@/lib/fitting/circle';
import { createRng } from '@/lib/evaluation/prng';
import type { Vec3 } from '@/lib/geometry/vec3';

const sd = (xs: number[]): number => {
  const m = xs.reduce((s, x) => s + x, 0) / xs.length;
  return Math.sqrt(xs.reduce((s, x) => s + (x - m) ** 2, 0) / (xs.length - 1));
};

describe('least-squares sensitivities to point repeatability', () => {
  it.each([7, 16])('%i points: radius σ/√n, centre σ·√(2/n) (within 10 %)', (n) => {
    const rng = createRng(99 + n);
    const sigma = 0.001;
    const radii: number[] = [];
    const xs: number[] = [];
    for (let trial = 0; trial < 2000; trial++) {
      const pts: Vec3[] = Array.from({ length: n }, (_, i) => {
        const a = (2 * Math.PI * i) / n;
        const r = 10 + rng.normal(sigma);
        return [r * Math.cos(a), r * Math.sin(a), 0];
      });
      const c = fitCircle(pts);
      radii.push(c.radius);
      xs.push(c.center[0]);
    }
    expect(sd(radii) / (sigma / Math.sqrt(n))).toBeGreaterThan(0.9);
    expect(sd(radii) / (sigma / Math.sqrt(n))).toBeLessThan(1.1);
    expect(sd(xs) / (sigma * Math.sqrt(2 / n))).toBeGreaterThan(0.9);
    expect(sd(xs) / (sigma * Math.sqrt(2 / n))).toBeLessThan(1.1);
  });
});
