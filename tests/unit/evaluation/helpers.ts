/**
 * Hand-built touch points in the contract's shape (spec/engine-cli.md, "plan"), for
 * reference cases whose point patterns are fixed by the source, and invented demo ids.
 */
import { v5 as uuidv5 } from 'uuid';
import type { Feature, Part, Probe, Tolerance } from '@/lib/features/schema';
import type { Plan, TouchPoint } from '@/lib/program/plan-schema';
import { addScaled, normalize, type Vec3 } from '@/lib/geometry/vec3';
import { completeFrame } from '@/lib/fitting/frame';
import { evaluateInputSchema } from '@/lib/evaluation/input';
import { evaluateRun } from '@/lib/evaluation/evaluate';
import { simulateInputSchema } from '@/lib/evaluation/simulate-input';
import { simulateRun } from '@/lib/evaluation/simulate';

const NS = '6f1c2a4e-0d3b-4c5a-9e8f-7a6b5c4d3e2f';
export const id = (name: string): string => uuidv5(name, NS);

export const probe = (diameter = 3): Probe => ({ stylusDiameter: diameter, effectiveDiameter: diameter, approach: 3, overtravel: 3, clearance: 5, fastFeed: 1000, measureFeed: 100 });

export function touchPoint(featureUuid: string, seq: number, surface: Vec3, normal: Vec3, r: number, approach = 3, overtravel = 3): TouchPoint {
  const n = normalize(normal);
  const target = addScaled(surface, n, r);
  return {
    uuid: id(`${featureUuid}:${seq}`), featureUuid, seq, surface, normal: n, direction: [-n[0], -n[1], -n[2]], target,
    start: addScaled(target, n, approach), end: addScaled(target, n, -overtravel), toolAxis: [0, 0, 1], axes: {},
  };
}

/** Points on a bore (normals toward the axis) or boss (away from it), at the given depths below `center`. */
export function ringPoints(f: { uuid: string; center: Vec3; axis: Vec3; diameter: number }, internal: boolean, count: number, depths: number[], r: number, seq0 = 0): TouchPoint[] {
  const a = normalize(f.axis);
  const { u, v } = completeFrame(a);
  const out: TouchPoint[] = [];
  depths.forEach((d) => {
    for (let i = 0; i < count; i++) {
      const t = (2 * Math.PI * i) / count;
      const radial = addScaled(addScaled([0, 0, 0], u, Math.cos(t)), v, Math.sin(t));
      const surface = addScaled(addScaled(f.center, a, -d), radial, f.diameter / 2);
      out.push(touchPoint(f.uuid, seq0 + out.length, surface, internal ? [-radial[0], -radial[1], -radial[2]] : radial, r));
    }
  });
  return out;
}

export function gridPoints(f: { uuid: string }, pts: Vec3[], normal: Vec3, r: number, seq0 = 0): TouchPoint[] {
  return pts.map((p, i) => touchPoint(f.uuid, seq0 + i, p, normal, r));
}

export const bore = (label: string, center: Vec3, diameter: number, depth = 20): Extract<Feature, { type: 'bore' }> =>
  ({ uuid: id(`bore:${label}`), label, type: 'bore', center, axis: [0, 0, 1], diameter, depth });
export const boss = (label: string, center: Vec3, diameter: number, height = 10): Extract<Feature, { type: 'boss' }> =>
  ({ uuid: id(`boss:${label}`), label, type: 'boss', center, axis: [0, 0, 1], diameter, height });
export const plane = (label: string, origin: Vec3, normal: Vec3, size: [number, number] = [100, 100]): Extract<Feature, { type: 'plane' }> =>
  ({ uuid: id(`plane:${label}`), label, type: 'plane', origin, normal, uDir: Math.abs(normal[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0], size });
export const tol = (name: string, t: Omit<Tolerance, 'uuid'>): Tolerance => ({ uuid: id(`tol:${name}`), ...t });

export function part(features: Feature[], tolerances: Tolerance[], datums: Record<string, string> = {}, material?: string): Part {
  return { features, tolerances, datums, ...(material ? { material } : {}) };
}

/** Simulate (seeded) then evaluate; `extra` goes into the evaluate request. */
export function run(p: Part, pr: Probe, plan: Plan, errors: Record<string, unknown> = {}, extra: Record<string, unknown> = {}, seed = 1) {
  const sim = simulateRun(simulateInputSchema.parse({ part: p, probe: pr, plan, errors, seed }));
  const out = evaluateRun(evaluateInputSchema.parse({ part: p, probe: pr, plan, measurements: sim.measurements, ...extra }));
  return { sim, out, result: (t: Tolerance) => out.results.find((r) => r.toleranceUuid === t.uuid)! };
}

/** Exact conditions: no uncertainty at all, and no warning share (for checking limits). */
export const exact = { conditions: { probeRepeatability2Sigma: 0, effectiveDiameterU: 0, machine: { aUm: 0, bMm: 1e15 }, partTemperatureC: 20, temperatureUncertaintyK: 0, alphaRelativeUncertainty: 0 }, options: { warningShare: 1 } };
