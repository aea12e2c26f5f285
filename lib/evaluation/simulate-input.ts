/**
 * The `simulate` request: a plan, the part and probe it was planned for, an error model
 * of the part as made and of the machine, and a seed.
 */
import { z } from 'zod';
import { partSchema, probeSchema } from '../features/schema';
import { machineSchema, vec3Schema } from '../kinematics/schema';
import { planSchema } from '../program/plan-schema';

const finite = z.number().finite();

export const featureErrorSchema = z.object({
  /** The feature as made sits displaced by this vector, mm (part frame). */
  offset: vec3Schema.optional(),
  /** Made size minus nominal (diameter or width), mm. */
  sizeError: finite.optional(),
  /** Added to the nominal axis / normal before normalising (a small tilt; 0.001 ≈ 1 mrad). */
  tilt: vec3Schema.optional(),
  /** Standard deviation of the surface's random form error at each touch point, mm. */
  formNoise: finite.nonnegative().optional(),
  /** Lobing of a bore or boss: radius + amplitude·cos(order·θ + phase). */
  lobes: z.object({ order: z.number().int().min(2).max(50), amplitude: finite, phaseDeg: finite.default(0) }).optional(),
});
export type FeatureError = z.infer<typeof featureErrorSchema>;

export const errorModelSchema = z.object({
  features: z.record(z.string().uuid(), featureErrorSchema).default({}),
  /** Surface form noise on every feature without its own, mm (σ). */
  formNoise: finite.nonnegative().default(0),
  /** Actual ball radius minus the effective radius the plan assumed, mm. */
  probeRadiusError: finite.default(0),
  /** Actual minus commanded rotary positions, degrees (needs `machine`). */
  rotaryOffsets: z.record(z.string(), finite).default({}),
  /** The whole part sits displaced by this vector from where the work offset puts it, mm (part frame). */
  workOffsetError: vec3Schema.default([0, 0, 0]),
  /** Standard deviation of the probe's trigger repeatability along the path, mm. */
  repeatability: finite.nonnegative().default(0),
}).default({ features: {}, formNoise: 0, probeRadiusError: 0, rotaryOffsets: {}, workOffsetError: [0, 0, 0], repeatability: 0 });
export type ErrorModel = z.infer<typeof errorModelSchema>;

export const simulateInputSchema = z.object({
  part: partSchema,
  probe: probeSchema,
  plan: planSchema,
  machine: machineSchema.optional(),
  errors: errorModelSchema,
  seed: z.number().int().default(1),
}).superRefine((v, ctx) => {
  const names = Object.keys(v.errors.rotaryOffsets);
  if (names.length === 0) return;
  if (!v.machine) { ctx.addIssue({ code: 'custom', path: ['errors', 'rotaryOffsets'], message: 'rotary offsets need the machine' }); return; }
  const known = new Set(v.machine.rotaries.map((r) => r.name));
  names.filter((n) => !known.has(n as 'A' | 'B' | 'C')).forEach((n) => ctx.addIssue({ code: 'custom', path: ['errors', 'rotaryOffsets', n], message: `the machine has no rotary ${n}` }));
});
export type SimulateInput = z.infer<typeof simulateInputSchema>;
