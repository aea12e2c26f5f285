/**
 * The `evaluate` request (spec/engine-cli.md, "evaluate"), as zod schemas, with the
 * optional measurement conditions, decision options and correction settings.
 */
import { z } from 'zod';
import { partSchema, probeSchema } from '../features/schema';
import { vec3Schema } from '../kinematics/schema';
import { planSchema } from '../program/plan-schema';
import { DEFAULT_WARNING_SHARE } from '../capability/decision';
import { MIN_TUR } from '../capability/risk';

export const measurementSchema = z.object({
  uuid: z.string().uuid(),
  /** Stylus-ball centre at trigger, part frame; absent when the move missed. */
  point: vec3Schema.optional(),
  miss: z.boolean().optional(),
});
export type Measurement = z.infer<typeof measurementSchema>;

const finite = z.number().finite();
const nonNeg = finite.nonnegative();

export const conditionsSchema = z.object({
  probeRepeatability2Sigma: nonNeg.optional(),
  effectiveDiameterU: nonNeg.optional(),
  machine: z.object({ aUm: nonNeg, bMm: finite.positive() }).optional(),
  partTemperatureC: finite.min(-50).max(150).optional(),
  temperatureUncertaintyK: nonNeg.optional(),
  alphaRelativeUncertainty: nonNeg.optional(),
  assumedRangeK: nonNeg.optional(),
}).default({});

export const formMethodSchema = z.enum(['minimum-zone', 'least-squares']);

export const correctionSettingsSchema = z.object({
  dialect: z.string().min(1).default('ngc'),
  workOffset: z.object({
    /** Register number: 1 = G54 … 6 = G59. */
    register: z.number().int().min(1).max(9),
    current: vec3Schema,
    deadBand: nonNeg.default(0.005),
    cap: finite.positive().default(0.5),
    /** Rotation of the part frame in the machine (setup.xAxis/zAxis); default identity. */
    xAxis: vec3Schema.optional(),
    zAxis: vec3Schema.optional(),
  }).optional(),
  wear: z.array(z.object({
    featureUuid: z.string().uuid(),
    tool: z.number().int().min(1).max(9999),
    /** Current radius wear (or tool-table radius on controls without a wear register), mm. */
    current: finite,
    deadBand: nonNeg.default(0.004),
    cap: finite.positive().default(0.1),
  })).default([]),
});
export type CorrectionSettings = z.infer<typeof correctionSettingsSchema>;

export const evaluateInputSchema = z.object({
  part: partSchema,
  probe: probeSchema,
  plan: planSchema,
  measurements: z.array(measurementSchema),
  conditions: conditionsSchema,
  options: z.object({
    formMethod: formMethodSchema.default('minimum-zone'),
    /** Per-tolerance override of the form method. */
    methods: z.record(z.string(), formMethodSchema).default({}),
    warningShare: finite.gt(0).max(1).default(DEFAULT_WARNING_SHARE),
    minTur: finite.positive().default(MIN_TUR),
  }).default({ formMethod: 'minimum-zone', methods: {}, warningShare: DEFAULT_WARNING_SHARE, minTur: MIN_TUR }),
  corrections: correctionSettingsSchema.optional(),
});
export type EvaluateInput = z.infer<typeof evaluateInputSchema>;
export type EvaluateOptions = EvaluateInput['options'];
