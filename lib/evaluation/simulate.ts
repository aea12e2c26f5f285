/**
 * `simulate`: the trip points a machine would report for a part made with the given
 * errors. Each probing move (start → end, a ball of the actual radius) is intersected
 * with the actual surface of the mis-made feature; the machine reports where it
 * believes the ball centre was at that moment (the commanded path), so machine errors
 * (rotary offsets, a wrong work offset) show up in the points the way they would on
 * the machine. A move that reaches its end without contact, or starts inside the
 * material, is a miss. Reproducible: all randomness comes from the seed, drawn in plan
 * order.
 */
import type { Feature } from '../features/schema';
import type { TouchPoint } from '../program/plan-schema';
import { forwardKinematics } from '../kinematics/forward';
import { linearAxesFor } from '../kinematics/inverse';
import type { Machine } from '../kinematics/schema';
import { add, addScaled, dot, norm, normalize, reject, sub, type Vec3 } from '../geometry/vec3';
import { completeFrame } from '../fitting/frame';
import { effectiveRadius } from './measure-feature';
import { createRng } from './prng';
import type { ErrorModel, FeatureError, SimulateInput } from './simulate-input';

export type SimulatedMeasurement =
  | { uuid: string; point: Vec3 }
  | { uuid: string; miss: true; reason: string };

export interface SimulateOutput { measurements: SimulatedMeasurement[]; hits: number; misses: number; seed: number }

const WALL_COS = 0.5;

export function simulateRun(input: SimulateInput): SimulateOutput {
  const rng = createRng(input.seed);
  const features = new Map(input.part.features.map((f) => [f.uuid, f]));
  const rho = effectiveRadius(input.probe) + input.errors.probeRadiusError;
  const measurements = input.plan.touchPoints.map((tp): SimulatedMeasurement => {
    const f = features.get(tp.featureUuid);
    const noise = rng.normal(1);
    const trig = rng.normal(1);
    if (!f) return { uuid: tp.uuid, miss: true, reason: 'touch point of a feature that is not on the part' };
    const fe = input.errors.features[f.uuid] ?? {};
    const path = actualPath(tp, input.machine, input.errors);
    const eps = noise * (fe.formNoise ?? input.errors.formNoise);
    const t = contact(f, fe, tp, path, rho, eps, input.errors.workOffsetError);
    if (typeof t === 'string') return { uuid: tp.uuid, miss: true, reason: t };
    const frac = Math.min(1, Math.max(0, t / path.length + (trig * input.errors.repeatability) / path.length));
    return { uuid: tp.uuid, point: addScaled(tp.start, sub(tp.end, tp.start), frac) };
  });
  const misses = measurements.filter((m) => 'miss' in m).length;
  return { measurements, hits: measurements.length - misses, misses, seed: input.seed };
}

interface Path { start: Vec3; dir: Vec3; length: number }

/** The path the ball really takes relative to the part (rotary offsets move it). */
function actualPath(tp: TouchPoint, machine: Machine | undefined, errors: ErrorModel): Path {
  let start = tp.start;
  let end = tp.end;
  const offsets = Object.entries(errors.rotaryOffsets).filter(([, v]) => v !== 0);
  if (machine && offsets.length > 0) {
    const rot: Record<string, number> = {};
    for (const r of machine.rotaries) rot[r.name] = tp.axes[r.name] ?? 0;
    const actual = { ...rot };
    for (const [name, v] of offsets) actual[name] = (actual[name] ?? 0) + v;
    const endLinear = linearAxesFor(machine, tp.end, rot);
    start = forwardKinematics(machine, { ...tp.axes, ...actual }).tip;
    end = forwardKinematics(machine, { ...endLinear, ...actual }).tip;
  }
  const d = sub(end, start);
  const length = norm(d);
  return { start, dir: normalize(d), length };
}

/** Distance along the path to contact, or why there is none. */
function contact(f: Feature, fe: FeatureError, tp: TouchPoint, path: Path, rho: number, eps: number, shiftAll: Vec3): number | string {
  const offset = add(fe.offset ?? [0, 0, 0], shiftAll);
  const half = (fe.sizeError ?? 0) / 2;
  const tilt = (v: Vec3): Vec3 => normalize(add(normalize(v), fe.tilt ?? [0, 0, 0]));
  const n = normalize(tp.normal);
  switch (f.type) {
    case 'plane':
      return planeContact(path, add(f.origin, offset), tilt(f.normal), eps, rho);
    case 'bore':
    case 'boss': {
      const axis = tilt(f.axis);
      const c = add(f.center, offset);
      if (Math.abs(dot(n, normalize(f.axis))) >= WALL_COS) {
        return planeContact(path, add(tp.surface, offset), dot(n, axis) > 0 ? axis : [-axis[0], -axis[1], -axis[2]], eps, rho);
      }
      let radius = f.diameter / 2 + half + eps;
      if (fe.lobes) {
        const { u, v } = completeFrame(normalize(f.axis));
        const rel = sub(tp.surface, f.center);
        const theta = Math.atan2(dot(rel, v), dot(rel, u));
        radius += fe.lobes.amplitude * Math.cos(fe.lobes.order * theta + (fe.lobes.phaseDeg * Math.PI) / 180);
      }
      return f.type === 'bore' ? radialContact(path, c, axis, radius - rho, true) : radialContact(path, c, axis, radius + rho, false);
    }
    case 'sphere':
      return radialContact(path, add(f.center, offset), null, f.diameter / 2 + half + eps + rho, false);
    case 'slot':
    case 'web': {
      const w = tilt(f.widthDir);
      const side = dot(n, normalize(f.widthDir));
      if (Math.abs(side) <= WALL_COS) return planeContact(path, add(tp.surface, offset), n, eps, rho);
      // A slot's wall at +width/2 faces −w (toward the centre); a web's faces +w.
      const s = Math.sign(side);
      const wallPoint = addScaled(add(f.center, offset), w, (f.type === 'slot' ? -s : s) * (f.width / 2 + half));
      return planeContact(path, wallPoint, [w[0] * s, w[1] * s, w[2] * s], eps, rho);
    }
  }
}

function planeContact(path: Path, point: Vec3, outward: Vec3, eps: number, rho: number): number | string {
  const g0 = dot(sub(path.start, point), outward) - eps - rho;
  if (g0 < 0) return 'the move starts inside the material (collision on approach)';
  const rate = dot(path.dir, outward);
  if (rate >= 0) return 'the move runs away from the surface';
  const t = -g0 / rate;
  return t <= path.length ? t : 'no contact before the end of the move (overtravel exhausted)';
}

/** Ball centre reaching distance k from an axis (or, with axis null, from a point). */
function radialContact(path: Path, c: Vec3, axis: Vec3 | null, k: number, fromInside: boolean): number | string {
  if (!(k > 0)) return 'the ball is larger than the bore';
  const p = axis ? reject(sub(path.start, c), axis) : sub(path.start, c);
  const q = axis ? reject(path.dir, axis) : path.dir;
  const a = dot(q, q);
  const b = 2 * dot(p, q);
  const c0 = dot(p, p) - k * k;
  if (fromInside ? c0 > 0 : c0 < 0) return 'the move starts inside the material (collision on approach)';
  const disc = b * b - 4 * a * c0;
  if (a < 1e-18 || disc < 0) return 'no contact before the end of the move (the path misses the surface)';
  const sq = Math.sqrt(disc);
  const t = fromInside ? (-b + sq) / (2 * a) : (-b - sq) / (2 * a);
  if (t < 0) return 'the move runs away from the surface';
  return t <= path.length ? t : 'no contact before the end of the move (overtravel exhausted)';
}

