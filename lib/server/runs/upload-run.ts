import 'server-only';
/**
 * A results upload: the control's output for an approved revision, checked line by line
 * against the revision's touch points, brought to the part frame through the machine
 * version's forward kinematics, evaluated and stored in one transaction. Any problem
 * refuses the whole file, with every problem named by line.
 */
import { z } from 'zod';
import { getDb } from '@/db/client';
import { forwardKinematics } from '@/lib/kinematics/forward';
import { toPartFrame } from '@/lib/program/results-frame';
import { parseResults, type ResultError } from '@/lib/program/results-parse';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import { evaluateMeasurements, warningShareOf } from './evaluate-measurements';
import { loadRevisionContext } from './revision-context';
import { storeRun } from './store-run';

/** 2 MiB holds some 20,000 TRIP records — far more than a probing routine writes. */
export const MAX_UPLOAD_BYTES = 2 * 1024 * 1024;

const optionalNumber = (min: number, max: number, what: string) => z.preprocess(
  (v) => (v === '' || v === null || v === undefined ? undefined : Number(v)),
  z.number({ error: `${what} must be a number` }).finite().min(min, `${what} must be at least ${min}`).max(max, `${what} must be at most ${max}`).optional(),
);

export const uploadFieldsSchema = z.object({
  revisionId: z.uuid('choose the approved revision that ran'),
  serial: z.string().trim().min(1, 'enter the part serial or lot number').max(80, 'at most 80 characters'),
  temperatureC: optionalNumber(-50, 150, 'part temperature (°C)'),
  format: z.enum(['auto', 'trip-log', 'csv']).default('auto'),
  offsetX: optionalNumber(-10000, 10000, 'work offset X'),
  offsetY: optionalNumber(-10000, 10000, 'work offset Y'),
  offsetZ: optionalNumber(-10000, 10000, 'work offset Z'),
});
export type UploadFields = z.infer<typeof uploadFieldsSchema>;

export type UploadOutcome =
  | { ok: true; runId: string; mailed: number; warnings: string[] }
  | { ok: false; problems: ResultError[]; moreProblems: number; message: string };

export async function uploadRun(ctx: Ctx, fields: UploadFields, text: string): Promise<UploadOutcome> {
  const c = await loadRevisionContext(ctx, fields.revisionId);
  if (c.revision.status !== 'approved') {
    throw new AppError('conflict', `Revision ${c.revision.number} is not approved; results are taken only for approved revisions.`, { path: 'revisionId' });
  }
  const labels = new Map(c.part.engine.features.map((f) => [f.uuid, f.label]));
  const parsed = parseResults(text, {
    format: fields.format,
    rotaries: c.machine.engine.rotaries.map((r) => r.name),
    touchPoints: c.plan.touchPoints.map((tp) => ({ uuid: tp.uuid, label: labels.get(tp.featureUuid), seq: tp.seq })),
  });
  if (parsed.errors.length > 0) {
    const total = parsed.errors.length + parsed.moreErrors;
    return { ok: false, problems: parsed.errors, moreProblems: parsed.moreErrors, message: `Nothing was stored: the file has ${total} problem${total === 1 ? '' : 's'}. Fix them and upload the whole file again.` };
  }
  const { measurements, warnings } = toPartFrame(parsed.records, c.plan, (axes) => forwardKinematics(c.machine.engine, axes).tip);
  const offset = fields.offsetX !== undefined || fields.offsetY !== undefined || fields.offsetZ !== undefined
    ? [fields.offsetX ?? 0, fields.offsetY ?? 0, fields.offsetZ ?? 0] as [number, number, number] : undefined;
  const evaluation = evaluateMeasurements(c, measurements.map((m) => ({ uuid: m.uuid, point: m.point })), { temperatureC: fields.temperatureC, workOffsetNow: offset }, await warningShareOf(getDb(), ctx));
  const stored = await storeRun(ctx, c, {
    serial: fields.serial, temperatureC: fields.temperatureC, simulated: false, measuredAt: new Date(),
    measurements: measurements.map((m) => ({ uuid: m.uuid, point: m.point, line: m.line, axes: m.axes })),
    evaluation,
  });
  return { ok: true, ...stored, warnings: [...warnings.map((w) => w.message), ...evaluation.warnings.map((w) => w.message)] };
}
