/**
 * Programs and revisions: creating a program for a part on a machine with a
 * probe and a post, saving an edited text as a new revision, re-targeting to
 * another machine, and the verifier finding shape the editor shows as markers.
 */
import { z } from 'zod';
import { postIdSchema } from './machines';
import { recordIdSchema } from './parts';

export const createProgramSchema = z.object({
  name: z.string().trim().min(1, 'give the program a name').max(200),
  partId: recordIdSchema,
  machineId: recordIdSchema,
  probeId: recordIdSchema,
  post: postIdSchema,
});
export type CreateProgram = z.infer<typeof createProgramSchema>;

/** The largest program text accepted from the editor (characters). */
export const maxProgramChars = 4_000_000;

export const saveRevisionSchema = z.object({
  /** The revision number the edit started from: a newer one means someone else saved first (409). */
  baseRevision: z.number().int().positive(),
  text: z.string().min(1, 'the program is empty').max(maxProgramChars, 'the program is too long'),
  message: z.string().trim().min(1, 'say what you changed').max(500),
});
export type SaveRevision = z.infer<typeof saveRevisionSchema>;

export const regenerateSchema = z.object({
  message: z.string().trim().max(500).default('regenerated'),
});

export const retargetSchema = z.object({
  machineId: recordIdSchema,
  probeId: recordIdSchema.optional(),
  post: postIdSchema.optional(),
  name: z.string().trim().min(1).max(200).optional(),
});
export type Retarget = z.infer<typeof retargetSchema>;

export const findingSeveritySchema = z.enum(['error', 'warning', 'info']);
export const findingSchema = z.object({
  line: z.number().int().nonnegative(),
  code: z.string(),
  severity: findingSeveritySchema,
  message: z.string(),
});
export type Finding = z.infer<typeof findingSchema>;
