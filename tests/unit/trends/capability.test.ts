import { describe, expect, it } from 'vitest';
import { basicStats, capability, cpkInterval, MIN_VALUES_FOR_CAPABILITY } from '@/lib/trends/capability';

// Invented bore diameters, 12 +0.018/0 (demo values).
const BORE = [12.0071, 12.0094, 12.0062, 12.0108, 12.0083, 12.0079, 12.0101, 12.0066, 12.0088, 12.0092, 12.0075, 12.0097];

describe('basicStats', () => {
  it('gives mean and sample sd (n − 1)', () => {
    // Independently computed with Python 3's statistics.mean / statistics.stdev.
    const s = basicStats(BORE);
    expect(s.n).toBe(12);
    expect(s.mean).toBeCloseTo(12.008466666666667, 12);
    expect(s.sd).toBeCloseTo(0.001443690556955419, 14);
    expect([s.min, s.max]).toEqual([12.0062, 12.0108]);
  });

  it('keeps precision for values far from zero (two-pass)', () => {
    // Hand-computed: ±0.1 about 1e6 → sd = √(10·0.01/9) = 0.105409…; a one-pass Σx² loses it.
    const s = basicStats(Array.from({ length: 10 }, (_, i) => 1e6 + (i % 2 === 0 ? -0.1 : 0.1)));
    expect(s.sd).toBeCloseTo(Math.sqrt(0.1 / 9), 9);
  });

  it('has no sd for one value and nothing for none', () => {
    expect(basicStats([3])).toEqual({ n: 1, mean: 3, sd: null, min: 3, max: 3 });
    expect(basicStats([])).toEqual({ n: 0, mean: null, sd: null, min: null, max: null });
  });
});

describe('capability', () => {
  it('matches an independently computed two-sided case', () => {
    // Independently computed with Python 3 (statistics.stdev; Cp, Cpu, Cpl by the textbook formulas).
    const c = capability(BORE, { lower: 12.0, upper: 12.018 });
    expect(c.cp).toBeCloseTo(2.0780076350480368, 10);
    expect(c.cpk).toBeCloseTo(1.9548664418600235, 10); // the lower side governs
    expect(c.cpkInterval?.[0]).toBeCloseTo(1.1165058921197963, 10);
    expect(c.cpkInterval?.[1]).toBeCloseTo(2.7932269916002506, 10);
    expect(c.preliminary).toBe(true);
    expect(c.reason).toBeNull();
  });

  it('matches a hand-computed symmetric case exactly', () => {
    // Hand-computed: ten values 9.9/10.1 → x̄ 10, s = √(1/90); limits 9.4–10.6 → Cp = Cpk = 0.2·√90.
    const values = Array.from({ length: 10 }, (_, i) => (i % 2 === 0 ? 9.9 : 10.1));
    const c = capability(values, { lower: 9.4, upper: 10.6 });
    expect(c.cp).toBeCloseTo(0.2 * Math.sqrt(90), 9);
    expect(c.cpk).toBeCloseTo(0.2 * Math.sqrt(90), 9);
    // An off-centre process: shift by +0.3 → Cpk = (10.6 − 10.3)/(3s) = 0.1·√90, Cp unchanged.
    const shifted = capability(values.map((v) => v + 0.3), { lower: 9.4, upper: 10.6 });
    expect(shifted.cp).toBeCloseTo(0.2 * Math.sqrt(90), 9);
    expect(shifted.cpk).toBeCloseTo(0.1 * Math.sqrt(90), 9);
  });

  it('gives Cpk but no Cp for a one-sided tolerance (flatness)', () => {
    // Independently computed with Python 3: invented flatness values, zone 0.02.
    const flat = [0.0112, 0.0087, 0.0131, 0.0095, 0.0104, 0.012, 0.0099, 0.009, 0.0117, 0.0108];
    const c = capability(flat, { lower: null, upper: 0.02 });
    expect(c.cp).toBeNull();
    expect(c.cpk).toBeCloseTo(2.2258478690069947, 10);
  });

  it(`states nothing below ${MIN_VALUES_FOR_CAPABILITY} values, without limits, or without spread`, () => {
    const nine = BORE.slice(0, 9);
    expect(capability(nine, { lower: 12, upper: 12.018 })).toMatchObject({ n: 9, cp: null, cpk: null, reason: 'too-few-values', minimumN: 10 });
    expect(capability(BORE, { lower: null, upper: null })).toMatchObject({ cpk: null, reason: 'no-limits' });
    expect(capability(Array(12).fill(12.005), { lower: 12, upper: 12.018 })).toMatchObject({ sd: 0, cpk: null, reason: 'no-spread' });
    expect(capability(nine, { lower: 12, upper: 12.018 }, 5).cpk).not.toBeNull();
  });

  it('is no longer preliminary from 30 values', () => {
    const thirty = Array.from({ length: 30 }, (_, i) => 12.009 + ((i % 5) - 2) * 0.001);
    expect(capability(thirty, { lower: 12, upper: 12.018 }).preliminary).toBe(false);
  });
});

describe('cpkInterval', () => {
  it('narrows as n grows (Bissell approximation)', () => {
    const [lo10, hi10] = cpkInterval(1.33, 10);
    const [lo100, hi100] = cpkInterval(1.33, 100);
    expect(hi10 - lo10).toBeGreaterThan(hi100 - lo100);
    // Hand-computed: n 10, Cpk 1.33 → half width 1.96·√(1/90 + 1.7689/18) = 0.6487…
    expect((hi10 - lo10) / 2).toBeCloseTo(1.959963984540054 * Math.sqrt(1 / 90 + 1.7689 / 18), 12);
  });
});
