import 'server-only';
/**
 * CSV import onto a stored part. `preview` only reports; `all` stores only when
 * the whole file is valid; `valid-only` stores the rows that passed, and only
 * when the user asked for exactly that. Everything goes in one transaction.
 */
import { z } from 'zod';
import { getDb } from '@/db/client';
import { datums } from '@/db/schema';
import { getPart, insertFeature, insertTolerance } from '@/db/queries/parts';
import { importFeaturesCsv, validRowsOnly, maxCsvBytes, type CsvImport } from '@/lib/csv/import-csv';
import type { Ctx } from '@/lib/server/context';
import { v4 as uuidv4 } from 'uuid';

export const importRequestSchema = z.object({
  csv: z.string().min(1, 'the file is empty').max(maxCsvBytes, 'the file is larger than 2 MB'),
  mode: z.enum(['preview', 'all', 'valid-only']).default('preview'),
});
export type ImportRequest = z.infer<typeof importRequestSchema>;

export type ImportOutcome = { stored: boolean; features: number; tolerances: number; report: Omit<CsvImport, 'features' | 'tolerances'> };

export async function importFeatures(ctx: Ctx, partId: string, req: ImportRequest): Promise<ImportOutcome> {
  const part = await getPart(ctx, partId);
  const existing = { features: part.features.map((f) => ({ label: f.label, type: f.type })), datums: Object.keys(part.datums) };
  const result = importFeaturesCsv(req.csv, existing);
  const report = { valid: result.valid, fileIssues: result.fileIssues, issues: result.issues, rows: result.rows };
  const store = req.mode === 'valid-only' ? result.fileIssues.length === 0 : req.mode === 'all' && result.valid;
  if (!store) return { stored: false, features: 0, tolerances: 0, report };
  const kept = validRowsOnly(result);
  await getDb().transaction(async (tx) => {
    const idByLabel = new Map(part.features.map((f) => [f.label, f.uuid] as const));
    let order = part.features.length;
    for (const f of kept.features) {
      const id = await insertFeature(tx, ctx, partId, f.feature, order++);
      idByLabel.set(f.feature.label, id);
      if (f.datum) await tx.insert(datums).values({ id: uuidv4(), workspaceId: ctx.user.workspaceId, partId, letter: f.datum, featureId: id, createdAt: new Date() });
    }
    for (const t of kept.tolerances) {
      const featureId = idByLabel.get(t.featureLabel);
      if (featureId) await insertTolerance(tx, ctx, partId, featureId, t.tolerance);
    }
  });
  return { stored: true, features: kept.features.length, tolerances: kept.tolerances.length, report };
}
