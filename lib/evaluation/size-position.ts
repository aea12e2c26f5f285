/**
 * Size (`diameter`, `width`) and location (`position`) characteristics.
 * Position: diametral zone 2·√(Δx² + Δy²) of the axis (at both ends of its measured
 * length) in the plane across the nominal axis, in the datum reference frame; spherical
 * 2·|Δ| for a sphere; 2·|Δ| across the width for a slot or web. Bonus at MMC / LMC per
 * ASME Y14.5 [from memory, REFERENCES.md §3]: the departure of the actual size from the
 * material-condition size, added to the stated tolerance; the virtual condition is the
 * MMC (LMC) size ∓ the tolerance. The actual size for the bonus is the mating size
 * (Y14.5's actual mating envelope, with the least-squares axis direction): the largest
 * empty circle of a bore's contact points, the smallest enclosing circle of a boss's,
 * the narrowest (widest) pair of planes at the fitted orientation for a slot (web).
 * A sphere, or contact points that do not surround a centre, fall back to the
 * least-squares size, and the result says so.
 */
import type { Feature, Tolerance } from '../features/schema';
import { correctLength } from '../capability/temperature';
import { addScaled, dot, norm, normalize, reject, scale, sub, type Vec3 } from '../geometry/vec3';
import { FitCodeError, resolveFitCode } from './iso286';
import { circumscribedCircle, inscribedCircle } from '../fitting/mating';
import { FitError } from '../fitting/types';
import { datumAlignment, notEvaluated, type EvalContext, type RawResult } from './context';
import type { FeatureMeasurement } from './measure-feature';

export interface SizeLimits { nominal: number; upper: number; lower: number; source: string }

const isInternal = (f: Feature): boolean => f.type === 'bore' || f.type === 'slot';

function nominalSize(f: Feature): number | null {
  if (f.type === 'bore' || f.type === 'boss' || f.type === 'sphere') return f.diameter;
  if (f.type === 'slot' || f.type === 'web') return f.width;
  return null;
}

export function sizeLimits(tol: Tolerance, f: Feature): SizeLimits | { error: string } {
  if (tol.fit) {
    try {
      const r = resolveFitCode(tol.fit);
      const own = nominalSize(f);
      const clash = own !== null && Math.abs(own - r.nominal) > 1e-9 ? `; the feature's nominal is ${own} mm, the fit code's ${r.nominal} mm is used` : '';
      const kind = (r.kind === 'hole') !== isInternal(f) ? `; note: ${r.code} is a ${r.kind} code on an ${isInternal(f) ? 'internal' : 'external'} feature` : '';
      return { nominal: r.nominal, upper: r.upper, lower: r.lower, source: `ISO 286 ${r.code}: ${r.upperUm >= 0 ? '+' : ''}${r.upperUm}/${r.lowerUm >= 0 ? '+' : ''}${r.lowerUm} µm (tables)${clash}${kind}` };
    } catch (e) {
      if (e instanceof FitCodeError) return { error: e.message };
      throw e;
    }
  }
  const nominal = tol.value ?? nominalSize(f);
  if (nominal === null) return { error: `a ${f.type} has no size` };
  if (tol.upper === undefined || tol.lower === undefined) return { error: 'no size limits: give upper and lower deviations or an ISO 286 fit code' };
  if (tol.lower > tol.upper) return { error: `lower deviation ${tol.lower} is above upper deviation ${tol.upper}` };
  return { nominal, upper: tol.upper, lower: tol.lower, source: `${nominal} ${tol.upper >= 0 ? '+' : ''}${tol.upper}/${tol.lower >= 0 ? '+' : ''}${tol.lower} mm` };
}

/** Actual size of a measured feature (least squares, compensated), before temperature correction. */
export function measuredSize(m: FeatureMeasurement): number | null {
  const e = m.element;
  if (e.kind === 'axis' || e.kind === 'sphere') return e.diameter;
  if (e.kind === 'slot') return e.width;
  return null;
}

/** Mating size of a measured feature (before temperature correction), or null where none is defined. */
export function matingSize(m: FeatureMeasurement): { size: number; method: string } | null {
  const e = m.element;
  if (e.kind === 'axis') {
    try {
      const c = e.internal ? inscribedCircle(m.contacts, e.point, e.axis) : circumscribedCircle(m.contacts, e.point, e.axis);
      return { size: c.diameter, method: `${e.internal ? 'largest empty' : 'smallest enclosing'} circle of ${m.contacts.length} contact points across the least-squares axis` };
    } catch (err) {
      if (err instanceof FitError) return null;
      throw err;
    }
  }
  if (e.kind === 'slot') {
    let hiMin = Infinity, hiMax = -Infinity, loMin = Infinity, loMax = -Infinity;
    for (const c of m.contacts) {
      const d = dot(sub(c, e.mid), e.widthDir);
      if (d > 0) { hiMin = Math.min(hiMin, d); hiMax = Math.max(hiMax, d); } else { loMin = Math.min(loMin, d); loMax = Math.max(loMax, d); }
    }
    if (!Number.isFinite(hiMin) || !Number.isFinite(loMin)) return null;
    return { size: e.internal ? hiMin - loMax : hiMax - loMin, method: `${e.internal ? 'narrowest' : 'widest'} pair of planes across the fitted width direction` };
  }
  return null;
}

export function evaluateSize(ctx: EvalContext, tol: Tolerance, m: FeatureMeasurement): RawResult {
  const f = m.feature;
  const wants = tol.characteristic === 'width' ? ['slot', 'web'] : ['bore', 'boss', 'sphere'];
  if (!wants.includes(f.type)) return notEvaluated(`${tol.characteristic} does not apply to a ${f.type}`);
  const limits = sizeLimits(tol, f);
  if ('error' in limits) return notEvaluated(limits.error);
  const raw = measuredSize(m) as number;
  const t = correctLength(raw, ctx.input.conditions.partTemperatureC, ctx.material);
  return {
    value: t.value, lower: limits.nominal + limits.lower, upper: limits.nominal + limits.upper,
    nominal: limits.nominal, method: `${m.method}; limits ${limits.source}`, lengthMm: limits.nominal,
    temperatureCorrection: t.correction,
  };
}

function sizeToleranceOf(ctx: EvalContext, f: Feature): Tolerance | undefined {
  return ctx.part.tolerances.find((t) => t.featureUuid === f.uuid && (t.characteristic === 'diameter' || t.characteristic === 'width'));
}

interface Bonus { bonus: number; virtualCondition: number; note: string }

const LIMIT_EPS_MM = 1e-9;

function bonusFor(ctx: EvalContext, tol: Tolerance, m: FeatureMeasurement, zone: number): Bonus | { error: string } | null {
  const mat = tol.material ?? 'RFS';
  if (mat === 'RFS') return null;
  const sizeTol = sizeToleranceOf(ctx, m.feature);
  if (!sizeTol) return { error: `${mat} needs a size tolerance on ${m.feature.label}` };
  const limits = sizeLimits(sizeTol, m.feature);
  if ('error' in limits) return { error: `size tolerance of ${m.feature.label}: ${limits.error}` };
  const min = limits.nominal + limits.lower;
  const max = limits.nominal + limits.upper;
  const mating = matingSize(m);
  const actual = correctLength(mating?.size ?? (measuredSize(m) as number), ctx.input.conditions.partTemperatureC, ctx.material).value;
  const basis = mating ? `mating size (${mating.method})` : 'least-squares size (no mating envelope for this feature)';
  const internal = isInternal(m.feature);
  const mmc = mat === 'MMC';
  const conditionSize = internal === mmc ? min : max;
  const departure = internal === mmc ? actual - conditionSize : conditionSize - actual;
  const virtualCondition = internal === mmc ? conditionSize - zone : conditionSize + zone;
  // a size on a limit to within rounding (1e-9 mm) counts as on it
  if (departure < -LIMIT_EPS_MM || actual < min - LIMIT_EPS_MM || actual > max + LIMIT_EPS_MM) {
    return { bonus: 0, virtualCondition, note: `actual ${basis} ${actual.toFixed(4)} is outside ${min.toFixed(4)}–${max.toFixed(4)}: no bonus` };
  }
  return { bonus: Math.max(0, departure), virtualCondition, note: `bonus ${Math.max(0, departure).toFixed(4)} = departure of the actual ${basis} ${actual.toFixed(4)} from ${mat} ${conditionSize.toFixed(4)}` };
}

export function evaluatePosition(ctx: EvalContext, tol: Tolerance, m: FeatureMeasurement): RawResult {
  const f = m.feature;
  if (tol.value === undefined || !(tol.value >= 0)) return notEvaluated('position needs its zone size in `value`');
  if (f.type === 'plane') return notEvaluated('position of a plane is not evaluated: give it a profile tolerance');
  const drf = datumAlignment(ctx, tol);
  if ('error' in drf) return notEvaluated(drf.error);
  const origin = drf.nominal.origin;
  const temp = correctLength(1, ctx.input.conditions.partTemperatureC, ctx.material);
  const at20 = locate(m, (p) => addScaled(origin, sub(drf.alignment.point(p), origin), temp.value));
  if (!at20) return notEvaluated(`position is not evaluated for a ${f.type}`);
  const asMeasured = locate(m, (p) => drf.alignment.point(p)) as Located;
  const { value, deviation, kind } = at20;
  const b = bonusFor(ctx, tol, m, tol.value);
  if (b && 'error' in b) return notEvaluated(b.error);
  const bonus = b?.bonus ?? 0;
  const frameText = drf.letters.length ? `datums ${drf.letters.join('|')}` : 'part frame (no datums)';
  return {
    value, lower: null, upper: tol.value + bonus, method: `${kind} in the ${frameText}; ${m.method}`,
    bonus: b ? bonus : undefined, virtualCondition: b?.virtualCondition, materialCondition: tol.material ?? 'RFS',
    message: b?.note, deviation, lengthMm: Math.max(norm(sub(centerOf(f), origin)), measuredSize(m) ?? 0),
    temperatureCorrection: {
      ...temp.correction, correction: value - asMeasured.value,
      note: temp.correction.applied ? `locations from the datum origin scaled by ${temp.value.toFixed(8)} to 20 °C; the value changed by ${(value - asMeasured.value).toFixed(6)} mm` : temp.correction.note,
    },
  };
}

interface Located { value: number; deviation: Vec3; kind: string }

const centerOf = (f: Feature): Vec3 => (f.type === 'plane' ? f.origin : f.center);

/** Location value of a measured feature with its points placed by `place` (alignment, temperature). */
function locate(m: FeatureMeasurement, place: (p: Vec3) => Vec3): Located | null {
  const f = m.feature;
  const e = m.element;
  if (e.kind === 'axis' && (f.type === 'bore' || f.type === 'boss')) {
    const a = normalize(f.axis);
    const offs = e.ends.map((p) => norm(reject(sub(place(p), f.center), a)));
    return {
      value: 2 * Math.max(...offs), deviation: reject(sub(place(e.point), f.center), a),
      kind: e.ends.length > 1 ? 'diametral zone, axis at both ends of the measured length' : 'diametral zone, centre of one level',
    };
  }
  if (e.kind === 'sphere' && f.type === 'sphere') {
    const deviation = sub(place(e.center), f.center);
    return { value: 2 * norm(deviation), deviation, kind: 'spherical zone' };
  }
  if (e.kind === 'slot' && (f.type === 'slot' || f.type === 'web')) {
    const d = dot(sub(place(e.mid), f.center), e.widthDir);
    return { value: 2 * Math.abs(d), deviation: scale(e.widthDir, d), kind: 'zone across the width (mid-plane)' };
  }
  return null;
}
