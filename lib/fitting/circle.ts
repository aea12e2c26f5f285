/**
 * Circle in 3-D: the least-squares plane first, then the orthogonal-distance circle in
 * that plane (Shakarji, J. Res. NIST 103 (1998) §3.4), by Levenberg–Marquardt from a
 * Kåsa start. Residuals are radial: positive outside the circle.
 */
import { kasaCircle, type Circle2 } from './algebraic';
import { fitPlaneFlat } from './line-plane';
import { levenbergMarquardt, type LmProblem } from './lm';
import { toFlat } from './scatter';
import { FitError, assertFinitePoints, summarise, type CircleFit, type SolverReport } from './types';
import { completeFrame } from './frame';
import { addScaled, type Vec3 } from '../geometry/vec3';

export interface Circle2Fit { circle: Circle2; report: SolverReport; residuals: Float64Array }

/** Geometric circle fit of 2-D points (x, y arrays). */
export function fitCircle2(xs: Float64Array, ys: Float64Array, start?: Circle2): Circle2Fit {
  const m = xs.length;
  if (m < 3) throw new FitError('TOO_FEW_POINTS', `a circle needs at least 3 points; got ${m}`);
  const problem: LmProblem<Circle2> = {
    m,
    n: 3,
    linearize(s, jac, r) {
      for (let i = 0; i < m; i++) {
        const dx = (xs[i] as number) - s.a;
        const dy = (ys[i] as number) - s.b;
        const ri = Math.sqrt(dx * dx + dy * dy);
        const inv = ri > 0 ? 1 / ri : 0;
        r[i] = ri - s.r;
        jac[i] = -dx * inv;
        jac[m + i] = -dy * inv;
        jac[2 * m + i] = -1;
      }
    },
    cost(s) {
      let c = 0;
      for (let i = 0; i < m; i++) {
        const dx = (xs[i] as number) - s.a;
        const dy = (ys[i] as number) - s.b;
        const d = Math.sqrt(dx * dx + dy * dy) - s.r;
        c += d * d;
      }
      return c;
    },
    step: (s, d) => ({ a: s.a + (d[0] as number), b: s.b + (d[1] as number), r: s.r + (d[2] as number) }),
  };
  const out = levenbergMarquardt(problem, start ?? kasaCircle(xs, ys));
  if (out.report.rank < 3) throw new FitError('COLLINEAR_POINTS', 'the points lie on one line: no circle is defined');
  const { a, b, r } = out.state;
  const residuals = new Float64Array(m);
  for (let i = 0; i < m; i++) residuals[i] = Math.hypot((xs[i] as number) - a, (ys[i] as number) - b) - r;
  return { circle: out.state, report: out.report, residuals };
}

export function fitCircle(points: readonly Vec3[], hint?: Vec3): CircleFit {
  assertFinitePoints(points, 3, 'circle');
  const flat = toFlat(points);
  let plane;
  try {
    plane = fitPlaneFlat(flat, hint, false);
  } catch (e) {
    if (e instanceof FitError && (e.code === 'COLLINEAR_POINTS' || e.code === 'COINCIDENT_POINTS')) {
      throw new FitError('COLLINEAR_POINTS', 'the points lie on one line: no circle is defined');
    }
    throw e;
  }
  const { u, v } = completeFrame(plane.normal);
  const o = plane.origin;
  const m = points.length;
  const xs = new Float64Array(m);
  const ys = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    const dx = (flat[3 * i] as number) - o[0];
    const dy = (flat[3 * i + 1] as number) - o[1];
    const dz = (flat[3 * i + 2] as number) - o[2];
    xs[i] = dx * u[0] + dy * u[1] + dz * u[2];
    ys[i] = dx * v[0] + dy * v[1] + dz * v[2];
  }
  const fit = fitCircle2(xs, ys);
  const center = addScaled(addScaled(o, u, fit.circle.a), v, fit.circle.b);
  const residuals = summarise(Array.from(fit.residuals));
  return {
    shape: 'circle', method: 'least-squares', center, normal: plane.normal, radius: fit.circle.r,
    residuals, form: residuals.max - residuals.min, planeForm: plane.form,
    solver: fit.report, pointCount: m,
  };
}
