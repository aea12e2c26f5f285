/**
 * Machine records as the app stores and edits them, and the try-a-pose requests.
 *
 * A record is the engine's machine model (lib/kinematics/schema.ts) plus what the
 * shop keeps beside it: the controller dialect (post-processor id) and the head
 * pivot distance. A head rotary's `point` in a record is measured from the head
 * pivot (usually [0, 0, 0]); the stored model (machine_versions.model) is the
 * engine machine for a zero-length tool (pivot distance added along +Z), and the
 * engine gets the probe length added on top (tool axis +Z at all rotaries zero).
 * Millimetres and degrees.
 */
import { z } from 'zod';
import { machineSchema, vec3Schema, directionSchema, type Machine } from '../kinematics/schema';

export const postIdSchema = z
  .string()
  .min(1, 'choose a post-processor')
  .max(40)
  .regex(/^[a-z0-9][a-z0-9-]*$/, 'a post-processor id is lower-case letters, digits and dashes');

/** What the engineer edits: the whole machine model plus dialect and pivot. */
export const machineRecordSchema = machineSchema.safeExtend({
  post: postIdSchema,
  /** Distance from the spindle gauge line up to the head pivot, mm (0 when there is no head rotary). */
  headPivotMm: z.number().finite().min(0, 'the pivot distance cannot be negative').max(2000),
  notes: z.string().max(2000).default(''),
});
export type MachineRecordInput = z.input<typeof machineRecordSchema>;
export type MachineRecord = z.output<typeof machineRecordSchema>;

/** Creating from a preset: the preset id and the new machine's name and dialect. */
export const createFromPresetSchema = z.object({
  presetId: z.string().min(1, 'choose a preset').max(60),
  name: z.string().trim().min(1, 'give the machine a name').max(200),
  post: postIdSchema,
});
export type CreateFromPreset = z.infer<typeof createFromPresetSchema>;

/** Saving an edit: the full record plus the version it was edited from (409 when stale). */
export const updateMachineSchema = z.object({
  baseVersion: z.number().int().positive(),
  machine: machineRecordSchema,
  message: z.string().trim().max(500).default(''),
});
export type UpdateMachine = z.infer<typeof updateMachineSchema>;

const axisValuesSchema = z.record(z.string().regex(/^[XYZABC]$/, 'axis words are X, Y, Z, A, B or C'), z.number().finite());

/** Try a pose, forward: axis values → tip and tool axis in the part frame. */
export const fkRequestSchema = z.object({
  axes: axisValuesSchema,
  probeLengthMm: z.number().finite().min(0).max(1000).default(0),
});
export type FkRequest = z.infer<typeof fkRequestSchema>;

/** Try a pose, inverse: tip and tool axis in the part frame → every solution. */
export const ikRequestSchema = z.object({
  tip: vec3Schema,
  axis: directionSchema,
  previous: axisValuesSchema.optional(),
  probeLengthMm: z.number().finite().min(0).max(1000).default(0),
});
export type IkRequest = z.infer<typeof ikRequestSchema>;

type ModelParts = Pick<Machine, 'name' | 'rotaries' | 'linear' | 'setup'>;
const lifted = (m: ModelParts, lift: number): Machine => ({
  name: m.name,
  linear: m.linear,
  setup: m.setup,
  rotaries: m.rotaries.map((r) => (r.carrier === 'head' ? { ...r, point: [r.point[0], r.point[1], r.point[2] + lift] } : { ...r })),
});

/**
 * The stored model of a record: the engine's machine for a zero-length tool (head
 * points measured from the tip at the gauge line), so it is a valid engine model.
 */
export function recordToModel(record: ModelParts & { headPivotMm: number }): Machine {
  return lifted(record, record.headPivotMm);
}

/** Back from a stored model to the pivot-relative points the engineer edits. */
export function modelToRecordParts(model: Machine, headPivotMm: number): ModelParts {
  return lifted(model, -headPivotMm);
}

/** The engine's machine for a stored model and the probe in the spindle. */
export function engineMachineFor(model: Machine, probeLengthMm: number): Machine {
  return lifted(model, probeLengthMm);
}

/** The engine's model for a record and a probe length (see the header comment). */
export function toEngineMachine(record: ModelParts & { headPivotMm: number }, probeLengthMm: number): Machine {
  return engineMachineFor(recordToModel(record), probeLengthMm);
}

/** The layout name stored with a machine, from its rotaries. */
export function layoutOf(m: Pick<Machine, 'rotaries'>): 'three-axis' | 'table-table' | 'head-table' | 'head-head' {
  const heads = m.rotaries.filter((r) => r.carrier === 'head').length;
  if (m.rotaries.length === 0) return 'three-axis';
  if (heads === 0) return 'table-table';
  return heads === m.rotaries.length ? 'head-head' : 'head-table';
}

/** Words a person reads for a rotary's layout, e.g. "C on the table, about +Z". */
export function describeRotary(r: { name: string; carrier: 'table' | 'head'; direction: readonly number[] }): string {
  const [x = 0, y = 0, z = 0] = r.direction;
  const n = Math.hypot(x, y, z) || 1;
  const names = ['X', 'Y', 'Z'] as const;
  const comps = [x / n, y / n, z / n];
  const main = comps.findIndex((c) => Math.abs(Math.abs(c) - 1) < 1e-9);
  const about = main >= 0 ? `${(comps[main] ?? 0) > 0 ? '+' : '−'}${names[main]}` : `(${comps.map((c) => c.toFixed(3)).join(', ')})`;
  return `${r.name} on the ${r.carrier}, about ${about}`;
}
