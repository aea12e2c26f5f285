/**
 * Plain data for the 3D views, built from the engine's shapes: no three.js here,
 * so the geometry (frames, arcs, bounds) can be checked without a browser.
 * Machine frame M, part frame P, right-handed, Z up, millimetres.
 */
import type { Machine, Vec3 } from '@/lib/kinematics/schema';
import type { Feature } from '@/lib/features/schema';
import type { TouchPoint } from '@/lib/program/plan-schema';

/** Okabe & Ito (2008) colour-blind-safe palette, without black. */
export const okabeIto = ['#E69F00', '#56B4E9', '#009E73', '#F0E442', '#0072B2', '#D55E00', '#CC79A7', '#999999'] as const;

export const add = (a: Vec3, b: Vec3): Vec3 => [a[0] + b[0], a[1] + b[1], a[2] + b[2]];
export const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
export const scale = (a: Vec3, s: number): Vec3 => [a[0] * s, a[1] * s, a[2] * s];
export const dot = (a: Vec3, b: Vec3) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
export const cross = (a: Vec3, b: Vec3): Vec3 => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
export const length = (a: Vec3) => Math.hypot(a[0], a[1], a[2]);
export const unit = (a: Vec3): Vec3 => { const n = length(a); return n > 0 ? scale(a, 1 / n) : [0, 0, 1]; };

/** Any unit vector perpendicular to `n`. */
export function perpendicular(n: Vec3): Vec3 {
  const u = unit(n);
  const helper: Vec3 = Math.abs(u[2]) < 0.9 ? [0, 0, 1] : [1, 0, 0];
  return unit(cross(helper, u));
}

/** A right-handed orthonormal frame from a primary axis and a reference direction. */
export function frameFrom(primary: Vec3, reference?: Vec3): { x: Vec3; y: Vec3; z: Vec3 } {
  const z = unit(primary);
  const r = reference ? sub(reference, scale(z, dot(reference, z))) : perpendicular(z);
  const x = length(r) > 1e-9 ? unit(r) : perpendicular(z);
  return { x, y: cross(z, x), z };
}

export type Bounds = { min: Vec3; max: Vec3 };
export const boundsCenter = (b: Bounds): Vec3 => scale(add(b.min, b.max), 0.5);
export const boundsSize = (b: Bounds) => Math.max(1, length(sub(b.max, b.min)));

export function boundsOf(points: readonly Vec3[]): Bounds {
  if (points.length === 0) return { min: [-50, -50, -50], max: [50, 50, 50] };
  const min: Vec3 = [Infinity, Infinity, Infinity];
  const max: Vec3 = [-Infinity, -Infinity, -Infinity];
  for (const p of points) for (let i = 0; i < 3; i++) { min[i] = Math.min(min[i] ?? 0, p[i] ?? 0); max[i] = Math.max(max[i] ?? 0, p[i] ?? 0); }
  return { min, max };
}

/**
 * The positive sense of a rotation about `direction` (right-hand rule) as a
 * polyline arc of `sweepDeg` around the axis, centred on `at`, plus the tangent
 * at its end for the arrow head.
 */
export function senseArc(at: Vec3, direction: Vec3, radius: number, sweepDeg = 270, steps = 36): { points: Vec3[]; endTangent: Vec3 } {
  const { x, y } = frameFrom(direction);
  const points: Vec3[] = [];
  const sweep = (sweepDeg * Math.PI) / 180;
  for (let i = 0; i <= steps; i++) {
    const t = (sweep * i) / steps;
    points.push(add(at, add(scale(x, radius * Math.cos(t)), scale(y, radius * Math.sin(t)))));
  }
  const endTangent = unit(add(scale(x, -Math.sin(sweep)), scale(y, Math.cos(sweep))));
  return { points, endTangent };
}

export type RotaryDrawing = {
  name: string; carrier: 'table' | 'head'; color: string;
  point: Vec3; direction: Vec3; limits: string;
};

export type MachineScene = {
  travel: Bounds;
  rotaries: RotaryDrawing[];
  /** Where the head is drawn: tip at X = Y = 0 (or mid-travel) and Z at its top. */
  headAt: Vec3;
  partFrame: { origin: Vec3; x: Vec3; y: Vec3; z: Vec3 };
  size: number;
};

const mid = (r: readonly [number, number]) => (r[0] <= 0 && r[1] >= 0 ? 0 : (r[0] + r[1]) / 2);

export function machineScene(machine: Machine): MachineScene {
  const { X, Y, Z } = machine.linear;
  const travel: Bounds = { min: [X[0], Y[0], Z[0]], max: [X[1], Y[1], Z[1]] };
  const headAt: Vec3 = [mid(X), mid(Y), Z[1]];
  const rotaries = machine.rotaries.map((r, i) => ({
    name: r.name,
    carrier: r.carrier,
    color: okabeIto[i === 0 ? 0 : 1],
    point: r.carrier === 'head' ? add(r.point, headAt) : r.point,
    direction: unit(r.direction),
    limits: r.min === null || r.max === null ? 'continuous' : `${r.min}° to ${r.max}°`,
  }));
  const f = frameFrom(machine.setup.zAxis, machine.setup.xAxis);
  return { travel, rotaries, headAt, partFrame: { origin: machine.setup.origin, ...f }, size: boundsSize(travel) };
}

export type FeatureDrawing = { uuid: string; label: string; type: Feature['type']; color: string };

export function featureColors(features: readonly Feature[]): FeatureDrawing[] {
  return features.map((f, i) => ({ uuid: f.uuid, label: f.label, type: f.type, color: okabeIto[i % okabeIto.length] ?? '#999999' }));
}

/** Points that bound a feature's nominal shape (for framing the camera). */
export function featureExtent(f: Feature): Vec3[] {
  switch (f.type) {
    case 'plane': {
      const { x, y } = frameFrom(f.normal, f.uDir);
      const hu = f.size[0] / 2, hv = f.size[1] / 2;
      return [add(f.origin, add(scale(x, hu), scale(y, hv))), add(f.origin, add(scale(x, -hu), scale(y, -hv)))];
    }
    case 'bore': case 'boss': {
      const down = f.type === 'bore' ? f.depth : f.height;
      const r = f.diameter / 2;
      const bottom = sub(f.center, scale(unit(f.axis), down));
      return [add(f.center, [r, r, r]), sub(f.center, [r, r, r]), add(bottom, [r, r, r]), sub(bottom, [r, r, r])];
    }
    case 'slot': case 'web': {
      const half = Math.max(f.width, f.length) / 2;
      const bottom = sub(f.center, scale(unit(f.axis), f.depth));
      return [add(f.center, [half, half, half]), sub(bottom, [half, half, half])];
    }
    case 'sphere': {
      const r = f.diameter / 2;
      return [add(f.center, [r, r, r]), sub(f.center, [r, r, r])];
    }
  }
}

export function partBounds(features: readonly Feature[], touchPoints: readonly TouchPoint[]): Bounds {
  return boundsOf([...features.flatMap(featureExtent), ...touchPoints.flatMap((t) => [t.surface, t.start])]);
}
