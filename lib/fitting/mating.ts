/**
 * Mating sizes of a round feature seen along an axis: the largest circle with no
 * contact point inside it (a hole's mating envelope) and the smallest circle holding
 * every contact point (a pin's). The points are projected onto the plane across the
 * axis, so the envelope keeps the axis direction it is given (the least-squares one).
 *
 * Smallest enclosing circle: the incremental algorithm of Welzl (1991), "Smallest
 * enclosing disks (balls and ellipsoids)", LNCS 555 [from memory], on a fixed
 * pseudo-random order so the result is reproducible.
 * Largest empty circle: its centre is a point equidistant from three contact points that
 * lies inside their triangle (a Voronoi vertex; Shamos & Hoey 1975 [from memory]).
 * Candidates are searched on a working set of the points nearest the start centre; a
 * point of the full set inside the candidate joins the working set and the search
 * repeats. A subset's largest empty circle is never smaller than the full set's, so the
 * first candidate that the full set respects is the answer.
 */
import { FitError } from './types';
import { completeFrame } from './frame';
import { dot, sub, type Vec3 } from '../geometry/vec3';

type P2 = [number, number];

export interface MatingCircle {
  /** 'inscribed' (largest empty circle, for holes) or 'circumscribed' (smallest enclosing, for pins). */
  kind: 'inscribed' | 'circumscribed';
  center: Vec3;
  diameter: number;
  /** Indices of the points on the circle. */
  supports: number[];
}

const TOL = 1e-9;
/** The search is O(k⁴) in its working set: beyond this size it stops with an error (the caller falls back). */
const MAX_WORKING = 64;

function project(points: readonly Vec3[], origin: Vec3, axis: Vec3): { pts: P2[]; u: Vec3; v: Vec3 } {
  const { u, v } = completeFrame(axis);
  return { pts: points.map((p) => { const d = sub(p, origin); return [dot(d, u), dot(d, v)]; }), u, v };
}

const lift = (origin: Vec3, u: Vec3, v: Vec3, c: P2): Vec3 => [
  origin[0] + u[0] * c[0] + v[0] * c[1], origin[1] + u[1] * c[0] + v[1] * c[1], origin[2] + u[2] * c[0] + v[2] * c[1],
];

const dist = (a: P2, b: P2): number => Math.hypot(a[0] - b[0], a[1] - b[1]);

/** Centre of the circle through three points, or null when they are (nearly) in a row. */
function circumcenter(a: P2, b: P2, c: P2): P2 | null {
  const bx = b[0] - a[0], by = b[1] - a[1], cx = c[0] - a[0], cy = c[1] - a[1];
  const d = 2 * (bx * cy - by * cx);
  const scale = (bx * bx + by * by + cx * cx + cy * cy) || 1;
  if (Math.abs(d) <= 1e-12 * scale) return null;
  const b2 = bx * bx + by * by, c2 = cx * cx + cy * cy;
  return [a[0] + (cy * b2 - by * c2) / d, a[1] + (bx * c2 - cx * b2) / d];
}

/** Whether p lies inside (or on) triangle abc. */
function inTriangle(p: P2, a: P2, b: P2, c: P2): boolean {
  const s = (q: P2, r: P2) => (r[0] - q[0]) * (p[1] - q[1]) - (r[1] - q[1]) * (p[0] - q[0]);
  const d1 = s(a, b), d2 = s(b, c), d3 = s(c, a);
  const eps = 1e-12 * ((Math.abs(d1) + Math.abs(d2) + Math.abs(d3)) || 1);
  return (d1 >= -eps && d2 >= -eps && d3 >= -eps) || (d1 <= eps && d2 <= eps && d3 <= eps);
}

/** Largest empty circle of the working set `w` (indices into pts): centre, radius, supports. */
function largestEmpty(pts: P2[], w: number[]): { c: P2; r: number; s: number[] } | null {
  let best: { c: P2; r: number; s: number[] } | null = null;
  for (let i = 0; i < w.length; i++) {
    for (let j = i + 1; j < w.length; j++) {
      for (let k = j + 1; k < w.length; k++) {
        const a = pts[w[i]!]!, b = pts[w[j]!]!, c = pts[w[k]!]!;
        const o = circumcenter(a, b, c);
        if (!o || !inTriangle(o, a, b, c)) continue;
        const r = dist(o, a);
        if (best && r <= best.r) continue;
        let empty = true;
        for (const m of w) if (dist(o, pts[m]!) < r - TOL * (1 + r)) { empty = false; break; }
        if (empty) best = { c: o, r, s: [w[i]!, w[j]!, w[k]!] };
      }
    }
  }
  return best;
}

/**
 * Largest circle with no point inside, its centre surrounded by the points (a hole's
 * mating circle). `start` is a centre inside the hole (the least-squares one).
 */
export function inscribedCircle(points: readonly Vec3[], start: Vec3, axis: Vec3): MatingCircle {
  if (points.length < 3) throw new FitError('TOO_FEW_POINTS', `an inscribed circle needs at least 3 points; got ${points.length}`);
  const { pts, u, v } = project(points, start, axis);
  // start from the point nearest the centre in each of 12 sectors around it, so the working set surrounds it
  const order = pts.map((p, i) => [Math.hypot(p[0], p[1]), i] as const).sort((a, b) => a[0] - b[0]).map(([, i]) => i);
  const sector = (i: number) => Math.floor(((Math.atan2(pts[i]![1], pts[i]![0]) + Math.PI) / (2 * Math.PI)) * 12) % 12;
  const w: number[] = [];
  const taken = new Set<number>();
  for (const i of order) if (!taken.has(sector(i))) { taken.add(sector(i)); w.push(i); }
  for (;;) {
    const cand = largestEmpty(pts, w);
    if (!cand) {
      // no centre surrounded yet: widen the working set, and give up only with every point in it
      const more = order.filter((i) => !w.includes(i)).slice(0, 8);
      if (more.length === 0 || w.length >= MAX_WORKING) throw new FitError('NOT_SURROUNDED', 'the points do not surround a centre: no inscribed circle');
      w.push(...more);
      continue;
    }
    // points of the full set inside the candidate, deepest first
    const inside = order.filter((i) => !w.includes(i) && dist(cand.c, pts[i]!) < cand.r - TOL * (1 + cand.r))
      .sort((a, b) => dist(cand.c, pts[a]!) - dist(cand.c, pts[b]!));
    if (inside.length === 0) return { kind: 'inscribed', center: lift(start, u, v, cand.c), diameter: 2 * cand.r, supports: cand.s };
    if (w.length >= MAX_WORKING) throw new FitError('NO_CONVERGENCE', `no inscribed circle found with ${MAX_WORKING} points in the working set`);
    w.push(...inside.slice(0, 4));
  }
}

/** Smallest circle holding every point (a pin's mating circle). */
export function circumscribedCircle(points: readonly Vec3[], start: Vec3, axis: Vec3): MatingCircle {
  if (points.length < 2) throw new FitError('TOO_FEW_POINTS', `a circumscribed circle needs at least 2 points; got ${points.length}`);
  const { pts, u, v } = project(points, start, axis);
  // a fixed pseudo-random order (xorshift32) gives the algorithm its expected linear time
  const idx = pts.map((_, i) => i);
  let seed = 0x9e3779b9;
  for (let i = idx.length - 1; i > 0; i--) {
    seed ^= seed << 13; seed ^= seed >>> 17; seed ^= seed << 5;
    const j = (seed >>> 0) % (i + 1);
    [idx[i], idx[j]] = [idx[j]!, idx[i]!];
  }
  const outside = (c: P2, r: number, p: P2) => dist(c, p) > r + TOL * (1 + r);
  let c: P2 = pts[idx[0]!]!;
  let r = 0;
  let s = [idx[0]!];
  for (let a = 1; a < idx.length; a++) {
    const pa = pts[idx[a]!]!;
    if (!outside(c, r, pa)) continue;
    c = pa; r = 0; s = [idx[a]!];
    for (let b = 0; b < a; b++) {
      const pb = pts[idx[b]!]!;
      if (!outside(c, r, pb)) continue;
      c = [(pa[0] + pb[0]) / 2, (pa[1] + pb[1]) / 2]; r = dist(c, pa); s = [idx[a]!, idx[b]!];
      for (let k = 0; k < b; k++) {
        const pk = pts[idx[k]!]!;
        if (!outside(c, r, pk)) continue;
        const o = circumcenter(pa, pb, pk);
        if (!o) continue; // in a row: the pair's circle already spans the third point's line
        c = o; r = dist(o, pa); s = [idx[a]!, idx[b]!, idx[k]!];
      }
    }
  }
  return { kind: 'circumscribed', center: lift(start, u, v, c), diameter: 2 * r, supports: s };
}
