/**
 * Point patterns in a feature's own 2-D parameters (no frames here): angles on a circle,
 * an even spread over a rectangle, rings on a spherical cap, positions along a slot.
 * Deterministic: no randomness, the same input gives the same pattern.
 */

/** n angles (radians) from `start`, equally spaced round the full circle. */
export const circleAngles = (n: number, start: number): number[] =>
  Array.from({ length: n }, (_, i) => start + (2 * Math.PI * i) / n);

/** n depths evenly between top and bottom (a single level sits midway). */
export function levelDepths(n: number, top: number, bottom: number): number[] {
  if (n === 1 || bottom <= top) return [(top + bottom) / 2];
  return Array.from({ length: n }, (_, i) => top + ((bottom - top) * i) / (n - 1));
}

export type Point2 = [number, number];

/**
 * n points spread over the rectangle [−hu, hu] × [−hv, hv] avoiding `blocked` points:
 * candidates on a fine grid, then farthest-point selection from the corner (−hu, −hv).
 * Farthest-point selection of a 2-D candidate set never puts n ≥ 3 points in one row
 * unless the usable area is itself a line. Returns fewer points when fewer candidates
 * are free.
 */
export function spreadOverRectangle(n: number, hu: number, hv: number, blocked: (p: Point2) => boolean): Point2[] {
  const aspect = hu / Math.max(hv, 1e-9);
  const total = Math.max(64, 12 * n);
  const nu = Math.max(2, Math.round(Math.sqrt(total * aspect)));
  const nv = Math.max(2, Math.round(total / nu));
  const cand: Point2[] = [];
  for (let j = 0; j < nv; j++) {
    for (let i = 0; i < nu; i++) {
      const p: Point2 = [-hu + (2 * hu * i) / (nu - 1), -hv + (2 * hv * j) / (nv - 1)];
      if (!blocked(p)) cand.push(p);
    }
  }
  if (cand.length === 0) return [];
  // coordinates and distances to the chosen set in scratch arrays (no callback runs from here on)
  if (spread.u.length < cand.length) spread = { u: new Float64Array(2 * cand.length), v: new Float64Array(2 * cand.length), d: new Float64Array(2 * cand.length) };
  const { u: us, v: vs, d: dist } = spread;
  const first = cand[0] as Point2;
  // the farthest candidate (first of equals within 1e-12) is tracked while distances are updated
  let best = -1;
  let bestD = -1;
  for (let k = 0; k < cand.length; k++) {
    const p = cand[k] as Point2;
    us[k] = p[0];
    vs[k] = p[1];
    dist[k] = (p[0] - first[0]) ** 2 + (p[1] - first[1]) ** 2;
    if (dist[k]! > bestD + 1e-12) { bestD = dist[k]!; best = k; }
  }
  const chosen: Point2[] = [cand[0] as Point2];
  while (chosen.length < Math.min(n, cand.length)) {
    if (bestD <= 0) break;
    chosen.push(cand[best] as Point2);
    const u = us[best]!;
    const v = vs[best]!;
    best = -1;
    bestD = -1;
    for (let k = 0; k < cand.length; k++) {
      const d = (us[k]! - u) ** 2 + (vs[k]! - v) ** 2;
      if (d < dist[k]!) dist[k] = d;
      if (dist[k]! > bestD + 1e-12) { bestD = dist[k]!; best = k; }
    }
  }
  return chosen;
}

let spread = { u: new Float64Array(256), v: new Float64Array(256), d: new Float64Array(256) };

/** Reorders 2-D points into a nearest-neighbour chain from the first (short travel); `at` is called once per item. */
export function nearestNeighbourOrder<T>(items: T[], at: (t: T) => Point2): T[] {
  if (items.length < 3) return items.slice();
  const xs = new Float64Array(items.length);
  const ys = new Float64Array(items.length);
  items.forEach((t, i) => {
    const [a, b] = at(t);
    xs[i] = a;
    ys[i] = b;
  });
  const left = Array.from({ length: items.length - 1 }, (_, k) => k + 1);
  const out: T[] = [items[0] as T];
  let last = 0;
  while (left.length > 0) {
    const x = xs[last]!;
    const y = ys[last]!;
    let best = 0;
    let bestD = Infinity;
    for (let k = 0; k < left.length; k++) {
      const d = (xs[left[k]!]! - x) ** 2 + (ys[left[k]!]! - y) ** 2;
      if (d < bestD) { bestD = d; best = k; }
    }
    last = left.splice(best, 1)[0]!;
    out.push(items[last] as T);
  }
  return out;
}

/**
 * n points on a spherical cap: the pole, then rings at polar angles up to `maxPolar`
 * (radians), each ring staggered by half its spacing. Returns [polar, azimuth] pairs.
 */
export function capPoints(n: number, maxPolar: number, startAzimuth: number): [number, number][] {
  const out: [number, number][] = [[0, 0]];
  const rest = n - 1;
  const rings = rest <= 4 ? 1 : 2;
  let left = rest;
  for (let r = 0; r < rings; r++) {
    const count = r === rings - 1 ? left : Math.floor(rest / rings);
    left -= count;
    const polar = (maxPolar * (r + 1)) / rings;
    const stagger = r % 2 === 1 ? Math.PI / count : 0;
    for (let i = 0; i < count; i++) out.push([polar, startAzimuth + stagger + (2 * Math.PI * i) / count]);
  }
  return out;
}

/** Positions of n opposing pairs along a straight wall of half-span `half` (0 for one pair). */
export function pairPositions(pairs: number, half: number): number[] {
  if (pairs === 1 || half <= 0) return Array.from({ length: pairs }, () => 0);
  return Array.from({ length: pairs }, (_, i) => -half + ((i + 0.5) * 2 * half) / pairs);
}
