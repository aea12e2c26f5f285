/**
 * Orthogonal-distance least-squares line and plane: centroid plus the largest (line) or
 * smallest (plane) eigenvector of the scatter matrix — closed form, no iteration
 * (Shakarji, J. Res. NIST 103 (1998) §3.1–3.2).
 */
import { principalAxes, scatterFlat, toFlat } from './scatter';
import { FitError, assertFinitePoints, summarise, type LineFit, type PlaneFit } from './types';
import { cross, dot, norm, sub, type Vec3 } from '../geometry/vec3';

/** Relative size of an eigenvalue (to the largest) below which the spread is taken as zero. */
const DEGENERATE_RATIO = 1e-20;

/** Sign convention: the normal (or direction) is flipped to lie within 90° of `hint` when given. */
function orient(v: Vec3, hint?: Vec3): Vec3 {
  if (hint && dot(v, hint) < 0) return [-v[0], -v[1], -v[2]];
  return v;
}

export interface PlaneParameters {
  origin: Vec3;
  normal: Vec3;
  /** Residual RMS from the smallest eigenvalue of the scatter (no second pass). */
  rms: number;
  solver: PlaneFit['solver'];
  pointCount: number;
}

/**
 * The plane's parameters from ONE pass over flat x y z data (the path for
 * million-point clouds): centroid, normal, residual RMS and the solver report.
 */
export function planeParametersFlat(xyz: Float64Array, hint?: Vec3): PlaneParameters {
  const n = Math.floor(xyz.length / 3);
  if (n < 3) throw new FitError('TOO_FEW_POINTS', `a plane needs at least 3 points; got ${n}`);
  const s = scatterFlat(xyz);
  const ax = principalAxes(s);
  const [l0, l1, l2] = ax.values;
  if (l2 <= 0) throw new FitError('COINCIDENT_POINTS', 'all points coincide: no plane is defined');
  if (l1 <= DEGENERATE_RATIO * l2 + Number.MIN_VALUE) {
    throw new FitError('COLLINEAR_POINTS', 'the points lie on one line: no plane is defined');
  }
  return {
    origin: s.centroid, normal: orient(ax.vectors[0], hint ?? [0, 0, 1]), rms: Math.sqrt(Math.max(l0, 0) / n), pointCount: n,
    solver: {
      iterations: ax.sweeps, converged: true, stopReason: 'closed-form',
      condition: l0 > 0 ? Math.sqrt(l2 / l0) : Number.MAX_VALUE, rank: l0 > DEGENERATE_RATIO * l2 ? 3 : 2,
    },
  };
}

/**
 * Full plane fit of flat data: parameters, then a second pass for the signed residuals
 * (kept per point unless `keepValues` is false, when only RMS, max and min are returned).
 */
export function fitPlaneFlat(xyz: Float64Array, hint?: Vec3, keepValues = true): PlaneFit {
  const p = planeParametersFlat(xyz, hint);
  const [nx, ny, nz] = p.normal;
  const off = p.origin[0] * nx + p.origin[1] * ny + p.origin[2] * nz;
  let lo = Infinity, hi = -Infinity, sq = 0;
  const values = keepValues ? new Array<number>(p.pointCount) : undefined;
  if (values) {
    for (let i = 0, k = 0; k < p.pointCount; i += 3, k++) {
      const d = (xyz[i] as number) * nx + (xyz[i + 1] as number) * ny + (xyz[i + 2] as number) * nz - off;
      values[k] = d;
      sq += d * d;
      lo = lo < d ? lo : d;
      hi = hi > d ? hi : d;
    }
  } else {
    for (let i = 0; i < 3 * p.pointCount; i += 3) {
      const d = (xyz[i] as number) * nx + (xyz[i + 1] as number) * ny + (xyz[i + 2] as number) * nz - off;
      sq += d * d;
      lo = lo < d ? lo : d;
      hi = hi > d ? hi : d;
    }
  }
  const residuals = { rms: Math.sqrt(sq / p.pointCount), max: hi, min: lo, ...(values ? { values } : {}) };
  return { shape: 'plane', method: 'least-squares', origin: p.origin, normal: p.normal, residuals, form: hi - lo, solver: p.solver, pointCount: p.pointCount };
}

export function fitPlane(points: readonly Vec3[], hint?: Vec3): PlaneFit {
  assertFinitePoints(points, 3, 'plane');
  return fitPlaneFlat(toFlat(points), hint);
}

/**
 * Line: residuals are distances from the line. When all points lie in one plane the
 * distances are signed within that plane and `form` is max − min (straightness in a
 * plane); otherwise `form` is twice the largest distance (a cylindrical zone about the
 * least-squares line).
 */
export function fitLine(points: readonly Vec3[], hint?: Vec3): LineFit {
  assertFinitePoints(points, 2, 'line');
  const s = scatterFlat(toFlat(points));
  const ax = principalAxes(s);
  const [l0, l1, l2] = ax.values;
  if (l2 <= 0) throw new FitError('COINCIDENT_POINTS', 'all points coincide: no line is defined');
  const direction = orient(ax.vectors[2], hint ?? dominantAxis(ax.vectors[2]));
  const c = s.centroid;
  const planar = l0 <= DEGENERATE_RATIO * l2 + Number.MIN_VALUE && l1 > 0;
  const inPlane = planar ? cross(ax.vectors[0], direction) : null;
  const values = points.map((p) => {
    const d = sub(p, c);
    if (inPlane) return dot(d, inPlane);
    return norm(cross(d, direction));
  });
  const residuals = summarise(values);
  return {
    shape: 'line', method: 'least-squares', origin: c, direction, residuals,
    form: inPlane ? residuals.max - residuals.min : 2 * residuals.max,
    solver: {
      iterations: ax.sweeps, converged: true, stopReason: 'closed-form',
      condition: l1 > 0 ? Math.sqrt(l2 / l1) : Number.MAX_VALUE, rank: l1 > DEGENERATE_RATIO * l2 ? 2 : 1,
    },
    pointCount: points.length,
  };
}

/** The coordinate axis a direction is closest to, positive: gives lines a stable sense. */
function dominantAxis(v: Vec3): Vec3 {
  const a = v.map(Math.abs);
  const k = (a[0] as number) >= (a[1] as number) && (a[0] as number) >= (a[2] as number) ? 0 : (a[1] as number) >= (a[2] as number) ? 1 : 2;
  const out: Vec3 = [0, 0, 0];
  out[k] = 1;
  return out;
}
