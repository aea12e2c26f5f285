/**
 * The point patterns' tuned loops against plain statements of the same algorithms
 * (farthest-point selection over a grid, nearest-neighbour chain): the same points in
 * the same order, to the last bit; and the footprints a part's sources remember.
 */
import { describe, expect, it } from 'vitest';
import { nearestNeighbourOrder, spreadOverRectangle, type Point2 } from '@/lib/features/patterns';
import { footprintSources, footprintsOnPlane } from '@/lib/features/footprints';
import { demoBracket } from '@/lib/examples/demo-parts';
import type { Feature } from '@/lib/features/schema';

/** Farthest-point selection as stated: grid candidates not blocked, start at the first, then the farthest (first of equals within 1e-12). */
function spreadReference(n: number, hu: number, hv: number, blocked: (u: number, v: number) => boolean): Point2[] {
  const aspect = hu / Math.max(hv, 1e-9);
  const total = Math.max(64, 12 * n);
  const nu = Math.max(2, Math.round(Math.sqrt(total * aspect)));
  const nv = Math.max(2, Math.round(total / nu));
  const cand: Point2[] = [];
  for (let j = 0; j < nv; j++) {
    for (let i = 0; i < nu; i++) {
      const p: Point2 = [-hu + (2 * hu * i) / (nu - 1), -hv + (2 * hv * j) / (nv - 1)];
      if (!blocked(p[0], p[1])) cand.push(p);
    }
  }
  if (cand.length === 0) return [];
  const chosen = [cand[0]!];
  const d2 = (a: Point2, b: Point2) => (a[0] - b[0]) ** 2 + (a[1] - b[1]) ** 2;
  const dist = cand.map((c) => d2(c, cand[0]!));
  while (chosen.length < Math.min(n, cand.length)) {
    let best = -1;
    let bestD = -1;
    dist.forEach((d, k) => { if (d > bestD + 1e-12) { bestD = d; best = k; } });
    if (bestD <= 0) break;
    chosen.push(cand[best]!);
    cand.forEach((c, k) => { dist[k] = Math.min(dist[k]!, d2(c, cand[best]!)); });
  }
  return chosen;
}

/** Nearest-neighbour chain as stated: from the first, always the nearest remaining (first of equals). */
function chainReference(pts: Point2[]): Point2[] {
  if (pts.length < 3) return pts.slice();
  const left = pts.slice(1);
  const out = [pts[0]!];
  while (left.length > 0) {
    const last = out[out.length - 1]!;
    let best = 0;
    left.forEach((p, k) => { if ((p[0] - last[0]) ** 2 + (p[1] - last[1]) ** 2 < (left[best]![0] - last[0]) ** 2 + (left[best]![1] - last[1]) ** 2) best = k; });
    out.push(left.splice(best, 1)[0]!);
  }
  return out;
}

describe('spreadOverRectangle', () => {
  const cases: [number, number, number, (u: number, v: number) => boolean][] = [
    [9, 58, 38, () => false],
    [10, 18, 18, () => false],
    [25, 140.5, 7.25, () => false],
    [12, 40, 30, (u, v) => (u - 10) ** 2 + v ** 2 < 15 ** 2],
    [20, 33.3, 21.7, (u, v) => Math.abs(u + v) < 4 || u > 25],
    [5, 10, 10, () => true],
  ];
  it('picks the points of the plain farthest-point selection, in its order', () => {
    for (const [n, hu, hv, blocked] of cases) {
      const got = spreadOverRectangle(n, hu, hv, blocked);
      expect(got).toEqual(spreadReference(n, hu, hv, blocked));
      for (const [u, v] of got) expect(blocked(u, v)).toBe(false);
    }
    expect(spreadOverRectangle(9, 58, 38, () => false)).toHaveLength(9);
  });
});

describe('nearestNeighbourOrder', () => {
  it('orders as the plain nearest-neighbour chain, ties to the earlier point', () => {
    const grid: Point2[] = [];
    for (let i = 0; i < 60; i++) grid.push([((i * 37) % 11) * 3.5 - 7, ((i * 53) % 13) * 2.25 + (i % 3) * 0.1]);
    expect(nearestNeighbourOrder(grid, (p) => p)).toEqual(chainReference(grid));
    const ties: Point2[] = [[0, 0], [1, 0], [-1, 0], [0, 1], [0, -1], [2, 0]];
    expect(nearestNeighbourOrder(ties, (p) => p)).toEqual(chainReference(ties));
  });
});

describe('footprintsOnPlane', () => {
  it('remembers the footprints of a plane per ball radius in the sources of one part', () => {
    const face = demoBracket.features[0] as Extract<Feature, { type: 'plane' }>;
    const sources = footprintSources(demoBracket);
    const first = footprintsOnPlane(face, sources, 1.95);
    expect(first.length).toBeGreaterThan(0);
    expect(footprintsOnPlane(face, sources, 1.95)).toBe(first);
    const fresh = footprintsOnPlane(face, footprintSources(demoBracket), 1.95);
    expect(fresh).not.toBe(first);
    expect(fresh.map((fp) => fp.height)).toEqual(first.map((fp) => fp.height));
    // a larger ball keeps farther out: a point just outside the small keep-out is inside the large one
    const other = footprintsOnPlane(face, sources, 5);
    expect(other).not.toBe(first);
    const probe = (prints: typeof first, u: number, v: number) => prints.some((fp) => fp.contains(u, v));
    const bore = demoBracket.features[1] as Extract<Feature, { type: 'bore' }>;
    const edge = bore.center[0] + bore.diameter / 2 + 1.95 + 1 + 0.5;
    expect(probe(first, edge, bore.center[1])).toBe(false);
    expect(probe(other, edge, bore.center[1])).toBe(true);
  });
});
