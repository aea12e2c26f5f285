import { describe, expect, it } from 'vitest';
import { feedsPerTouchPoint, touchPointLines } from '@/lib/program/diff-lines';

const A = '1b4e28ba-2fa1-51d2-883f-0016d3cca427';
const B = '2c5f39cb-3ab2-52e3-994a-1127e4ddb538';

// An invented program fragment in the ngc style.
const program = [
  '(CAUTION: prove out single block)', // 1
  'G21 G90', // 2
  'G38.3 Z5 F2000', // 3
  'G38.2 Z-2 F300', // 4
  'G38.2 Z-2 F40 (slow touch, F999 in a comment)', // 5
  `(LOG,TRIP ${A.toUpperCase()} X#5061 Y#5062 Z#5063)`, // 6
  'G0 Z20', // 7
  'G38.3 X10 F2000', // 8
  'G38.2 X12 F25 ; note F777', // 9
  `(LOG,TRIP ${B} X#5061 Y#5062 Z#5063)`, // 10
  'M2', // 11
].join('\n');

describe('touchPointLines', () => {
  it('finds the block of lines that measures each touch point', () => {
    const m = touchPointLines(program, [A, B]);
    expect(m.get(A)).toEqual({ from: 1, to: 6, recordLine: 6 });
    expect(m.get(B)).toEqual({ from: 7, to: 10, recordLine: 10 });
  });

  it('leaves out UUIDs the program never records', () => {
    expect(touchPointLines(program, ['3d6a4adc-4bc3-53f4-a55b-2238f5eec649']).size).toBe(0);
  });
});

describe('feedsPerTouchPoint', () => {
  it('reads F words in order, ignoring comments', () => {
    expect(feedsPerTouchPoint(program, [A, B])).toEqual({ [A]: [2000, 300, 40], [B]: [2000, 25] });
  });
});
