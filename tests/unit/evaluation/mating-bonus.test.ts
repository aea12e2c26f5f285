import { describe, expect, it } from 'vitest';
import { bore, boss, exact, part, probe, ringPoints, run, tol } from './helpers';

const pr = probe(3);
const r = 1.5;

describe('bonus at MMC from the mating size', () => {
  it('a bore with form error: the largest empty circle is smaller than the least-squares size, so the bonus is smaller too', () => {
    const h = bore('MB', [0, 0, 0], 10.25);
    const size = tol('mb-size', { featureUuid: h.uuid, characteristic: 'diameter', upper: 0.25, lower: 0 });
    const pos = tol('mb-pos', { featureUuid: h.uuid, characteristic: 'position', value: 0.5, material: 'MMC' });
    const { result } = run(part([h], [size, pos]), pr, { touchPoints: ringPoints(h, true, 16, [5], r), warnings: [] }, { formNoise: 0.004, features: { [h.uuid]: { sizeError: 0.1 } } }, exact, 7);
    const ls = result(size).value as number;
    const bonus = result(pos).bonus as number;
    expect(ls).toBeGreaterThan(10.3);
    expect(bonus).toBeGreaterThan(0);
    expect(bonus).toBeLessThan(ls - 10.25);
    // with 16 points and 4 µm noise the two sizes differ by a few µm, never more than the form band
    expect(ls - 10.25 - bonus).toBeLessThan(0.02);
    expect(result(pos).limit as number).toBeCloseTo(0.5 + bonus, 12);
    expect(result(pos).message).toMatch(/mating size \(largest empty circle of 16 contact points/);
  });

  it('a boss: the smallest enclosing circle is larger than the least-squares size, so the bonus at MMC is smaller', () => {
    const p = boss('MP', [0, 0, 0], 11.5);
    const size = tol('mp-size', { featureUuid: p.uuid, characteristic: 'diameter', upper: 0.3, lower: -0.3 });
    const pos = tol('mp-pos', { featureUuid: p.uuid, characteristic: 'position', value: 0.5, material: 'MMC' });
    const { result } = run(part([p], [size, pos]), pr, { touchPoints: ringPoints(p, false, 16, [4], r), warnings: [] }, { formNoise: 0.004, features: { [p.uuid]: { sizeError: -0.2 } } }, exact, 8);
    const ls = result(size).value as number;
    const bonus = result(pos).bonus as number;
    expect(bonus).toBeGreaterThan(0);
    expect(bonus).toBeLessThan(11.8 - ls);
    expect(result(pos).message).toMatch(/mating size \(smallest enclosing circle/);
  });
});
