import { describe, expect, it } from 'vitest';
import { machineRecordSchema, toEngineMachine, describeRotary, ikRequestSchema } from '@/lib/validation/machines';
import { probeRecordSchema, calibrationStatus, calibrationSchema } from '@/lib/validation/probes';
import { featureInputSchema, toleranceInputSchema, partHeaderSchema, fitCodePattern } from '@/lib/validation/parts';
import { saveRevisionSchema, createProgramSchema } from '@/lib/validation/programs';
import { bearerToken, createTokenSchema } from '@/lib/validation/tokens';

// Invented demo machine: a B head over a C table.
const headTable = {
  name: 'Demo B/C',
  post: 'ngc',
  headPivotMm: 150,
  rotaries: [
    { name: 'C', carrier: 'table', direction: [0, 0, 1], point: [0, 0, 0], min: null, max: null },
    { name: 'B', carrier: 'head', direction: [0, 1, 0], point: [0, 0, 0], min: -110, max: 110 },
  ],
  linear: { X: [-400, 400], Y: [-300, 300], Z: [-500, 0] },
  setup: { origin: [0, 0, 100], xAxis: [1, 0, 0], zAxis: [0, 0, 1] },
};

const fieldOf = (r: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }) => r.error?.issues.map((i) => i.path.join('.'));

describe('machines', () => {
  it('accepts a whole record and keeps the engine refinements', () => {
    expect(machineRecordSchema.safeParse(headTable).success).toBe(true);
    const swapped = { ...headTable, rotaries: [headTable.rotaries[1], headTable.rotaries[0]] };
    expect(fieldOf(machineRecordSchema.safeParse(swapped))).toEqual(['rotaries']);
    expect(fieldOf(machineRecordSchema.safeParse({ ...headTable, post: 'NGC!' }))).toEqual(['post']);
    expect(fieldOf(machineRecordSchema.safeParse({ ...headTable, headPivotMm: -1 }))).toEqual(['headPivotMm']);
  });

  it('lifts head axis points by pivot plus probe length, leaves table axes alone', () => {
    const rec = machineRecordSchema.parse(headTable);
    const m = toEngineMachine(rec, 90);
    expect(m.rotaries[0]?.point).toEqual([0, 0, 0]);
    expect(m.rotaries[1]?.point).toEqual([0, 0, 240]);
    expect(rec.rotaries[1]?.point).toEqual([0, 0, 0]);
  });

  it('describes a rotary in words, with a negated sense', () => {
    expect(describeRotary({ name: 'C', carrier: 'table', direction: [0, 0, -2] })).toBe('C on the table, about −Z');
    expect(describeRotary({ name: 'B', carrier: 'head', direction: [0, 1, 1] })).toBe('B on the head, about (0.000, 0.707, 0.707)');
  });

  it('refuses a zero tool axis in a pose request', () => {
    expect(fieldOf(ikRequestSchema.safeParse({ tip: [0, 0, 0], axis: [0, 0, 0] }))).toEqual(['axis']);
  });
});

describe('probes', () => {
  const probe = { name: 'Demo probe 1', stylusDiameter: 4, lengthMm: 90, repeatabilityMm: 0.001, approach: 5, overtravel: 3, clearance: 20, fastFeed: 500, measureFeed: 50 };
  it('accepts a probe and names a field that is wrong', () => {
    expect(probeRecordSchema.safeParse(probe).success).toBe(true);
    expect(fieldOf(probeRecordSchema.safeParse({ ...probe, stylusDiameter: 0 }))).toEqual(['stylusDiameter']);
    expect(fieldOf(probeRecordSchema.safeParse({ ...probe, measureFeed: 800 }))).toEqual(['measureFeed']);
  });

  it('refuses a calibration without certificate or with a bad date', () => {
    const cal = { calibratedOn: '2026-11-30', artifact: 'ring 25', certificate: 'C-1', measuredEffectiveDiameter: 3.987, feedMmPerMin: 50 };
    expect(calibrationSchema.safeParse(cal).success).toBe(true);
    expect(fieldOf(calibrationSchema.safeParse({ ...cal, certificate: ' ', calibratedOn: '30/11/2026' }))?.sort()).toEqual(['calibratedOn', 'certificate']);
  });

  it('says stale when never calibrated, too old, or after a logged event', () => {
    expect(calibrationStatus(null, [], 7, '2026-12-01')).toMatchObject({ state: 'stale', reason: 'never' });
    expect(calibrationStatus('2026-11-24', [], 7, '2026-12-01')).toEqual({ state: 'current', ageDays: 7 });
    expect(calibrationStatus('2026-11-23', [], 7, '2026-12-01')).toMatchObject({ state: 'stale', reason: 'age', message: expect.stringMatching(/8 days ago/) });
    const collision = [{ kind: 'collision', happenedOn: '2026-11-30' }];
    expect(calibrationStatus('2026-11-29', collision, 7, '2026-12-01')).toMatchObject({ state: 'stale', reason: 'event', message: expect.stringMatching(/collision/) });
    expect(calibrationStatus('2026-11-30', [{ kind: 'collision', happenedOn: '2026-11-28' }], 7, '2026-12-01').state).toBe('current');
  });
});

describe('parts', () => {
  it('needs a part number and revision', () => {
    expect(fieldOf(partHeaderSchema.safeParse({ name: 'Demo bracket', number: '', revision: 'B' }))).toEqual(['number']);
  });

  it('takes a feature without uuid and keeps the slot rule', () => {
    const slot = { type: 'slot', label: '4', center: [0, 0, 0], axis: [0, 0, 1], widthDir: [0, 1, 0], width: 30, length: 20, depth: 5 };
    expect(fieldOf(featureInputSchema.safeParse(slot))).toEqual(['width']);
    expect(featureInputSchema.safeParse({ ...slot, width: 8 }).success).toBe(true);
  });

  it('reads fit codes and refuses ones that are not', () => {
    expect(fitCodePattern.exec('12H7')?.slice(1)).toEqual(['12', 'H', '7']);
    expect(fitCodePattern.exec('25 g6')?.slice(1)).toEqual(['25', 'g', '6']);
    expect(fitCodePattern.test('H7')).toBe(false);
    expect(fieldOf(toleranceInputSchema.safeParse({ characteristic: 'diameter', fit: 'H7' }))).toEqual(['fit']);
  });

  it('asks a size tolerance for limits or a fit, a geometric one for its zone', () => {
    expect(toleranceInputSchema.safeParse({ characteristic: 'diameter', fit: '12H7' }).success).toBe(true);
    expect(fieldOf(toleranceInputSchema.safeParse({ characteristic: 'diameter' }))).toEqual(['upper']);
    expect(fieldOf(toleranceInputSchema.safeParse({ characteristic: 'diameter', upper: 0, lower: 0.01 }))).toEqual(['upper']);
    expect(fieldOf(toleranceInputSchema.safeParse({ characteristic: 'flatness' }))).toEqual(['value']);
    expect(fieldOf(toleranceInputSchema.safeParse({ characteristic: 'flatness', value: 0.02, datums: ['A'] }))).toEqual(['datums']);
    expect(fieldOf(toleranceInputSchema.safeParse({ characteristic: 'circularity', value: 0.01, material: 'MMC' }))).toEqual(['material']);
    expect(toleranceInputSchema.safeParse({ characteristic: 'profile', upper: 0.1, lower: -0.05, datums: ['A', 'B'] }).success).toBe(true);
  });
});

describe('programs and tokens', () => {
  it('needs a message and a base revision to save an edit', () => {
    expect(fieldOf(saveRevisionSchema.safeParse({ baseRevision: 0, text: 'G0', message: '' }))?.sort()).toEqual(['baseRevision', 'message']);
    expect(fieldOf(createProgramSchema.safeParse({ name: 'x', partId: 'p', machineId: '', probeId: 'q', post: 'ngc' }))).toEqual(['machineId']);
  });

  it('accepts only well-formed bearer tokens', () => {
    const token = `prb_${'a'.repeat(43)}`;
    expect(bearerToken(`Bearer ${token}`)).toBe(token);
    expect(bearerToken(`bearer  ${token} `)).toBe(token);
    expect(bearerToken(`Basic ${token}`)).toBeNull();
    expect(bearerToken('Bearer prb_short')).toBeNull();
    expect(bearerToken(null)).toBeNull();
    expect(createTokenSchema.safeParse({ name: '  ' }).success).toBe(false);
  });
});
