/**
 * Machine model contract (spec/engine-cli.md, "Machine model"), as zod schemas.
 *
 * Frames: machine frame M is right-handed and fixed to the bed; the part frame P is
 * placed in M by `setup` with every rotary at 0. Millimetres and degrees at this
 * boundary; the kinematics converts to radians inside.
 */
import { z } from 'zod';

export const vec3Schema = z.tuple([z.number().finite(), z.number().finite(), z.number().finite()]);
export type Vec3 = [number, number, number];

/** A direction vector: any non-zero length, normalised by the engine. */
export const directionSchema = vec3Schema.refine(
  (v) => Math.hypot(v[0], v[1], v[2]) > 1e-12,
  { message: 'must be a non-zero direction vector' },
);

export const rotaryNameSchema = z.enum(['A', 'B', 'C']);
export type RotaryName = z.infer<typeof rotaryNameSchema>;

export const rotarySchema = z
  .object({
    name: rotaryNameSchema,
    carrier: z.enum(['table', 'head']),
    direction: directionSchema,
    point: vec3Schema,
    min: z.number().finite().nullable(),
    max: z.number().finite().nullable(),
  })
  .refine((r) => (r.min === null) === (r.max === null), {
    message: 'min and max must both be numbers (limited) or both null (continuous)',
    path: ['max'],
  })
  .refine((r) => r.min === null || r.max === null || r.min < r.max, {
    message: 'min must be less than max',
    path: ['min'],
  });
export type Rotary = z.infer<typeof rotarySchema>;

const rangeSchema = z
  .tuple([z.number().finite(), z.number().finite()])
  .refine((r) => r[0] < r[1], { message: 'travel must be [min, max] with min < max' });

export const machineSchema = z
  .object({
    name: z.string().min(1).max(200),
    rotaries: z.array(rotarySchema).max(2),
    linear: z.object({ X: rangeSchema, Y: rangeSchema, Z: rangeSchema }),
    setup: z.object({ origin: vec3Schema, xAxis: directionSchema, zAxis: directionSchema }),
  })
  .refine((m) => new Set(m.rotaries.map((r) => r.name)).size === m.rotaries.length, {
    message: 'rotary names must be distinct',
    path: ['rotaries'],
  })
  .refine(
    (m) => !(m.rotaries.length === 2 && m.rotaries[0]?.carrier === 'head' && m.rotaries[1]?.carrier === 'table'),
    { message: 'with one table and one head rotary, list the table axis first', path: ['rotaries'] },
  );
export type Machine = z.infer<typeof machineSchema>;

/** Axis values keyed by word: X, Y, Z and each rotary's name. */
export type AxisValues = Record<string, number>;
