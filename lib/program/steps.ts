/**
 * The neutral program: a list of steps built from a plan, controller-free. Axis values
 * are machine coordinates in the program's work offset, which is the model's machine
 * frame M (mm, degrees). Posts format these steps; the verifier reads them back.
 *
 * Per feature: rotaries change only with Z at the top of its travel; then rapid over
 * to the safe plane, protected moves down to the feature's clearance and to each start,
 * per touch point a fast touch, an incremental back-off along the normal, a slow touch
 * at the measuring feed ending at `end`, the TRIP record, a retract to the start, and
 * protected moves back up to the safe plane.
 */
import { partToMachineWith, rotationsAt } from '../kinematics/forward';
import { linearAxesMap, linearAxisOf } from '../kinematics/inverse';
import { prepareMachine, rotaryValues, type PreparedMachine } from '../kinematics/machine';
import { distance, type Vec3 } from '../geometry/vec3';
import type { AxisValues, Machine } from '../kinematics/schema';
import type { Feature, Part, Probe } from '../features/schema';
import { featureAxis } from '../features/feature-geometry';
import { partClearances, safeHeight } from '../features/clearance';
import { featurePath } from '../features/path';
import type { Plan, TouchPoint } from './plan-schema';

export type Step =
  | { kind: 'feature'; label: string; type: Feature['type']; points: number }
  | { kind: 'rapid'; to: AxisValues }
  | { kind: 'rotary'; to: AxisValues }
  // machine X, Y, Z of the linear moves (every axis given)
  | { kind: 'protected'; to: Vec3; feed: number }
  | { kind: 'touch'; to: Vec3; feed: number; pass: 'fast' | 'slow' }
  | { kind: 'backoff'; by: Vec3; feed: number }
  | { kind: 'record'; uuid: string }
  | { kind: 'retract'; to: Vec3; feed: number };

export interface NeutralProgram {
  steps: Step[];
  /** Z at the top of its travel: the only place rotaries move. */
  zTop: number;
  rotaryNames: string[];
  touchPoints: number;
  features: number;
}

/** Back-off after the fast touch (mm): 1 mm, or half the approach when that is shorter (common practice). */
export const backoffDistance = (probe: Probe): number => Math.min(1, probe.approach / 2);

/** Protected moves shorter than this are left out (RS274/NGC refuses probe moves under 0.254 mm; NISTIR 6556 §3.5.9.1). */
export const MIN_PROBE_MOVE_MM = 0.3;

function runs(points: TouchPoint[]): TouchPoint[][] {
  const out: TouchPoint[][] = [];
  for (const tp of points) {
    const last = out[out.length - 1];
    if (last && last[0]!.featureUuid === tp.featureUuid) last.push(tp);
    else out.push([tp]);
  }
  return out;
}

const sameRotaries = (a: AxisValues | null, b: AxisValues): boolean => a !== null && Object.keys(b).every((k) => Math.abs((a[k] ?? 0) - (b[k] ?? 0)) < 1e-9);

export function buildProgram(plan: Plan, part: Part, probe: Probe, machine: Machine | PreparedMachine): NeutralProgram {
  const pm = prepareMachine(machine);
  const zTop = pm.machine.linear.Z[1];
  const features = new Map(part.features.map((f) => [f.uuid, f]));
  const clearances = partClearances(part, probe);
  const safeByAxis = new Map<string, number>();
  const steps: Step[] = [];
  let at: Vec3 | null = null;
  let rot: AxisValues | null = null;
  const protectedTo = (to: Vec3) => {
    if (at && distance(at, to) < MIN_PROBE_MOVE_MM) return;
    steps.push({ kind: 'protected', to, feed: probe.fastFeed });
    at = to;
  };
  const featureRuns = runs(plan.touchPoints);
  for (const run of featureRuns) {
    const first = run[0]!;
    const f = features.get(first.featureUuid);
    if (!f) throw new Error(`touch point ${first.uuid} names feature ${first.featureUuid}, which the part does not have`);
    const r = rotaryValues(pm, first.axes);
    const t = featureAxis(f);
    const key = t.join();
    const safeH = safeByAxis.get(key) ?? safeHeight(part, probe, t, clearances);
    safeByAxis.set(key, safeH);
    const path = featurePath(f, run.map((tp) => tp.start), clearances.get(f.uuid) ?? probe.clearance, t, safeH);
    steps.push({ kind: 'feature', label: f.label, type: f.type, points: run.length });
    const map = linearAxesMap(pm, r);
    const linear = (p: Vec3): Vec3 => [linearAxisOf(map, p, 0), linearAxisOf(map, p, 1), linearAxisOf(map, p, 2)];
    const tables = rotationsAt(pm.tables, r);
    const safeIn = linear(path.safeIn);
    if (!sameRotaries(rot, r)) {
      if (pm.rotaries.length > 0 || at === null) steps.push({ kind: 'rapid', to: { Z: zTop } });
      if (pm.rotaries.length > 0) steps.push({ kind: 'rotary', to: r });
      steps.push({ kind: 'rapid', to: { X: safeIn[0], Y: safeIn[1], Z: zTop } });
      rot = r;
    }
    steps.push({ kind: 'rapid', to: { X: safeIn[0], Y: safeIn[1], Z: safeIn[2] } });
    at = safeIn;
    protectedTo(linear(path.entry));
    const back = backoffDistance(probe);
    run.forEach((tp, i) => {
      for (const b of path.before[i] ?? []) protectedTo(linear(b));
      const start = linear(tp.start);
      const gap = at ? distance(at, start) : Infinity;
      // starts closer than a probe move allows (e.g. a pair across a narrow slot): go via a point 1 mm up the axis
      if (gap >= 1e-9 && gap < MIN_PROBE_MOVE_MM) protectedTo(linear([tp.start[0] + t[0], tp.start[1] + t[1], tp.start[2] + t[2]]));
      protectedTo(start);
      const end = linear(tp.end);
      steps.push({ kind: 'touch', to: end, feed: probe.fastFeed, pass: 'fast' });
      const n = partToMachineWith(pm, tables, tp.normal, true);
      steps.push({ kind: 'backoff', by: [n[0] * back, n[1] * back, n[2] * back], feed: probe.fastFeed });
      steps.push({ kind: 'touch', to: end, feed: probe.measureFeed, pass: 'slow' });
      steps.push({ kind: 'record', uuid: tp.uuid });
      steps.push({ kind: 'retract', to: start, feed: probe.fastFeed });
      at = start;
      for (const a of path.after[i] ?? []) protectedTo(linear(a));
    });
    protectedTo(linear(path.exit));
    protectedTo(linear(path.safeOut));
  }
  steps.push({ kind: 'rapid', to: { Z: zTop } });
  return { steps, zTop, rotaryNames: pm.rotaries.map((x) => x.name).sort(), touchPoints: plan.touchPoints.length, features: featureRuns.length };
}
