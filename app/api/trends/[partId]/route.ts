import { z } from 'zod';
import { loadPartTrends } from '@/db/queries/trends';
import { AppError } from '@/lib/server/app-error';
import { apiRoute } from '@/lib/server/route';
import { trendCsv } from '@/lib/trends/trend-csv';

/** GET /api/trends/:partId[?tolerance=…&format=csv] — run-chart data per characteristic, or one as CSV. */
export const GET = apiRoute(
  { permission: 'results.read', params: z.object({ partId: z.uuid() }), query: z.object({ tolerance: z.uuid().optional(), format: z.enum(['json', 'csv']).default('json') }) },
  async (ctx, { params, query }) => {
    const data = await loadPartTrends(ctx, params.partId, query.tolerance);
    if (query.format === 'json') return data;
    const trend = data.trends[0];
    if (!query.tolerance || !trend) throw new AppError('invalid', 'CSV export needs one tolerance: add ?tolerance=<uuid>.', { path: 'query.tolerance' });
    return new Response(trendCsv(trend), {
      headers: { 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': `attachment; filename="trend-${data.part.number.replace(/[^A-Za-z0-9._-]+/g, '-')}-${trend.label}-${trend.characteristic}.csv"` },
    });
  },
);
