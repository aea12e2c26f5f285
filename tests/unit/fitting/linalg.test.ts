/**
 * The engine's own small linear algebra against ml-matrix (a general-purpose reference
 * library from the npm registry) on seeded random matrices.
 */
import { describe, expect, it } from 'vitest';
import { EigenvalueDecomposition, Matrix, QrDecomposition } from 'ml-matrix';
import { householderQr, solveUpper, symmetricEigen } from '@/lib/fitting/linalg';
import { createRng } from '@/lib/evaluation/prng';

describe('linear algebra against ml-matrix', () => {
  it('symmetric eigenvalues of random 3×3 … 6×6 matrices', () => {
    const rng = createRng(42);
    for (let n = 3; n <= 6; n++) {
      const b = Matrix.rand(n, n, { random: () => rng.next() });
      const a = b.transpose().mmul(b);
      const ours = symmetricEigen(a.to1DArray(), n);
      const ref = new EigenvalueDecomposition(a, { assumeSymmetric: true }).realEigenvalues.slice().sort((x, y) => x - y);
      ours.values.forEach((v, k) => expect(v).toBeCloseTo(ref[k] as number, 10));
      for (let k = 0; k < n; k++) {
        const v = Matrix.columnVector(ours.vectors[k] as number[]);
        const av = a.mmul(v);
        for (let i = 0; i < n; i++) expect(av.get(i, 0)).toBeCloseTo((ours.values[k] as number) * v.get(i, 0), 10);
      }
    }
  });
  it('least squares by Householder QR matches ml-matrix QR', () => {
    const rng = createRng(43);
    const m = 40, n = 5;
    const a = Matrix.rand(m, n, { random: () => rng.next() });
    const b = Matrix.rand(m, 1, { random: () => rng.next() });
    const colMajor = Float64Array.from(a.transpose().to1DArray());
    const qr = householderQr(colMajor, Float64Array.from(b.to1DArray()), m, n);
    const x = solveUpper(qr.r, qr.qtb, n);
    const ref = new QrDecomposition(a).solve(b);
    for (let i = 0; i < n; i++) expect(x[i] as number).toBeCloseTo(ref.get(i, 0), 10);
    expect(qr.rank).toBe(5);
  });
});
