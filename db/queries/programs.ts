import 'server-only';
/**
 * Programs: a part on a machine version with a probe and a post, and the list of
 * its revisions. Setup technicians (no `revisions.read`) see approved revisions
 * only. Workspace-scoped; revisions are stored with their touch points in one
 * transaction.
 */
import { and, desc, eq, inArray, isNull, max } from 'drizzle-orm';
import { v4 as uuidv4 } from 'uuid';
import { getDb, type DbOrTx, type Tx } from '@/db/client';
import { machines, machineVersions, parts, probes, programs, revisions, touchPoints, users } from '@/db/schema';
import { can } from '@/lib/auth/permissions';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import type { RevisionContent } from '@/lib/server/programs/build-revision';
import type { CreateProgram } from '@/lib/validation/programs';
import { getMachineVersionOrThrow } from './machines';
import { partRowOrThrow } from './parts';

export type ProgramRow = {
  id: string; name: string; part: string; partId: string; machine: string; machineId: string; machineVersion: number;
  machineChanged: boolean; probe: string; probeId: string; post: string; latest: number | null; latestStatus: string | null; linkedFromProgramId: string | null;
};
export type RevisionRow = { id: string; number: number; author: string; message: string; status: string; findings: number; errors: number; createdAt: string; sha256: string };
export type ProgramDetail = ProgramRow & { machineVersionId: string; currentMachineVersion: number; revisions: RevisionRow[] };

const seesDrafts = (ctx: Ctx) => can(ctx.user, 'revisions.read');

async function programRows(db: DbOrTx, ctx: Ctx, programId?: string) {
  return db.select({
    id: programs.id, name: programs.name, partId: programs.partId, partNumber: parts.number, partRevision: parts.revision,
    machineId: programs.machineId, machine: machines.name, machineVersionId: programs.machineVersionId, machineVersion: machineVersions.version,
    currentVersionId: machines.currentVersionId, probeId: programs.probeId, probe: probes.name, post: programs.postId, linkedFromProgramId: programs.linkedFromProgramId,
  }).from(programs)
    .innerJoin(parts, eq(parts.id, programs.partId))
    .innerJoin(machines, eq(machines.id, programs.machineId))
    .innerJoin(machineVersions, eq(machineVersions.id, programs.machineVersionId))
    .innerJoin(probes, eq(probes.id, programs.probeId))
    .where(and(eq(programs.workspaceId, ctx.user.workspaceId), isNull(programs.archivedAt), programId ? eq(programs.id, programId) : undefined))
    .orderBy(desc(programs.updatedAt));
}

async function revisionRows(db: DbOrTx, ctx: Ctx, programIds: string[]) {
  if (programIds.length === 0) return [];
  return db.select({
    id: revisions.id, programId: revisions.programId, number: revisions.number, author: users.name, message: revisions.message,
    status: revisions.status, findings: revisions.findings, createdAt: revisions.createdAt, sha256: revisions.sha256,
  }).from(revisions).innerJoin(users, eq(users.id, revisions.authorId))
    .where(and(eq(revisions.workspaceId, ctx.user.workspaceId), inArray(revisions.programId, programIds), seesDrafts(ctx) ? undefined : eq(revisions.status, 'approved')))
    .orderBy(desc(revisions.number));
}

const toRevisionRow = (r: Awaited<ReturnType<typeof revisionRows>>[number]): RevisionRow => {
  const f = Array.isArray(r.findings) ? (r.findings as { severity?: string }[]) : [];
  return { id: r.id, number: r.number, author: r.author, message: r.message, status: r.status, findings: f.length, errors: f.filter((x) => x.severity === 'error').length, createdAt: r.createdAt.toISOString(), sha256: r.sha256 };
};

function toProgramRow(p: Awaited<ReturnType<typeof programRows>>[number], latest: RevisionRow | undefined): ProgramRow {
  return {
    id: p.id, name: p.name, part: `${p.partNumber} rev ${p.partRevision}`, partId: p.partId, machine: p.machine, machineId: p.machineId, machineVersion: p.machineVersion,
    machineChanged: p.currentVersionId !== p.machineVersionId, probe: p.probe, probeId: p.probeId, post: p.post,
    latest: latest?.number ?? null, latestStatus: latest?.status ?? null, linkedFromProgramId: p.linkedFromProgramId,
  };
}

export async function listPrograms(ctx: Ctx): Promise<ProgramRow[]> {
  const db = getDb();
  const rows = await programRows(db, ctx);
  const revs = await revisionRows(db, ctx, rows.map((r) => r.id));
  return rows.map((p) => {
    const latest = revs.find((r) => r.programId === p.id);
    return toProgramRow(p, latest ? toRevisionRow(latest) : undefined);
  });
}

export async function getProgram(ctx: Ctx, programId: string, db: DbOrTx = getDb()): Promise<ProgramDetail> {
  const p = (await programRows(db, ctx, programId))[0];
  if (!p) throw new AppError('not-found', 'No such program in this workspace.');
  const revs = (await revisionRows(db, ctx, [programId])).map(toRevisionRow);
  const current = await db.select({ version: machineVersions.version }).from(machineVersions).where(eq(machineVersions.id, p.currentVersionId ?? '')).limit(1);
  return { ...toProgramRow(p, revs[0]), machineVersionId: p.machineVersionId, currentMachineVersion: current[0]?.version ?? p.machineVersion, revisions: revs };
}

/** Creates the program record for the machine's current version (revision 1 comes from generate). */
export async function createProgram(ctx: Ctx, input: CreateProgram, linkedFromProgramId: string | null = null): Promise<{ id: string }> {
  const db = getDb();
  const id = uuidv4();
  const now = new Date();
  await partRowOrThrow(db, ctx, input.partId);
  const machine = await getMachineVersionOrThrow(db, ctx, input.machineId);
  const probe = await db.select({ id: probes.id }).from(probes).where(and(eq(probes.id, input.probeId), eq(probes.workspaceId, ctx.user.workspaceId), isNull(probes.archivedAt))).limit(1);
  if (!probe[0]) throw new AppError('not-found', 'No such probe in this workspace.', { path: 'body.probeId' });
  await db.insert(programs).values({
    id, workspaceId: ctx.user.workspaceId, name: input.name, partId: input.partId, machineId: input.machineId, machineVersionId: machine.versionId,
    probeId: input.probeId, postId: input.post, linkedFromProgramId, createdBy: ctx.user.id, createdAt: now, updatedAt: now,
  });
  return { id };
}

/** Locks the program row for a new revision; returns the latest revision number (0 when none). */
export async function lockProgram(tx: Tx, ctx: Ctx, programId: string): Promise<{ latest: number; latestId: string | null }> {
  const locked = await tx.select({ id: programs.id }).from(programs)
    .where(and(eq(programs.id, programId), eq(programs.workspaceId, ctx.user.workspaceId), isNull(programs.archivedAt))).for('update');
  if (locked.length === 0) throw new AppError('not-found', 'No such program in this workspace.');
  const m = await tx.select({ n: max(revisions.number) }).from(revisions).where(eq(revisions.programId, programId));
  const latest = m[0]?.n ?? 0;
  const row = latest > 0 ? await tx.select({ id: revisions.id }).from(revisions).where(and(eq(revisions.programId, programId), eq(revisions.number, latest))).limit(1) : [];
  return { latest, latestId: row[0]?.id ?? null };
}

/** Stores a revision and its touch points (call inside the transaction that locked the program). */
export async function insertRevision(tx: Tx, ctx: Ctx, programId: string, number: number, content: RevisionContent, meta: { message: string; baseRevisionId: string | null }): Promise<{ id: string; number: number }> {
  const id = uuidv4();
  const now = new Date();
  await tx.insert(revisions).values({
    id, workspaceId: ctx.user.workspaceId, programId, number, authorId: ctx.user.id, message: meta.message, status: 'draft',
    programText: content.text, sha256: content.sha256, plan: content.plan, findings: content.findings, baseRevisionId: meta.baseRevisionId, createdAt: now,
  });
  const rows = content.plan.touchPoints.map((t) => ({
    id: uuidv4(), workspaceId: ctx.user.workspaceId, revisionId: id, uuid: t.uuid, featureId: t.featureUuid, seq: t.seq,
    geometry: { surface: t.surface, normal: t.normal, direction: t.direction, target: t.target, start: t.start, end: t.end, toolAxis: t.toolAxis }, axes: t.axes,
  }));
  for (let i = 0; i < rows.length; i += 500) await tx.insert(touchPoints).values(rows.slice(i, i + 500));
  await tx.update(programs).set({ updatedAt: now }).where(eq(programs.id, programId));
  return { id, number };
}

/** Points the program at the machine's current version (before regenerating). */
export async function followCurrentMachineVersion(tx: Tx, ctx: Ctx, programId: string, machineId: string): Promise<string> {
  const m = await getMachineVersionOrThrow(tx, ctx, machineId);
  await tx.update(programs).set({ machineVersionId: m.versionId }).where(and(eq(programs.id, programId), eq(programs.workspaceId, ctx.user.workspaceId)));
  return m.versionId;
}
