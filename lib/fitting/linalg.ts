/**
 * Small dense linear algebra for the fits: a cyclic Jacobi eigen solver for symmetric
 * n×n matrices (n ≤ ~6) and Householder QR least squares for tall m×n systems stored
 * column-major. Written for this engine (the maths is the product); methods after
 * Golub & Van Loan, *Matrix Computations*, 4th ed. (2013), §8.5 (Jacobi) and §5.2 (QR).
 */

export interface SymmetricEigen {
  /** Eigenvalues in ascending order. */
  values: number[];
  /** vectors[k] is the unit eigenvector of values[k]. */
  vectors: number[][];
  sweeps: number;
}

/**
 * Eigen-decomposition of a symmetric matrix given row-major as `a` (n×n). Cyclic Jacobi
 * rotations until the off-diagonal mass is below 1e-30 of the total (a handful of sweeps).
 */
export function symmetricEigen(a: ArrayLike<number>, n: number): SymmetricEigen {
  const m = Float64Array.from(a as ArrayLike<number>);
  const v = new Float64Array(n * n);
  for (let i = 0; i < n; i++) v[i * n + i] = 1;
  let total = 0;
  for (let i = 0; i < n * n; i++) total += (m[i] as number) ** 2;
  let sweeps = 0;
  for (; sweeps < 60; sweeps++) {
    let off = 0;
    for (let p = 0; p < n; p++) for (let q = p + 1; q < n; q++) off += (m[p * n + q] as number) ** 2;
    if (off <= 1e-30 * total || off === 0) break;
    for (let p = 0; p < n; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = m[p * n + q] as number;
        if (apq === 0) continue;
        const app = m[p * n + p] as number;
        const aqq = m[q * n + q] as number;
        const theta = (aqq - app) / (2 * apq);
        const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        for (let k = 0; k < n; k++) {
          const mkp = m[k * n + p] as number;
          const mkq = m[k * n + q] as number;
          m[k * n + p] = c * mkp - s * mkq;
          m[k * n + q] = s * mkp + c * mkq;
        }
        for (let k = 0; k < n; k++) {
          const mpk = m[p * n + k] as number;
          const mqk = m[q * n + k] as number;
          m[p * n + k] = c * mpk - s * mqk;
          m[q * n + k] = s * mpk + c * mqk;
        }
        for (let k = 0; k < n; k++) {
          const vkp = v[k * n + p] as number;
          const vkq = v[k * n + q] as number;
          v[k * n + p] = c * vkp - s * vkq;
          v[k * n + q] = s * vkp + c * vkq;
        }
      }
    }
  }
  const order = Array.from({ length: n }, (_, i) => i).sort((i, j) => (m[i * n + i] as number) - (m[j * n + j] as number));
  return {
    values: order.map((i) => m[i * n + i] as number),
    vectors: order.map((i) => Array.from({ length: n }, (_, k) => v[k * n + i] as number)),
    sweeps,
  };
}

export interface QrResult {
  /** Upper-triangular n×n factor, row-major. */
  r: Float64Array;
  /** First n entries of Qᵀb. */
  qtb: Float64Array;
  /** ‖b − A x‖² at the least-squares solution (the tail of Qᵀb). */
  residualSq: number;
  /** Numerical rank: diagonal entries of R above 1e-12 of the largest. */
  rank: number;
}

/**
 * Householder QR of the column-major m×n matrix `a` (overwritten) applied to `b`
 * (overwritten). Returns R, the head of Qᵀb and the residual; solve with `solveUpper`.
 */
export function householderQr(a: Float64Array, b: Float64Array, m: number, n: number): QrResult {
  for (let k = 0; k < n; k++) {
    const ck = k * m;
    let sigma = 0;
    for (let i = k; i < m; i++) sigma += (a[ck + i] as number) ** 2;
    const normX = Math.sqrt(sigma);
    if (normX === 0) continue;
    const akk = a[ck + k] as number;
    const alpha = akk > 0 ? -normX : normX;
    const v0 = akk - alpha;
    const vtv = sigma - akk * akk + v0 * v0;
    a[ck + k] = v0;
    // Apply H = I − 2 v vᵀ / vᵀv to the remaining columns and to b.
    for (let j = k + 1; j < n; j++) {
      const cj = j * m;
      let s = 0;
      for (let i = k; i < m; i++) s += (a[ck + i] as number) * (a[cj + i] as number);
      const f = (2 * s) / vtv;
      for (let i = k; i < m; i++) a[cj + i] = (a[cj + i] as number) - f * (a[ck + i] as number);
    }
    let s = 0;
    for (let i = k; i < m; i++) s += (a[ck + i] as number) * (b[i] as number);
    const f = (2 * s) / vtv;
    for (let i = k; i < m; i++) b[i] = (b[i] as number) - f * (a[ck + i] as number);
    a[ck + k] = alpha;
  }
  const r = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = i; j < n; j++) r[i * n + j] = a[j * m + i] as number;
  const qtb = b.slice(0, n);
  let residualSq = 0;
  for (let i = n; i < m; i++) residualSq += (b[i] as number) ** 2;
  let maxDiag = 0;
  for (let i = 0; i < n; i++) maxDiag = Math.max(maxDiag, Math.abs(r[i * n + i] as number));
  let rank = 0;
  for (let i = 0; i < n; i++) if (Math.abs(r[i * n + i] as number) > 1e-12 * maxDiag) rank++;
  return { r, qtb, residualSq, rank };
}

/** Back substitution R x = y for an upper-triangular row-major n×n R. */
export function solveUpper(r: Float64Array, y: Float64Array, n: number): Float64Array {
  const x = new Float64Array(n);
  for (let i = n - 1; i >= 0; i--) {
    let s = y[i] as number;
    for (let j = i + 1; j < n; j++) s -= (r[i * n + j] as number) * (x[j] as number);
    x[i] = s / (r[i * n + i] as number);
  }
  return x;
}

/** 2-norm condition number of an upper-triangular R (from the eigenvalues of RᵀR). */
export function conditionOfR(r: Float64Array, n: number): number {
  const rtr = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let s = 0;
      for (let k = 0; k <= Math.min(i, j); k++) s += (r[k * n + i] as number) * (r[k * n + j] as number);
      rtr[i * n + j] = s;
    }
  }
  const { values } = symmetricEigen(rtr, n);
  const lo = values[0] as number;
  const hi = values[n - 1] as number;
  return lo > 0 ? Math.sqrt(hi / lo) : Number.POSITIVE_INFINITY;
}
