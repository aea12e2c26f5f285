import { describe, expect, it } from 'vitest';
import { shiftedSumsSimd } from '@/lib/fitting/scatter-simd';
import { scatterFlat, SIMD_MIN_POINTS } from '@/lib/fitting/scatter';
import { planeParametersFlat } from '@/lib/fitting/line-plane';
import { createRng } from '@/lib/evaluation/prng';

/** The nine shifted sums by a plain loop (x y z xx xy xz yy yz zz), and the same sums of |terms| for the rounding bound. */
function plainSums(xyz: Float64Array, n: number, o: number[]): { sums: number[]; scale: number[] } {
  const sums = new Array<number>(9).fill(0);
  const scale = new Array<number>(9).fill(0);
  for (let i = 0; i < n; i++) {
    const x = xyz[3 * i]! - o[0]!, y = xyz[3 * i + 1]! - o[1]!, z = xyz[3 * i + 2]! - o[2]!;
    const t = [x, y, z, x * x, x * y, x * z, y * y, y * z, z * z];
    t.forEach((v, k) => { sums[k]! += v; scale[k]! += Math.abs(v); });
  }
  return { sums, scale };
}

function cloud(n: number, seed: number, offset: number[], spread: number): Float64Array {
  const rng = createRng(seed);
  const xyz = new Float64Array(3 * n);
  for (let i = 0; i < 3 * n; i++) xyz[i] = offset[i % 3]! + (rng.next() - 0.5) * spread;
  return xyz;
}

describe('SIMD sums for large point sets', () => {
  it('runs on this Node.js (WebAssembly SIMD), and equals a plain loop to rounding at every chunk boundary', () => {
    for (const n of [1, 2, 3, 2047, 2048, 2049, 4095, 4096, 4097, 10001]) {
      const xyz = cloud(n, n, [250, -120, 40], 300);
      const o = [xyz[0]!, xyz[1]!, xyz[2]!];
      const simd = shiftedSumsSimd(xyz, n, o[0]!, o[1]!, o[2]!);
      expect(simd, 'WebAssembly SIMD is available on Node.js 20').not.toBeNull();
      const { sums, scale } = plainSums(xyz, n, o);
      // both sum the same terms in another order: they differ by rounding only (n·ε of Σ|term|, Higham §4.2 [from memory])
      for (let k = 0; k < 9; k++) expect(Math.abs(simd![k]! - sums[k]!)).toBeLessThanOrEqual(n * 2.3e-16 * scale[k]! + 1e-300);
    }
  });

  it('sums only the first n points of a longer array', () => {
    const xyz = cloud(5000, 3, [0, 0, 0], 10);
    const simd = shiftedSumsSimd(xyz, 4001, 1, 2, 3)!;
    const { sums, scale } = plainSums(xyz, 4001, [1, 2, 3]);
    for (let k = 0; k < 9; k++) expect(Math.abs(simd[k]! - sums[k]!)).toBeLessThanOrEqual(4001 * 2.3e-16 * scale[k]!);
  });

  it('a tilted plate far from the origin: the plane through the SIMD scatter matches a two-pass reference to 1e-12 rad', () => {
    const n = SIMD_MIN_POINTS * 4 + 1;
    const rng = createRng(9);
    const normal = [0.01, -0.02, 1].map((v) => v / Math.hypot(0.01, -0.02, 1));
    const xyz = new Float64Array(3 * n);
    for (let i = 0; i < n; i++) {
      const u = (rng.next() - 0.5) * 40, v = (rng.next() - 0.5) * 30, w = rng.normal(0.001);
      // u along x, v along y, both tilted onto the plane; 5,000 mm from the origin
      xyz[3 * i] = 5000 + u + w * normal[0]!;
      xyz[3 * i + 1] = -3000 + v + w * normal[1]!;
      xyz[3 * i + 2] = 800 - (normal[0]! * u + normal[1]! * v) / normal[2]! + w * normal[2]!;
    }
    const s = scatterFlat(xyz);
    // reference: exact mean first, then the scatter about it
    const m = [0, 1, 2].map((k) => { let t = 0; for (let i = 0; i < n; i++) t += xyz[3 * i + k]!; return t / n; });
    expect(s.centroid[0]).toBeCloseTo(m[0]!, 9);
    const c = new Float64Array(3 * n);
    for (let i = 0; i < 3 * n; i++) c[i] = xyz[i]! - m[i % 3]!;
    const ref = planeParametersFlat(c).normal;
    const ours = planeParametersFlat(xyz).normal;
    const cross = Math.hypot(ours[1] * ref[2] - ours[2] * ref[1], ours[2] * ref[0] - ours[0] * ref[2], ours[0] * ref[1] - ours[1] * ref[0]);
    expect(cross).toBeLessThan(1e-12);
  });
});
