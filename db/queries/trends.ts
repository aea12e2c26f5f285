import 'server-only';
/**
 * Per part and characteristic across runs: the values, times, serials and statuses of
 * every result, simulated runs flagged (lib/trends leaves them out). Workspace-scoped.
 */
import { and, asc, eq } from 'drizzle-orm';
import { getDb } from '@/db/client';
import { features, parts, programs, results, revisions, runs, tolerances } from '@/db/schema';
import { buildTrend, type Trend } from '@/lib/trends/series';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';

export interface PartTrends { part: { id: string; number: string; revision: string; name: string }; trends: (Trend & { toleranceId: string })[] }

export async function loadPartTrends(ctx: Ctx, partId: string, toleranceId?: string): Promise<PartTrends> {
  const db = getDb();
  const [part] = await db.select({ id: parts.id, number: parts.number, revision: parts.revision, name: parts.name }).from(parts)
    .where(and(eq(parts.id, partId), eq(parts.workspaceId, ctx.user.workspaceId))).limit(1);
  if (!part) throw new AppError('not-found', 'No such part in this workspace.');
  const tolWhere = [eq(tolerances.partId, partId), eq(tolerances.workspaceId, ctx.user.workspaceId)];
  if (toleranceId) tolWhere.push(eq(tolerances.id, toleranceId));
  const tols = await db.select({ id: tolerances.id, characteristic: tolerances.characteristic, label: features.label })
    .from(tolerances).innerJoin(features, eq(features.id, tolerances.featureId)).where(and(...tolWhere));
  const rows = await db.select({
    toleranceId: results.toleranceId, value: results.value, status: results.status, lower: results.lowerLimit, upper: results.upperLimit,
    runId: runs.id, serial: runs.serial, simulated: runs.simulated, measuredAt: runs.measuredAt, createdAt: runs.createdAt,
  }).from(results)
    .innerJoin(runs, eq(runs.id, results.runId))
    .innerJoin(revisions, eq(revisions.id, runs.revisionId))
    .innerJoin(programs, eq(programs.id, revisions.programId))
    .where(and(eq(results.workspaceId, ctx.user.workspaceId), eq(programs.partId, partId)))
    .orderBy(asc(runs.createdAt));
  const trends = tols.map((t) => {
    const mine = rows.filter((r) => r.toleranceId === t.id && r.value !== null);
    const last = [...mine].reverse().find((r) => !r.simulated) ?? mine[mine.length - 1];
    const trend = buildTrend(
      { characteristic: t.characteristic, label: t.label, limits: { lower: last?.lower ?? null, upper: last?.upper ?? null } },
      mine.map((r) => ({ runUuid: r.runId, measuredAt: (r.measuredAt ?? r.createdAt).toISOString(), serial: r.serial, value: r.value ?? NaN, status: r.status, simulated: r.simulated })),
    );
    return { ...trend, toleranceId: t.id };
  });
  trends.sort((a, b) => a.label.localeCompare(b.label, 'en', { numeric: true }) || a.characteristic.localeCompare(b.characteristic));
  return { part, trends };
}
