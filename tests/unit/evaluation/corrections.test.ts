/**
 * Corrections: dead band, cap (stop and ask a person), wear sign for bores and bosses,
 * the dialect's line formats, and the measurement each proposal came from.
 */
import { describe, expect, it } from 'vitest';
import { bore, boss, exact, part, plane, probe, ringPoints, gridPoints, run, tol } from './helpers';

const r = 1.5;
const face = plane('A', [0, 0, 0], [0, 0, 1], [100, 100]);
const b = bore('B', [-20, 0, 0], 10);
const p = boss('P', [20, 0, 0], 16);
const tB = tol('bd', { featureUuid: b.uuid, characteristic: 'diameter', upper: 0.02, lower: 0 });
const tP = tol('pd', { featureUuid: p.uuid, characteristic: 'diameter', upper: 0, lower: -0.02 });
const pt = part([face, b, p], [tB, tP], { A: face.uuid, B: b.uuid });
const plan = {
  touchPoints: [
    ...gridPoints(face, [[-40, -40, 0], [40, -40, 0], [40, 40, 0], [-40, 40, 0], [0, 30, 0]], [0, 0, 1], r),
    ...ringPoints(b, true, 7, [3, 8], r, 10),
    ...ringPoints(p, false, 7, [2, 6], r, 40),
  ],
  warnings: [],
};
const settings = (dialect: string, wearCap = 0.1) => ({
  dialect,
  workOffset: { register: 2, current: [10, 20, -300] as [number, number, number], deadBand: 0.005, cap: 0.5 },
  wear: [{ featureUuid: b.uuid, tool: 7, current: 0.002, cap: wearCap, deadBand: 0.001 }, { featureUuid: p.uuid, tool: 8, current: -0.001, cap: wearCap, deadBand: 0.001 }],
});

describe('corrections', () => {
  it('bore 6 µm over the middle: radius wear +3 µm; boss 8 µm over: −4 µm (ngc writes the tool table with L1)', () => {
    const { out } = run(pt, probe(3), plan, { features: { [b.uuid]: { sizeError: 0.016 }, [p.uuid]: { sizeError: -0.002 } } }, { ...exact, corrections: settings('ngc') });
    const [, wb, wp] = out.corrections!.proposals;
    expect(wb?.kind === 'radius-wear' && wb.change).toBeCloseTo(0.003, 9);
    expect(wp?.kind === 'radius-wear' && wp.change).toBeCloseTo(-0.004, 9);
    expect(wb?.line).toBe('G10 L1 P7 R0.0050');
    expect(wp?.line).toBe('G10 L1 P8 R-0.0050');
    expect(wb?.source.toleranceUuid).toBe(tB.uuid);
    expect(wb?.source.touchPointUuids).toHaveLength(14);
  });
  it('iso-skip writes the radius wear register with G10 L13 and work offsets with G10 L2', () => {
    const { out } = run(pt, probe(3), plan, { workOffsetError: [0.1, 0, 0], features: { [b.uuid]: { sizeError: 0.016 }, [p.uuid]: { sizeError: -0.01 } } }, { ...exact, corrections: settings('iso-skip') });
    expect(out.corrections!.lines).toEqual(['G10 L2 P2 X10.1000 Y20.0000 Z-300.0000', 'G10 L13 P7 R0.0050']);
    expect(out.corrections!.proposals[0]!.instruction).toMatch(/G55/);
  });
  it('inside the dead band: no change and no line', () => {
    const { out } = run(pt, probe(3), plan, { workOffsetError: [0.003, -0.004, 0.001], features: { [b.uuid]: { sizeError: 0.0115 }, [p.uuid]: { sizeError: -0.0085 } } }, { ...exact, corrections: settings('ngc') });
    const [wo, wb, wp] = out.corrections!.proposals;
    expect(wo?.state).toBe('within-dead-band');
    expect(wb?.state).toBe('within-dead-band');
    expect(wp?.state).toBe('within-dead-band');
    expect(out.corrections!.lines).toEqual([]);
  });
  it('beyond the cap: stop and ask a person, nothing written', () => {
    const { out } = run(pt, probe(3), plan, { workOffsetError: [0.8, 0, 0], features: { [b.uuid]: { sizeError: 0.05 }, [p.uuid]: { sizeError: -0.05 } } }, { ...exact, corrections: settings('ngc', 0.01) });
    const [wo, wb, wp] = out.corrections!.proposals;
    expect(wo?.state).toBe('stop-ask-a-person');
    expect(wo?.instruction).toMatch(/^STOP/);
    expect(wb?.state).toBe('stop-ask-a-person');
    expect(wp?.state).toBe('stop-ask-a-person');
    expect(out.corrections!.lines).toEqual([]);
  });
  it('an unknown dialect says which are known', () => {
    const { out } = run(pt, probe(3), plan, {}, { ...exact, corrections: settings('nope') });
    expect(out.corrections!.note).toMatch(/ngc, iso-skip/);
  });
});
