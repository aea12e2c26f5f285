/**
 * What every characteristic sees while a run is evaluated: the part, each feature's
 * measurement (or why it has none), the datum alignment for a datum list, the material
 * and the requested methods. A characteristic returns a `RawResult`; `evaluate` adds
 * the uncertainty, the decision and the capability.
 */
import type { Feature, Part, Tolerance } from '../features/schema';
import type { Material } from '../capability/materials';
import type { TemperatureCorrection } from '../capability/temperature';
import { align, buildFrame, measuredDatum, nominalDatum, type Alignment, type Frame } from './datum-frame';
import type { EvaluateInput } from './input';
import type { FeatureMeasurement } from './measure-feature';
import type { Vec3 } from '../geometry/vec3';

export type MeasurementOrError = { ok: true; m: FeatureMeasurement } | { ok: false; feature: Feature; reason: string };

export interface EvalContext {
  part: Part;
  byFeature: Map<string, MeasurementOrError>;
  material: Material | null;
  input: EvaluateInput;
}

export interface RawResult {
  /** null: not evaluated, with `message`. */
  value: number | null;
  /** Specification limits on `value` for the decision (geometric: upper only). */
  lower: number | null;
  upper: number | null;
  method: string;
  message?: string;
  bonus?: number;
  virtualCondition?: number;
  materialCondition?: 'MMC' | 'LMC' | 'RFS';
  nominal?: number;
  /** Deviation of the feature's location from nominal, in the datum reference frame (position). */
  deviation?: Vec3;
  /** Extremes of the signed deviations (profile). */
  deviations?: { min: number; max: number };
  lengthMm: number;
  temperatureCorrection?: TemperatureCorrection;
}

export const notEvaluated = (message: string, method = 'none'): RawResult => ({ value: null, lower: null, upper: null, method, message, lengthMm: 0 });

export interface DatumAlignment { alignment: Alignment; nominal: Frame; measured: Frame; letters: string[] }

/** The measured-to-nominal alignment for a tolerance's datums (identity without datums), or why not. */
export function datumAlignment(ctx: EvalContext, tol: Tolerance): DatumAlignment | { error: string } {
  const letters = tol.datums ?? [];
  if (letters.length === 0) {
    const f: Frame = { origin: [0, 0, 0], x: [1, 0, 0], y: [0, 1, 0], z: [0, 0, 1] };
    return { alignment: align(f, f), nominal: f, measured: f, letters };
  }
  const nominals = [];
  const measured = [];
  for (const letter of letters) {
    const uuid = ctx.part.datums[letter];
    if (!uuid) return { error: `datum ${letter} is not assigned to a feature of the part` };
    const m = ctx.byFeature.get(uuid);
    if (!m) return { error: `datum ${letter} refers to a feature that is not on the part` };
    if (!m.ok) return { error: `datum ${letter} (${m.feature.label}) was not measured: ${m.reason}` };
    nominals.push(nominalDatum(m.m.feature));
    measured.push(measuredDatum(m.m.element));
  }
  const nominal = buildFrame(nominals);
  const meas = buildFrame(measured);
  return { alignment: align(meas, nominal), nominal, measured: meas, letters };
}
