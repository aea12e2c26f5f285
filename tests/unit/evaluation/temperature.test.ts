/**
 * Temperature correction of locations: a warm part grows about its datum origin, and the
 * evaluated position is brought back to 20 °C.
 */
import { describe, expect, it } from 'vitest';
import { bore, exact, part, probe, ringPoints, run, tol } from './helpers';

describe('position corrected to 20 °C', () => {
  // Source: α aluminium 23.1 µm/(m·K) [published] NIST (PMC8345254); 100 mm at 26 °C reads 0.01386 mm long [computed] (REFERENCES.md §8).
  it('a bore 100 mm from the origin of a part at 26 °C sits 0.01386 mm out as measured, on position at 20 °C', () => {
    const b = bore('T', [100, 0, 0], 10);
    const t = tol('tp', { featureUuid: b.uuid, characteristic: 'position', value: 0.05 });
    const grown = 100 * 23.1e-6 * 6;
    const p = part([b], [t], {}, 'aluminium');
    const plan = { touchPoints: ringPoints(b, true, 8, [5], 1.5), warnings: [] };
    const errors = { features: { [b.uuid]: { offset: [grown, 0, 0], sizeError: 10 * 23.1e-6 * 6 } } };
    const warm = run(p, probe(3), plan, errors, { ...exact, conditions: { ...exact.conditions, partTemperatureC: 26 } }).result(t);
    expect(warm.value).toBeCloseTo(0, 7);
    expect(warm.temperatureCorrection?.correction).toBeCloseTo(-2 * grown, 7);
    const unknown = run(p, probe(3), plan, errors, { ...exact, conditions: { ...exact.conditions, partTemperatureC: undefined } }).result(t);
    expect(unknown.value).toBeCloseTo(2 * grown, 9);
    expect(unknown.temperatureCorrection?.applied).toBe(false);
  });
});
