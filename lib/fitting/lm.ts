/**
 * Levenberg–Marquardt for geometric (orthogonal-distance) fits, on a state that the
 * problem itself moves (so a fit may re-centre or re-orient its local frame each step).
 * Each outer step factors the Jacobian once by Householder QR; trial damping values
 * then only refactor the small (2n)×n system [R; √λ·D]. Method after Moré, "The
 * Levenberg–Marquardt algorithm: implementation and theory" (1978), and Shakarji,
 * J. Res. NIST 103 (1998) for the fit parametrisations.
 */
import { conditionOfR, householderQr, solveUpper } from './linalg';
import type { SolverReport, StopReason } from './types';

export interface LmProblem<S> {
  /** Number of residuals and of parameters. */
  m: number;
  n: number;
  /** Fill residuals `r` (length m) and the column-major Jacobian `jac` (m×n) about `state`. */
  linearize(state: S, jac: Float64Array, r: Float64Array): void;
  /** Sum of squared residuals at `state`. */
  cost(state: S): number;
  /** The state moved by the parameter step `delta`. */
  step(state: S, delta: Float64Array): S;
}

export interface LmOptions {
  maxIterations?: number;
  /** Relative step size below which the fit has converged. */
  stepTolerance?: number;
  /** Relative cost decrease below which the fit has converged. */
  costTolerance?: number;
}

export interface LmResult<S> { state: S; cost: number; report: SolverReport }

export function levenbergMarquardt<S>(problem: LmProblem<S>, start: S, options: LmOptions = {}): LmResult<S> {
  const { m, n } = problem;
  const maxIterations = options.maxIterations ?? 100;
  const stepTol = options.stepTolerance ?? 1e-13;
  const costTol = options.costTolerance ?? 1e-15;
  const jac = new Float64Array(m * n);
  const r = new Float64Array(m);
  let state = start;
  let cost = problem.cost(state);
  let lambda = 0;
  let stopReason: StopReason = 'max-iterations';
  let condition = 1;
  let rank = n;
  let iterations = 0;
  for (; iterations < maxIterations; iterations++) {
    if (cost === 0) { stopReason = 'zero-residual'; break; }
    problem.linearize(state, jac, r);
    for (let i = 0; i < m; i++) r[i] = -(r[i] as number);
    const qr = householderQr(jac, r, m, n);
    condition = conditionOfR(qr.r, n);
    rank = qr.rank;
    if (rank < n) { stopReason = 'rank-deficient'; break; }
    let accepted = false;
    let stepNorm = 0;
    let newCost = cost;
    for (let trial = 0; trial < 30; trial++) {
      const delta = dampedStep(qr.r, qr.qtb, n, lambda);
      const candidate = problem.step(state, delta);
      const c = problem.cost(candidate);
      if (Number.isFinite(c) && c <= cost) {
        stepNorm = Math.sqrt(delta.reduce((s, d) => s + d * d, 0));
        state = candidate;
        newCost = c;
        lambda = lambda * 0.1 < 1e-12 ? 0 : lambda * 0.1;
        accepted = true;
        break;
      }
      lambda = lambda === 0 ? 1e-6 * maxDiagSq(qr.r, n) : lambda * 10;
    }
    if (!accepted) { stopReason = 'small-cost-change'; iterations++; break; }
    const scaleRef = 1 + Math.sqrt(cost);
    const relDrop = (cost - newCost) / Math.max(cost, 1e-300);
    cost = newCost;
    if (stepNorm <= stepTol * scaleRef) { stopReason = 'small-step'; iterations++; break; }
    if (relDrop <= costTol) { stopReason = 'small-cost-change'; iterations++; break; }
  }
  return {
    state,
    cost,
    report: { iterations, converged: stopReason !== 'max-iterations' && stopReason !== 'rank-deficient', stopReason, condition, rank },
  };
}

function maxDiagSq(r: Float64Array, n: number): number {
  let mx = 0;
  for (let i = 0; i < n; i++) mx = Math.max(mx, (r[i * n + i] as number) ** 2);
  return mx;
}

/** Solve min ‖[R; √λ·D] δ − [Qᵀb; 0]‖ with D = diag of R's column norms (scale invariance). */
function dampedStep(r: Float64Array, qtb: Float64Array, n: number, lambda: number): Float64Array {
  if (lambda === 0) return solveUpper(r, qtb, n);
  const rows = 2 * n;
  const a = new Float64Array(rows * n);
  const b = new Float64Array(rows);
  for (let j = 0; j < n; j++) {
    let colSq = 0;
    for (let i = 0; i <= j; i++) {
      const v = r[i * n + j] as number;
      a[j * rows + i] = v;
      colSq += v * v;
    }
    a[j * rows + n + j] = Math.sqrt(lambda * Math.max(colSq, 1e-300));
  }
  for (let i = 0; i < n; i++) b[i] = qtb[i] as number;
  const qr = householderQr(a, b, rows, n);
  return solveUpper(qr.r, qr.qtb, n);
}
