import { NextResponse } from 'next/server';
import { listRuns } from '@/db/queries/runs';
import { AppError } from '@/lib/server/app-error';
import { fromZod } from '@/lib/server/errors';
import { apiRoute } from '@/lib/server/route';
import { MAX_UPLOAD_BYTES, uploadFieldsSchema, uploadRun } from '@/lib/server/runs/upload-run';

/** GET /api/runs — the latest runs of the workspace. */
export const GET = apiRoute({ permission: 'results.read' }, async (ctx) => ({ runs: await listRuns(ctx) }));

const tooLarge = () => new AppError('invalid', `The file is larger than ${MAX_UPLOAD_BYTES / 1024 / 1024} MiB; upload the control's result output only.`, { path: 'file' });

/**
 * POST /api/runs (multipart: file, revisionId, serial, temperatureC?, format?, offsetX/Y/Z?)
 * → 201 { runId } or 400 { error, problems: [{ line, code, message }] } with nothing stored.
 */
export const POST = apiRoute({ permission: 'results.upload' }, async (ctx, { req }) => {
  if (Number(req.headers.get('content-length') ?? 0) > MAX_UPLOAD_BYTES + 64 * 1024) throw tooLarge();
  const form = await req.formData().catch(() => { throw new AppError('invalid', 'Send the upload as multipart form data.'); });
  const file = form.get('file');
  if (!(file instanceof File) || file.size === 0) throw new AppError('invalid', 'Choose the result file the control wrote.', { path: 'file' });
  if (file.size > MAX_UPLOAD_BYTES) throw tooLarge();
  const fields = uploadFieldsSchema.safeParse(Object.fromEntries([...form.entries()].filter(([k]) => k !== 'file')));
  if (!fields.success) throw fromZod(fields.error, 'body');
  const outcome = await uploadRun(ctx, fields.data, await file.text());
  if (!outcome.ok) {
    return NextResponse.json({ error: { code: 'invalid', message: outcome.message, path: 'file' }, problems: outcome.problems, moreProblems: outcome.moreProblems }, { status: 400 });
  }
  return NextResponse.json(outcome, { status: 201 });
});
