/**
 * Touch-point planning (spec/engine-cli.md, "plan"): features → ordered touch points with
 * machine axes. Part frame P, mm; rotary angles in degrees.
 *
 * Order: features are grouped by tool axis; groups are taken greedily by least rotary
 * travel from the angles in effect (starting from all rotaries at 0); inside a group,
 * features follow a nearest-neighbour chain over their entry points as seen along the
 * tool axis; inside a feature, its contacts' own order (contacts.ts). A feature whose
 * orientation or any path point cannot be reached is left out with a warning naming it.
 */
import { cross, dot, GeometryError, normalize, perpendicular, type Vec3 } from '../geometry/vec3';
import { prepareMachine, rotaryValues, type PreparedMachine } from '../kinematics/machine';
import { linearAxesMap, linearAxisAt, linearAxisOf, solveOrientation, solutionsFor, type LinearAxesMap, type OrientationResult } from '../kinematics/inverse';
import type { AxisValues } from '../kinematics/schema';
import type { Plan, PlanWarning, TouchPoint } from '../program/plan-schema';
import type { Characteristic, Feature } from './schema';
import type { PlanInput } from './plan-input';
import { characteristicsByFeature } from './counts';
import { planContacts, type Contact } from './contacts';
import { featureAxis, geometryKey } from './feature-geometry';
import { partClearancesFrom, probeRadius, safeHeights } from './clearance';
import { featurePath, type FeaturePath } from './path';
import { nearestNeighbourOrder } from './patterns';
import { footprintSources } from './footprints';
import { geometryName, touchPointNamer } from './touch-point-uuid';

interface Planned { f: Feature; axis: Vec3; contacts: Contact[]; starts: Vec3[] }
interface Group { axis: Vec3; items: Planned[] }

const axisKey = (a: Vec3): string => a.map((v) => (Math.abs(v) < 5e-10 ? 0 : v).toFixed(9)).join(',');

export function planProgram(input: PlanInput): Plan {
  const { part, probe } = input;
  const pm = prepareMachine(input.machine);
  const r = probeRadius(probe);
  const chars = characteristicsByFeature(part);
  const untoleranced = new Set<Characteristic>();
  const warnings: PlanWarning[] = [];
  const warn = (f: Feature, code: string, message: string) => warnings.push({ featureUuid: f.uuid, label: f.label, code, message });
  const groups = new Map<string, Group>();
  const sources = footprintSources(part);
  const away = r + probe.approach;
  for (const f of part.features) {
    const res = planContacts(f, { sources, r, approach: probe.approach, characteristics: chars.get(f.uuid) ?? untoleranced });
    for (const n of res.notes) warn(f, n.code, n.message);
    if (res.fault) { warn(f, res.fault.code, `${res.fault.message}; feature not planned`); continue; }
    const axis = featureAxis(f);
    // addScaled(surface, normal, away), written out: arrays that outlive the plan come from
    // allocation sites of their own, which V8 can then allocate straight in the old generation (pretenure)
    const starts = res.contacts.map(({ surface: p, normal: n }): Vec3 => [p[0] + n[0] * away, p[1] + n[1] * away, p[2] + n[2] * away]);
    const key = axisKey(axis);
    const g = groups.get(key) ?? { axis, items: [] };
    g.items.push({ f, axis, contacts: res.contacts, starts });
    groups.set(key, g);
  }
  const clearances = partClearancesFrom(part, probe, sources);
  const safeHeightAlong = safeHeights(part, probe, clearances);
  const touchPoints: TouchPoint[] = [];
  let current: AxisValues = Object.fromEntries(pm.rotaries.map((x) => [x.name, 0]));
  const place: Placing = { pm, mapFor: linearMapCache(pm), travel: travelOf(pm) };
  const left = [...groups.values()];
  while (left.length > 0) {
    const { index, orientation } = nextGroup(pm, left, current);
    const g = left.splice(index, 1)[0] as Group;
    if (!orientation.ok) {
      for (const it of g.items) warn(it.f, orientation.code, `${it.f.label}: ${orientation.message}; feature not planned`);
      continue;
    }
    const safeH = safeHeightAlong(g.axis);
    for (const it of orderInGroup(g)) {
      const clearance = clearances.get(it.f.uuid) ?? probe.clearance;
      const picked = pickRotaries(place, it, orientation.value, current, featurePath(it.f, it.starts, clearance, g.axis, safeH));
      if (!picked.ok) { warn(it.f, picked.code, `${it.f.label}: ${picked.message}; feature not planned`); continue; }
      current = picked.value;
      emitPoints(it, r, probe.overtravel, current, place.mapFor(current), touchPoints);
    }
  }
  return { touchPoints, warnings };
}

type Problem = { code: string; message: string };
type Outcome<T> = { ok: true; value: T } | ({ ok: false } & Problem);

const failure = (e: unknown): { ok: false } & Problem => {
  if (e instanceof GeometryError) return { ok: false, code: e.code, message: e.message };
  throw e;
};

function travel(a: AxisValues, b: AxisValues): [number, number] {
  let max = 0;
  let sum = 0;
  for (const k of Object.keys(b)) {
    const d = Math.abs((a[k] ?? 0) - (b[k] ?? 0));
    max = Math.max(max, d);
    sum += d;
  }
  return [max, sum];
}


/** The remaining group nearest in rotary travel (its orientation solved from `current`). */
function nextGroup(pm: PreparedMachine, groups: Group[], current: AxisValues): { index: number; orientation: Outcome<OrientationResult> } {
  let best = { index: 0, cost: [Infinity, Infinity] as [number, number], orientation: null as Outcome<OrientationResult> | null };
  groups.forEach((g, index) => {
    let orientation: Outcome<OrientationResult>;
    let cost: [number, number] = [Infinity, Infinity];
    try {
      orientation = { ok: true, value: solveOrientation(pm, g.axis, current) };
      const first = g.items[0]?.starts[0];
      if (first) {
        const sol = solutionsFor(pm, first, orientation.value, current);
        cost = travel(rotaryValues(pm, sol.solutions[sol.chosen]!), current);
      }
    } catch (e) {
      orientation = failure(e);
    }
    const better = cost[0] < best.cost[0] - 1e-9 || (Math.abs(cost[0] - best.cost[0]) <= 1e-9 && cost[1] < best.cost[1] - 1e-9);
    if (best.orientation === null || better) best = { index, cost, orientation };
  });
  return { index: best.index, orientation: best.orientation as Outcome<OrientationResult> };
}

/** Features of a group in a nearest-neighbour chain over their first starts, seen along the tool axis. */
function orderInGroup(g: Group): Planned[] {
  const u = perpendicular(g.axis);
  const v = normalize(cross(g.axis, u));
  return nearestNeighbourOrder(g.items, (it) => {
    const p = it.starts[0] ?? [0, 0, 0];
    return [dot(p, u), dot(p, v)];
  });
}

/**
 * `linearAxesMap` by rotary setting, remembering the last few settings (features of a
 * group mostly share one): the same angles give the very same map.
 */
function linearMapCache(pm: PreparedMachine): (rot: AxisValues) => LinearAxesMap {
  const names = pm.rotaries.map((x) => x.name);
  const recent: { rot: AxisValues; map: LinearAxesMap }[] = [];
  const sameAngles = (a: AxisValues, b: AxisValues): boolean => {
    for (const n of names) if (!Object.is(a[n], b[n])) return false;
    return true;
  };
  return (rot) => {
    for (const e of recent) if (sameAngles(e.rot, rot)) return e.map;
    const map = linearAxesMap(pm, rot);
    recent.unshift({ rot, map });
    if (recent.length > 4) recent.pop();
    return map;
  };
}

/** What placing a feature needs of the machine: the machine, linear maps by rotary setting, linear travel (travelOf). */
interface Placing { pm: PreparedMachine; mapFor: (rot: AxisValues) => LinearAxesMap; travel: number[] }

/** One rotary setting for the whole feature: least travel first, every path point inside travel. */
function pickRotaries(place: Placing, it: Planned, orientation: OrientationResult, current: AxisValues, path: FeaturePath): Outcome<AxisValues> {
  const { pm } = place;
  const first = it.starts[0];
  if (!first) return { ok: false, code: 'NO_POINTS', message: 'no touch points' };
  let sols: AxisValues[];
  try {
    const res = solutionsFor(pm, first, orientation, current);
    sols = [res.solutions[res.chosen]!, ...res.solutions.filter((_, i) => i !== res.chosen)];
  } catch (e) {
    return failure(e);
  }
  let firstProblem: Problem | null = null;
  for (const s of sols) {
    const rot = rotaryValues(pm, s);
    const problem = outsideTravel(place, place.mapFor(rot), it, path);
    if (!problem) return { ok: true, value: rot };
    firstProblem ??= problem;
  }
  return { ok: false, ...(firstProblem ?? { code: 'OUT_OF_LIMITS', message: 'out of travel' }) };
}

const WORDS = ['X', 'Y', 'Z'] as const;

/** Linear travel with its 1e-9 mm slack: [X min, X max, Y min, Y max, Z min, Z max]. */
const travelOf = (pm: PreparedMachine): number[] =>
  WORDS.flatMap((w) => [pm.machine.linear[w][0] - 1e-9, pm.machine.linear[w][1] + 1e-9]);

/** The first linear axis (0 X, 1 Y, 2 Z) outside `travel` for the part-frame tip (x, y, z), or -1. */
function axisOutside(travel: number[], map: LinearAxesMap, x: number, y: number, z: number): -1 | 0 | 1 | 2 {
  for (let k = 0 as 0 | 1 | 2; k < 3; k++) {
    const v = linearAxisAt(map, x, y, z, k);
    if (v < travel[2 * k]! || v > travel[2 * k + 1]!) return k;
  }
  return -1;
}

function firstOutside(pm: PreparedMachine, travel: number[], map: LinearAxesMap, pts: Vec3[]): Problem | null {
  for (const p of pts) {
    const k = axisOutside(travel, map, p[0], p[1], p[2]);
    if (k !== -1) return travelProblem(pm, map, p, k);
  }
  return null;
}

function travelProblem(pm: PreparedMachine, map: LinearAxesMap, p: Vec3, k: 0 | 1 | 2): Problem {
  const w = WORDS[k];
  const [lo, hi] = pm.machine.linear[w];
  return { code: 'OUT_OF_LIMITS', message: `${w} would be ${linearAxisOf(map, p, k).toFixed(3)} mm, outside its travel ${lo} to ${hi} mm` };
}

/**
 * The first point outside linear travel, in the order: starts, the points 1 mm past each
 * start toward its contact, then the path (safe-in, entry, before, after, exit, safe-out).
 */
function outsideTravel({ pm, travel }: Placing, map: LinearAxesMap, it: Planned, path: FeaturePath): Problem | null {
  const atStarts = firstOutside(pm, travel, map, it.starts);
  if (atStarts) return atStarts;
  for (let i = 0; i < it.contacts.length; i++) {
    const s = it.starts[i]!;
    const n = it.contacts[i]!.normal;
    // addScaled(s, n, -1), as scalars
    const x = s[0] + n[0] * -1;
    const y = s[1] + n[1] * -1;
    const z = s[2] + n[2] * -1;
    const k = axisOutside(travel, map, x, y, z);
    if (k !== -1) return travelProblem(pm, map, [x, y, z], k);
  }
  const ends = firstOutside(pm, travel, map, [path.safeIn, path.entry]);
  if (ends) return ends;
  for (const pts of path.before) {
    const problem = firstOutside(pm, travel, map, pts);
    if (problem) return problem;
  }
  for (const pts of path.after) {
    const problem = firstOutside(pm, travel, map, pts);
    if (problem) return problem;
  }
  return firstOutside(pm, travel, map, [path.exit, path.safeOut]);
}

function emitPoints(it: Planned, r: number, overtravel: number, rot: AxisValues, map: LinearAxesMap, out: TouchPoint[]): void {
  const uuidOf = touchPointNamer(it.f.uuid, geometryName(geometryKey(it.f)));
  // keys X, Y, Z, then the rotaries in chain order (as rot holds them)
  const keys: AxisValues = { X: 0, Y: 0, Z: 0, ...rot };
  for (let i = 0; i < it.contacts.length; i++) {
    const { surface, normal: n } = it.contacts[i]!;
    // addScaled(surface, n, r) and addScaled(target, n, -overtravel), written out (see `starts`)
    const target: Vec3 = [surface[0] + n[0] * r, surface[1] + n[1] * r, surface[2] + n[2] * r];
    const start = it.starts[i]!;
    const axes: AxisValues = { ...keys };
    axes.X = linearAxisOf(map, start, 0);
    axes.Y = linearAxisOf(map, start, 1);
    axes.Z = linearAxisOf(map, start, 2);
    out.push({
      uuid: uuidOf(i),
      featureUuid: it.f.uuid,
      seq: out.length,
      surface,
      normal: n,
      direction: [-n[0], -n[1], -n[2]],
      target,
      start,
      end: [target[0] + n[0] * -overtravel, target[1] + n[1] * -overtravel, target[2] + n[2] * -overtravel],
      toolAxis: it.axis,
      axes,
    });
  }
}
