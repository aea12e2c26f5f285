import 'server-only';
/**
 * Machines and their versions. Every change to the model, pivot or post makes a
 * new immutable version; programs keep the version they were generated for.
 * Scoped to the caller's workspace; returns only what the screens show.
 */
import { and, asc, desc, eq, isNull } from 'drizzle-orm';
import { v4 as uuidv4 } from 'uuid';
import { getDb, type DbOrTx } from '@/db/client';
import { machines, machineVersions, programs, users } from '@/db/schema';
import type { Machine } from '@/lib/kinematics/schema';
import { AppError, isDuplicateKey } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import { layoutOf, modelToRecordParts, recordToModel, type MachineRecord } from '@/lib/validation/machines';

export type MachineListRow = {
  id: string; name: string; layout: string; post: string; version: number; axes: string; updatedAt: string;
};

export type MachineVersionRow = { id: string; version: number; note: string; createdAt: string; createdBy: string | null; postId: string };

export type MachineDetail = {
  id: string; name: string; notes: string; layout: string;
  versionId: string; version: number;
  /** Stored model: engine machine for a zero-length tool. */
  model: Machine;
  /** What the edit form shows: head points relative to the pivot. */
  record: MachineRecord;
  versions: MachineVersionRow[];
};

const axesOf = (m: Machine) => ['X', 'Y', 'Z', ...m.rotaries.map((r) => r.name)].join(' ');

export async function listMachines(ctx: Ctx): Promise<MachineListRow[]> {
  const rows = await getDb()
    .select({ id: machines.id, name: machines.name, layout: machines.layout, updatedAt: machines.updatedAt, version: machineVersions.version, postId: machineVersions.postId, model: machineVersions.model })
    .from(machines)
    .innerJoin(machineVersions, eq(machineVersions.id, machines.currentVersionId))
    .where(and(eq(machines.workspaceId, ctx.user.workspaceId), isNull(machines.archivedAt)))
    .orderBy(asc(machines.name));
  return rows.map((r) => ({ id: r.id, name: r.name, layout: r.layout, post: r.postId, version: r.version, axes: axesOf(r.model), updatedAt: r.updatedAt.toISOString() }));
}

/** The machine's current version row, or 404 when it is not in the caller's workspace. */
export async function getMachineVersionOrThrow(db: DbOrTx, ctx: Ctx, machineId: string) {
  const rows = await db
    .select({ id: machines.id, name: machines.name, notes: machines.notes, layout: machines.layout, versionId: machineVersions.id, version: machineVersions.version, model: machineVersions.model, headPivotMm: machineVersions.headPivotMm, postId: machineVersions.postId })
    .from(machines)
    .innerJoin(machineVersions, eq(machineVersions.id, machines.currentVersionId))
    .where(and(eq(machines.id, machineId), eq(machines.workspaceId, ctx.user.workspaceId), isNull(machines.archivedAt)))
    .limit(1);
  const row = rows[0];
  if (!row) throw new AppError('not-found', 'No such machine in this workspace.');
  return row;
}

export async function getMachine(ctx: Ctx, machineId: string): Promise<MachineDetail> {
  const db = getDb();
  const row = await getMachineVersionOrThrow(db, ctx, machineId);
  const versions = await db
    .select({ id: machineVersions.id, version: machineVersions.version, note: machineVersions.note, createdAt: machineVersions.createdAt, createdBy: users.name, postId: machineVersions.postId })
    .from(machineVersions)
    .leftJoin(users, eq(users.id, machineVersions.createdBy))
    .where(and(eq(machineVersions.machineId, machineId), eq(machineVersions.workspaceId, ctx.user.workspaceId)))
    .orderBy(desc(machineVersions.version));
  const pivot = row.headPivotMm ?? 0;
  const parts = modelToRecordParts(row.model, pivot);
  return {
    id: row.id, name: row.name, notes: row.notes ?? '', layout: row.layout, versionId: row.versionId, version: row.version, model: row.model,
    record: { ...parts, name: row.name, post: row.postId, headPivotMm: pivot, notes: row.notes ?? '' },
    versions: versions.map((v) => ({ ...v, note: v.note ?? '', createdAt: v.createdAt.toISOString() })),
  };
}

function duplicateName(error: unknown, name: string): never {
  if (isDuplicateKey(error)) throw new AppError('conflict', `A machine named "${name}" already exists in this workspace.`, { path: 'name' });
  throw error;
}

export async function createMachine(ctx: Ctx, record: MachineRecord, note = 'created'): Promise<{ id: string }> {
  const id = uuidv4();
  const versionId = uuidv4();
  const now = new Date();
  const model = recordToModel(record);
  try {
    await getDb().transaction(async (tx) => {
      await tx.insert(machines).values({ id, workspaceId: ctx.user.workspaceId, name: record.name, layout: layoutOf(model), notes: record.notes, createdAt: now, updatedAt: now });
      await tx.insert(machineVersions).values({ id: versionId, workspaceId: ctx.user.workspaceId, machineId: id, version: 1, model, headPivotMm: record.headPivotMm, postId: record.post, note, createdBy: ctx.user.id, createdAt: now });
      await tx.update(machines).set({ currentVersionId: versionId }).where(eq(machines.id, id));
    });
  } catch (error) { duplicateName(error, record.name); }
  return { id };
}

/** Saves an edit as a new version; 409 when someone saved a newer version first. */
export async function updateMachine(ctx: Ctx, machineId: string, input: { baseVersion: number; machine: MachineRecord; message: string }): Promise<{ version: number }> {
  const now = new Date();
  const model = recordToModel(input.machine);
  try {
    return await getDb().transaction(async (tx) => {
      const locked = await tx.select({ id: machines.id }).from(machines)
        .where(and(eq(machines.id, machineId), eq(machines.workspaceId, ctx.user.workspaceId), isNull(machines.archivedAt))).for('update');
      if (locked.length === 0) throw new AppError('not-found', 'No such machine in this workspace.');
      const current = await getMachineVersionOrThrow(tx, ctx, machineId);
      if (current.version !== input.baseVersion) {
        throw new AppError('conflict', `This machine was changed (now version ${current.version}) since you opened version ${input.baseVersion}. Reload to see the change, then edit again.`, { path: 'baseVersion' });
      }
      const version = current.version + 1;
      const versionId = uuidv4();
      await tx.insert(machineVersions).values({ id: versionId, workspaceId: ctx.user.workspaceId, machineId, version, model, headPivotMm: input.machine.headPivotMm, postId: input.machine.post, note: input.message || `version ${version}`, createdBy: ctx.user.id, createdAt: now });
      await tx.update(machines).set({ name: input.machine.name, notes: input.machine.notes, layout: layoutOf(model), currentVersionId: versionId, updatedAt: now }).where(eq(machines.id, machineId));
      return { version };
    });
  } catch (error) { return duplicateName(error, input.machine.name); }
}

/** Archives (hides) a machine; its versions stay for the programs that use them. */
export async function archiveMachine(ctx: Ctx, machineId: string): Promise<void> {
  await getMachineVersionOrThrow(getDb(), ctx, machineId);
  await getDb().update(machines).set({ archivedAt: new Date() }).where(and(eq(machines.id, machineId), eq(machines.workspaceId, ctx.user.workspaceId)));
}

/** Machine names in the workspace that a program may be re-targeted to or created for. */
export async function machineChoices(ctx: Ctx): Promise<{ id: string; name: string; post: string }[]> {
  return (await listMachines(ctx)).map((m) => ({ id: m.id, name: m.name, post: m.post }));
}

/** How many programs use this machine (shown before archiving). */
export async function programsUsingMachine(ctx: Ctx, machineId: string): Promise<number> {
  const rows = await getDb().select({ id: programs.id }).from(programs)
    .where(and(eq(programs.machineId, machineId), eq(programs.workspaceId, ctx.user.workspaceId), isNull(programs.archivedAt)));
  return rows.length;
}
