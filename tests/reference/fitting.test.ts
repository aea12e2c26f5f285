/**
 * Fits checked against the outside references in ../shared/reference/REFERENCES.md §1.
 * Each check names its source as REFERENCES.md tags it.
 */
import { describe, expect, it } from 'vitest';
import { kasaCircle, unitNormCircle } from '@/lib/fitting/algebraic';
import { fitCircle } from '@/lib/fitting/circle';
import { fitCylinder } from '@/lib/fitting/cylinder';
import { fitShape } from '@/lib/fitting/fit-shape';
import { fitLine, fitPlane } from '@/lib/fitting/line-plane';
import { fitSphere } from '@/lib/fitting/sphere';
import type { Vec3 } from '@/lib/geometry/vec3';
import cylinderSet from '../../../shared/reference/fit-cylinder-24.json';

const ggs: Vec3[] = [[1, 7, 0], [2, 6, 0], [5, 8, 0], [7, 7, 0], [9, 5, 0], [3, 7, 0]];

describe('circle: Gander, Golub & Strebel 1994 (BIT 34, 558–578) data set', () => {
  // Source: data [published] Gander, Golub & Strebel 1994, BIT 34; results independently computed (REFERENCES.md §1).
  it('geometric fit: centre (4.7397824, 2.9835326), radius 4.7142261, Σd² 1.227599', () => {
    const c = fitCircle(ggs);
    expect(c.center[0]).toBeCloseTo(4.7397824, 6);
    expect(c.center[1]).toBeCloseTo(2.9835326, 6);
    expect(c.radius).toBeCloseTo(4.7142261, 6);
    const ss = (c.residuals.values ?? [Number.NaN]).reduce((s, d) => s + d * d, 0);
    expect(ss).toBeCloseTo(1.227599, 6);
    expect(c.solver.converged).toBe(true);
  });
  // Source: Gander, Golub & Strebel 1994, BIT 34 — the ‖u‖=1 algebraic form; values independently computed.
  it('algebraic ‖u‖ = 1 fit: centre (5.3794133, 7.2531985), radius 3.0370415', () => {
    const xs = Float64Array.from(ggs.map((p) => p[0]));
    const ys = Float64Array.from(ggs.map((p) => p[1]));
    const u = unitNormCircle(xs, ys);
    expect(u.a).toBeCloseTo(5.3794133, 6);
    expect(u.b).toBeCloseTo(7.2531985, 6);
    expect(u.r).toBeCloseTo(3.0370415, 6);
  });
  // Source: Gander, Golub & Strebel 1994, BIT 34 — Kåsa linear form; values independently computed.
  it('Kåsa linear fit: centre (4.7423313, 3.8351227), radius 4.1087615 (start value only)', () => {
    const xs = Float64Array.from(ggs.map((p) => p[0]));
    const ys = Float64Array.from(ggs.map((p) => p[1]));
    const k = kasaCircle(xs, ys);
    expect(k.a).toBeCloseTo(4.7423313, 6);
    expect(k.b).toBeCloseTo(3.8351227, 6);
    expect(k.r).toBeCloseTo(4.1087615, 6);
  });
});

describe('further sets, independently computed (REFERENCES.md §1)', () => {
  // Source: independently computed (orthogonal-distance LS, scipy), REFERENCES.md §1 "2-D line".
  it('2-D line: centroid (2, 2.04), direction (0.698880868, 0.715238095), straightness 0.193307', () => {
    const l = fitLine([[0, 0.1, 0], [1, 0.9, 0], [2, 2.1, 0], [3, 2.9, 0], [4, 4.2, 0]]);
    expect(l.origin[0]).toBeCloseTo(2, 12);
    expect(l.origin[1]).toBeCloseTo(2.04, 12);
    expect(l.direction[0]).toBeCloseTo(0.698880868, 8);
    expect(l.direction[1]).toBeCloseTo(0.715238095, 8);
    expect(l.form).toBeCloseTo(0.193307, 6);
  });
  // Source: independently computed, REFERENCES.md §1 "3-D line".
  it('3-D line: centroid, direction and max distance 0.046130', () => {
    const l = fitLine([[0, 0, 0.02], [10, 0.05, -0.01], [20, -0.03, 0.04], [30, 0.02, -0.02], [40, 0.01, 0.03], [50, -0.04, 0]]);
    expect(l.origin[0]).toBeCloseTo(25, 10);
    expect(l.origin[1]).toBeCloseTo(0.001667, 6);
    expect(l.origin[2]).toBeCloseTo(0.01, 10);
    expect(l.direction[0]).toBeCloseTo(0.9999996959, 9);
    expect(l.direction[1]).toBeCloseTo(-0.0007714302, 9);
    expect(l.direction[2]).toBeCloseTo(-0.000114285, 9);
    expect(l.residuals.max).toBeCloseTo(0.04613, 6);
  });
  const zs = [10.0, 10.009, 10.007, 10.017, 10.003, 10.012, 10.009, 10.011, 9.992, 10.004, 10.018, 10.017, 9.995, 9.993, 10.006, 10.017];
  const grid: Vec3[] = [];
  [0, 20, 40, 60].forEach((y, r) => [0, 25, 50, 75].forEach((x, c) => grid.push([x, y, zs[r * 4 + c] as number])));
  // Source: independently computed (LS by scipy; minimum zone by exhaustive support search), REFERENCES.md §1 "plane, 4×4 grid".
  it('plane 4×4: LS normal, flatness LS 0.017300 and minimum zone 0.016000', () => {
    const p = fitPlane(grid);
    expect(p.normal[0]).toBeCloseTo(-0.000238, 9);
    expect(p.normal[1]).toBeCloseTo(0.0000875, 9);
    expect(p.normal[2]).toBeCloseTo(0.9999999678, 9);
    expect(p.form).toBeCloseTo(0.0173, 6);
    const mz = fitShape({ shape: 'plane', points: grid, method: 'minimum-zone' });
    expect(mz.form).toBeCloseTo(0.016, 6);
    expect(mz.form).toBeLessThanOrEqual(p.form);
  });
  // Source: independently computed, REFERENCES.md §1 "sphere, 10 points".
  it('sphere: centre (0.996833, 2.002167, 3.000427), R 12.500200, form 0.003740', () => {
    const s = fitSphere([[1, 2, 15.503], [13.498, 2, 3], [1, 14.501, 3], [-11.504, 2, 3], [1, -10.497, 3], [1, 2, -9.502], [7.2495, 8.2495, 11.838128], [-5.25, -4.25, 11.838835], [-5.251, 8.251, -5.840249], [7.248, -4.248, -5.836006]]);
    expect(s.center[0]).toBeCloseTo(0.996833, 6);
    expect(s.center[1]).toBeCloseTo(2.002167, 6);
    expect(s.center[2]).toBeCloseTo(3.000427, 6);
    expect(s.radius).toBeCloseTo(12.5002, 6);
    expect(s.form).toBeCloseTo(0.00374, 6);
  });
  // Source: independently computed, REFERENCES.md §1 "circle in 3-D, 8 points".
  it('circle in 3-D: normal, centre (9.999453, −4.999409, 1.999803), R 15', () => {
    const c = fitCircle([[24.702959, -2.418366, 0.510647], [18.287417, 5.826659, -4.250774], [7.01996, 7.730938, -5.351365], [-2.504883, 2.180028, -2.143081], [-4.699039, -7.580446, 3.489821], [1.711478, -15.829103, 8.249876], [12.98004, -17.730938, 9.351365], [22.499882, -12.176157, 6.143156]]);
    expect(c.normal[0]).toBeCloseTo(-0.000013577, 8);
    expect(c.normal[1]).toBeCloseTo(0.499985393, 8);
    expect(c.normal[2]).toBeCloseTo(0.866033837, 8);
    expect(c.center[0]).toBeCloseTo(9.999453, 6);
    expect(c.center[1]).toBeCloseTo(-4.999409, 6);
    expect(c.center[2]).toBeCloseTo(1.999803, 6);
    expect(c.radius).toBeCloseTo(15, 6);
  });
  // Source: independently computed, fit-cylinder-24.json (two parametrisations agree to 1e-10 mm).
  it('cylinder, 24-point tilted bore: axis, radius 8.000375, cylindricity (LS) 0.005742', () => {
    const r = cylinderSet.result;
    const c = fitCylinder(cylinderSet.points as Vec3[]);
    const t = -c.origin[2] / c.axis[2];
    expect(c.origin[0] + t * c.axis[0]).toBeCloseTo(r.axis_point_at_z0[0] as number, 8);
    expect(c.origin[1] + t * c.axis[1]).toBeCloseTo(r.axis_point_at_z0[1] as number, 8);
    for (let k = 0; k < 3; k++) expect(c.axis[k] as number).toBeCloseTo(r.axis_dir[k] as number, 10);
    expect(c.radius).toBeCloseTo(r.radius, 9);
    expect(c.form).toBeCloseTo(r.cylindricity_LS, 8);
    expect(c.solver.converged).toBe(true);
  });
});
