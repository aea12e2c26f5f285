/**
 * Point patterns in a feature's own 2-D parameters (no frames here): angles on a circle,
 * an even spread over a rectangle, rings on a spherical cap, positions along a slot.
 * Deterministic: no randomness, the same input gives the same pattern.
 */

/** n angles (radians) from `start`, equally spaced round the full circle. */
export function circleAngles(n: number, start: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(start + (2 * Math.PI * i) / n);
  return out;
}

/** n depths evenly between top and bottom (a single level sits midway). */
export function levelDepths(n: number, top: number, bottom: number): number[] {
  if (n === 1 || bottom <= top) return [(top + bottom) / 2];
  return Array.from({ length: n }, (_, i) => top + ((bottom - top) * i) / (n - 1));
}

export type Point2 = [number, number];

/**
 * n points spread over the rectangle [−hu, hu] × [−hv, hv] avoiding points (u, v) that are
 * `blocked`: candidates on a fine grid, then farthest-point selection from the corner
 * (−hu, −hv). Farthest-point selection of a 2-D candidate set never puts n ≥ 3 points in
 * one row unless the usable area is itself a line. Returns fewer points when fewer
 * candidates are free.
 */
export function spreadOverRectangle(n: number, hu: number, hv: number, blocked: (u: number, v: number) => boolean): Point2[] {
  const aspect = hu / Math.max(hv, 1e-9);
  const total = Math.max(64, 12 * n);
  const nu = Math.max(2, Math.round(Math.sqrt(total * aspect)));
  const nv = Math.max(2, Math.round(total / nu));
  // free candidates' u and v, then their distances to the chosen set, in one buffer
  const cap = nu * nv;
  const buf = new Float64Array(3 * cap);
  let count = 0;
  for (let j = 0; j < nv; j++) {
    for (let i = 0; i < nu; i++) {
      const u = -hu + (2 * hu * i) / (nu - 1);
      const v = -hv + (2 * hv * j) / (nv - 1);
      if (!blocked(u, v)) { buf[count] = u; buf[cap + count] = v; count++; }
    }
  }
  if (count === 0) return [];
  const U = 0;
  const V = cap;
  const D = 2 * cap;
  // the farthest candidate (the first of equals within 1e-12) is found while distances are updated
  let best = -1;
  let bestD = -1;
  for (let k = 0; k < count; k++) {
    const d = (buf[U + k]! - buf[U]!) ** 2 + (buf[V + k]! - buf[V]!) ** 2;
    buf[D + k] = d;
    if (d > bestD + 1e-12) { bestD = d; best = k; }
  }
  const chosen: Point2[] = [[buf[U]!, buf[V]!]];
  while (chosen.length < Math.min(n, count)) {
    if (bestD <= 0) break;
    const u = buf[U + best]!;
    const v = buf[V + best]!;
    chosen.push([u, v]);
    best = -1;
    bestD = -1;
    for (let k = 0; k < count; k++) {
      const d = (buf[U + k]! - u) ** 2 + (buf[V + k]! - v) ** 2;
      if (d < buf[D + k]!) buf[D + k] = d;
      if (buf[D + k]! > bestD + 1e-12) { bestD = buf[D + k]!; best = k; }
    }
  }
  return chosen;
}

/** Reorders 2-D points into a nearest-neighbour chain from the first (short travel); `at` is called once per item. */
export function nearestNeighbourOrder<T>(items: T[], at: (t: T) => Point2): T[] {
  if (items.length < 3) return items.slice();
  const xs: number[] = [];
  const ys: number[] = [];
  for (const t of items) {
    const p = at(t);
    xs.push(p[0]);
    ys.push(p[1]);
  }
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
