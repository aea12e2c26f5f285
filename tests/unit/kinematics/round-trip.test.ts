/**
 * Property tests: fk(ik(x)) = x over thousands of random poses on random machines
 * (seeded fast-check), including non-orthogonal (nutating) axes and limited rotaries.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { AxisValues, Machine, Rotary, Vec3 } from '@/lib/kinematics/schema';
import { forwardKinematics } from '@/lib/kinematics/forward';
import { inverseKinematics, linearAxesFor } from '@/lib/kinematics/inverse';
import { GeometryError } from '@/lib/geometry/vec3';
import { machinePreset, presetIds } from '@/lib/kinematics/presets';
import { machineSchema } from '@/lib/kinematics/schema';

// Directions from small integers: oblique (nutating) axes without shrinking toward
// near-singular noise such as 1e-10 components, whose free angle is ill-conditioned.
const unit = fc.tuple(fc.integer({ min: -5, max: 5 }), fc.integer({ min: -5, max: 5 }), fc.integer({ min: -5, max: 5 }))
  .filter((v) => Math.hypot(...v) > 0) as fc.Arbitrary<Vec3>;
const point = fc.tuple(fc.double({ min: -400, max: 400, noNaN: true }), fc.double({ min: -400, max: 400, noNaN: true }), fc.double({ min: -400, max: 400, noNaN: true })) as fc.Arbitrary<Vec3>;
const layouts = [['table', 'table'], ['head', 'head'], ['table', 'head'], ['table'], ['head']] as const;

const machineArb: fc.Arbitrary<Machine> = fc
  .record({ layout: fc.constantFrom(...layouts), d1: unit, d2: unit, p1: point, p2: point, origin: point, x: unit, z: unit, names: fc.constantFrom(['A', 'C'], ['B', 'C'], ['C', 'A'], ['C', 'B']) })
  .filter((r) => Math.abs(r.d1[0] * r.d2[0] + r.d1[1] * r.d2[1] + r.d1[2] * r.d2[2]) / (Math.hypot(...r.d1) * Math.hypot(...r.d2)) < 0.95)
  .filter((r) => {
    const c = [r.x[1] * r.z[2] - r.x[2] * r.z[1], r.x[2] * r.z[0] - r.x[0] * r.z[2], r.x[0] * r.z[1] - r.x[1] * r.z[0]];
    return Math.hypot(...c) > 0.2 * Math.hypot(...r.x) * Math.hypot(...r.z);
  })
  .map((r) => {
    const rot = (i: number, carrier: 'table' | 'head'): Rotary => ({
      name: r.names[i] as Rotary['name'], carrier, direction: i === 0 ? r.d1 : r.d2, point: i === 0 ? r.p1 : r.p2, min: null, max: null,
    });
    return {
      name: 'random', rotaries: r.layout.map((c, i) => rot(i, c)),
      linear: { X: [-1e5, 1e5], Y: [-1e5, 1e5], Z: [-1e5, 1e5] }, setup: { origin: r.origin, xAxis: r.x, zAxis: r.z },
    };
  });

const anglesArb = fc.tuple(fc.double({ min: -179, max: 179, noNaN: true }), fc.double({ min: -179, max: 179, noNaN: true }));

describe('fk(ik(x)) = x on random machines (seeded)', () => {
  it('reproduces tip to 1e-9 mm and axis to 1e-12 for every solution, and finds the pose it came from', () => {
    let poses = 0;
    let maxAxisErr = 0;
    let maxTipErr = 0;
    fc.assert(
      fc.property(machineArb, point, anglesArb, (machine, lin, [a1, a2]) => {
        const axes: AxisValues = { X: lin[0], Y: lin[1], Z: lin[2] };
        machine.rotaries.forEach((r, i) => { axes[r.name] = i === 0 ? a1 : a2; });
        const pose = forwardKinematics(machine, axes);
        const res = inverseKinematics(machine, pose.tip, pose.axis, axes);
        poses++;
        expect(res.solutions.length).toBeGreaterThan(0);
        expect(res.solutions.length).toBeLessThanOrEqual(2);
        for (const s of res.solutions) {
          const back = forwardKinematics(machine, s);
          for (let k = 0; k < 3; k++) {
            expect(Math.abs(back.tip[k]! - pose.tip[k]!)).toBeLessThan(1e-9);
            maxAxisErr = Math.max(maxAxisErr, Math.abs(back.axis[k]! - pose.axis[k]!)); maxTipErr = Math.max(maxTipErr, Math.abs(back.tip[k]! - pose.tip[k]!));
          }
        }
        // previous = the originating pose: the chosen solution is that pose (zero travel).
        // 1e-4°: where the two cones of subproblem 2 touch (a double root, which small
        // integer axes hit exactly), the angles are conditioned like √ε ≈ 1e-8 rad,
        // although the pose itself is reproduced to the tolerances above.
        const chosen = res.solutions[res.chosen]!;
        for (const r of machine.rotaries) expect(Math.abs(chosen[r.name]! - axes[r.name]!)).toBeLessThan(1e-4);
      }),
      { seed: 20260, numRuns: 4000 },
    );
    expect(poses).toBe(4000);
    console.log(`round trip over ${poses} poses: max tip error ${maxTipErr.toExponential(2)} mm, max axis error ${maxAxisErr.toExponential(2)}`);
    expect(maxAxisErr).toBeLessThan(1e-12);
  });
});

describe('linearAxesFor', () => {
  it('places the tip at a part-frame point for given rotary angles (fk brings it back)', () => {
    fc.assert(
      fc.property(machineArb, point, anglesArb, (machine, tip, [a1, a2]) => {
        const rot: AxisValues = {};
        machine.rotaries.forEach((r, i) => { rot[r.name] = i === 0 ? a1 : a2; });
        const lin = linearAxesFor(machine, tip, rot);
        const back = forwardKinematics(machine, { ...lin, ...rot });
        for (let k = 0; k < 3; k++) expect(Math.abs(back.tip[k]! - tip[k]!)).toBeLessThan(1e-9);
      }),
      { seed: 7, numRuns: 1000 },
    );
  });
});

describe('errors', () => {
  const ac: Machine = {
    name: 'AC', linear: { X: [-500, 500], Y: [-500, 500], Z: [-500, 0] }, setup: { origin: [0, 0, -200], xAxis: [1, 0, 0], zAxis: [0, 0, 1] },
    rotaries: [
      { name: 'A', carrier: 'table', direction: [-1, 0, 0], point: [0, 0, -200], min: -30, max: 110 },
      { name: 'C', carrier: 'table', direction: [0, 0, -1], point: [0, 0, 0], min: null, max: null },
    ],
  };
  const expectCode = (fn: () => unknown, code: string, text?: RegExp) => {
    try { fn(); } catch (e) {
      expect(e).toBeInstanceOf(GeometryError);
      expect((e as GeometryError).code).toBe(code);
      if (text) expect((e as GeometryError).message).toMatch(text);
      return;
    }
    throw new Error(`expected ${code}`);
  };
  it('3-axis: only +Z is reachable', () => {
    const m: Machine = { ...ac, rotaries: [] };
    expect(inverseKinematics(m, [1, 2, 3], [0, 0, 5]).solutions).toEqual([{ X: 1, Y: 2, Z: -197 }]);
    expectCode(() => inverseKinematics(m, [0, 0, 0], [0, 1, 0]), 'UNREACHABLE_ORIENTATION');
  });
  it('single C table cannot tilt the tool', () => {
    const m: Machine = { ...ac, rotaries: [ac.rotaries[1]!] };
    expectCode(() => inverseKinematics(m, [0, 0, 0], [1, 0, 1]), 'UNREACHABLE_ORIENTATION');
  });
  it('45° nutating table cannot reach beyond 90° of tilt', () => {
    const s = Math.SQRT1_2;
    const m: Machine = { ...ac, rotaries: [
      { name: 'B', carrier: 'table', direction: [0, s, s], point: [0, 0, -200], min: null, max: null },
      { name: 'C', carrier: 'table', direction: [0, 0, 1], point: [0, 0, 0], min: null, max: null },
    ] };
    expectCode(() => inverseKinematics(m, [0, 0, 0], [0, 0, -1]), 'UNREACHABLE_ORIENTATION');
    // exactly 90° of tilt is the edge: one solution (tangent cones)
    expect(inverseKinematics(m, [0, 0, 0], [1, 0, 0]).solutions.length).toBeGreaterThanOrEqual(1);
  });
  it('A limited to -30..110: the negative branch is dropped, below -30 is OUT_OF_LIMITS naming A', () => {
    const res = inverseKinematics(ac, [0, 0, 0], [1, 0, 0]);
    expect(res.solutions).toHaveLength(1);
    expect(res.solutions[0]!.A).toBeCloseTo(90, 9);
    // axis (0, -1, -1)/√2 ·… needs |A| = 135 on both branches → out of limits
    expectCode(() => inverseKinematics(ac, [0, 0, 0], [0, -1, -1]), 'OUT_OF_LIMITS', /A would be -?135\.000°, outside its travel -30 to 110°/);
  });
  it('linear travel: OUT_OF_LIMITS names the linear axis', () => {
    expectCode(() => inverseKinematics(ac, [0, 0, 900], [0, 0, 1]), 'OUT_OF_LIMITS', /Z would be/);
  });
  it('a limited range wider than 360° yields each equivalent angle inside it', () => {
    const m: Machine = { ...ac, rotaries: [ac.rotaries[0]!, { ...ac.rotaries[1]!, min: -400, max: 400 }] };
    const res = inverseKinematics(m, [10, 0, 0], [1, 0, 0]);
    const cs = res.solutions.map((s) => Math.round(s.C!)).sort((a, b) => a - b);
    expect(cs).toEqual([-270, 90]);
    const wide = inverseKinematics(m, [10, 0, 0], [0, 0, 1], { C: 0 });
    expect(wide.singular).toBe(true);
    expect(wide.solutions.map((s) => s.C)).toEqual([0]);
  });
  it('chosen: least largest move from previous, then least sum', () => {
    const res = inverseKinematics({ ...ac, rotaries: [{ ...ac.rotaries[0]!, min: null, max: null }, ac.rotaries[1]!] }, [0, 0, 0], [1, 0, 0], { A: -80, C: -80 });
    expect(res.solutions[res.chosen]!.A).toBeCloseTo(-90, 9);
  });
});

describe('presets', () => {
  it('each preset validates and solves a 30° tilted axis both ways round', () => {
    for (const id of presetIds) {
      const m = machineSchema.parse(machinePreset(id));
      const axis: Vec3 = m.rotaries.length === 0 ? [0, 0, 1] : [0.5, 0, Math.sqrt(3) / 2];
      const res = inverseKinematics(m, [5, 10, 2], axis);
      const back = forwardKinematics(m, res.solutions[res.chosen]!);
      expect(Math.abs(back.tip[0] - 5) + Math.abs(back.tip[1] - 10) + Math.abs(back.tip[2] - 2)).toBeLessThan(1e-9);
      expect(Math.abs(back.axis[0] - axis[0]) + Math.abs(back.axis[2] - axis[2])).toBeLessThan(1e-12);
    }
  });
});
