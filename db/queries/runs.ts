import 'server-only';
/**
 * Runs: the list, one run with its measurements and corrections, the approved revisions a
 * setup technician may run, the correction toggle, and the latest run per machine.
 * Workspace-scoped; returns only what the run screens show.
 */
import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import { getDb } from '@/db/client';
import { corrections, machines, measurements, parts, programs, results, revisions, runs, users } from '@/db/schema';
import { recordAudit } from '@/db/queries/audit';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';

export interface RunListRow {
  id: string; serial: string; simulated: boolean; measuredAt: string; revisionId: string; revisionNumber: number;
  programName: string; partNumber: string; machineId: string; machineName: string; uploadedBy: string;
  counts: Record<'conforming' | 'marginal' | 'nonconforming' | 'not-evaluated', number>;
}

const runColumns = {
  id: runs.id, serial: runs.serial, simulated: runs.simulated, measuredAt: runs.measuredAt, createdAt: runs.createdAt,
  revisionId: runs.revisionId, revisionNumber: revisions.number, programName: programs.name, programId: programs.id,
  partNumber: parts.number, partId: parts.id, machineName: machines.name, machineId: machines.id, uploadedBy: users.name,
  temperatureC: runs.temperatureC, notes: runs.notes,
};

function runSelect() {
  return getDb().select(runColumns).from(runs)
    .innerJoin(revisions, eq(revisions.id, runs.revisionId))
    .innerJoin(programs, eq(programs.id, revisions.programId))
    .innerJoin(parts, eq(parts.id, programs.partId))
    .innerJoin(machines, eq(machines.id, programs.machineId))
    .innerJoin(users, eq(users.id, runs.uploadedBy));
}

async function statusCounts(runIds: string[]): Promise<Map<string, RunListRow['counts']>> {
  const out = new Map<string, RunListRow['counts']>();
  if (runIds.length === 0) return out;
  const rows = await getDb().select({ runId: results.runId, status: results.status, n: sql<number>`count(*)` })
    .from(results).where(inArray(results.runId, runIds)).groupBy(results.runId, results.status);
  for (const r of rows) {
    const c = out.get(r.runId) ?? { conforming: 0, marginal: 0, nonconforming: 0, 'not-evaluated': 0 };
    c[r.status] = Number(r.n);
    out.set(r.runId, c);
  }
  return out;
}

export async function listRuns(ctx: Ctx, filter: { machineId?: string; limit?: number } = {}): Promise<RunListRow[]> {
  const where = [eq(runs.workspaceId, ctx.user.workspaceId)];
  if (filter.machineId) where.push(eq(programs.machineId, filter.machineId));
  const rows = await runSelect().where(and(...where)).orderBy(desc(runs.createdAt)).limit(filter.limit ?? 100);
  const counts = await statusCounts(rows.map((r) => r.id));
  return rows.map((r) => ({
    id: r.id, serial: r.serial, simulated: r.simulated, measuredAt: (r.measuredAt ?? r.createdAt).toISOString(), revisionId: r.revisionId,
    revisionNumber: r.revisionNumber, programName: r.programName, partNumber: r.partNumber, machineId: r.machineId, machineName: r.machineName, uploadedBy: r.uploadedBy,
    counts: counts.get(r.id) ?? { conforming: 0, marginal: 0, nonconforming: 0, 'not-evaluated': 0 },
  }));
}

export async function getRunHeaderOrThrow(ctx: Ctx, runId: string) {
  const rows = await runSelect().where(and(eq(runs.id, runId), eq(runs.workspaceId, ctx.user.workspaceId))).limit(1);
  const r = rows[0];
  if (!r) throw new AppError('not-found', 'No such run in this workspace.');
  return { ...r, measuredAt: (r.measuredAt ?? r.createdAt).toISOString(), createdAt: r.createdAt.toISOString() };
}

export interface ResultRow {
  id: string; toleranceId: string; characteristic: string; value: number | null; nominal: number | null;
  lower: number | null; upper: number | null; bonus: number | null; status: 'conforming' | 'marginal' | 'nonconforming' | 'not-evaluated';
  uncertainty: number | null; decisionRule: string; details: Record<string, unknown>;
}

export async function listRunResults(ctx: Ctx, runId: string): Promise<ResultRow[]> {
  const rows = await getDb().select({
    id: results.id, toleranceId: results.toleranceId, characteristic: results.characteristic, value: results.value, nominal: results.nominal,
    lower: results.lowerLimit, upper: results.upperLimit, bonus: results.bonus, status: results.status, uncertainty: results.uncertainty,
    decisionRule: results.decisionRule, details: results.details,
  }).from(results).where(and(eq(results.runId, runId), eq(results.workspaceId, ctx.user.workspaceId)));
  return rows;
}

export async function listRunMeasurements(ctx: Ctx, runId: string) {
  return getDb().select({ uuid: measurements.touchPointUuid, x: measurements.xMm, y: measurements.yMm, z: measurements.zMm, line: measurements.sourceLine, axes: measurements.axes })
    .from(measurements).where(and(eq(measurements.runId, runId), eq(measurements.workspaceId, ctx.user.workspaceId)));
}

export interface CorrectionRow {
  id: string; kind: string; register: string; oldValue: number | null; newValue: number; code: string; applied: boolean;
  appliedAt: string | null; appliedBy: string | null; details: Record<string, unknown>;
}

export async function listRunCorrections(ctx: Ctx, runId: string): Promise<CorrectionRow[]> {
  const rows = await getDb().select({
    id: corrections.id, kind: corrections.kind, register: corrections.register, oldValue: corrections.oldValue, newValue: corrections.newValue,
    code: corrections.code, applied: corrections.applied, appliedAt: corrections.appliedAt, appliedBy: users.name, details: corrections.details,
  }).from(corrections).leftJoin(users, eq(users.id, corrections.appliedBy))
    .where(and(eq(corrections.runId, runId), eq(corrections.workspaceId, ctx.user.workspaceId)));
  return rows.map((r) => ({ ...r, appliedAt: r.appliedAt?.toISOString() ?? null, details: r.details ?? {} }));
}

/** Marks one proposal (all its rows) applied or not at the machine; audited. */
export async function setCorrectionApplied(ctx: Ctx, runId: string, group: number, applied: boolean): Promise<{ rows: number }> {
  const rows = await listRunCorrections(ctx, runId);
  const mine = rows.filter((r) => r.details.group === group);
  if (mine.length === 0) throw new AppError('not-found', 'No such correction on this run.');
  if (applied && mine.some((r) => r.details.state !== 'apply')) {
    throw new AppError('conflict', 'This proposal is not to be entered (inside the dead band or past the cap); it cannot be marked applied.');
  }
  const header = await getRunHeaderOrThrow(ctx, runId);
  if (header.simulated) throw new AppError('conflict', 'A simulated run proposes corrections for study only; they cannot be marked applied.');
  await getDb().transaction(async (tx) => {
    await tx.update(corrections)
      .set({ applied, appliedBy: applied ? ctx.user.id : null, appliedAt: applied ? new Date() : null })
      .where(and(eq(corrections.runId, runId), eq(corrections.workspaceId, ctx.user.workspaceId), inArray(corrections.id, mine.map((r) => r.id))));
    await recordAudit(tx, {
      workspaceId: ctx.user.workspaceId, actorUserId: ctx.user.id, actorEmail: ctx.user.email, ip: ctx.ip,
      action: applied ? 'correction-applied' : 'correction-unapplied', targetType: 'run', targetId: runId,
      summary: `${applied ? 'Applied' : 'Marked not applied'}: ${mine.map((r) => r.register).join(', ')} (serial ${header.serial})`,
    });
  });
  return { rows: mine.length };
}

/** Approved revisions, newest first, for the upload form and the setup technician's list. */
export async function listApprovedRevisions(ctx: Ctx) {
  const rows = await getDb().select({
    id: revisions.id, number: revisions.number, programName: programs.name, partNumber: parts.number, machineName: machines.name, approvedAt: revisions.approvedAt,
  }).from(revisions)
    .innerJoin(programs, eq(programs.id, revisions.programId))
    .innerJoin(parts, eq(parts.id, programs.partId))
    .innerJoin(machines, eq(machines.id, programs.machineId))
    .where(and(eq(revisions.workspaceId, ctx.user.workspaceId), eq(revisions.status, 'approved')))
    .orderBy(desc(revisions.approvedAt)).limit(200);
  return rows.map((r) => ({ ...r, approvedAt: r.approvedAt?.toISOString() ?? null }));
}

export async function getMachineNameOrThrow(ctx: Ctx, machineId: string): Promise<string> {
  const rows = await getDb().select({ name: machines.name }).from(machines).where(and(eq(machines.id, machineId), eq(machines.workspaceId, ctx.user.workspaceId))).limit(1);
  if (!rows[0]) throw new AppError('not-found', 'No such machine in this workspace.');
  return rows[0].name;
}
