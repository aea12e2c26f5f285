import { describe, expect, it } from 'vitest';
import { angleBetweenDeg, diffPlans } from '@/lib/program/diff';
import type { Plan, TouchPoint } from '@/lib/program/plan-schema';

type V = [number, number, number];
const F = '00000000-0000-5000-8000-0000000000f1';
const u = (n: number): string => `00000000-0000-5000-8000-${String(n).padStart(12, '0')}`;

function tp(n: number, seq: number, surface: V, normal: V = [0, 0, 1], axes: Record<string, number> = { X: 0, Y: 0, Z: 0, A: 0, C: 0 }, approach = 3): TouchPoint {
  const target: V = [surface[0] + normal[0], surface[1] + normal[1], surface[2] + normal[2]];
  return {
    uuid: u(n), featureUuid: F, seq, surface, normal,
    direction: [-normal[0], -normal[1], -normal[2]], target,
    start: [target[0] + approach * normal[0], target[1] + approach * normal[1], target[2] + approach * normal[2]],
    end: target, toolAxis: [0, 0, 1], axes,
  };
}
const plan = (...touchPoints: TouchPoint[]): Plan => ({ touchPoints, warnings: [] });

describe('diffPlans', () => {
  it('finds nothing between a plan and itself', () => {
    const p = plan(tp(1, 0, [0, 0, 0]), tp(2, 1, [10, 0, 0]));
    const d = diffPlans({ plan: p }, { plan: p });
    expect(d.summary).toMatchObject({ total: 2, unchanged: 2, changed: 0, added: 0, removed: 0 });
    expect(d.rows.every((r) => r.changes.length === 0)).toBe(true);
  });

  it('reports added and removed points keyed by UUID', () => {
    const d = diffPlans({ plan: plan(tp(1, 0, [0, 0, 0]), tp(2, 1, [10, 0, 0])) }, { plan: plan(tp(1, 0, [0, 0, 0]), tp(3, 1, [20, 0, 0])) });
    expect(d.rows.map((r) => [r.uuid, r.status])).toEqual([[u(1), 'unchanged'], [u(3), 'added'], [u(2), 'removed']]);
    expect(d.summary).toMatchObject({ total: 3, added: 1, removed: 1, unchanged: 1 });
  });

  it('measures a move (3-4-5 triangle) and a direction change (45°)', () => {
    const s = Math.SQRT1_2;
    const d = diffPlans(
      { plan: plan(tp(1, 0, [0, 0, 0]), tp(2, 1, [5, 5, 0])) },
      { plan: plan(tp(1, 0, [3, 4, 0]), tp(2, 1, [5, 5, 0], [s, 0, s])) },
    );
    const [moved, turned] = d.rows;
    expect(moved?.changes).toEqual([{ kind: 'moved', distanceMm: 5, from: [0, 0, 0], to: [3, 4, 0] }]);
    expect(turned?.changes).toHaveLength(1); // the start moves with the direction: not also an approach change
    expect(turned?.changes[0]).toMatchObject({ kind: 'direction' });
    const c = turned?.changes[0];
    expect(c?.kind === 'direction' ? c.angleDeg : NaN).toBeCloseTo(45, 12);
    expect(d.summary.byKind).toEqual({ moved: 1, direction: 1, approach: 0, feeds: 0, rotary: 0, order: 0 });
  });

  it('reports an approach change when only the start point moves', () => {
    const d = diffPlans({ plan: plan(tp(1, 0, [0, 0, 0])) }, { plan: plan(tp(1, 0, [0, 0, 0], [0, 0, 1], undefined, 5)) });
    expect(d.rows[0]?.changes).toEqual([{ kind: 'approach', distanceMm: 2, from: [0, 0, 4], to: [0, 0, 6] }]);
  });

  it('reports rotary positions and feeds', () => {
    const d = diffPlans(
      { plan: plan(tp(1, 0, [0, 0, 0], [0, 0, 1], { X: 0, Y: 0, Z: 0, A: 0, C: 0 })), feeds: { [u(1)]: [500, 50] } },
      { plan: plan(tp(1, 0, [0, 0, 0], [0, 0, 1], { X: 0, Y: 0, Z: 0, A: 0, C: 180 })), feeds: { [u(1)]: [500, 30] } },
    );
    expect(d.rows[0]?.changes).toEqual([
      { kind: 'feeds', from: [500, 50], to: [500, 30] },
      { kind: 'rotary', axes: [{ word: 'C', from: 0, to: 180 }] },
    ]);
    expect(d.summary).toMatchObject({ changed: 1, byKind: { feeds: 1, rotary: 1 } });
  });

  it('counts a swap as a reorder, but not a shift caused by an inserted point', () => {
    const a = plan(tp(1, 0, [0, 0, 0]), tp(2, 1, [1, 0, 0]), tp(3, 2, [2, 0, 0]));
    const inserted = plan(tp(9, 0, [9, 0, 0]), tp(1, 1, [0, 0, 0]), tp(2, 2, [1, 0, 0]), tp(3, 3, [2, 0, 0]));
    expect(diffPlans({ plan: a }, { plan: inserted }).summary.byKind.order).toBe(0);
    const swapped = plan(tp(2, 0, [1, 0, 0]), tp(1, 1, [0, 0, 0]), tp(3, 2, [2, 0, 0]));
    const d = diffPlans({ plan: a }, { plan: swapped });
    expect(d.summary.byKind.order).toBe(2);
    expect(d.rows.find((r) => r.uuid === u(3))?.status).toBe('unchanged');
  });

  it('ignores differences below the tolerance and honours a custom one', () => {
    const d = diffPlans({ plan: plan(tp(1, 0, [0, 0, 0])) }, { plan: plan(tp(1, 0, [0.00001, 0, 0])) });
    expect(d.summary.unchanged).toBe(1);
    const strict = diffPlans({ plan: plan(tp(1, 0, [0, 0, 0])) }, { plan: plan(tp(1, 0, [0.00001, 0, 0])) }, { distanceMm: 1e-6 });
    expect(strict.summary.byKind.moved).toBe(1);
  });
});

describe('angleBetweenDeg', () => {
  it('is accurate for tiny and straight angles', () => {
    // 1 µrad: an acos-based formula loses this to rounding.
    expect(angleBetweenDeg([1, 0, 0], [1, 1e-6, 0])).toBeCloseTo((1e-6 * 180) / Math.PI, 15);
    expect(angleBetweenDeg([0, 0, 1], [0, 0, -1])).toBe(180);
  });
});
