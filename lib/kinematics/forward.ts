/**
 * Forward kinematics, exactly as spec/engine-cli.md defines it (product of exponentials;
 * Murray, Li & Sastry 1994, ch. 3):
 *
 *   tip_M  = (X, Y, Z) + Rot(h1, θh1) ∘ Rot(h2, θh2) (0, 0, 0)
 *   axis_M = rotation part of the same head product applied to +Z
 *   tip_P  = S⁻¹ ∘ Rot(t2, θt2)⁻¹ ∘ Rot(t1, θt1)⁻¹ (tip_M)
 *
 * Rot(a, θ) turns about rotary a's line (as at all-rotaries-zero) by θ, right-hand rule.
 * Axis values: X, Y, Z in mm, rotaries in degrees keyed by their letter (missing = 0).
 */
import { add, sub, type Vec3 } from '../geometry/vec3';
import { applyMat, applyMatT, axisAngle, toRad, type Mat3 } from '../geometry/rotation';
import { prepareMachine, type PreparedMachine, type PreparedRotary } from './machine';
import type { AxisValues, Machine } from './schema';

export interface Pose {
  /** Stylus-ball centre. */
  tip: Vec3;
  /** Unit vector from the tip toward the spindle. */
  axis: Vec3;
}

const angleOf = (axes: AxisValues, r: PreparedRotary): number => toRad(axes[r.name] ?? 0);

/** Rotation matrices of a list of rotaries at the given axis values. */
export const rotationsAt = (list: PreparedRotary[], axes: AxisValues): Mat3[] =>
  list.map((r) => axisAngle(r.w, angleOf(axes, r)));

/** Head product applied to the tip at zero: offset of the tip from (X, Y, Z), and the tool axis, in M. */
export function headOffset(pm: PreparedMachine, axes: AxisValues): Pose {
  let v: Vec3 = [0, 0, 0];
  let a: Vec3 = [0, 0, 1];
  for (let i = pm.heads.length - 1; i >= 0; i--) {
    const h = pm.heads[i] as PreparedRotary;
    const R = axisAngle(h.w, angleOf(axes, h));
    v = add(applyMat(R, sub(v, h.p)), h.p);
    a = applyMat(R, a);
  }
  return { tip: v, axis: a };
}

/** Machine-frame point → part frame at the given table angles. */
export function machineToPart(pm: PreparedMachine, axes: AxisValues, tipM: Vec3, axisM: Vec3): Pose {
  let q = tipM;
  let d = axisM;
  for (const t of pm.tables) {
    const R = axisAngle(t.w, angleOf(axes, t));
    q = add(applyMatT(R, sub(q, t.p)), t.p);
    d = applyMatT(R, d);
  }
  return { tip: applyMatT(pm.setupR, sub(q, pm.setupOrigin)), axis: applyMatT(pm.setupR, d) };
}

/** Part-frame point (or direction, with `isDirection`) → machine frame at the given table angles. */
export function partToMachine(pm: PreparedMachine, axes: AxisValues, p: Vec3, isDirection = false): Vec3 {
  return partToMachineWith(pm, rotationsAt(pm.tables, axes), p, isDirection);
}

/** `partToMachine` with the tables' rotation matrices (`rotationsAt(pm.tables, axes)`) given, for many points. */
export function partToMachineWith(pm: PreparedMachine, tableRotations: Mat3[], p: Vec3, isDirection = false): Vec3 {
  // q = S·p (+ origin), then for each table from the part outward: q = R·(q − c) + c
  // (R·q for a direction); the same products and sums as applyMat, sub and add, as scalars
  const S = pm.setupR;
  let x = S[0] * p[0] + S[1] * p[1] + S[2] * p[2];
  let y = S[3] * p[0] + S[4] * p[1] + S[5] * p[2];
  let z = S[6] * p[0] + S[7] * p[1] + S[8] * p[2];
  if (!isDirection) {
    x = x + pm.setupOrigin[0];
    y = y + pm.setupOrigin[1];
    z = z + pm.setupOrigin[2];
  }
  for (let i = pm.tables.length - 1; i >= 0; i--) {
    const c = (pm.tables[i] as PreparedRotary).p;
    const R = tableRotations[i] as Mat3;
    const dx = isDirection ? x : x - c[0];
    const dy = isDirection ? y : y - c[1];
    const dz = isDirection ? z : z - c[2];
    x = R[0] * dx + R[1] * dy + R[2] * dz;
    y = R[3] * dx + R[4] * dy + R[5] * dz;
    z = R[6] * dx + R[7] * dy + R[8] * dz;
    if (!isDirection) {
      x = x + c[0];
      y = y + c[1];
      z = z + c[2];
    }
  }
  return [x, y, z];
}

/** `fk`: axis values → tip and tool axis in the part frame. Also turns a trip record back into a part-frame point. */
export function forwardKinematics(machine: Machine | PreparedMachine, axes: AxisValues): Pose {
  const pm = prepareMachine(machine);
  const head = headOffset(pm, axes);
  const tipM: Vec3 = [(axes.X ?? 0) + head.tip[0], (axes.Y ?? 0) + head.tip[1], (axes.Z ?? 0) + head.tip[2]];
  return machineToPart(pm, axes, tipM, head.axis);
}
