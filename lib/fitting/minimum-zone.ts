/**
 * Minimum-zone (Chebyshev) flatness and roundness, exact for the point counts of
 * probing. The optimum zone is fixed by four points (flatness: three on one plane and
 * one on the other, or two and two; roundness: 2 + 2, 3 + 1 or 1 + 3 on the two
 * circles), so every support set of a working set is tried and the narrowest zone
 * kept. The working set starts from the points farthest from the least-squares
 * element; if a point of the full set falls outside the working set's zone it is added
 * and the search repeats — the zone of a subset is never wider than that of the full
 * set at the same orientation, so when the full set fits, the zone is the minimum.
 * The least-squares element is always a candidate: the result never exceeds its form.
 * (Characterisation: ISO 12781-1 / ISO 12181-1 minimum zone definitions [from memory];
 * support-set search in the manner of Carr & Ferreira, Precision Engineering 17 (1995) [from memory].)
 */
import type { CircleFit, PlaneFit } from './types';
import { FitError } from './types';
import { completeFrame } from './frame';
import { cross, dot, norm, sub, type Vec3 } from '../geometry/vec3';

export interface MinimumZonePlane {
  method: 'minimum-zone';
  form: number;
  normal: Vec3;
  /** Point on the middle plane of the zone. */
  origin: Vec3;
  /** Indices of the points on the two zone planes. */
  supports: number[];
  rounds: number;
  candidates: number;
}

export interface MinimumZoneCircle {
  method: 'minimum-zone';
  form: number;
  center: Vec3;
  /** Radii of the inner and outer zone circles. */
  innerRadius: number;
  outerRadius: number;
  supports: number[];
  rounds: number;
  candidates: number;
}

/** Candidate zone normals more than this far from the least-squares normal are not flatness zones. */
const MAX_TILT_COS = Math.cos((20 * Math.PI) / 180);
const INITIAL_EACH_SIDE = 8;
const MAX_ROUNDS = 50;
const CONTAINS_TOL = 1e-12;

function initialSet(values: number[]): number[] {
  const order = values.map((_, i) => i).sort((i, j) => (values[i] as number) - (values[j] as number));
  if (order.length <= 2 * INITIAL_EACH_SIDE + 4) return order;
  return [...order.slice(0, INITIAL_EACH_SIDE), ...order.slice(-INITIAL_EACH_SIDE)];
}

function spread(values: ArrayLike<number>, idx: readonly number[]): { lo: number; hi: number } {
  let lo = Infinity, hi = -Infinity;
  for (const i of idx) { const v = values[i] as number; if (v < lo) lo = v; if (v > hi) hi = v; }
  return { lo, hi };
}

export function minimumZonePlane(points: readonly Vec3[], ls: PlaneFit): MinimumZonePlane {
  if (points.length < 4) {
    return { method: 'minimum-zone', form: ls.form, normal: ls.normal, origin: ls.origin, supports: points.map((_, i) => i), rounds: 0, candidates: 1 };
  }
  const all = points.map((_, i) => i);
  let work = initialSet(ls.residuals.values ?? points.map((p) => dot(sub(p, ls.origin), ls.normal)));
  let candidates = 0;
  for (let round = 1; round <= MAX_ROUNDS; round++) {
    let best = { width: widthAlong(points, work, ls.normal), normal: ls.normal };
    candidates++;
    const tryNormal = (raw: Vec3): void => {
      const len = norm(raw);
      if (len < 1e-300) return;
      let n: Vec3 = [raw[0] / len, raw[1] / len, raw[2] / len];
      const c = dot(n, ls.normal);
      if (Math.abs(c) < MAX_TILT_COS) return;
      if (c < 0) n = [-n[0], -n[1], -n[2]];
      candidates++;
      const w = widthAlong(points, work, n);
      if (w < best.width) best = { width: w, normal: n };
    };
    const k = work.length;
    for (let a = 0; a < k; a++) for (let b = a + 1; b < k; b++) {
      const pa = points[work[a] as number] as Vec3;
      const ab = sub(points[work[b] as number] as Vec3, pa);
      for (let c = b + 1; c < k; c++) tryNormal(cross(ab, sub(points[work[c] as number] as Vec3, pa)));
    }
    const pairs: Array<[number, number]> = [];
    for (let a = 0; a < k; a++) for (let b = a + 1; b < k; b++) pairs.push([work[a] as number, work[b] as number]);
    for (let s = 0; s < pairs.length; s++) {
      const [i, j] = pairs[s] as [number, number];
      const dij = sub(points[j] as Vec3, points[i] as Vec3);
      for (let t = s + 1; t < pairs.length; t++) {
        const [p, q] = pairs[t] as [number, number];
        if (p === i || p === j || q === i || q === j) continue;
        tryNormal(cross(dij, sub(points[q] as Vec3, points[p] as Vec3)));
      }
    }
    const proj = points.map((p) => dot(p, best.normal));
    const sub0 = spread(proj, work);
    const full = spread(proj, all);
    const violators = all.filter((i) => (proj[i] as number) > sub0.hi + CONTAINS_TOL || (proj[i] as number) < sub0.lo - CONTAINS_TOL);
    if (violators.length === 0) {
      const mid = (full.lo + full.hi) / 2;
      const c = ls.origin;
      const origin: Vec3 = [c[0] + best.normal[0] * (mid - dot(c, best.normal)), c[1] + best.normal[1] * (mid - dot(c, best.normal)), c[2] + best.normal[2] * (mid - dot(c, best.normal))];
      const supports = all.filter((i) => Math.abs((proj[i] as number) - full.hi) <= 1e-9 || Math.abs((proj[i] as number) - full.lo) <= 1e-9);
      return { method: 'minimum-zone', form: Math.min(full.hi - full.lo, ls.form), normal: best.normal, origin, supports, rounds: round, candidates };
    }
    violators.sort((i, j) => outside(proj, j, sub0) - outside(proj, i, sub0));
    work = [...work, ...violators.slice(0, 4)];
  }
  throw new FitError('NO_CONVERGENCE', 'the minimum-zone flatness search did not settle');
}

function outside(proj: number[], i: number, z: { lo: number; hi: number }): number {
  const v = proj[i] as number;
  return Math.max(v - z.hi, z.lo - v);
}

function widthAlong(points: readonly Vec3[], idx: readonly number[], n: Vec3): number {
  let lo = Infinity, hi = -Infinity;
  for (const i of idx) {
    const p = points[i] as Vec3;
    const v = p[0] * n[0] + p[1] * n[1] + p[2] * n[2];
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return hi - lo;
}

/** Roundness in the least-squares circle's plane (points projected onto it). */
export function minimumZoneCircle(points: readonly Vec3[], ls: CircleFit): MinimumZoneCircle {
  const { u, v } = completeFrame(ls.normal);
  const xs = points.map((p) => dot(sub(p, ls.center), u));
  const ys = points.map((p) => dot(sub(p, ls.center), v));
  const all = points.map((_, i) => i);
  const radii = (cx: number, cy: number): number[] => xs.map((x, i) => Math.hypot(x - cx, (ys[i] as number) - cy));
  const lsRadii = radii(0, 0);
  if (points.length < 4) return circleResult(ls, u, v, 0, 0, lsRadii, all, 0, 1, ls.form);
  const reach = 0.5 * ls.radius;
  let work = initialSet(lsRadii.map((r) => r - ls.radius));
  let candidates = 0;
  for (let round = 1; round <= MAX_ROUNDS; round++) {
    let best = { width: widthAt(xs, ys, work, 0, 0), cx: 0, cy: 0 };
    candidates++;
    const tryCentre = (cx: number, cy: number): void => {
      if (!Number.isFinite(cx) || !Number.isFinite(cy) || Math.hypot(cx, cy) > reach) return;
      candidates++;
      const w = widthAt(xs, ys, work, cx, cy);
      if (w < best.width) best = { width: w, cx, cy };
    };
    const k = work.length;
    for (let a = 0; a < k; a++) for (let b = a + 1; b < k; b++) for (let c = b + 1; c < k; c++) {
      const cc = circumcentre(xs, ys, work[a] as number, work[b] as number, work[c] as number);
      if (cc) tryCentre(cc[0], cc[1]);
    }
    const bis: Array<{ i: number; j: number; mx: number; my: number; dx: number; dy: number }> = [];
    for (let a = 0; a < k; a++) for (let b = a + 1; b < k; b++) {
      const i = work[a] as number, j = work[b] as number;
      bis.push({ i, j, mx: ((xs[i] as number) + (xs[j] as number)) / 2, my: ((ys[i] as number) + (ys[j] as number)) / 2, dx: (xs[j] as number) - (xs[i] as number), dy: (ys[j] as number) - (ys[i] as number) });
    }
    for (let s = 0; s < bis.length; s++) for (let t = s + 1; t < bis.length; t++) {
      const A = bis[s]!, B = bis[t]!;
      if (A.i === B.i || A.i === B.j || A.j === B.i || A.j === B.j) continue;
      // Points c with (c − mA)·dA = 0 and (c − mB)·dB = 0.
      const det = A.dx * B.dy - A.dy * B.dx;
      if (Math.abs(det) < 1e-300) continue;
      const ra = A.dx * A.mx + A.dy * A.my;
      const rb = B.dx * B.mx + B.dy * B.my;
      tryCentre((ra * B.dy - A.dy * rb) / det, (A.dx * rb - ra * B.dx) / det);
    }
    const rr = radii(best.cx, best.cy);
    const z = spread(rr, work);
    const violators = all.filter((i) => (rr[i] as number) > z.hi + CONTAINS_TOL || (rr[i] as number) < z.lo - CONTAINS_TOL);
    if (violators.length === 0) return circleResult(ls, u, v, best.cx, best.cy, rr, all, round, candidates, ls.form);
    violators.sort((i, j) => outside(rr, j, z) - outside(rr, i, z));
    work = [...work, ...violators.slice(0, 4)];
  }
  throw new FitError('NO_CONVERGENCE', 'the minimum-zone roundness search did not settle');
}

function circleResult(ls: CircleFit, u: Vec3, v: Vec3, cx: number, cy: number, rr: number[], all: number[], rounds: number, candidates: number, lsForm: number): MinimumZoneCircle {
  const z = spread(rr, all);
  const c = ls.center;
  const center: Vec3 = [c[0] + u[0] * cx + v[0] * cy, c[1] + u[1] * cx + v[1] * cy, c[2] + u[2] * cx + v[2] * cy];
  const supports = all.filter((i) => Math.abs((rr[i] as number) - z.hi) <= 1e-9 || Math.abs((rr[i] as number) - z.lo) <= 1e-9);
  return { method: 'minimum-zone', form: Math.min(z.hi - z.lo, lsForm), center, innerRadius: z.lo, outerRadius: z.hi, supports, rounds, candidates };
}

function widthAt(xs: number[], ys: number[], idx: readonly number[], cx: number, cy: number): number {
  let lo = Infinity, hi = -Infinity;
  for (const i of idx) {
    const r = Math.hypot((xs[i] as number) - cx, (ys[i] as number) - cy);
    if (r < lo) lo = r;
    if (r > hi) hi = r;
  }
  return hi - lo;
}

function circumcentre(xs: number[], ys: number[], i: number, j: number, k: number): [number, number] | null {
  const ax = xs[i] as number, ay = ys[i] as number;
  const bx = (xs[j] as number) - ax, by = (ys[j] as number) - ay;
  const cx = (xs[k] as number) - ax, cy = (ys[k] as number) - ay;
  const d = 2 * (bx * cy - by * cx);
  if (Math.abs(d) < 1e-300) return null;
  const b2 = bx * bx + by * by, c2 = cx * cx + cy * cy;
  return [ax + (cy * b2 - by * c2) / d, ay + (bx * c2 - cx * b2) / d];
}
