/**
 * Part, feature, tolerance and probe contract (spec/engine-cli.md, "Parts, probes and
 * plans"), as zod schemas. All geometry is in the part frame P, millimetres.
 * A feature's `axis` (or a plane's `normal`) points out of the material, toward the
 * side the probe comes from.
 */
import { z } from 'zod';
import { directionSchema, vec3Schema } from '../kinematics/schema';

const positive = z.number().finite().positive();
const uuid = z.string().uuid();

const common = {
  uuid,
  label: z.string().min(1).max(40),
  /** Requested number of touch points (per level for bores and bosses). */
  points: z.number().int().positive().max(500).optional(),
  /** Depths below the top edge (bores) or below the top face (bosses), mm. */
  levels: z.array(z.number().finite().nonnegative()).min(1).max(20).optional(),
  /** Distance kept from edges, mm. */
  margin: z.number().finite().nonnegative().optional(),
  /** Angle of the first point on a circle, degrees, measured from the feature's reference direction. */
  startAngle: z.number().finite().optional(),
};

export const planeFeatureSchema = z.object({
  ...common,
  type: z.literal('plane'),
  origin: vec3Schema,
  normal: directionSchema,
  uDir: directionSchema,
  size: z.tuple([positive, positive]),
});

export const boreFeatureSchema = z.object({
  ...common,
  type: z.literal('bore'),
  center: vec3Schema,
  axis: directionSchema,
  diameter: positive,
  depth: positive,
});

export const bossFeatureSchema = z.object({
  ...common,
  type: z.literal('boss'),
  center: vec3Schema,
  axis: directionSchema,
  diameter: positive,
  height: positive,
});

const slotLike = {
  ...common,
  center: vec3Schema,
  axis: directionSchema,
  widthDir: directionSchema,
  width: positive,
  length: positive,
  depth: positive,
};

export const slotFeatureSchema = z.object({ ...slotLike, type: z.literal('slot') });
export const webFeatureSchema = z.object({ ...slotLike, type: z.literal('web') });

export const sphereFeatureSchema = z.object({
  ...common,
  type: z.literal('sphere'),
  center: vec3Schema,
  diameter: positive,
  axis: directionSchema,
});

export const featureSchema = z
  .discriminatedUnion('type', [
    planeFeatureSchema,
    boreFeatureSchema,
    bossFeatureSchema,
    slotFeatureSchema,
    webFeatureSchema,
    sphereFeatureSchema,
  ])
  .superRefine((f, ctx) => {
    if ((f.type === 'slot' || f.type === 'web') && f.width >= f.length) {
      ctx.addIssue({ code: 'custom', path: ['width'], message: `width (${f.width}) must be less than length (${f.length})` });
    }
  });
export type Feature = z.infer<typeof featureSchema>;
export type FeatureType = Feature['type'];

export const characteristicSchema = z.enum([
  'diameter', 'width', 'position', 'flatness', 'circularity', 'cylindricity',
  'perpendicularity', 'parallelism', 'profile',
]);
export type Characteristic = z.infer<typeof characteristicSchema>;

export const toleranceSchema = z.object({
  uuid,
  featureUuid: uuid,
  characteristic: characteristicSchema,
  /**
   * Geometric tolerances: the zone size, mm. Size tolerances (`diameter`, `width`):
   * the nominal size when it differs from the feature's own (default: the feature's).
   */
  value: z.number().finite().optional(),
  /**
   * Size tolerances: upper and lower deviations from nominal, mm (12 +0.018/0 is
   * upper 0.018, lower 0). Profile: an unequal zone, upper outward (+) and lower (−)
   * offsets from the nominal surface, used instead of `value`.
   */
  upper: z.number().finite().optional(),
  lower: z.number().finite().optional(),
  /** ISO 286 fit code for a size tolerance, e.g. "12H7" (resolved by the evaluation engine). */
  fit: z.string().max(20).optional(),
  material: z.enum(['MMC', 'LMC', 'RFS']).optional(),
  datums: z.array(z.string().regex(/^[A-Z]$/)).max(3).optional(),
});
export type Tolerance = z.infer<typeof toleranceSchema>;

export const partSchema = z.object({
  uuid: uuid.optional(),
  number: z.string().max(100).optional(),
  revision: z.string().max(20).optional(),
  material: z.string().max(60).optional(),
  features: z.array(featureSchema),
  tolerances: z.array(toleranceSchema).default([]),
  /** Datum letter → feature uuid. */
  datums: z.record(z.string().regex(/^[A-Z]$/), uuid).default({}),
});
export type Part = z.infer<typeof partSchema>;

export const probeSchema = z.object({
  stylusDiameter: positive,
  effectiveDiameter: positive.optional(),
  approach: positive,
  overtravel: positive,
  clearance: positive,
  fastFeed: positive,
  measureFeed: positive,
});
export type Probe = z.infer<typeof probeSchema>;
