import { z } from 'zod';
import { apiRoute } from '@/lib/server/route';
import { getPart } from '@/db/queries/parts';
import { exportFeaturesCsv } from '@/lib/csv/export-csv';
import { recordIdSchema } from '@/lib/validation/parts';

const params = z.object({ id: recordIdSchema });

export const GET = apiRoute({ permission: 'parts.read', params }, async (ctx, { params: p }) => {
  const part = await getPart(ctx, p.id);
  const csv = exportFeaturesCsv(part.features, part.tolerances, part.datums);
  const file = `${part.number}-${part.revision}-features.csv`.replace(/[^A-Za-z0-9._-]+/g, '_');
  return new Response(csv, { headers: { 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': `attachment; filename="${file}"` } });
});
