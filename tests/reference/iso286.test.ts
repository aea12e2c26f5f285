/**
 * ISO 286 fit codes resolved from the tables, against REFERENCES.md §4.
 */
import { describe, expect, it } from 'vitest';
import { FitCodeError, itGrade, resolveFitCode } from '@/lib/evaluation/iso286';

const lim = (code: string): [number, number] => {
  const r = resolveFitCode(code);
  return [r.upperUm, r.lowerUm];
};

describe('ISO 286 limit check values', () => {
  // Source: REFERENCES.md §4 limit check values [from memory, corroborated as noted there].
  it.each([
    ['25H7', 21, 0], ['25g6', -7, -20], ['25f7', -20, -41], ['25h6', 0, -13], ['25k6', 15, 2], ['25p6', 35, 22],
    ['25G7', 28, 7], ['25F8', 53, 20], ['25K7', 6, -15], ['25P7', -14, -35], ['10H7', 15, 0], ['10g6', -5, -14],
    ['50H7', 25, 0], ['50g6', -9, -25], ['100H7', 35, 0],
  ])('%s → %i / %i µm', (code, up, lo) => {
    expect(lim(code)).toEqual([up, lo]);
  });
  // Source: V. B. Bhandari, Design of Machine Elements, examples 3.1–3.4 [published], via REFERENCES.md §4.
  it.each([
    ['20H6', 13, 0], ['20e7', -40, -61], ['20H7', 21, 0], ['20s6', 48, 35], ['50H7', 25, 0], ['50s6', 59, 43],
    ['12H11', 110, 0], ['12d11', -50, -160],
  ])('textbook example %s → %i / %i µm', (code, up, lo) => {
    expect(lim(code)).toEqual([up, lo]);
  });
});

describe('ISO 286 tables: steps and grades', () => {
  // Source: REFERENCES.md §4 IT table [from memory]; steps are "over … up to and including".
  it('30.000 is in 18–30 and 30.001 in 30–50', () => {
    expect(itGrade(7, 30)).toBe(21);
    expect(itGrade(7, 30.001)).toBe(25);
    expect(itGrade(6, 3)).toBe(6);
    expect(itGrade(11, 500)).toBe(400);
  });
  // Source: REFERENCES.md §4 IT table, every listed cell [from memory].
  it('every IT5–IT11 cell of the table', () => {
    const rows: Array<[number, number[]]> = [
      [2, [4, 6, 10, 14, 25, 40, 60]], [5, [5, 8, 12, 18, 30, 48, 75]], [8, [6, 9, 15, 22, 36, 58, 90]],
      [15, [8, 11, 18, 27, 43, 70, 110]], [25, [9, 13, 21, 33, 52, 84, 130]], [40, [11, 16, 25, 39, 62, 100, 160]],
      [60, [13, 19, 30, 46, 74, 120, 190]], [100, [15, 22, 35, 54, 87, 140, 220]], [150, [18, 25, 40, 63, 100, 160, 250]],
      [200, [20, 29, 46, 72, 115, 185, 290]], [300, [23, 32, 52, 81, 130, 210, 320]], [350, [25, 36, 57, 89, 140, 230, 360]],
      [450, [27, 40, 63, 97, 155, 250, 400]],
    ];
    for (const [size, cells] of rows) cells.forEach((v, k) => expect(itGrade(5 + k, size)).toBe(v));
  });
  it('limits of size in mm', () => {
    const r = resolveFitCode('12H7');
    expect(r.max).toBeCloseTo(12.018, 12);
    expect(r.min).toBeCloseTo(12, 12);
    expect(r.kind).toBe('hole');
  });
  it('bad or untabulated codes are errors in words', () => {
    expect(() => resolveFitCode('12X7')).toThrow(FitCodeError);
    expect(() => resolveFitCode('H7')).toThrow(/not a fit code/);
    expect(() => resolveFitCode('600H7')).toThrow(/above 500/);
    expect(() => resolveFitCode('12H14')).toThrow(/IT14/);
    expect(() => resolveFitCode('60s6')).toThrow(/not tabulated/);
  });
});
