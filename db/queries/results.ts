import 'server-only';
/**
 * The trace of one tolerance: its feature's touch points in each revision → the program
 * lines that measure them → the measurements of each run → the result → the corrections
 * it led to (proposed and applied). Workspace-scoped.
 */
import { and, desc, eq, inArray } from 'drizzle-orm';
import { getDb } from '@/db/client';
import { corrections, features, measurements, parts, programs, results, revisions, runs, tolerances } from '@/db/schema';
import { touchPointLines } from '@/lib/program/diff-lines';
import { planSchema } from '@/lib/program/plan-schema';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';

export interface TraceRevision {
  id: string; number: number; status: string; programName: string;
  points: { uuid: string; seq: number; surface: [number, number, number]; lines: { from: number; to: number; recordLine: number } | null; text: string[] }[];
}
export interface TraceRun {
  id: string; serial: string; simulated: boolean; at: string; revisionId: string;
  measurements: { uuid: string; x: number; y: number; z: number; line: number | null }[];
  result: { status: string; value: number | null; lower: number | null; upper: number | null; bonus: number | null } | null;
  corrections: { register: string; oldValue: number | null; newValue: number; applied: boolean; state: string }[];
}
export interface Trace {
  tolerance: { id: string; characteristic: string; featureId: string; featureLabel: string; featureType: string; partId: string; partNumber: string };
  revisions: TraceRevision[];
  runs: TraceRun[];
}

const MAX_RUNS = 20;

function involves(details: Record<string, unknown> | null, toleranceId: string, featureId: string): boolean {
  const source = (details?.source ?? {}) as { toleranceUuid?: string; featureUuids?: string[] };
  return source.toleranceUuid === toleranceId || (source.featureUuids ?? []).includes(featureId);
}

export async function loadTrace(ctx: Ctx, toleranceId: string): Promise<Trace> {
  const db = getDb();
  const ws = ctx.user.workspaceId;
  const [tol] = await db.select({ id: tolerances.id, characteristic: tolerances.characteristic, featureId: features.id, featureLabel: features.label, featureType: features.type, partId: parts.id, partNumber: parts.number })
    .from(tolerances).innerJoin(features, eq(features.id, tolerances.featureId)).innerJoin(parts, eq(parts.id, tolerances.partId))
    .where(and(eq(tolerances.id, toleranceId), eq(tolerances.workspaceId, ws))).limit(1);
  if (!tol) throw new AppError('not-found', 'No such tolerance in this workspace.');

  const revs = await db.select({ id: revisions.id, number: revisions.number, status: revisions.status, plan: revisions.plan, text: revisions.programText, programName: programs.name })
    .from(revisions).innerJoin(programs, eq(programs.id, revisions.programId))
    .where(and(eq(programs.partId, tol.partId), eq(revisions.workspaceId, ws))).orderBy(desc(revisions.createdAt)).limit(20);
  const traceRevisions: TraceRevision[] = revs.map((r) => {
    const plan = planSchema.safeParse(r.plan);
    const tps = plan.success ? plan.data.touchPoints.filter((t) => t.featureUuid === tol.featureId) : [];
    const lines = touchPointLines(r.text, tps.map((t) => t.uuid));
    const textLines = r.text.split(/\r\n|\n|\r/);
    return {
      id: r.id, number: r.number, status: r.status, programName: r.programName,
      points: tps.map((t) => {
        const l = lines.get(t.uuid) ?? null;
        return { uuid: t.uuid, seq: t.seq, surface: t.surface, lines: l, text: l ? textLines.slice(l.from - 1, l.to) : [] };
      }),
    };
  });

  const runRows = revs.length === 0 ? [] : await db.select({ id: runs.id, serial: runs.serial, simulated: runs.simulated, at: runs.createdAt, revisionId: runs.revisionId })
    .from(runs).where(and(eq(runs.workspaceId, ws), inArray(runs.revisionId, revs.map((r) => r.id)))).orderBy(desc(runs.createdAt)).limit(MAX_RUNS);
  const runIds = runRows.map((r) => r.id);
  const uuids = [...new Set(traceRevisions.flatMap((r) => r.points.map((p) => p.uuid)))];
  const [meas, res, corr] = runIds.length === 0 ? [[], [], []] : await Promise.all([
    uuids.length === 0 ? [] : db.select({ runId: measurements.runId, uuid: measurements.touchPointUuid, x: measurements.xMm, y: measurements.yMm, z: measurements.zMm, line: measurements.sourceLine })
      .from(measurements).where(and(eq(measurements.workspaceId, ws), inArray(measurements.runId, runIds), inArray(measurements.touchPointUuid, uuids))),
    db.select({ runId: results.runId, status: results.status, value: results.value, lower: results.lowerLimit, upper: results.upperLimit, bonus: results.bonus })
      .from(results).where(and(eq(results.workspaceId, ws), inArray(results.runId, runIds), eq(results.toleranceId, toleranceId))),
    db.select({ runId: corrections.runId, register: corrections.register, oldValue: corrections.oldValue, newValue: corrections.newValue, applied: corrections.applied, details: corrections.details })
      .from(corrections).where(and(eq(corrections.workspaceId, ws), inArray(corrections.runId, runIds))),
  ]);
  return {
    tolerance: tol,
    revisions: traceRevisions,
    runs: runRows.map((r) => {
      const result = res.find((x) => x.runId === r.id);
      return {
        id: r.id, serial: r.serial, simulated: r.simulated, at: r.at.toISOString(), revisionId: r.revisionId,
        measurements: meas.filter((m) => m.runId === r.id).map(({ runId: _r, ...m }) => m),
        result: result ? { status: result.status, value: result.value, lower: result.lower, upper: result.upper, bonus: result.bonus } : null,
        corrections: corr.filter((c) => c.runId === r.id && involves(c.details, toleranceId, tol.featureId))
          .map((c) => ({ register: c.register, oldValue: c.oldValue, newValue: c.newValue, applied: c.applied, state: String(c.details?.state ?? '') })),
      };
    }),
  };
}
