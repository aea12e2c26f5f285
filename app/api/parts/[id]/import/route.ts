import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { importFeatures, importRequestSchema } from '@/lib/server/parts/import-features';
import { recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });

/**
 * CSV import of features and tolerances. A file with problems stores nothing
 * (mode "all") and answers 400 with the per-row report; "valid-only" stores the
 * rows that passed; "preview" only reports.
 */
export const POST = apiRoute({ permission: 'parts.edit', params, body: importRequestSchema }, async (ctx, { params: p, body }) => {
  const outcome = await importFeatures(ctx, p.id, body);
  if (body.mode === 'all' && !outcome.stored) {
    const first = outcome.report.fileIssues[0] ?? outcome.report.issues[0];
    const lines = [...new Set(outcome.report.issues.map((i) => i.line))];
    const message = first
      ? `Nothing was imported: ${lines.length > 0 ? `line${lines.length > 1 ? 's' : ''} ${lines.join(', ')} ha${lines.length > 1 ? 've' : 's'} problems` : first.message}.`
      : 'Nothing was imported.';
    return Response.json({ error: { code: 'invalid', message, path: 'body.csv' }, ...outcome }, { status: 400 });
  }
  return outcome;
});
