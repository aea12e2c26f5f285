/**
 * Result types shared by every fit. Distances are signed: positive outside the fitted
 * element (away from a circle's or cylinder's axis, along a plane's normal).
 */
import type { Vec3 } from '../geometry/vec3';

export type FitErrorCode =
  | 'TOO_FEW_POINTS'
  | 'COINCIDENT_POINTS'
  | 'COLLINEAR_POINTS'
  | 'COPLANAR_POINTS'
  | 'NOT_FINITE'
  | 'NO_CONVERGENCE'
  | 'UNSUPPORTED_METHOD'
  | 'NOT_SURROUNDED';

/** A degenerate or impossible fit: typed, with a message in words (never NaN). */
export class FitError extends Error {
  constructor(
    readonly code: FitErrorCode,
    message: string,
  ) {
    super(message);
    this.name = 'FitError';
  }
}

export interface Residuals {
  rms: number;
  max: number;
  min: number;
  /** Signed orthogonal distance of every point, in input order (left out only by `fitPlaneFlat(…, false)`). */
  values?: number[];
}

export type StopReason =
  | 'closed-form'
  | 'small-step'
  | 'small-cost-change'
  | 'zero-residual'
  | 'max-iterations'
  | 'rank-deficient';

export interface SolverReport {
  iterations: number;
  converged: boolean;
  stopReason: StopReason;
  /** 2-norm condition number of the final Jacobian (or scatter matrix). */
  condition: number;
  rank: number;
}

export type FitMethod = 'least-squares' | 'minimum-zone';

interface FitBase {
  method: FitMethod;
  residuals: Residuals;
  /** max − min signed distance (for a line in 3-D: the diameter of the enclosing cylinder about the fitted line). */
  form: number;
  solver: SolverReport;
  pointCount: number;
}

export interface LineFit extends FitBase { shape: 'line'; origin: Vec3; direction: Vec3 }
export interface PlaneFit extends FitBase { shape: 'plane'; origin: Vec3; normal: Vec3 }
export interface CircleFit extends FitBase { shape: 'circle'; center: Vec3; normal: Vec3; radius: number; planeForm: number }
export interface SphereFit extends FitBase { shape: 'sphere'; center: Vec3; radius: number }
export interface CylinderFit extends FitBase {
  shape: 'cylinder';
  /** Point on the axis nearest the centroid of the points. */
  origin: Vec3;
  axis: Vec3;
  radius: number;
  /** Axis points at the smallest and largest axial position of the points. */
  axisEnds: [Vec3, Vec3];
}

export type AnyFit = LineFit | PlaneFit | CircleFit | SphereFit | CylinderFit;

export function summarise(values: number[]): Residuals {
  let sq = 0;
  let max = -Infinity;
  let min = Infinity;
  for (const d of values) {
    sq += d * d;
    if (d > max) max = d;
    if (d < min) min = d;
  }
  return { rms: values.length ? Math.sqrt(sq / values.length) : 0, max, min, values };
}

export function assertFinitePoints(points: readonly Vec3[], min: number, shape: string): void {
  if (points.length < min) {
    throw new FitError('TOO_FEW_POINTS', `a ${shape} needs at least ${min} points; got ${points.length}`);
  }
  points.forEach((p, i) => {
    if (!Number.isFinite(p[0]) || !Number.isFinite(p[1]) || !Number.isFinite(p[2])) {
      throw new FitError('NOT_FINITE', `point ${i} has a coordinate that is not a finite number`);
    }
  });
}
