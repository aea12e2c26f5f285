/**
 * Orthogonal-distance least-squares sphere by Levenberg–Marquardt from the linear
 * (algebraic) start (Shakarji, J. Res. NIST 103 (1998) §3.5). Residuals are radial,
 * positive outside.
 */
import { algebraicSphere, type Sphere4 } from './algebraic';
import { levenbergMarquardt, type LmProblem } from './lm';
import { principalAxes, scatterFlat, toFlat } from './scatter';
import { FitError, assertFinitePoints, summarise, type SphereFit } from './types';
import type { Vec3 } from '../geometry/vec3';

export function fitSphere(points: readonly Vec3[]): SphereFit {
  assertFinitePoints(points, 4, 'sphere');
  const xyz = toFlat(points);
  const ax = principalAxes(scatterFlat(xyz));
  if (ax.values[0] <= 1e-20 * ax.values[2]) {
    throw new FitError('COPLANAR_POINTS', 'the points lie in one plane: no sphere is defined');
  }
  const m = points.length;
  const problem: LmProblem<Sphere4> = {
    m,
    n: 4,
    linearize(s, jac, r) {
      for (let i = 0; i < m; i++) {
        const dx = (xyz[3 * i] as number) - s.a;
        const dy = (xyz[3 * i + 1] as number) - s.b;
        const dz = (xyz[3 * i + 2] as number) - s.c;
        const ri = Math.sqrt(dx * dx + dy * dy + dz * dz);
        const inv = ri > 0 ? 1 / ri : 0;
        r[i] = ri - s.r;
        jac[i] = -dx * inv;
        jac[m + i] = -dy * inv;
        jac[2 * m + i] = -dz * inv;
        jac[3 * m + i] = -1;
      }
    },
    cost(s) {
      let c = 0;
      for (let i = 0; i < m; i++) {
        const d = Math.hypot((xyz[3 * i] as number) - s.a, (xyz[3 * i + 1] as number) - s.b, (xyz[3 * i + 2] as number) - s.c) - s.r;
        c += d * d;
      }
      return c;
    },
    step: (s, d) => ({ a: s.a + (d[0] as number), b: s.b + (d[1] as number), c: s.c + (d[2] as number), r: s.r + (d[3] as number) }),
  };
  const out = levenbergMarquardt(problem, algebraicSphere(xyz));
  if (out.report.rank < 4) throw new FitError('COPLANAR_POINTS', 'the points do not determine a sphere');
  const { a, b, c, r } = out.state;
  const values = points.map((p) => Math.hypot(p[0] - a, p[1] - b, p[2] - c) - r);
  const residuals = summarise(values);
  return {
    shape: 'sphere', method: 'least-squares', center: [a, b, c], radius: r, residuals,
    form: residuals.max - residuals.min, solver: out.report, pointCount: m,
  };
}
