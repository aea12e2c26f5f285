/**
 * Datum reference frames, 3-2-1: the primary datum fixes an axis (plane normal or
 * feature axis) and a position along it, the secondary a second direction and
 * position, the tertiary the rest. The same construction runs on the nominal datum
 * features and on the measured ones; `align` then maps measured geometry into the
 * nominal frame (measured frame → nominal frame), so that comparing an aligned
 * measured feature with its nominal is comparing it in the datum reference frame.
 * Degrees of freedom the datums leave open take the part frame's (part X projected,
 * the part origin projected), identically in both frames, so they do not move.
 */
import type { Feature } from '../features/schema';
import { add, addScaled, cross, dot, normalize, reject, scale, sub, type Vec3 } from '../geometry/vec3';
import type { Element } from './measure-feature';

export type DatumElement =
  | { type: 'plane'; point: Vec3; normal: Vec3 }
  | { type: 'axis'; point: Vec3; dir: Vec3 }
  | { type: 'point'; point: Vec3 };

export interface Frame { origin: Vec3; x: Vec3; y: Vec3; z: Vec3 }

export function nominalDatum(f: Feature): DatumElement {
  switch (f.type) {
    case 'plane': return { type: 'plane', point: f.origin, normal: normalize(f.normal) };
    case 'bore':
    case 'boss': return { type: 'axis', point: f.center, dir: normalize(f.axis) };
    case 'sphere': return { type: 'point', point: f.center };
    case 'slot':
    case 'web': return { type: 'plane', point: f.center, normal: normalize(f.widthDir) };
  }
}

export function measuredDatum(e: Element): DatumElement {
  switch (e.kind) {
    case 'plane': return { type: 'plane', point: e.origin, normal: e.normal };
    case 'axis': return { type: 'axis', point: e.point, dir: e.axis };
    case 'sphere': return { type: 'point', point: e.center };
    case 'slot': return { type: 'plane', point: e.mid, normal: e.widthDir };
  }
}

const PARALLEL_COS = 0.7;

export function buildFrame(datums: readonly DatumElement[]): Frame {
  let origin: Vec3 = [0, 0, 0];
  let z: Vec3 | null = null;
  let x: Vec3 | null = null;
  let locked = false; // origin fixed on an axis: later datums only orient
  for (const [k, d] of datums.entries()) {
    if (k === 0) {
      if (d.type === 'plane') { z = d.normal; origin = addScaled(origin, d.normal, dot(sub(d.point, origin), d.normal)); }
      else if (d.type === 'axis') { z = d.dir; origin = addScaled(d.point, z, dot(sub(origin, d.point), z)); locked = true; }
      else { origin = d.point; locked = true; }
      continue;
    }
    const zz: Vec3 = z ?? [0, 0, 1];
    if (d.type === 'plane') {
      if (Math.abs(dot(d.normal, zz)) > PARALLEL_COS) {
        // A plane across the primary axis (a shoulder): fixes the position along it.
        origin = addScaled(origin, zz, dot(sub(d.point, origin), d.normal) / dot(zz, d.normal));
        continue;
      }
      const dir = normalize(reject(d.normal, zz));
      let along = dir;
      if (x === null) x = k === 1 ? dir : normalize(cross(dir, zz));
      else along = normalize(cross(zz, x));
      if (!locked) origin = addScaled(origin, along, dot(sub(d.point, origin), d.normal) / dot(along, d.normal));
      continue;
    }
    const q = d.type === 'axis' ? intersectAxis(d, origin, zz) : d.point;
    if (!locked) {
      if (x === null) { origin = add(origin, reject(sub(q, origin), zz)); locked = true; }
      else { const y = normalize(cross(zz, x)); origin = addScaled(origin, y, dot(sub(q, origin), y)); }
    } else if (x === null) {
      const v = reject(sub(q, origin), zz);
      if (Math.hypot(v[0], v[1], v[2]) > 1e-9) x = normalize(v);
    }
  }
  const zf: Vec3 = z ?? [0, 0, 1];
  const seed: Vec3 = Math.abs(zf[0]) < 0.99 ? [1, 0, 0] : [0, 1, 0];
  const xf: Vec3 = x ?? normalize(reject(seed, zf));
  return { origin, x: xf, y: cross(zf, xf), z: zf };
}

function intersectAxis(d: { point: Vec3; dir: Vec3 }, origin: Vec3, z: Vec3): Vec3 {
  const c = dot(d.dir, z);
  if (Math.abs(c) < 1e-9) return d.point;
  return addScaled(d.point, d.dir, dot(sub(origin, d.point), z) / c);
}

/** Rigid map taking the measured frame onto the nominal one. */
export interface Alignment { point(p: Vec3): Vec3; direction(v: Vec3): Vec3 }

export function align(measured: Frame, nominal: Frame): Alignment {
  const local = (v: Vec3): Vec3 => [dot(v, measured.x), dot(v, measured.y), dot(v, measured.z)];
  const global = (l: Vec3): Vec3 => add(add(scale(nominal.x, l[0]), scale(nominal.y, l[1])), scale(nominal.z, l[2]));
  return {
    point: (p) => add(nominal.origin, global(local(sub(p, measured.origin)))),
    direction: (v) => global(local(v)),
  };
}
