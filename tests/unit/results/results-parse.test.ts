import { describe, expect, it } from 'vitest';
import { parseResults, type ResultRecord } from '@/lib/program/results-parse';
import { parseTripLine } from '@/lib/program/results-lines';

// Invented touch-point UUIDs for the tests.
const U1 = '1b4e28ba-2fa1-51d2-883f-0016d3cca427';
const U2 = '2c5f39cb-3ab2-52e3-994a-1127e4ddb538';
const U3 = '3d6a4adc-4bc3-53f4-a55b-2238f5eec649';
const touchPoints = [
  { uuid: U1, label: '2', seq: 0 },
  { uuid: U2, label: '2', seq: 1 },
  { uuid: U3, label: '10', seq: 2 },
];
const ac = { touchPoints, rotaries: ['A', 'C'] };

function trip(r: ResultRecord | undefined): Record<string, number> {
  if (r?.kind !== 'trip') throw new Error('expected a trip record');
  return r.axes;
}

describe('parseResults, TRIP logs', () => {
  it('reads an ngc-style log with line numbers', () => {
    const log = [
      `TRIP ${U1} X10.000000 Y10.000000 Z1.003200 A0.000000 C0.000000`,
      `TRIP ${U2} X40.0 Y12.0 Z0.9987 A0 C0`,
      '',
      `TRIP ${U3} X-52.125 Y20 Z-5 A-30.000 C90`,
    ].join('\n');
    const r = parseResults(log, ac);
    expect(r.errors).toEqual([]);
    expect(r.format).toBe('trip-log');
    expect(r.records.map((x) => x.line)).toEqual([1, 2, 4]);
    expect(trip(r.records[2])).toEqual({ X: -52.125, Y: 20, Z: -5, A: -30, C: 90 });
  });

  it('reads a DPRNT-style print-out padded with spaces, CRLF and tape marks', () => {
    const out = `%\r\nTRIP ${U1.toUpperCase()} X    10.0000 Y   -10.5000 Z     1.0032 A     0.0000 C    90.0000\r\n`
      + `TRIP ${U2} X 40. Y 12. Z .9987 A 0. C 0.\r\nTRIP ${U3} X+1 Y2 Z3 A4 C5\r\n%\r\n`;
    const r = parseResults(out, ac);
    expect(r.errors).toEqual([]);
    expect(r.records[0]).toMatchObject({ uuid: U1, line: 2 });
    expect(trip(r.records[0])).toEqual({ X: 10, Y: -10.5, Z: 1.0032, A: 0, C: 90 });
    expect(trip(r.records[1])).toEqual({ X: 40, Y: 12, Z: 0.9987, A: 0, C: 0 });
  });

  it('reports every malformed line, unknown UUID, duplicate and missing point at once', () => {
    const log = [
      `TRIP ${U1} X1 Y2 Z3 A0 C0`,
      `TRIP ${U1} X1 Y2 Z3 A0 C0`,
      'TRIP not-a-uuid X1 Y2 Z3 A0 C0',
      `TRIP 99999999-9999-5999-8999-999999999999 X1 Y2 Z3 A0 C0`,
      `TRIP ${U2} X1 Y2 Z3 C0`,
      'PROBE FAILED',
    ].join('\n');
    const r = parseResults(log, ac);
    expect(r.records).toHaveLength(1);
    expect(r.errors.map((e) => [e.line, e.code])).toEqual([
      [2, 'DUPLICATE_UUID'],
      [3, 'MALFORMED_LINE'],
      [4, 'UNKNOWN_UUID'],
      [5, 'MALFORMED_LINE'],
      [6, 'MALFORMED_LINE'],
      [null, 'MISSING_POINT'],
      [null, 'MISSING_POINT'],
    ]);
    expect(r.errors[0]?.message).toBe(`line 2: feature 2, point 0 (${U1}) was already recorded on line 1`);
    expect(r.errors[3]?.message).toBe('line 5: missing A (a record needs X Y Z A C)');
    expect(r.errors[5]?.message).toBe(`no record for feature 2, point 1 (${U2})`);
  });

  it('refuses axis words the machine does not have, twice-given words and garbled values', () => {
    expect(parseTripLine(`TRIP ${U1} X1 Y2 Z3 B4`, [])).toEqual({ ok: false, message: 'B is not an axis of this machine (it has X Y Z)' });
    expect(parseTripLine(`TRIP ${U1} X1 X2 Y2 Z3`, [])).toEqual({ ok: false, message: 'X appears twice' });
    expect(parseTripLine(`TRIP ${U1} X1 Y2 Z3..4`, [])).toMatchObject({ ok: false });
    expect(parseTripLine(`TRIP ${U1} X1 Y2 Z9e99`, [])).toEqual({ ok: false, message: 'Z9e99 is not a usable number' });
    expect(parseTripLine('TRIP', [])).toMatchObject({ ok: false });
  });

  it('stops listing after maxErrors and counts the rest', () => {
    const log = Array.from({ length: 30 }, () => 'garbage').join('\n') + `\nTRIP ${U1} X1 Y2 Z3 A0 C0`;
    const r = parseResults(log, { ...ac, maxErrors: 10 });
    expect(r.errors).toHaveLength(10);
    expect(r.moreErrors).toBe(22); // 20 more malformed lines + 2 missing points
  });

  it('says so when the file is empty', () => {
    const r = parseResults('\n\n%\n', ac);
    expect(r.errors).toEqual([{ line: null, code: 'EMPTY_FILE', message: 'the file holds no result records' }]);
  });
});

describe('parseResults, CSV', () => {
  it('reads uuid,x,y,z with a header', () => {
    const csv = `uuid,x,y,z\n${U1},10,10,1.0032\n${U2}, 40 , 12 ,0.9987\n${U3},"-52.1",20,-5\n`;
    const r = parseResults(csv, ac);
    expect(r.format).toBe('csv');
    expect(r.errors).toEqual([]);
    expect(r.records[2]).toEqual({ kind: 'point', line: 4, uuid: U3, point: [-52.1, 20, -5] });
  });

  it('reads it without a header, and semicolon-separated with decimal commas', () => {
    expect(parseResults(`${U1},1,2,3\n${U2},4,5,6\n${U3},7,8,9`, ac).errors).toEqual([]);
    const semi = parseResults(`uuid;x;y;z\n${U1};1,5;2;3\n${U2};4;5;6\n${U3};7;8;-9,25`, ac);
    expect(semi.errors).toEqual([]);
    expect(semi.records.map((x) => (x.kind === 'point' ? x.point : null))).toEqual([[1.5, 2, 3], [4, 5, 6], [7, 8, -9.25]]);
  });

  it('names the line and the field of a bad row; a header only counts on the first line', () => {
    const csv = `${U1},1,2\n${U2},1,two,3\nuuid,x,y,z\n${U3},1,2,3`;
    const r = parseResults(csv, ac);
    expect(r.errors.map((e) => e.message)).toEqual([
      'line 1: expected 4 fields (uuid,x,y,z), found 3',
      'line 2: y "two" is not a usable number',
      'line 3: "uuid" is not a UUID',
      `no record for feature 2, point 0 (${U1})`,
      `no record for feature 2, point 1 (${U2})`,
    ]);
  });
});
