/**
 * Inverse kinematics in closed form (spec/engine-cli.md, "ik"). No iteration.
 *
 * Orientation: the tool axis a = S·axis_P (in M at all rotaries zero) must satisfy
 *   R_t1(θt1) R_t2(θt2) a = R_h1(θh1) R_h2(θh2) ẑ.
 * With two rotaries this is one vector c reached from two sides, c = R_i(±θ_i) u_i,
 * so c lies on two cones (w_i·c = w_i·u_i): Paden–Kahan subproblem 2 (Murray, Li &
 * Sastry 1994, §2.3.3), solved as one trigonometric equation on the better side. Each angle then follows from subproblem 1 (the angle turning
 * u_i onto c about w_i). One rotary is subproblem 1 alone; none needs a = ẑ.
 * Linear axes then follow directly: X, Y, Z = T(S(tip_P)) − H(0) (`linearAxesFor`).
 *
 * Senses and units: right-hand rule about each rotary's `direction`; degrees out,
 * radians inside. A continuous rotary gives the equivalent angle nearest `previous`;
 * a limited one gives every equivalent angle inside [min, max].
 */
import { addScaled, cross, dot, GeometryError, norm, normalize, reject, scale, sub, type Vec3 } from '../geometry/vec3';
import { applyMat, toDeg, wrapDeg, type Mat3 } from '../geometry/rotation';
import { headOffset, partToMachineWith, rotationsAt } from './forward';
import { prepareMachine, type PreparedMachine, type PreparedRotary } from './machine';
import type { AxisValues, Machine } from './schema';
import { chooseSolution } from './choose';

/** |u − (u·w)w| below this: the source vector lies on the rotary line (free angle). */
const SINGULAR_TOL = 1e-9;
/** Slack on the cone-intersection discriminant (γ², dimensionless): rounding, not geometry. */
const REACH_TOL = 1e-12;
/** Two solutions closer than this (mm, degrees) are the same one. */
const SAME_TOL = 1e-7;
/** Angles this close to a travel limit count as inside (degrees). */
const LIMIT_TOL = 1e-9;

export interface IkResult {
  solutions: AxisValues[];
  chosen: number;
  singular: boolean;
}

export interface OrientationResult {
  /** Rotary angles (degrees, raw, before equivalents), one entry per branch. */
  branches: Record<string, number>[];
  singular: boolean;
  /** Rotaries whose angle is free (tool axis along their line); they keep `previous`. */
  free: string[];
}

interface Term { r: PreparedRotary; u: Vec3; sign: 1 | -1 }

/** Subproblem 1: the angle (radians) turning u onto c about unit w, or null when u is on the line. */
function subproblem1(w: Vec3, u: Vec3, c: Vec3): number | null {
  const up = reject(u, w);
  if (norm(up) < SINGULAR_TOL) return null;
  const cp = reject(c, w);
  return Math.atan2(dot(w, cross(up, cp)), dot(up, cp));
}

/**
 * Subproblem 2, solved on the better-conditioned side: c = R_j(φ)·u_j swept about w_j
 * must meet the cone w_i·c = w_i·u_i, i.e. P cos φ + Q sin φ = D (closed form). The
 * candidate c then lies exactly on cone j (the smaller cone) and on cone i to rounding.
 */
function subproblem2(tj: Term, ti: Term): { c: Vec3; phi: number }[] {
  const w = tj.r.w;
  const u = tj.u;
  const along = dot(w, u);
  const uPar = scale(w, along);
  const uPerp = sub(u, uPar);
  const wxu = cross(w, u);
  const P = dot(ti.r.w, uPerp);
  const Q = dot(ti.r.w, wxu);
  const D = dot(ti.r.w, ti.u) - dot(ti.r.w, uPar);
  const rho = Math.hypot(P, Q);
  const cAt = (phi: number): Vec3 => addScaled(addScaled(uPar, uPerp, Math.cos(phi)), wxu, Math.sin(phi));
  if (Math.abs(D) > rho + REACH_TOL) return [];
  const base = Math.atan2(Q, P);
  const ratio = Math.max(-1, Math.min(1, D / rho));
  const delta = Math.acos(ratio);
  if (delta < 1e-15) return [{ c: cAt(base), phi: base }];
  return [base + delta, base - delta].map((phi) => ({ c: cAt(phi), phi }));
}

function terms(pm: PreparedMachine, a: Vec3): Term[] {
  const z: Vec3 = [0, 0, 1];
  const { tables, heads } = pm;
  if (tables.length === 2) return [{ r: tables[0]!, u: z, sign: -1 }, { r: tables[1]!, u: a, sign: 1 }];
  if (heads.length === 2) return [{ r: heads[0]!, u: a, sign: -1 }, { r: heads[1]!, u: z, sign: 1 }];
  if (tables.length === 1 && heads.length === 1) return [{ r: tables[0]!, u: a, sign: 1 }, { r: heads[0]!, u: z, sign: 1 }];
  if (tables.length === 1) return [{ r: tables[0]!, u: a, sign: 1 }];
  if (heads.length === 1) return [{ r: heads[0]!, u: z, sign: 1 }];
  return [];
}

const unreachable = (axisP: Vec3): GeometryError =>
  new GeometryError('UNREACHABLE_ORIENTATION', `no rotary angles turn the tool axis to [${axisP.map((v) => +v.toFixed(6)).join(', ')}] (part frame) on this machine`, 'axis');

/** The rotary angles giving tool axis `axisP` (part frame); free angles keep `previous`. */
export function solveOrientation(machine: Machine | PreparedMachine, axisP: Vec3, previous: AxisValues = {}): OrientationResult {
  const pm = prepareMachine(machine);
  const a = applyMat(pm.setupR, normalize(axisP));
  const ts = terms(pm, a);
  if (ts.length === 0) {
    if (norm(sub(a, [0, 0, 1])) > REACH_TOL) throw unreachable(axisP);
    return { branches: [{}], singular: false, free: [] };
  }
  let cs: Vec3[];
  if (ts.length === 1) {
    const t = ts[0]!;
    const c: Vec3 = t.r.carrier === 'table' ? [0, 0, 1] : a;
    if (Math.abs(dot(t.r.w, t.u) - dot(t.r.w, c)) > REACH_TOL) throw unreachable(axisP);
    cs = [c];
  } else {
    const [t1, t2] = ts as [Term, Term];
    const off = (t: Term) => norm(reject(t.u, t.r.w));
    // Sweep the term whose source is nearer its own line (small cone): the other angle
    // then comes from subproblem 1, whose rounding error scales as 1e-16 / its offset.
    const [tj, ti] = off(t1) <= off(t2) ? [t1, t2] : [t2, t1];
    if (off(tj) < SINGULAR_TOL) {
      // source on its own line: c is pinned to it and that angle is free
      cs = Math.abs(dot(ti.r.w, tj.u) - dot(ti.r.w, ti.u)) <= REACH_TOL ? [tj.u] : [];
    } else {
      cs = subproblem2(tj, ti).map((x) => x.c);
    }
    if (cs.length === 0) throw unreachable(axisP);
  }
  const free = new Set<string>();
  const branches = cs.map((c) => {
    const angles: Record<string, number> = {};
    for (const t of ts) {
      const phi = subproblem1(t.r.w, t.u, c);
      if (phi === null) {
        free.add(t.r.name);
        angles[t.r.name] = previous[t.r.name] ?? 0;
      } else {
        angles[t.r.name] = t.sign * toDeg(phi);
      }
    }
    return angles;
  });
  return { branches, singular: free.size > 0, free: [...free] };
}

const NO_OFFSET: Readonly<Vec3> = [0, 0, 0];

/** What `linearAxesFor` needs at one rotary setting: the tables' rotations and the head's tip offset. */
export interface RotarySetting { tables: Mat3[]; head: Readonly<Vec3> }

export function rotarySetting(pm: PreparedMachine, rotaries: AxisValues): RotarySetting {
  // without head axes the tip sits at (X, Y, Z): the offset is zero (and x − 0 is x, to the bit)
  return { tables: rotationsAt(pm.tables, rotaries), head: pm.heads.length === 0 ? NO_OFFSET : headOffset(pm, rotaries).tip };
}

/** Linear axes X, Y, Z (written into `out`) placing the tip at part-frame point `tipP` at a rotary setting. */
export function linearAxesIn(pm: PreparedMachine, s: RotarySetting, tipP: Vec3, out: Vec3 = [0, 0, 0]): Vec3 {
  const tipM = partToMachineWith(pm, s.tables, tipP);
  out[0] = tipM[0] - s.head[0];
  out[1] = tipM[1] - s.head[1];
  out[2] = tipM[2] - s.head[2];
  return out;
}

/** Linear axes placing the tip at part-frame point `tipP` with the rotaries at the given angles (degrees). */
export function linearAxesFor(machine: Machine | PreparedMachine, tipP: Vec3, rotaries: AxisValues): { X: number; Y: number; Z: number } {
  const pm = prepareMachine(machine);
  const v = linearAxesIn(pm, rotarySetting(pm, rotaries), tipP);
  return { X: v[0], Y: v[1], Z: v[2] };
}

/**
 * `linearAxesFor` at fixed rotary angles, as an affine map: (X, Y, Z) = o + p[0]·c[0] +
 * p[1]·c[1] + p[2]·c[2], sampled once at the origin and the three unit points (rounding
 * below 1e-12 mm for part sizes of metres). `linearAxisOf` applies it.
 */
export interface LinearAxesMap { o: Vec3; c: [Vec3, Vec3, Vec3] }

export function linearAxesMap(machine: Machine | PreparedMachine, rotaries: AxisValues): LinearAxesMap {
  const pm = prepareMachine(machine);
  const setting = rotarySetting(pm, rotaries);
  const at = (p: Vec3): Vec3 => linearAxesIn(pm, setting, p);
  const o = at([0, 0, 0]);
  const col = (e: Vec3): Vec3 => {
    const v = at(e);
    return [v[0] - o[0], v[1] - o[1], v[2] - o[2]];
  };
  return { o, c: [col([1, 0, 0]), col([0, 1, 0]), col([0, 0, 1])] };
}

/** Linear axis `k` (0 = X, 1 = Y, 2 = Z) of the part-frame tip (x, y, z) under a `linearAxesMap`. */
export const linearAxisAt = (m: LinearAxesMap, x: number, y: number, z: number, k: 0 | 1 | 2): number =>
  m.o[k] + m.c[0][k] * x + m.c[1][k] * y + m.c[2][k] * z;

/** Linear axis `k` (0 = X, 1 = Y, 2 = Z) of part-frame tip `p` under a `linearAxesMap`. */
export const linearAxisOf = (m: LinearAxesMap, p: Vec3, k: 0 | 1 | 2): number => linearAxisAt(m, p[0], p[1], p[2], k);

/** Every angle equivalent to `raw` that the rotary may take (nearest `prev` when continuous). */
export function equivalentAngles(r: PreparedRotary, raw: number, prev: number, free: boolean): number[] {
  if (r.min === null || r.max === null) return [free ? raw : prev + wrapDeg(raw - prev)];
  if (free) return raw >= r.min - LIMIT_TOL && raw <= r.max + LIMIT_TOL ? [raw] : [];
  const out: number[] = [];
  const k0 = Math.ceil((r.min - LIMIT_TOL - raw) / 360);
  for (let v = raw + 360 * k0; v <= r.max + LIMIT_TOL; v += 360) {
    if (v >= r.min - LIMIT_TOL) out.push(v);
  }
  return out;
}

interface Violation { word: string; value: number; lo: number; hi: number; unit: string }

/** Every combination of equivalent angles of a branch, as angle lists in `pm.rotaries` order (the first rotary varying slowest). */
function expandBranch(pm: PreparedMachine, branch: Record<string, number>, previous: AxisValues, freeNames: string[], violations: Violation[]): number[][] {
  let combos: number[][] = [[]];
  for (const r of pm.rotaries) {
    const raw = branch[r.name] ?? 0;
    const prev = previous[r.name] ?? 0;
    const free = freeNames.includes(r.name);
    const eq = equivalentAngles(r, raw, prev, free);
    if (eq.length === 0) violations.push({ word: r.name, value: raw, lo: r.min ?? 0, hi: r.max ?? 0, unit: '°' });
    if (eq.length === 1) for (const c of combos) c.push(eq[0]!);
    else combos = combos.flatMap((c) => eq.map((v) => [...c, v]));
  }
  return combos;
}

const LINEAR = ['X', 'Y', 'Z'] as const;

function withinLinear(pm: PreparedMachine, s: AxisValues, violations: Violation[]): boolean {
  for (const w of LINEAR) {
    const [lo, hi] = pm.machine.linear[w];
    const v = s[w] ?? 0;
    if (v < lo - 1e-9 || v > hi + 1e-9) {
      violations.push({ word: w, value: v, lo, hi, unit: ' mm' });
      return false;
    }
  }
  return true;
}

function same(a: AxisValues, b: AxisValues): boolean {
  for (const k of Object.keys(a)) if (!(Math.abs((a[k] ?? 0) - (b[k] ?? 0)) <= SAME_TOL)) return false;
  return true;
}

/** Solutions within limits for a solved orientation, tip in the part frame. */
export function solutionsFor(machine: Machine | PreparedMachine, tipP: Vec3, orientation: OrientationResult, previous: AxisValues = {}): IkResult {
  const pm = prepareMachine(machine);
  const violations: Violation[] = [];
  const solutions: AxisValues[] = [];
  for (const branch of orientation.branches) {
    for (const angles of expandBranch(pm, branch, previous, orientation.free, violations)) {
      // keys X, Y, Z first, then the rotaries in chain order
      const s: AxisValues = { X: 0, Y: 0, Z: 0 };
      for (let i = 0; i < pm.rotaries.length; i++) s[pm.rotaries[i]!.name] = angles[i]!;
      const lin = linearAxesFor(pm, tipP, s);
      s.X = lin.X;
      s.Y = lin.Y;
      s.Z = lin.Z;
      if (withinLinear(pm, s, violations) && !solutions.some((o) => same(o, s))) solutions.push(s);
    }
  }
  if (solutions.length === 0) {
    const v = violations[0];
    const what = v ? `${v.word} would be ${v.value.toFixed(3)}${v.unit}, outside its travel ${v.lo} to ${v.hi}${v.unit}` : 'no candidate';
    throw new GeometryError('OUT_OF_LIMITS', `no solution within travel limits: ${what}`, v ? `machine.${['X', 'Y', 'Z'].includes(v.word) ? `linear.${v.word}` : `rotaries[${pm.rotaries.findIndex((r) => r.name === v.word)}]`}` : 'machine');
  }
  return { solutions, chosen: chooseSolution(solutions, previous, pm.rotaries.map((r) => r.name)), singular: orientation.singular };
}

/** `ik`: tip and tool axis in the part frame → every solution within limits, the chosen one, singularity. */
export function inverseKinematics(machine: Machine | PreparedMachine, tipP: Vec3, axisP: Vec3, previous: AxisValues = {}): IkResult {
  const pm = prepareMachine(machine);
  return solutionsFor(pm, tipP, solveOrientation(pm, axisP, previous), previous);
}
