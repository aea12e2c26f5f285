/**
 * GD&T evaluation against REFERENCES.md §3 (and the bore check of §6, the plane and
 * cylinder sets of §1). Trip points come from `simulate` (exact geometry, no noise) or
 * are built by hand where the source fixes the deviations point by point.
 */
import { describe, expect, it } from 'vitest';
import { evaluateInputSchema } from '@/lib/evaluation/input';
import { evaluateRun } from '@/lib/evaluation/evaluate';
import { addScaled, type Vec3 } from '@/lib/geometry/vec3';
import { bore, boss, exact, gridPoints, id, part, plane, probe, ringPoints, run, tol } from '../unit/evaluation/helpers';
import cylinderSet from '../../../shared/reference/fit-cylinder-24.json';

const pr = probe(3);
const r = 1.5;

describe('position', () => {
  // Source: [published] calhub.xyz true position calculator — Δx 0.1, Δy 0.15 → ⌀0.3606 (REFERENCES.md §3).
  it('diametral zone 2·√(Δx² + Δy²): Δ (0.1, 0.15) → ⌀0.3606', () => {
    const b = bore('1', [20, 10, 0], 10);
    const t = tol('pos', { featureUuid: b.uuid, characteristic: 'position', value: 0.4 });
    const { result } = run(part([b], [t]), pr, { touchPoints: ringPoints(b, true, 8, [5], r), warnings: [] }, { features: { [b.uuid]: { offset: [0.1, 0.15, 0] } } }, exact);
    expect(result(t).value).toBeCloseTo(0.3606, 4);
    expect(result(t).value).toBeCloseTo(2 * Math.hypot(0.1, 0.15), 9);
    expect(result(t).status).toBe('conforming');
  });

  // Source: [published] gdtseminars.com, "How to factor bonus tolerance into a tolerance stack" (REFERENCES.md §3).
  it.each([[11.8, 0.5], [11.5, 0.8], [11.2, 1.1]])('pin ⌀11.2–11.8, position ⌀0.5 Ⓜ: at %f the allowed zone is ⌀%f; virtual condition 12.3', (size, allowed) => {
    const p = boss('2', [0, 0, 0], 11.5);
    const size_ = tol('pin-size', { featureUuid: p.uuid, characteristic: 'diameter', upper: 0.3, lower: -0.3 });
    const pos = tol('pin-pos', { featureUuid: p.uuid, characteristic: 'position', value: 0.5, material: 'MMC' });
    const { result } = run(part([p], [size_, pos]), pr, { touchPoints: ringPoints(p, false, 8, [4], r), warnings: [] }, { features: { [p.uuid]: { sizeError: size - 11.5 } } }, exact);
    expect(result(size_).value).toBeCloseTo(size, 9);
    expect(result(pos).limit as number).toBeCloseTo(allowed, 9);
    expect(result(pos).bonus).toBeCloseTo(allowed - 0.5, 9);
    expect(result(pos).virtualCondition).toBeCloseTo(12.3, 9);
  });

  // Source: [published] actdenver.com GD&T frame example (0.5 at MMC 10.25 → 0.75 at LMC 10.5); 10.4 → 0.65 [computed] (REFERENCES.md §3).
  it.each([[10.25, 0.5], [10.4, 0.65], [10.5, 0.75]])('holes MMC 10.25 / LMC 10.5, ⌀0.5 Ⓜ: at %f the allowed zone is ⌀%f; virtual condition 9.75', (size, allowed) => {
    const h = bore('3', [0, 0, 0], 10.25);
    const size_ = tol('h-size', { featureUuid: h.uuid, characteristic: 'diameter', upper: 0.25, lower: 0 });
    const pos = tol('h-pos', { featureUuid: h.uuid, characteristic: 'position', value: 0.5, material: 'MMC' });
    const { result } = run(part([h], [size_, pos]), pr, { touchPoints: ringPoints(h, true, 8, [5], r), warnings: [] }, { features: { [h.uuid]: { sizeError: size - 10.25 } } }, exact);
    expect(result(pos).limit as number).toBeCloseTo(allowed, 9);
    expect(result(pos).virtualCondition).toBeCloseTo(9.75, 9);
  });

  // Source: independently computed (REFERENCES.md §3): hole ⌀10.00–10.20, ⌀0.25 Ⓜ, actual 10.12 at (+0.12, −0.09) → ⌀0.300 vs 0.37 conforming; RFS nonconforming.
  it('hole 10.12 at (+0.12, −0.09): ⌀0.300 within 0.37 at MMC, outside 0.25 RFS', () => {
    const h = bore('4', [30, 30, 0], 10);
    const size_ = tol('s', { featureUuid: h.uuid, characteristic: 'diameter', upper: 0.2, lower: 0 });
    const mmc = tol('m', { featureUuid: h.uuid, characteristic: 'position', value: 0.25, material: 'MMC' });
    const rfs = tol('r', { featureUuid: h.uuid, characteristic: 'position', value: 0.25, material: 'RFS' });
    const { result } = run(part([h], [size_, mmc, rfs]), pr, { touchPoints: ringPoints(h, true, 8, [5], r), warnings: [] }, { features: { [h.uuid]: { offset: [0.12, -0.09, 0], sizeError: 0.12 } } }, exact);
    expect(result(mmc).value).toBeCloseTo(0.3, 9);
    expect(result(mmc).limit as number).toBeCloseTo(0.37, 9);
    expect(result(mmc).status).toBe('conforming');
    expect(result(rfs).status).toBe('nonconforming');
    expect(result(rfs).bonus).toBeUndefined();
  });

  // Source: independently computed (REFERENCES.md §3): spherical position, Δ (0.02, −0.01, 0.03) → S⌀0.074833.
  it('spherical position: Δ (0.02, −0.01, 0.03) → S⌀0.074833', () => {
    const s = { uuid: id('sphere'), label: '5', type: 'sphere' as const, center: [0, 0, 10] as Vec3, diameter: 20, axis: [0, 0, 1] as Vec3 };
    const t = tol('sp', { featureUuid: s.uuid, characteristic: 'position', value: 0.1 });
    const pts = [[0, 0, 1], [1, 0, 0.2], [-1, 0, 0.2], [0, 1, 0.2], [0, -1, 0.2], [0.7, 0.7, 0.5], [-0.7, 0.7, 0.5], [0.7, -0.7, 0.5], [-0.7, -0.7, 0.5]] as Vec3[];
    const tps = pts.map((d, i) => {
      const n = d.map((x) => x / Math.hypot(...d)) as Vec3;
      return gridPoints(s, [addScaled(s.center, n, 10)], n, r, i)[0]!;
    });
    const { result } = run(part([s], [t]), pr, { touchPoints: tps, warnings: [] }, { features: { [s.uuid]: { offset: [0.02, -0.01, 0.03] } } }, exact);
    expect(result(t).value).toBeCloseTo(0.074833, 6);
  });

  // Source: [published] Kramer, Proctor & Messina, NISTIR 6556 §3.5.9.3 table 6 bore program; check value [computed] (REFERENCES.md §6).
  it('RS274NGC bore example: centre (50.03, 29.98), ⌀20.012, tip radius 1.5 → position ⌀0.072111', () => {
    const h = bore('6', [50, 30, 0], 20);
    const d = tol('d', { featureUuid: h.uuid, characteristic: 'diameter', upper: 0.05, lower: 0 });
    const t = tol('p', { featureUuid: h.uuid, characteristic: 'position', value: 0.1 });
    const { out, result } = run(part([h], [d, t]), pr, { touchPoints: ringPoints(h, true, 4, [5], r), warnings: [] }, { features: { [h.uuid]: { offset: [0.03, -0.02, 0], sizeError: 0.012 } } }, exact);
    const fit = out.features[0]!.fit!;
    expect(fit.center![0]).toBeCloseTo(50.03, 9);
    expect(fit.center![1]).toBeCloseTo(29.98, 9);
    expect(result(d).value).toBeCloseTo(20.012, 9);
    expect(result(t).value).toBeCloseTo(0.072111, 6);
  });
});

describe('profile of a surface', () => {
  // Source: independently computed (REFERENCES.md §3): deviations 0.031 −0.062 0.048 −0.017 0.089 −0.044 → 0.178 in a bilateral 0.2 zone (conforming), nonconforming in −0.05…+0.15.
  const devs = [0.031, -0.062, 0.048, -0.017, 0.089, -0.044];
  const f = plane('7', [0, 0, 0], [0, 0, 1], [60, 40]);
  const surf: Vec3[] = devs.map((_, i) => [-25 + 10 * i, (i % 2) * 10 - 5, 0]);
  const tps = gridPoints(f, surf, [0, 0, 1], r);
  const measurements = tps.map((tp, i) => ({ uuid: tp.uuid, point: addScaled(tp.surface, [0, 0, 1], r + (devs[i] as number)) }));
  const bil = tol('pb', { featureUuid: f.uuid, characteristic: 'profile', value: 0.2 });
  const uneq = tol('pu', { featureUuid: f.uuid, characteristic: 'profile', upper: 0.15, lower: -0.05 });
  const out = evaluateRun(evaluateInputSchema.parse({ part: part([f], [bil, uneq]), probe: pr, plan: { touchPoints: tps }, measurements, ...exact }));
  // The ball is offset along the FITTED normal, tilted θ from the nominal by these very
  // deviations: every deviation reads r(1 − cos θ) more than the nominal-normal construction.
  const n = out.features[0]!.fit!.normal!;
  const lift = r * (1 - n[2]);
  it('bilateral 0.2: value 2·max|d| = 0.178, conforming', () => {
    const res = out.results.find((x) => x.toleranceUuid === bil.uuid)!;
    expect(lift).toBeLessThan(1e-4);
    expect(res.value).toBeCloseTo(2 * (0.089 + lift), 12);
    expect(res.value).toBeCloseTo(0.178, 3);
    expect(res.status).toBe('conforming');
  });
  it('unequal −0.05…+0.15: nonconforming by −0.062', () => {
    const res = out.results.find((x) => x.toleranceUuid === uneq.uuid)!;
    expect(res.deviations?.min).toBeCloseTo(-0.062 + lift, 12);
    expect(res.deviations?.max).toBeCloseTo(0.089 + lift, 12);
    expect(res.value).toBeCloseTo(-0.062 + lift, 12);
    expect(res.status).toBe('nonconforming');
  });
});

describe('form and orientation on the §1 sets', () => {
  const zs = [10.0, 10.009, 10.007, 10.017, 10.003, 10.012, 10.009, 10.011, 9.992, 10.004, 10.018, 10.017, 9.995, 9.993, 10.006, 10.017];
  const top = plane('8', [37.5, 30, 10], [0, 0, 1], [75, 60]);
  const base = plane('9', [37.5, 30, 0], [0, 0, -1], [75, 60]);
  const grid: Vec3[] = [];
  [0, 20, 40, 60].forEach((y) => [0, 25, 50, 75].forEach((x) => grid.push([x, y, 10])));
  const baseGrid: Vec3[] = [[0, 0, 0], [75, 0, 0], [75, 60, 0], [0, 60, 0], [37, 30, 0]];
  const tps = [...gridPoints(top, grid, [0, 0, 1], r), ...gridPoints(base, baseGrid, [0, 0, -1], r, 100)];
  const measurements = tps.map((tp, i) => ({ uuid: tp.uuid, point: tp.featureUuid === top.uuid ? [tp.surface[0], tp.surface[1], (zs[i] as number) + r] as Vec3 : addScaled(tp.surface, [0, 0, -1], r) }));
  const flatMz = tol('fz', { featureUuid: top.uuid, characteristic: 'flatness', value: 0.02 });
  const flatLs = tol('fl', { featureUuid: top.uuid, characteristic: 'flatness', value: 0.02 });
  const par = tol('pa', { featureUuid: top.uuid, characteristic: 'parallelism', value: 0.03, datums: ['A'] });
  const out = evaluateRun(evaluateInputSchema.parse({
    part: part([top, base], [flatMz, flatLs, par], { A: base.uuid }), probe: pr, plan: { touchPoints: tps }, measurements,
    ...exact, options: { warningShare: 1, methods: { [flatLs.uuid]: 'least-squares' } },
  }));
  const res = (t: { uuid: string }) => out.results.find((x) => x.toleranceUuid === t.uuid)!;
  // Source: independently computed (REFERENCES.md §1, plane 4×4 grid): flatness LS 0.017300, minimum zone 0.016000, parallelism to a datum ⟂ Z 0.026000.
  it('flatness: minimum zone 0.016 by default, 0.0173 by least squares on request', () => {
    expect(res(flatMz).value).toBeCloseTo(0.016, 6);
    expect(res(flatMz).method).toMatch(/minimum-zone/);
    expect(res(flatLs).value).toBeCloseTo(0.0173, 6);
    expect(res(flatLs).method).toMatch(/least-squares/);
  });
  it('parallelism to datum plane A ⟂ Z: 0.026', () => {
    expect(res(par).value).toBeCloseTo(0.026, 9);
  });

  // Source: independently computed, fit-cylinder-24.json: perpendicularity of the LS axis to datum A (⟂ Z) over the measured length ⌀0.027766; cylindricity (LS) 0.005742.
  it('fit-cylinder-24 as a bore: perpendicularity to A ⌀0.027766, cylindricity 0.005742', () => {
    // A tiny ball: the set's points are surface points, and the ball centres are placed
    // along approximate radial directions, so a small r keeps that construction exact.
    const rs = 0.005;
    const b = bore('10', [50, 30, 0], 16, 40);
    const a = plane('11', [50, 30, 0], [0, 0, 1], [80, 80]);
    const pts = cylinderSet.points as Vec3[];
    const wall = pts.map((p, i) => {
      const radial: Vec3 = [p[0] - 50, p[1] - 30, 0];
      const len = Math.hypot(...radial);
      return gridPoints(b, [[50 + (8 * radial[0]) / len, 30 + (8 * radial[1]) / len, Math.round(p[2])]], [-radial[0] / len, -radial[1] / len, 0], rs, i)[0]!;
    });
    const face = gridPoints(a, [[20, 20, 0], [80, 20, 0], [80, 60, 0], [20, 60, 0]], [0, 0, 1], rs, 50);
    // The set's points are surface points: give the ball centres r inside them, toward the axis.
    const meas = [
      ...wall.map((tp, i) => ({ uuid: tp.uuid, point: addScaled(pts[i] as Vec3, tp.normal, rs) })),
      ...face.map((tp) => ({ uuid: tp.uuid, point: tp.target })),
    ];
    const perp = tol('pp', { featureUuid: b.uuid, characteristic: 'perpendicularity', value: 0.05, datums: ['A'] });
    const cyl = tol('cy', { featureUuid: b.uuid, characteristic: 'cylindricity', value: 0.01 });
    const o = evaluateRun(evaluateInputSchema.parse({ part: part([b, a], [perp, cyl], { A: a.uuid }), probe: probe(2 * rs), plan: { touchPoints: [...wall, ...face] }, measurements: meas, ...exact }));
    const rp = o.results.find((x) => x.toleranceUuid === perp.uuid)!;
    const rc = o.results.find((x) => x.toleranceUuid === cyl.uuid)!;
    expect(rp.value).toBeCloseTo(cylinderSet.result.perpendicularity_axis_to_A, 5);
    expect(rc.value).toBeCloseTo(cylinderSet.result.cylindricity_LS, 6);
    expect(o.features[0]!.fit!.diameter).toBeCloseTo(2 * cylinderSet.result.radius, 6);
  });
});
