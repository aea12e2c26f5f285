/**
 * Capability advice per tolerance before anything is machined: the tolerance span
 * against the expected expanded uncertainty of its measurement on this machine with
 * this probe and point count; TUR = span / (2U), on-machine advised at TUR ≥ 4, else
 * "send to the CMM" (REFERENCES.md §7).
 */
import type { Feature, Part, Tolerance } from '../features/schema';
import { findMaterial } from '../capability/materials';
import { capability, MIN_TUR, type Capability } from '../capability/risk';
import { uncertaintyBudget, type MeasurementConditions, type UncertaintyBudget } from '../capability/uncertainty';
import type { Plan } from '../program/plan-schema';
import { norm } from '../geometry/vec3';
import { sizeLimits } from './size-position';

export interface ToleranceAdvice {
  toleranceUuid: string;
  featureUuid: string;
  characteristic: Tolerance['characteristic'];
  points: number;
  span: number | null;
  budget: UncertaintyBudget | null;
  capability: Capability | null;
  message: string;
}

function lengthFor(f: Feature, tol: Tolerance): number {
  if (tol.characteristic === 'position') return norm('center' in f ? f.center : f.origin);
  if (f.type === 'plane') return Math.hypot(f.size[0], f.size[1]);
  if (f.type === 'slot' || f.type === 'web') return tol.characteristic === 'width' ? f.width : f.length;
  return f.diameter;
}

function spanOf(tol: Tolerance, f: Feature): number | { error: string } {
  if (tol.characteristic === 'diameter' || tol.characteristic === 'width') {
    const l = sizeLimits(tol, f);
    return 'error' in l ? l : l.upper - l.lower;
  }
  if (tol.characteristic === 'profile' && tol.upper !== undefined && tol.lower !== undefined) return tol.upper - tol.lower;
  if (tol.value === undefined || !(tol.value > 0)) return { error: 'no zone size given' };
  return tol.value;
}

export function adviseCapability(part: Part, plan: Plan, conditions: MeasurementConditions = {}, minTur = MIN_TUR): ToleranceAdvice[] {
  const material = findMaterial(part.material);
  return part.tolerances.map((tol) => {
    const f = part.features.find((x) => x.uuid === tol.featureUuid);
    const points = plan.touchPoints.filter((t) => t.featureUuid === tol.featureUuid).length;
    const base = { toleranceUuid: tol.uuid, featureUuid: tol.featureUuid, characteristic: tol.characteristic, points };
    if (!f) return { ...base, span: null, budget: null, capability: null, message: 'the tolerance names no feature of the part' };
    if (points === 0) return { ...base, span: null, budget: null, capability: null, message: `${f.label} has no planned touch points` };
    const span = spanOf(tol, f);
    if (typeof span !== 'number') return { ...base, span: null, budget: null, capability: null, message: span.error };
    const budget = uncertaintyBudget({ characteristic: tol.characteristic, points, lengthMm: lengthFor(f, tol), alphaPerK: material?.alphaPerK ?? null, conditions });
    const cap = capability(span, budget.U, minTur);
    return { ...base, span, budget, capability: cap, message: cap.message };
  });
}
