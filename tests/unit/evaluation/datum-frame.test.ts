/**
 * 3-2-1 datum frames: measured datums that are the nominal ones moved rigidly give an
 * alignment that undoes the move exactly.
 */
import { describe, expect, it } from 'vitest';
import { align, buildFrame, type DatumElement } from '@/lib/evaluation/datum-frame';
import { applyMat, axisAngle } from '@/lib/geometry/rotation';
import { add, normalize, type Vec3 } from '@/lib/geometry/vec3';

const R = axisAngle(normalize([0.2, -0.3, 1]), 0.01);
const t: Vec3 = [0.3, -0.2, 0.05];
const move = (p: Vec3): Vec3 => add(applyMat(R, p), t);
const moveEl = (d: DatumElement): DatumElement =>
  d.type === 'plane' ? { type: 'plane', point: move(d.point), normal: applyMat(R, d.normal) }
    : d.type === 'axis' ? { type: 'axis', point: move(d.point), dir: applyMat(R, d.dir) } : { type: 'point', point: move(d.point) };

const sets: Record<string, DatumElement[]> = {
  'plane | plane | plane': [
    { type: 'plane', point: [0, 0, 0], normal: [0, 0, 1] }, { type: 'plane', point: [-50, 0, -10], normal: [-1, 0, 0] }, { type: 'plane', point: [0, -30, -10], normal: [0, -1, 0] },
  ],
  'plane | bore | bore': [
    { type: 'plane', point: [0, 0, 0], normal: [0, 0, 1] }, { type: 'axis', point: [-40, 0, 0], dir: [0, 0, 1] }, { type: 'axis', point: [40, 5, 0], dir: [0, 0, 1] },
  ],
  'plane | bore | plane': [
    { type: 'plane', point: [0, 0, 0], normal: [0, 0, 1] }, { type: 'axis', point: [-40, 0, 0], dir: [0, 0, 1] }, { type: 'plane', point: [0, -30, -5], normal: [0, -1, 0] },
  ],
  'axis | shoulder plane | plane': [
    { type: 'axis', point: [0, 0, 0], dir: [0, 0, 1] }, { type: 'plane', point: [0, 0, -20], normal: [0, 0, 1] }, { type: 'plane', point: [12, 0, 0], normal: [1, 0, 0] },
  ],
};

describe('3-2-1 datum reference frames', () => {
  for (const [name, nominal] of Object.entries(sets)) {
    it(`${name}: a rigid move of the part is undone exactly`, () => {
      const a = align(buildFrame(nominal.map(moveEl)), buildFrame(nominal));
      for (const p of [[10, 20, -5], [-33, 7, 12], [0, 0, 0]] as Vec3[]) {
        const back = a.point(move(p));
        for (let k = 0; k < 3; k++) expect(back[k] as number).toBeCloseTo(p[k] as number, 10);
      }
    });
  }
  it('a primary plane alone leaves the in-plane position and rotation where they are', () => {
    const nominal: DatumElement[] = [{ type: 'plane', point: [5, 5, 0], normal: [0, 0, 1] }];
    const measured: DatumElement[] = [{ type: 'plane', point: [9, -3, 0.02], normal: [0, 0, 1] }];
    const p = align(buildFrame(measured), buildFrame(nominal)).point([10, 10, 0.02]);
    expect(p[0]).toBeCloseTo(10, 12);
    expect(p[1]).toBeCloseTo(10, 12);
    expect(p[2]).toBeCloseTo(0, 12);
  });
});
