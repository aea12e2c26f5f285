/**
 * Parts, features, tolerances and datum letters as the app edits them. The
 * geometry and tolerance fields come from the engine contract
 * (lib/features/schema.ts); the app adds the part header, and the server assigns
 * uuids, so the input variants here leave them out.
 */
import { z } from 'zod';
import {
  planeFeatureSchema, boreFeatureSchema, bossFeatureSchema, slotFeatureSchema,
  webFeatureSchema, sphereFeatureSchema, toleranceSchema,
  type Characteristic, type FeatureType,
} from '../features/schema';

/** Ids of stored records (parts, machines, probes, programs, revisions). */
export const recordIdSchema = z.string().trim().min(1, 'an id is required').max(64);

export const partHeaderSchema = z.object({
  name: z.string().trim().min(1, 'give the part a name').max(200),
  number: z.string().trim().min(1, 'give the part number').max(100),
  revision: z.string().trim().min(1, 'give the drawing revision').max(20),
  material: z.string().trim().max(60).default(''),
  notes: z.string().max(4000).default(''),
});
export type PartHeaderInput = z.input<typeof partHeaderSchema>;
export type PartHeader = z.output<typeof partHeaderSchema>;

const noUuid = { uuid: true } as const;

/** A feature without its uuid: what a form or a CSV row supplies. */
export const featureInputSchema = z
  .discriminatedUnion('type', [
    planeFeatureSchema.omit(noUuid),
    boreFeatureSchema.omit(noUuid),
    bossFeatureSchema.omit(noUuid),
    slotFeatureSchema.omit(noUuid),
    webFeatureSchema.omit(noUuid),
    sphereFeatureSchema.omit(noUuid),
  ])
  .superRefine((f, ctx) => {
    if ((f.type === 'slot' || f.type === 'web') && f.width >= f.length) {
      ctx.addIssue({ code: 'custom', path: ['width'], message: `width (${f.width}) must be less than length (${f.length})` });
    }
  });
export type FeatureInput = z.infer<typeof featureInputSchema>;

export const featureTypes: readonly FeatureType[] = ['plane', 'bore', 'boss', 'slot', 'web', 'sphere'];

const characteristicsByType: Record<FeatureType, readonly Characteristic[]> = {
  plane: ['flatness', 'perpendicularity', 'parallelism', 'profile'],
  bore: ['diameter', 'position', 'circularity', 'cylindricity', 'perpendicularity', 'parallelism', 'profile'],
  boss: ['diameter', 'position', 'circularity', 'cylindricity', 'perpendicularity', 'parallelism', 'profile'],
  slot: ['width', 'position', 'perpendicularity', 'parallelism', 'profile'],
  web: ['width', 'position', 'perpendicularity', 'parallelism', 'profile'],
  sphere: ['diameter', 'position', 'profile'],
};

/** The characteristics that make sense on a feature type. */
export function characteristicsFor(type: FeatureType): readonly Characteristic[] {
  return characteristicsByType[type];
}

export const sizeCharacteristics: readonly Characteristic[] = ['diameter', 'width'];
const datumReferenced: readonly Characteristic[] = ['position', 'perpendicularity', 'parallelism', 'profile'];

/** An ISO 286 fit code: nominal size, deviation letter(s), grade — `12H7`, `25 g6`, `8JS9`. */
export const fitCodePattern = /^(\d+(?:\.\d+)?)\s*([A-Za-z]{1,2})(\d{1,2})$/;

/** A tolerance without uuid and feature uuid (the feature is given by the URL or the CSV label). */
export const toleranceInputSchema = toleranceSchema
  .omit({ uuid: true, featureUuid: true })
  .extend({
    fit: z.string().trim().regex(fitCodePattern, 'a fit code is size, letters and grade, like 12H7').optional(),
    value: z.number().finite().positive('the tolerance must be greater than zero').optional(),
  })
  .superRefine((t, ctx) => {
    const isSize = sizeCharacteristics.includes(t.characteristic);
    if (isSize) {
      const hasLimits = t.upper !== undefined && t.lower !== undefined;
      if (!hasLimits && t.fit === undefined) {
        ctx.addIssue({ code: 'custom', path: ['upper'], message: 'a size tolerance needs upper and lower deviations or a fit code' });
      }
      if (hasLimits && t.fit !== undefined) {
        ctx.addIssue({ code: 'custom', path: ['fit'], message: 'give either deviations or a fit code, not both' });
      }
      if (hasLimits && (t.upper ?? 0) <= (t.lower ?? 0)) {
        ctx.addIssue({ code: 'custom', path: ['upper'], message: 'the upper deviation must be greater than the lower' });
      }
    } else {
      if (t.fit !== undefined) ctx.addIssue({ code: 'custom', path: ['fit'], message: 'a fit code applies to a diameter or width only' });
      const profileBand = t.characteristic === 'profile' && t.upper !== undefined && t.lower !== undefined;
      if (t.value === undefined && !profileBand) {
        ctx.addIssue({ code: 'custom', path: ['value'], message: `${t.characteristic} needs the tolerance zone in mm` });
      }
    }
    if (t.datums && t.datums.length > 0 && !datumReferenced.includes(t.characteristic)) {
      ctx.addIssue({ code: 'custom', path: ['datums'], message: `${t.characteristic} takes no datum reference` });
    }
    if (t.material && t.material !== 'RFS' && !['position', 'perpendicularity', 'parallelism'].includes(t.characteristic)) {
      ctx.addIssue({ code: 'custom', path: ['material'], message: `${t.material} applies to position, perpendicularity or parallelism` });
    }
    if (t.datums && new Set(t.datums).size !== t.datums.length) {
      ctx.addIssue({ code: 'custom', path: ['datums'], message: 'a datum letter is repeated' });
    }
  });
export type ToleranceInput = z.infer<typeof toleranceInputSchema>;

export const datumLetterSchema = z.string().regex(/^[A-Z]$/, 'a datum is one capital letter');
export const assignDatumSchema = z.object({ letter: datumLetterSchema, featureId: recordIdSchema });
export type AssignDatum = z.infer<typeof assignDatumSchema>;
