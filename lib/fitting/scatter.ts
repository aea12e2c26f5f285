/**
 * Centroid and 3×3 scatter matrix in a single pass over the points, shifted by the
 * first point so that the sums of squares do not cancel catastrophically far from the
 * origin. Line and plane fits take the principal directions of this matrix
 * (Shakarji, J. Res. NIST 103 (1998) §3: centroid plus singular vectors). Large sets are
 * summed in WebAssembly SIMD (scatter-simd.ts), small ones in the loop below.
 */
import { symmetricEigen } from './linalg';
import { shiftedSumsSimd } from './scatter-simd';
import type { Vec3 } from '../geometry/vec3';

/** From this many points the sums run in WebAssembly SIMD (below it the copy costs more than it saves). */
export const SIMD_MIN_POINTS = 8192;

export interface Scatter {
  count: number;
  centroid: Vec3;
  /** Row-major 3×3 scatter Σ (p − c)(p − c)ᵀ. */
  matrix: number[];
}

/** Scatter of points stored flat as x0 y0 z0 x1 y1 z1 … (the fast path; SIMD for large sets). */
export function scatterFlat(xyz: Float64Array): Scatter {
  const n = Math.floor(xyz.length / 3);
  const ox = xyz[0] ?? 0;
  const oy = xyz[1] ?? 0;
  const oz = xyz[2] ?? 0;
  let sx = 0, sy = 0, sz = 0, sxx = 0, sxy = 0, sxz = 0, syy = 0, syz = 0, szz = 0;
  const simd = n >= SIMD_MIN_POINTS ? shiftedSumsSimd(xyz, n, ox, oy, oz) : null;
  if (simd) [sx, sy, sz, sxx, sxy, sxz, syy, syz, szz] = simd;
  else for (let i = 0; i < 3 * n; i += 3) {
    const x = (xyz[i] as number) - ox;
    const y = (xyz[i + 1] as number) - oy;
    const z = (xyz[i + 2] as number) - oz;
    sx += x; sy += y; sz += z;
    sxx += x * x; sxy += x * y; sxz += x * z;
    syy += y * y; syz += y * z; szz += z * z;
  }
  const mx = sx / n, my = sy / n, mz = sz / n;
  const cxx = sxx - sx * mx, cxy = sxy - sx * my, cxz = sxz - sx * mz;
  const cyy = syy - sy * my, cyz = syz - sy * mz, czz = szz - sz * mz;
  return {
    count: n,
    centroid: [ox + mx, oy + my, oz + mz],
    matrix: [cxx, cxy, cxz, cxy, cyy, cyz, cxz, cyz, czz],
  };
}

export function toFlat(points: readonly Vec3[]): Float64Array {
  const out = new Float64Array(points.length * 3);
  points.forEach((p, i) => { out[3 * i] = p[0]; out[3 * i + 1] = p[1]; out[3 * i + 2] = p[2]; });
  return out;
}

export interface PrincipalAxes {
  /** Eigenvalues of the scatter, ascending. */
  values: [number, number, number];
  /** Matching unit eigenvectors. */
  vectors: [Vec3, Vec3, Vec3];
  sweeps: number;
}

export function principalAxes(s: Scatter): PrincipalAxes {
  const e = symmetricEigen(s.matrix, 3);
  const vec = (k: number): Vec3 => {
    const v = e.vectors[k] as number[];
    return [v[0] as number, v[1] as number, v[2] as number];
  };
  return {
    values: [e.values[0] as number, e.values[1] as number, e.values[2] as number],
    vectors: [vec(0), vec(1), vec(2)],
    sweeps: e.sweeps,
  };
}
