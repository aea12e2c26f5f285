import 'server-only';
/**
 * Everything the package, the results upload, the run page and the trace need about one
 * revision, as engine data: the part (features, tolerances, datums), the plan, the engine
 * machine for the program's machine version with the program's probe in the spindle, and
 * the probe. Workspace-scoped; a revision of another workspace is not found.
 */
import { and, asc, eq } from 'drizzle-orm';
import { getDb, type DbOrTx } from '@/db/client';
import { engineProbe, getProbe } from '@/db/queries/probes';
import { datums, features, machines, machineVersions, parts, programs, revisions, tolerances, users } from '@/db/schema';
import type { RevisionStatus } from '@/db/schema';
import { featureSchema, partSchema, toleranceSchema, type Feature, type Part, type Probe, type Tolerance } from '@/lib/features/schema';
import type { Machine } from '@/lib/kinematics/schema';
import { planSchema, type Plan } from '@/lib/program/plan-schema';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import { engineMachineFor } from '@/lib/validation/machines';

export interface RevisionContext {
  revision: { id: string; number: number; status: RevisionStatus; programText: string; sha256: string; authorId: string; approverId: string | null; approverName: string | null; approvedAt: Date | null };
  program: { id: string; name: string; postId: string; createdBy: string };
  part: { id: string; number: string; revision: string; name: string; material: string | null; engine: Part };
  machine: { id: string; name: string; versionId: string; version: number; engine: Machine; postId: string };
  probe: { id: string; name: string; engine: Probe; repeatability2SigmaMm: number; calibration: Awaited<ReturnType<typeof getProbe>>['status']; lastCalibratedOn: string | null };
  plan: Plan;
}

const orUndefined = <T>(v: T | null): T | undefined => (v === null ? undefined : v);

function engineFeature(row: { id: string; type: string; label: string; geometry: Record<string, unknown>; pointOptions: Record<string, unknown> }): Feature {
  const parsed = featureSchema.safeParse({ ...row.pointOptions, ...row.geometry, uuid: row.id, label: row.label, type: row.type });
  if (!parsed.success) throw new AppError('conflict', `Feature ${row.label} is not complete (${parsed.error.issues[0]?.message ?? 'invalid'}); fix it on the part first.`);
  return parsed.data;
}

function engineTolerance(row: typeof tolerances.$inferSelect): Tolerance {
  return toleranceSchema.parse({
    uuid: row.id, featureUuid: row.featureId, characteristic: row.characteristic,
    value: orUndefined(row.value), upper: orUndefined(row.upper), lower: orUndefined(row.lower),
    fit: orUndefined(row.fit), material: orUndefined(row.material), datums: row.datums.length > 0 ? row.datums : undefined,
  });
}

async function loadEnginePart(db: DbOrTx, ctx: Ctx, partId: string): Promise<Part> {
  const scope = (t: typeof features | typeof tolerances | typeof datums) => and(eq(t.partId, partId), eq(t.workspaceId, ctx.user.workspaceId));
  const [f, t, d] = await Promise.all([
    db.select({ id: features.id, type: features.type, label: features.label, geometry: features.geometry, pointOptions: features.pointOptions })
      .from(features).where(scope(features)).orderBy(asc(features.sortOrder), asc(features.label)),
    db.select().from(tolerances).where(scope(tolerances)),
    db.select({ letter: datums.letter, featureId: datums.featureId }).from(datums).where(scope(datums)),
  ]);
  return partSchema.parse({
    uuid: partId,
    features: f.map(engineFeature),
    tolerances: t.map(engineTolerance),
    datums: Object.fromEntries(d.map((x) => [x.letter, x.featureId])),
  });
}

export async function loadRevisionContext(ctx: Ctx, revisionId: string, db: DbOrTx = getDb()): Promise<RevisionContext> {
  const rows = await db
    .select({ revision: revisions, program: programs, part: parts, machineName: machines.name, version: machineVersions, approverName: users.name })
    .from(revisions)
    .innerJoin(programs, eq(programs.id, revisions.programId))
    .innerJoin(parts, eq(parts.id, programs.partId))
    .innerJoin(machines, eq(machines.id, programs.machineId))
    .innerJoin(machineVersions, eq(machineVersions.id, programs.machineVersionId))
    .leftJoin(users, eq(users.id, revisions.approverId))
    .where(and(eq(revisions.id, revisionId), eq(revisions.workspaceId, ctx.user.workspaceId)))
    .limit(1);
  const row = rows[0];
  if (!row) throw new AppError('not-found', 'No such revision in this workspace.');
  const { revision: r, program: p, part, version: v } = row;
  const plan = planSchema.safeParse(r.plan);
  if (!plan.success) throw new AppError('conflict', `Revision ${r.number} has no readable plan; regenerate the program.`);
  const [enginePart, probe, probeDetail] = await Promise.all([
    loadEnginePart(db, ctx, part.id), engineProbe(db, ctx, p.probeId), getProbe(ctx, p.probeId),
  ]);
  return {
    revision: { id: r.id, number: r.number, status: r.status, programText: r.programText, sha256: r.sha256, authorId: r.authorId, approverId: r.approverId, approverName: row.approverName, approvedAt: r.approvedAt },
    program: { id: p.id, name: p.name, postId: p.postId, createdBy: p.createdBy },
    part: { id: part.id, number: part.number, revision: part.revision, name: part.name, material: part.material, engine: { ...enginePart, number: part.number, revision: part.revision, material: orUndefined(part.material) } },
    machine: { id: p.machineId, name: row.machineName, versionId: v.id, version: v.version, engine: engineMachineFor(v.model, probe.lengthMm), postId: v.postId },
    probe: { id: p.probeId, name: probe.name, engine: probe.probe, repeatability2SigmaMm: probeDetail.repeatabilityMm, calibration: probeDetail.status, lastCalibratedOn: probeDetail.lastCalibratedOn },
    plan: plan.data,
  };
}
