import 'server-only';
/**
 * "Try a pose" on a stored machine model: forward (axis values → tip and tool
 * axis in the part frame) or inverse (tip and tool axis → every solution, the
 * chosen one marked, or the engine's reason in words). The maths is the engine's.
 */
import { forwardKinematics } from '@/lib/kinematics/forward';
import { inverseKinematics } from '@/lib/kinematics/inverse';
import { GeometryError } from '@/lib/geometry/vec3';
import type { AxisValues, Machine, Vec3 } from '@/lib/kinematics/schema';
import { engineMachineFor, type FkRequest, type IkRequest } from '@/lib/validation/machines';
import { AppError } from '@/lib/server/app-error';

export type FkResult = { mode: 'fk'; tip: Vec3; axis: Vec3 };
export type IkResult =
  | { mode: 'ik'; ok: true; solutions: AxisValues[]; chosen: number; singular: boolean }
  | { mode: 'ik'; ok: false; code: string; message: string };

const round = (v: number, places: number) => Number(v.toFixed(places));
const roundAxes = (a: AxisValues): AxisValues => Object.fromEntries(Object.entries(a).map(([k, v]) => [k, round(v, 6)]));

function checkWords(model: Machine, axes: AxisValues) {
  const known = new Set(['X', 'Y', 'Z', ...model.rotaries.map((r) => r.name)]);
  for (const word of Object.keys(axes)) {
    if (!known.has(word)) throw new AppError('invalid', `This machine has no ${word} axis (it has ${[...known].join(', ')}).`, { path: `body.axes.${word}` });
  }
}

export function tryForward(model: Machine, req: FkRequest): FkResult {
  checkWords(model, req.axes);
  const pose = forwardKinematics(engineMachineFor(model, req.probeLengthMm), req.axes);
  return { mode: 'fk', tip: pose.tip.map((v) => round(v, 6)) as Vec3, axis: pose.axis.map((v) => round(v, 9)) as Vec3 };
}

const reasons: Record<string, string> = {
  UNREACHABLE_ORIENTATION: 'No rotary angles give that tool axis on this machine',
  OUT_OF_LIMITS: 'Solutions exist, but none is inside the travel limits',
};

export function tryInverse(model: Machine, req: IkRequest): IkResult {
  if (req.previous) checkWords(model, req.previous);
  try {
    const r = inverseKinematics(engineMachineFor(model, req.probeLengthMm), req.tip, req.axis, req.previous ?? {});
    return { mode: 'ik', ok: true, solutions: r.solutions.map(roundAxes), chosen: r.chosen, singular: r.singular };
  } catch (error) {
    if (error instanceof GeometryError) {
      const lead = reasons[error.code];
      return { mode: 'ik', ok: false, code: error.code, message: lead ? `${lead}: ${error.message}.` : error.message };
    }
    throw error;
  }
}
