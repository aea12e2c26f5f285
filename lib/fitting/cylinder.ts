/**
 * Orthogonal-distance least-squares cylinder (Shakarji, J. Res. NIST 103 (1998) §3.6):
 * Levenberg–Marquardt on (x₀, y₀, tilt₁, tilt₂, r) in a local frame re-built about the
 * current axis at every step, so the Jacobian is always taken at zero tilt:
 * ∂d/∂x₀ = −x/ρ, ∂d/∂y₀ = −y/ρ, ∂d/∂t₁ = −x z/ρ, ∂d/∂t₂ = −y z/ρ, ∂d/∂r = −1.
 * Start: the axis given as a hint, else the principal direction of the points whose
 * projected Kåsa circle fits best. Residuals are radial, positive away from the axis.
 */
import { kasaCircle } from './algebraic';
import { levenbergMarquardt, type LmProblem } from './lm';
import { principalAxes, scatterFlat, toFlat } from './scatter';
import { FitError, assertFinitePoints, summarise, type CylinderFit } from './types';
import { completeFrame } from './frame';
import { addScaled, dot, normalize, sub, type Vec3 } from '../geometry/vec3';

interface CylState { p0: Vec3; u: Vec3; r: number }

export function fitCylinder(points: readonly Vec3[], hint?: Vec3): CylinderFit {
  assertFinitePoints(points, 5, 'cylinder');
  const xyz = toFlat(points);
  const m = points.length;
  const sc = scatterFlat(xyz);
  const c = sc.centroid;
  const candidates: Vec3[] = hint ? [normalize(hint)] : principalAxes(sc).vectors;
  // Choosing among candidate axes needs no more than a few hundred points.
  const sample = subsample(xyz, 500);
  let best: { state: CylState; score: number } | null = null;
  for (const u of candidates) {
    try {
      const state = startFor(sample, c, u);
      const score = costOf(sample, state) / (state.r * state.r);
      if (!best || score < best.score) best = { state, score };
    } catch {
      // a candidate axis along which the points project onto a line: try the next one
    }
  }
  if (!best) throw new FitError('COLLINEAR_POINTS', 'the points do not determine a cylinder');
  const problem: LmProblem<CylState> = {
    m,
    n: 5,
    linearize(s, jac, r) {
      const { u: e1, v: e2 } = completeFrame(s.u);
      for (let i = 0; i < m; i++) {
        const dx = (xyz[3 * i] as number) - s.p0[0];
        const dy = (xyz[3 * i + 1] as number) - s.p0[1];
        const dz = (xyz[3 * i + 2] as number) - s.p0[2];
        const x = dx * e1[0] + dy * e1[1] + dz * e1[2];
        const y = dx * e2[0] + dy * e2[1] + dz * e2[2];
        const z = dx * s.u[0] + dy * s.u[1] + dz * s.u[2];
        const rho = Math.sqrt(x * x + y * y);
        const inv = rho > 0 ? 1 / rho : 0;
        r[i] = rho - s.r;
        jac[i] = -x * inv;
        jac[m + i] = -y * inv;
        jac[2 * m + i] = -x * z * inv;
        jac[3 * m + i] = -y * z * inv;
        jac[4 * m + i] = -1;
      }
    },
    cost: (s) => costOf(xyz, s),
    step(s, d) {
      const { u: e1, v: e2 } = completeFrame(s.u);
      const p = addScaled(addScaled(s.p0, e1, d[0] as number), e2, d[1] as number);
      const u = normalize(addScaled(addScaled(s.u, e1, d[2] as number), e2, d[3] as number));
      return { p0: addScaled(p, u, dot(sub(c, p), u)), u, r: s.r + (d[4] as number) };
    },
  };
  const out = levenbergMarquardt(problem, best.state);
  if (out.report.rank < 5) {
    throw new FitError('COPLANAR_POINTS', 'the points do not determine a cylinder axis (all on one level?): measure at least two levels');
  }
  return finish(points, out.state, out.report);
}

function finish(points: readonly Vec3[], s: CylState, report: CylinderFit['solver']): CylinderFit {
  let tMin = Infinity;
  let tMax = -Infinity;
  const values = points.map((p) => {
    const d = sub(p, s.p0);
    const t = dot(d, s.u);
    if (t < tMin) tMin = t;
    if (t > tMax) tMax = t;
    return Math.sqrt(Math.max(dot(d, d) - t * t, 0)) - s.r;
  });
  const residuals = summarise(values);
  return {
    shape: 'cylinder', method: 'least-squares', origin: s.p0, axis: s.u, radius: s.r, residuals,
    form: residuals.max - residuals.min,
    axisEnds: [addScaled(s.p0, s.u, tMin), addScaled(s.p0, s.u, tMax)],
    solver: report, pointCount: points.length,
  };
}

function costOf(xyz: Float64Array, s: CylState): number {
  let cost = 0;
  const m = xyz.length / 3;
  for (let i = 0; i < m; i++) {
    const dx = (xyz[3 * i] as number) - s.p0[0];
    const dy = (xyz[3 * i + 1] as number) - s.p0[1];
    const dz = (xyz[3 * i + 2] as number) - s.p0[2];
    const t = dx * s.u[0] + dy * s.u[1] + dz * s.u[2];
    const d = Math.sqrt(Math.max(dx * dx + dy * dy + dz * dz - t * t, 0)) - s.r;
    cost += d * d;
  }
  return cost;
}

function subsample(xyz: Float64Array, max: number): Float64Array {
  const m = xyz.length / 3;
  if (m <= max) return xyz;
  const stride = Math.ceil(m / max);
  const out = new Float64Array(3 * Math.ceil(m / stride));
  for (let i = 0, k = 0; i < m; i += stride, k++) {
    out[3 * k] = xyz[3 * i] as number; out[3 * k + 1] = xyz[3 * i + 1] as number; out[3 * k + 2] = xyz[3 * i + 2] as number;
  }
  return out;
}

/** Axis through the Kåsa centre of the points projected along `u`. */
function startFor(xyz: Float64Array, c: Vec3, u: Vec3): CylState {
  const { u: e1, v: e2 } = completeFrame(u);
  const m = xyz.length / 3;
  const xs = new Float64Array(m);
  const ys = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    const d: Vec3 = [(xyz[3 * i] as number) - c[0], (xyz[3 * i + 1] as number) - c[1], (xyz[3 * i + 2] as number) - c[2]];
    xs[i] = dot(d, e1);
    ys[i] = dot(d, e2);
  }
  const k = kasaCircle(xs, ys);
  return { p0: addScaled(addScaled(c, e1, k.a), e2, k.b), u, r: k.r };
}
