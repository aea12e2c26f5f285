import { describe, expect, it } from 'vitest';
import { uncertaintyBudget } from '@/lib/capability/uncertainty';

describe('uncertainty budget (GUM RSS, k = 2)', () => {
  const conditions = { probeRepeatability2Sigma: 0.002, effectiveDiameterU: 0.001, machine: { aUm: 2, bMm: 500 }, partTemperatureC: 22, temperatureUncertaintyK: 0.5, alphaRelativeUncertainty: 0.1 };
  it('diameter of a 20 mm bore from 8 points: every component by hand', () => {
    const b = uncertaintyBudget({ characteristic: 'diameter', points: 8, lengthMm: 20, alphaPerK: 11.5e-6, conditions });
    const rep = 0.001 * (2 / Math.sqrt(8));
    const cal = 0.0005;
    const mach = (2 + 20 / 500) / 1000 / Math.sqrt(3);
    const temp = 20 * Math.sqrt((11.5e-6 * 0.5) ** 2 + (2 * 1.15e-6) ** 2);
    const byHand = 2 * Math.sqrt(rep ** 2 + cal ** 2 + mach ** 2 + temp ** 2);
    expect(b.U).toBeCloseTo(byHand, 12);
    expect(b.components.map((c) => c.name)).toEqual(['repeatability', 'effective-diameter', 'machine', 'temperature']);
    expect(b.components.every((c) => !c.assumed)).toBe(true);
  });
  it('more points lower the repeatability share; the calibration does not touch position', () => {
    const few = uncertaintyBudget({ characteristic: 'position', points: 4, lengthMm: 50, alphaPerK: null, conditions });
    const many = uncertaintyBudget({ characteristic: 'position', points: 16, lengthMm: 50, alphaPerK: null, conditions });
    expect(many.components[0]?.standardUncertainty).toBeCloseTo((few.components[0]?.standardUncertainty ?? 0) / 2, 12);
    expect(few.components[1]?.standardUncertainty).toBe(0);
  });
  it('defaults are flagged as assumed; an unmeasured part gets a temperature term', () => {
    const b = uncertaintyBudget({ characteristic: 'diameter', points: 8, lengthMm: 100, alphaPerK: 23.1e-6, conditions: {} });
    expect(b.components.every((c) => c.assumed)).toBe(true);
    expect(b.components[3]?.standardUncertainty).toBeCloseTo((100 * 23.1e-6 * 3) / Math.sqrt(3), 12);
  });
});
