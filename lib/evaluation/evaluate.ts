/**
 * `evaluate`: a plan's touch points and the trip points a machine reported → one
 * compensated fit per feature and one result per tolerance, each with its value,
 * limits, bonus, uncertainty budget (U, k = 2), ISO 14253-1 decision, capability
 * (TUR), method, temperature correction and the touch points it rests on.
 */
import type { Characteristic, Feature, Tolerance } from '../features/schema';
import type { TouchPoint } from '../program/plan-schema';
import { findMaterial } from '../capability/materials';
import { decide, type Decision, type DecisionRule, type Status } from '../capability/decision';
import { capability, type Capability } from '../capability/risk';
import type { TemperatureCorrection } from '../capability/temperature';
import { uncertaintyBudget, type UncertaintyBudget } from '../capability/uncertainty';
import { FitError } from '../fitting/types';
import { notEvaluated, type EvalContext, type MeasurementOrError, type RawResult } from './context';
import { evaluateForm, evaluateOrientation, evaluateProfile } from './form-orientation';
import type { EvaluateInput } from './input';
import { effectiveRadius, measureFeature, type MeasuredPoint } from './measure-feature';
import { summariseFeature, type FeatureSummary } from './feature-summary';
import { evaluatePosition, evaluateSize } from './size-position';
import { proposeCorrections, type Corrections } from './corrections';

/** What a result carries over from its characteristic's raw evaluation, as it was computed. */
type Carried = Pick<RawResult, 'value' | 'lower' | 'upper' | 'bonus' | 'virtualCondition' | 'materialCondition' | 'nominal' | 'deviation' | 'deviations'>;

export interface ResultRecord extends Carried {
  toleranceUuid: string;
  featureUuid: string;
  label: string;
  characteristic: Characteristic;
  /** Geometric: the zone (with bonus); size and unequal profile: [lower, upper]. */
  limit: number | [number, number] | null;
  status: Status;
  message?: string;
  uncertainty: UncertaintyBudget | null;
  decisionRule: DecisionRule | null;
  capability: Capability | null;
  method: string;
  touchPointUuids: string[];
  temperatureCorrection: TemperatureCorrection | null;
}

export interface EvaluateWarning { code: string; message: string; uuid?: string }

export interface EvaluateOutput {
  features: FeatureSummary[];
  results: ResultRecord[];
  warnings: EvaluateWarning[];
  corrections?: Corrections;
}

export function evaluateRun(input: EvaluateInput): EvaluateOutput {
  const { part, probe, plan } = input;
  const warnings: EvaluateWarning[] = [];
  const tpByUuid = new Map<string, TouchPoint>(plan.touchPoints.map((t) => [t.uuid, t]));
  const pointsByFeature = new Map<string, MeasuredPoint[]>();
  const seen = new Set<string>();
  for (const m of input.measurements) {
    const tp = tpByUuid.get(m.uuid);
    if (!tp) { warnings.push({ code: 'UNKNOWN_TOUCH_POINT', uuid: m.uuid, message: `measurement ${m.uuid} matches no touch point of the plan: ignored` }); continue; }
    if (seen.has(m.uuid)) { warnings.push({ code: 'DUPLICATE_MEASUREMENT', uuid: m.uuid, message: `touch point ${m.uuid} was reported twice: the first is used` }); continue; }
    seen.add(m.uuid);
    if (m.miss || !m.point) { warnings.push({ code: 'MISSED_POINT', uuid: m.uuid, message: `touch point ${m.uuid} (seq ${tp.seq}) did not trigger: left out` }); continue; }
    const list = pointsByFeature.get(tp.featureUuid) ?? [];
    list.push({ tp, centre: m.point });
    pointsByFeature.set(tp.featureUuid, list);
  }
  const r = effectiveRadius(probe);
  const byFeature = new Map<string, MeasurementOrError>();
  for (const f of part.features) byFeature.set(f.uuid, measureOne(f, pointsByFeature.get(f.uuid) ?? [], r));
  const ctx: EvalContext = { part, byFeature, material: findMaterial(part.material), input };
  if (input.conditions.partTemperatureC !== undefined && !ctx.material) {
    warnings.push({ code: 'UNKNOWN_MATERIAL', message: `part material "${part.material ?? ''}" is not in the material table: lengths not corrected to 20 °C` });
  }
  const results = part.tolerances.map((t) => evaluateTolerance(ctx, t));
  const features = part.features.map((f) => summariseFeature(f, byFeature.get(f.uuid) as MeasurementOrError, plan.touchPoints.filter((t) => t.featureUuid === f.uuid).length));
  const out: EvaluateOutput = { features, results, warnings };
  if (input.corrections) out.corrections = proposeCorrections(ctx, results, input.corrections);
  return out;
}

function measureOne(f: Feature, points: MeasuredPoint[], r: number): MeasurementOrError {
  if (points.length === 0) return { ok: false, feature: f, reason: 'no measured points' };
  try {
    return { ok: true, m: measureFeature(f, points, r) };
  } catch (e) {
    if (e instanceof FitError) return { ok: false, feature: f, reason: `${e.message} (${e.code})` };
    throw e;
  }
}

function raw(ctx: EvalContext, tol: Tolerance): RawResult {
  const m = ctx.byFeature.get(tol.featureUuid);
  if (!m) return notEvaluated(`tolerance refers to feature ${tol.featureUuid}, which is not on the part`);
  if (!m.ok) return notEvaluated(`${m.feature.label} was not measured: ${m.reason}`);
  switch (tol.characteristic) {
    case 'diameter':
    case 'width': return evaluateSize(ctx, tol, m.m);
    case 'position': return evaluatePosition(ctx, tol, m.m);
    case 'flatness':
    case 'circularity':
    case 'cylindricity': return evaluateForm(ctx, tol, m.m);
    case 'perpendicularity':
    case 'parallelism': return evaluateOrientation(ctx, tol, m.m);
    case 'profile': return evaluateProfile(ctx, tol, m.m);
  }
}

const RANK: Record<Status, number> = { conforming: 0, marginal: 1, nonconforming: 2, 'not-evaluated': 3 };

function evaluateTolerance(ctx: EvalContext, tol: Tolerance): ResultRecord {
  const m = ctx.byFeature.get(tol.featureUuid);
  const label = m ? (m.ok ? m.m.feature.label : m.feature.label) : '?';
  const touchPointUuids = m && m.ok ? m.m.points.map((p) => p.tp.uuid) : ctx.input.plan.touchPoints.filter((t) => t.featureUuid === tol.featureUuid).map((t) => t.uuid);
  const res = raw(ctx, tol);
  const base = { toleranceUuid: tol.uuid, featureUuid: tol.featureUuid, label, characteristic: tol.characteristic, touchPointUuids, method: res.method };
  if (res.value === null) {
    return { ...base, value: null, limit: null, lower: null, upper: null, status: 'not-evaluated', message: res.message, uncertainty: null, decisionRule: null, capability: null, temperatureCorrection: null };
  }
  const budget = uncertaintyBudget({ characteristic: tol.characteristic, points: touchPointUuids.length, lengthMm: res.lengthMm, alphaPerK: ctx.material?.alphaPerK ?? null, conditions: ctx.input.conditions });
  const share = ctx.input.options.warningShare;
  let decision: Decision = decide(res.value, res.lower, res.upper, budget.U, share);
  if (res.deviations && res.lower !== null) {
    const other = decide(res.deviations.min === res.value ? res.deviations.max : res.deviations.min, res.lower, res.upper, budget.U, share);
    if (RANK[other.status] > RANK[decision.status]) decision = other;
  }
  const twoSided = res.lower !== null && res.upper !== null;
  const span = twoSided ? (res.upper as number) - (res.lower as number) : (res.upper ?? 0);
  const message = [res.message, decision.status !== 'conforming' ? decision.reason : undefined].filter(Boolean).join('; ');
  return {
    ...base, value: res.value,
    limit: twoSided ? [res.lower as number, res.upper as number] : res.upper,
    lower: res.lower, upper: res.upper, bonus: res.bonus, virtualCondition: res.virtualCondition, materialCondition: res.materialCondition,
    nominal: res.nominal, deviation: res.deviation, deviations: res.deviations,
    status: decision.status, ...(message ? { message } : {}),
    uncertainty: budget, decisionRule: decision.decisionRule,
    capability: capability(span, budget.U, ctx.input.options.minTur),
    temperatureCorrection: res.temperatureCorrection ?? { applied: false, partTemperatureC: ctx.input.conditions.partTemperatureC ?? null, material: ctx.material?.id ?? null, alphaPerK: ctx.material?.alphaPerK ?? null, correction: 0, note: 'form and orientation values are not corrected for temperature' },
  };
}
