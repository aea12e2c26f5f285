/**
 * The planner's fast paths through the kinematics against the plain definitions:
 * `partToMachine` (written out as scalars) against the composition of the vector
 * helpers it replaced, and the affine `linearAxesMap` against `linearAxesFor`.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { AxisValues, Vec3 } from '@/lib/kinematics/schema';
import { partToMachine, rotationsAt } from '@/lib/kinematics/forward';
import { linearAxesFor, linearAxesMap, linearAxisOf } from '@/lib/kinematics/inverse';
import { prepareMachine, type PreparedMachine } from '@/lib/kinematics/machine';
import { machinePreset, presetIds } from '@/lib/kinematics/presets';
import { add, sub } from '@/lib/geometry/vec3';
import { applyMat } from '@/lib/geometry/rotation';

/** The definition: S·p + origin, then each table from the part outward, R·(q − c) + c (R·q for a direction). */
function reference(pm: PreparedMachine, axes: AxisValues, p: Vec3, isDirection: boolean): Vec3 {
  const R = rotationsAt(pm.tables, axes);
  let q = applyMat(pm.setupR, p);
  if (!isDirection) q = add(q, pm.setupOrigin);
  for (let i = pm.tables.length - 1; i >= 0; i--) {
    const t = pm.tables[i]!;
    q = isDirection ? applyMat(R[i]!, q) : add(applyMat(R[i]!, sub(q, t.p)), t.p);
  }
  return q;
}

// Generic values (integers over primes): fc.double favours 0, ±1 and the bounds, where
// sines vanish and the order of a sum cannot show.
const coord = fc.integer({ min: -2_000_000, max: 2_000_000 }).map((i) => i / 997);
const pointArb = fc.tuple(coord, coord, coord) as fc.Arbitrary<Vec3>;
const angle = fc.integer({ min: -720_000, max: 720_000 }).map((i) => i / 991);

describe('partToMachine', () => {
  it('gives exactly the numbers of the vector composition, points and directions, on every preset', () => {
    for (const id of presetIds) {
      const pm = prepareMachine(machinePreset(id));
      fc.assert(
        fc.property(pointArb, angle, angle, fc.boolean(), (p, a1, a2, dir) => {
          const axes: AxisValues = {};
          pm.rotaries.forEach((r, i) => { axes[r.name] = i === 0 ? a1 : a2; });
          expect(partToMachine(pm, axes, p, dir)).toEqual(reference(pm, axes, p, dir));
        }),
        { seed: 7, numRuns: 300 },
      );
    }
  });
});

describe('linearAxesMap', () => {
  it('agrees with linearAxesFor to 1e-9 mm over ±2 m on every preset', () => {
    let worst = 0;
    for (const id of presetIds) {
      const pm = prepareMachine(machinePreset(id));
      fc.assert(
        fc.property(pointArb, angle, angle, (p, a1, a2) => {
          const rot: AxisValues = {};
          pm.rotaries.forEach((r, i) => { rot[r.name] = i === 0 ? a1 : a2; });
          const m = linearAxesMap(pm, rot);
          const direct = linearAxesFor(pm, p, rot);
          (['X', 'Y', 'Z'] as const).forEach((w, k) => {
            worst = Math.max(worst, Math.abs(linearAxisOf(m, p, k as 0 | 1 | 2) - direct[w]));
          });
        }),
        { seed: 11, numRuns: 300 },
      );
    }
    expect(worst).toBeLessThan(1e-9);
  });
});
