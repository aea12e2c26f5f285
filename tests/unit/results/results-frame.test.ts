import { describe, expect, it } from 'vitest';
import type { AxisValues, Vec3 } from '@/lib/kinematics/schema';
import type { Plan } from '@/lib/program/plan-schema';
import { toPartFrame } from '@/lib/program/results-frame';
import { parseResults } from '@/lib/program/results-parse';

const U1 = '1b4e28ba-2fa1-51d2-883f-0016d3cca427';
const U2 = '2c5f39cb-3ab2-52e3-994a-1127e4ddb538';

function tp(uuid: string, axes: AxisValues): Plan['touchPoints'][number] {
  const o: Vec3 = [0, 0, 0];
  return { uuid, featureUuid: U1, seq: 0, surface: o, normal: [0, 0, 1], direction: [0, 0, -1], target: o, start: o, end: o, toolAxis: [0, 0, 1], axes };
}

// A C table on the Z axis through M's origin, part origin at (10, 0, 0) in M (invented).
// Written out by hand for the test: tip_P = Rz(-C)·tip_M − origin.
function cTableTip(axes: AxisValues): Vec3 {
  const c = ((axes.C ?? 0) * Math.PI) / 180;
  const [x, y, z] = [axes.X ?? 0, axes.Y ?? 0, axes.Z ?? 0];
  return [Math.cos(c) * x + Math.sin(c) * y - 10, -Math.sin(c) * x + Math.cos(c) * y, z];
}

describe('toPartFrame', () => {
  const plan: Plan = { touchPoints: [tp(U1, { X: 0, Y: 0, Z: 0, C: 0 }), tp(U2, { X: 0, Y: 0, Z: 0, C: 90 })], warnings: [] };
  const touchPoints = plan.touchPoints.map((t) => ({ uuid: t.uuid }));

  it('brings TRIP records to the part frame through the given forward kinematics', () => {
    const parsed = parseResults(`TRIP ${U1} X15 Y0 Z-2 C0\nTRIP ${U2} X0 Y15 Z-2 C90`, { touchPoints, rotaries: ['C'] });
    const { measurements, warnings } = toPartFrame(parsed.records, plan, cTableTip);
    expect(warnings).toEqual([]);
    expect(measurements[0]?.point).toEqual([5, 0, -2]);
    // With C at 90°, M's (0, 15) is the table's (15, 0) → part (5, 0).
    const p = measurements[1]?.point ?? [NaN, NaN, NaN];
    expect(p[0]).toBeCloseTo(5, 12);
    expect(p[1]).toBeCloseTo(0, 12);
    expect(measurements[1]?.axes).toEqual({ X: 0, Y: 15, Z: -2, C: 90 });
  });

  it('warns with the line when a recorded rotary differs from the plan, treating 360° as the same', () => {
    const parsed = parseResults(`TRIP ${U1} X15 Y0 Z-2 C360\nTRIP ${U2} X0 Y15 Z-2 C91`, { touchPoints, rotaries: ['C'] });
    const { warnings } = toPartFrame(parsed.records, plan, cTableTip);
    expect(warnings).toEqual([{ line: 2, uuid: U2, message: 'line 2: C was 91° at the trip, the plan has 90°' }]);
  });

  it('passes CSV points through unchanged', () => {
    const parsed = parseResults(`${U1},1,2,3\n${U2},4,5,6`, { touchPoints, rotaries: ['C'] });
    const { measurements } = toPartFrame(parsed.records, plan, () => { throw new Error('fk must not be called for CSV'); });
    expect(measurements.map((m) => m.point)).toEqual([[1, 2, 3], [4, 5, 6]]);
  });
});
