/**
 * Every case of shared/reference/kinematics-cases.json.
 * Source: independently computed for this project from the product-of-exponentials chain
 * (Murray, Li & Sastry 1994, ch. 2–3), each solution checked by forward kinematics to
 * 1e-12 mm; the table-table cases agree with LinuxCNC's trtfuncs.c formulas
 * (REFERENCES.md §2). Singular poses are marked in the file.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { machineSchema, type AxisValues, type Vec3 } from '@/lib/kinematics/schema';
import { forwardKinematics } from '@/lib/kinematics/forward';
import { inverseKinematics } from '@/lib/kinematics/inverse';

interface RefCase { tip: Vec3; axis: Vec3; solutions: AxisValues[]; singular?: boolean }
interface RefMachine { name: string; cases: RefCase[] }
const file = JSON.parse(readFileSync(new URL('../../../shared/reference/kinematics-cases.json', import.meta.url), 'utf8')) as { machines: RefMachine[] };

const close = (a: AxisValues, b: AxisValues, tol: number) => Object.keys(b).every((k) => Math.abs((a[k] ?? NaN) - (b[k] ?? NaN)) <= tol);

describe('kinematics-cases.json (source: REFERENCES.md §2, independently computed)', () => {
  it('holds six layouts of eight poses', () => {
    expect(file.machines).toHaveLength(6);
    for (const m of file.machines) expect(m.cases).toHaveLength(8);
  });
  for (const raw of file.machines) {
    const machine = machineSchema.parse(raw);
    describe(raw.name, () => {
      raw.cases.forEach((c, i) => {
        it(`pose ${i}${c.singular ? ' (singular)' : ''}: both reference solutions`, () => {
          for (const ref of c.solutions) {
            // forward kinematics of the reference solution reproduces the pose
            const pose = forwardKinematics(machine, ref);
            for (let k = 0; k < 3; k++) {
              expect(pose.tip[k]).toBeCloseTo(c.tip[k]!, 9);
              expect(pose.axis[k]).toBeCloseTo(c.axis[k]!, 12);
            }
          }
          if (c.singular) {
            // one angle is free: it keeps `previous`, so each reference solution comes back from its own previous
            for (const ref of c.solutions) {
              const prev = Object.fromEntries(machine.rotaries.map((r) => [r.name, ref[r.name]!]));
              const res = inverseKinematics(machine, c.tip, c.axis, prev);
              expect(res.singular).toBe(true);
              expect(close(res.solutions[res.chosen]!, ref, 1e-9)).toBe(true);
            }
          } else {
            const res = inverseKinematics(machine, c.tip, c.axis);
            expect(res.singular).toBe(false);
            expect(res.solutions).toHaveLength(2);
            for (const ref of c.solutions) {
              expect(res.solutions.some((s) => close(s, ref, 1e-9))).toBe(true);
            }
          }
        });
      });
    });
  }
});
