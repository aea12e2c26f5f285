/**
 * The program reader: words read in place must give exactly what Number() gives for their
 * text, codes as the post knows them, and the line kinds in the order the grammar asks.
 */
import { describe, expect, it } from 'vitest';
import { getPost } from '@/postprocessors/index';
import { BLANK, BLOCK, COMMENT, FIXED, makeReader, PROTECTED_CHECK, ReadSlot, RECORD, recordUuid, TOUCH_CHECK, UNKNOWN } from '@/lib/program/verify-read';
import { rng } from './helpers';

const ngc = getPost('ngc')!.bundle;
const iso = getPost('iso-skip')!.bundle;
const reader = makeReader(ngc.definition, ngc.grammar, ['A', 'C'], 'P-1');
const read = (line: string) => {
  const slot = new ReadSlot(reader.words.length);
  // read in place from inside a longer text, as the verifier does
  const text = `G0 X1\n${line}\nG0 X2`;
  reader.read(text, 6, 6 + line.length, slot);
  return slot;
};
const valueOf = (line: string, word: string) => {
  const slot = read(line);
  const k = reader.words.indexOf(word);
  return slot.mask & (1 << k) ? slot.values[k] : undefined;
};
const codesOf = (line: string) => { const s = read(line); return s.codes.slice(0, s.nCodes).map((c) => reader.codes[c]); };

describe('word values', () => {
  it('equal Number() of the text, for short and long mantissas and fractions', () => {
    // Source: ECMA-262 StringToNumber (Number() rounds the decimal to the nearest double);
    // IEEE 754-2019 §5.4.2 / §4.3 (a quotient of two exact doubles is correctly rounded).
    const rand = rng(7);
    const texts = ['0', '-0', '-0.0000', '+3', '1.', '.5', '-.5', '00012.5000', '1395.0000', '-1395.0500', '0.1', '4.35', '1.005',
      '9007199254740991', '9007199254740993', '123456789012345678.123', '0.1000000000000000055511151231257827',
      '0.0000000000000000000001', '0.00000000000000000000001', '99999999999999999999', '1'.repeat(400)];
    for (let i = 0; i < 3000; i++) {
      const int = String(Math.floor(rand() * 10 ** (1 + Math.floor(rand() * 17))));
      const frac = String(Math.floor(rand() * 10 ** Math.floor(rand() * 20))).padStart(Math.floor(rand() * 24), '0');
      texts.push(`${rand() < 0.5 ? '-' : ''}${int}${rand() < 0.8 ? `.${frac}` : ''}`);
    }
    for (const t of texts) {
      const n = Number(t);
      expect(Object.is(valueOf(`G0 X${t}`, 'X'), Number.isFinite(n) ? n : undefined), t).toBe(true);
    }
  });

  it('leave texts that are not numbers as unknown words', () => {
    for (const t of ['X', 'X-', 'X+', 'X.', 'X1.2.3', 'X--1', 'X+-1', 'X1-', 'X1e3', 'X0x1F', 'XInfinity', 'x1', 'X1,5']) {
      const slot = read(`G0 ${t} Y1`);
      expect(slot.t, t).toBe(BLOCK);
      expect(slot.unknown, t).toEqual([t]);
    }
  });

  it('keep the last of a repeated word and the rotaries by letter', () => {
    expect(valueOf('G0 X1 X2', 'X')).toBe(2);
    expect(valueOf('G0 A-30.5 C90', 'A')).toBe(-30.5);
    expect(valueOf('G0 B10', 'B')).toBeUndefined();
    expect(read('G0 B10').unknown).toEqual(['B10']);
  });
});

describe('codes', () => {
  it('are the known codes, as written or by their number', () => {
    expect(codesOf('G91 G1 X1')).toEqual(['G91', 'G1']);
    expect(codesOf('G01 X1')).toEqual(['G1']);
    expect(codesOf('G38.20 X1')).toEqual(['G38.2']);
    expect(codesOf('G038.3 X1')).toEqual(['G38.3']);
    expect(codesOf('G-0 X1')).toEqual(['G0']);
    expect(codesOf('M64 P0 X1')).toEqual(['M64', 'P0']);
    expect(read('G2 X1').unknown).toEqual(['G2']);
    expect(read('G31 X1').unknown).toEqual(['G31']);
  });
});

describe('line kinds', () => {
  it('in the grammar order: blank, fixed, block, record, checks, comment, else block or unknown', () => {
    expect(read('').t).toBe(BLANK);
    expect(read(' \t ').t).toBe(BLANK);
    expect(read('M2').t).toBe(FIXED);
    expect(read('\tM2 ').t).toBe(FIXED);
    expect(read('o9001 call').t).toBe(PROTECTED_CHECK);
    expect(read('o9001 CALL').t).toBe(UNKNOWN);
    expect(read('(a comment)').t).toBe(COMMENT);
    expect(reader.commentText(read('(a comment)'))).toBe('a comment');
    expect(read('(a (nested) comment)').t).toBe(UNKNOWN);
    expect(read('G0\tX1').t).toBe(BLOCK);
    expect(valueOf('G0\tX1', 'X')).toBe(1);
    expect(read('HELLO').t).toBe(UNKNOWN);
    expect(read('X10').t).toBe(BLOCK);
    const rec = read('(LOG,TRIP C1FA3BAC-A834-5DA5-B12A-B8FB35D5F5D3 X#5061 Y#5062 Z#5063 A#5064 C#5066)');
    expect(rec.t).toBe(RECORD);
    expect(recordUuid(rec)).toBe('c1fa3bac-a834-5da5-b12a-b8fb35d5f5d3');
    // a record without the rotary values is no record: it reads as a comment
    expect(read('(LOG,TRIP c1fa3bac-a834-5da5-b12a-b8fb35d5f5d3 X#5061 Y#5062 Z#5063)').t).toBe(COMMENT);
  });

  it('with block numbers and statement labels (iso-skip with numbered blocks)', () => {
    const def = { ...iso.definition, lineNumbers: { enabled: true, start: 10, step: 10, letter: 'N' } };
    const r = makeReader(def, iso.grammar, ['A', 'C'], 'P-1');
    const kind = (line: string) => { const s = new ReadSlot(r.words.length); r.read(line, 0, line.length, s); return s.t; };
    expect(kind('N9001 #3000=1(NO PROBE TRIGGER - CHECK PART AND PROBE)')).toBe(FIXED);
    expect(kind('N20 M30')).toBe(FIXED);
    expect(kind('N20 G31 X1 Y2 Z3 F120')).toBe(BLOCK);
    expect(kind('N20 IF[[ABS[#5061-[1.0]]+ABS[#5062-[2.0]]+ABS[#5063-[3.0]]]LT0.001]GOTO9001')).toBe(TOUCH_CHECK);
    expect(kind('N20 IF[[ABS[#5061-[1.0]]+ABS[#5062-[2.0]]+ABS[#5063-[3.0]]]GT0.001]GOTO9002')).toBe(PROTECTED_CHECK);
    expect(kind('N20  G0 X1')).toBe(BLOCK);
    expect(kind('N G0 X1')).toBe(BLOCK);
  });
});
