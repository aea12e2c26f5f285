import 'server-only';
/**
 * Parts with their features, tolerances and datum letters. Feature and tolerance
 * ids are the engine's uuids. Scoped to the caller's workspace; edits that touch
 * several rows run in one transaction.
 */
import { and, asc, count, eq, inArray, isNull } from 'drizzle-orm';
import { v4 as uuidv4 } from 'uuid';
import { getDb, type DbOrTx, type Tx } from '@/db/client';
import { datums, features, parts, tolerances } from '@/db/schema';
import { featureSchema, type Feature, type Part, type Tolerance } from '@/lib/features/schema';
import { AppError, isDuplicateKey } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import type { FeatureInput, PartHeader, ToleranceInput } from '@/lib/validation/parts';

export type PartListRow = { id: string; name: string; number: string; revision: string; material: string; features: number; updatedAt: string };
export type ToleranceRow = Tolerance & { id: string };
export type PartDetail = PartHeader & { id: string; updatedAt: string; features: Feature[]; tolerances: ToleranceRow[]; datums: Record<string, string> };

const optionKeys = ['points', 'levels', 'margin', 'startAngle'] as const;

function splitFeature(f: FeatureInput) {
  const { type, label, ...rest } = f;
  const pointOptions: Record<string, unknown> = {};
  const geometry: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(rest)) {
    if (v === undefined) continue;
    if ((optionKeys as readonly string[]).includes(k)) pointOptions[k] = v; else geometry[k] = v;
  }
  return { type, label, geometry, pointOptions };
}

function joinFeature(row: { id: string; type: string; label: string; geometry: Record<string, unknown>; pointOptions: Record<string, unknown> }): Feature {
  return featureSchema.parse({ uuid: row.id, type: row.type, label: row.label, ...row.geometry, ...row.pointOptions });
}

function toleranceOf(row: typeof tolerances.$inferSelect): ToleranceRow {
  const t: ToleranceRow = { id: row.id, uuid: row.id, featureUuid: row.featureId, characteristic: row.characteristic };
  if (row.value !== null) t.value = row.value;
  if (row.upper !== null) t.upper = row.upper;
  if (row.lower !== null) t.lower = row.lower;
  if (row.fit) t.fit = row.fit;
  if (row.material) t.material = row.material;
  if (row.datums.length > 0) t.datums = row.datums;
  return t;
}

export async function listParts(ctx: Ctx): Promise<PartListRow[]> {
  const rows = await getDb()
    .select({ id: parts.id, name: parts.name, number: parts.number, revision: parts.revision, material: parts.material, updatedAt: parts.updatedAt, features: count(features.id) })
    .from(parts).leftJoin(features, eq(features.partId, parts.id))
    .where(and(eq(parts.workspaceId, ctx.user.workspaceId), isNull(parts.archivedAt)))
    .groupBy(parts.id).orderBy(asc(parts.number), asc(parts.revision));
  return rows.map((r) => ({ ...r, material: r.material ?? '', updatedAt: r.updatedAt.toISOString() }));
}

export async function partRowOrThrow(db: DbOrTx, ctx: Ctx, partId: string) {
  const rows = await db.select({ id: parts.id, name: parts.name, number: parts.number, revision: parts.revision, material: parts.material, notes: parts.notes, updatedAt: parts.updatedAt })
    .from(parts).where(and(eq(parts.id, partId), eq(parts.workspaceId, ctx.user.workspaceId), isNull(parts.archivedAt))).limit(1);
  const row = rows[0];
  if (!row) throw new AppError('not-found', 'No such part in this workspace.');
  return row;
}

export async function getPart(ctx: Ctx, partId: string, db: DbOrTx = getDb()): Promise<PartDetail> {
  const row = await partRowOrThrow(db, ctx, partId);
  const scope = (t: typeof features | typeof tolerances | typeof datums) => and(eq(t.partId, partId), eq(t.workspaceId, ctx.user.workspaceId));
  const [f, t, d] = await Promise.all([
    db.select({ id: features.id, type: features.type, label: features.label, geometry: features.geometry, pointOptions: features.pointOptions }).from(features).where(scope(features)).orderBy(asc(features.sortOrder), asc(features.createdAt)),
    db.select().from(tolerances).where(scope(tolerances)).orderBy(asc(tolerances.createdAt)),
    db.select({ letter: datums.letter, featureId: datums.featureId }).from(datums).where(scope(datums)).orderBy(asc(datums.letter)),
  ]);
  return {
    id: row.id, name: row.name, number: row.number, revision: row.revision, material: row.material ?? '', notes: row.notes ?? '', updatedAt: row.updatedAt.toISOString(),
    features: f.map(joinFeature), tolerances: t.map(toleranceOf), datums: Object.fromEntries(d.map((x) => [x.letter, x.featureId])),
  };
}

/** The engine's part (features, tolerances, datums) for planning and evaluation. */
export async function enginePart(db: DbOrTx, ctx: Ctx, partId: string): Promise<Part & { label: string }> {
  const p = await getPart(ctx, partId, db);
  return {
    uuid: p.id, number: p.number, revision: p.revision, ...(p.material ? { material: p.material } : {}), label: `${p.number} rev ${p.revision}`,
    features: p.features, tolerances: p.tolerances.map(({ id: _id, ...t }) => t), datums: p.datums,
  };
}

function duplicatePart(error: unknown, h: PartHeader): never {
  if (isDuplicateKey(error)) throw new AppError('conflict', `Part ${h.number} revision ${h.revision} already exists.`, { path: 'number' });
  throw error;
}

export async function createPart(ctx: Ctx, h: PartHeader): Promise<{ id: string }> {
  const id = uuidv4();
  const now = new Date();
  try {
    await getDb().insert(parts).values({ id, workspaceId: ctx.user.workspaceId, name: h.name, number: h.number, revision: h.revision, material: h.material || null, notes: h.notes || null, createdAt: now, updatedAt: now });
  } catch (error) { duplicatePart(error, h); }
  return { id };
}

export async function updatePart(ctx: Ctx, partId: string, h: PartHeader): Promise<void> {
  await partRowOrThrow(getDb(), ctx, partId);
  try {
    await getDb().update(parts).set({ name: h.name, number: h.number, revision: h.revision, material: h.material || null, notes: h.notes || null, updatedAt: new Date() })
      .where(and(eq(parts.id, partId), eq(parts.workspaceId, ctx.user.workspaceId)));
  } catch (error) { duplicatePart(error, h); }
}

export async function archivePart(ctx: Ctx, partId: string): Promise<void> {
  await partRowOrThrow(getDb(), ctx, partId);
  await getDb().update(parts).set({ archivedAt: new Date() }).where(and(eq(parts.id, partId), eq(parts.workspaceId, ctx.user.workspaceId)));
}

const touch = (tx: DbOrTx, partId: string) => tx.update(parts).set({ updatedAt: new Date() }).where(eq(parts.id, partId));

function duplicateLabel(error: unknown, label: string): never {
  if (isDuplicateKey(error)) throw new AppError('conflict', `The part already has a feature labelled "${label}".`, { path: 'label' });
  throw error;
}

export async function insertFeature(tx: Tx, ctx: Ctx, partId: string, f: FeatureInput, sortOrder: number): Promise<string> {
  const id = uuidv4();
  try {
    await tx.insert(features).values({ id, workspaceId: ctx.user.workspaceId, partId, ...splitFeature(f), sortOrder, createdAt: new Date() });
  } catch (error) { duplicateLabel(error, f.label); }
  return id;
}

async function nextSortOrder(db: DbOrTx, partId: string): Promise<number> {
  const rows = await db.select({ n: count(features.id) }).from(features).where(eq(features.partId, partId));
  return rows[0]?.n ?? 0;
}

export async function addFeature(ctx: Ctx, partId: string, f: FeatureInput): Promise<{ id: string }> {
  return getDb().transaction(async (tx) => {
    await partRowOrThrow(tx, ctx, partId);
    const id = await insertFeature(tx, ctx, partId, f, await nextSortOrder(tx, partId));
    await touch(tx, partId);
    return { id };
  });
}

async function featureOrThrow(db: DbOrTx, ctx: Ctx, partId: string, featureId: string) {
  const rows = await db.select({ id: features.id, type: features.type }).from(features)
    .where(and(eq(features.id, featureId), eq(features.partId, partId), eq(features.workspaceId, ctx.user.workspaceId))).limit(1);
  if (!rows[0]) throw new AppError('not-found', 'No such feature on this part.', { path: 'featureId' });
  return rows[0];
}

export async function updateFeature(ctx: Ctx, partId: string, featureId: string, f: FeatureInput): Promise<void> {
  await getDb().transaction(async (tx) => {
    await partRowOrThrow(tx, ctx, partId);
    const existing = await featureOrThrow(tx, ctx, partId, featureId);
    if (existing.type !== f.type) throw new AppError('invalid', 'A feature keeps its type; delete it and add a new one instead.', { path: 'body.type' });
    try {
      await tx.update(features).set(splitFeature(f)).where(eq(features.id, featureId));
    } catch (error) { duplicateLabel(error, f.label); }
    await touch(tx, partId);
  });
}

export async function deleteFeature(ctx: Ctx, partId: string, featureId: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    await featureOrThrow(tx, ctx, partId, featureId);
    await tx.delete(tolerances).where(eq(tolerances.featureId, featureId));
    await tx.delete(datums).where(eq(datums.featureId, featureId));
    await tx.delete(features).where(eq(features.id, featureId));
    await touch(tx, partId);
  });
}

export async function insertTolerance(tx: Tx, ctx: Ctx, partId: string, featureId: string, t: ToleranceInput): Promise<string> {
  const id = uuidv4();
  await tx.insert(tolerances).values({
    id, workspaceId: ctx.user.workspaceId, partId, featureId, characteristic: t.characteristic,
    value: t.value ?? null, upper: t.upper ?? null, lower: t.lower ?? null, fit: t.fit ?? null, material: t.material ?? null,
    datums: t.datums ?? [], createdAt: new Date(),
  });
  return id;
}

export async function addTolerance(ctx: Ctx, partId: string, featureId: string, t: ToleranceInput): Promise<{ id: string }> {
  return getDb().transaction(async (tx) => {
    await featureOrThrow(tx, ctx, partId, featureId);
    await assertDatumsExist(tx, partId, t.datums ?? []);
    const id = await insertTolerance(tx, ctx, partId, featureId, t);
    await touch(tx, partId);
    return { id };
  });
}

async function assertDatumsExist(db: DbOrTx, partId: string, letters: readonly string[]) {
  if (letters.length === 0) return;
  const rows = await db.select({ letter: datums.letter }).from(datums).where(and(eq(datums.partId, partId), inArray(datums.letter, [...letters])));
  const have = new Set(rows.map((r) => r.letter));
  const missing = letters.filter((l) => !have.has(l));
  if (missing.length > 0) throw new AppError('invalid', `Datum ${missing.join(', ')} is not assigned to a feature on this part yet.`, { path: 'body.datums' });
}

export async function deleteTolerance(ctx: Ctx, partId: string, toleranceId: string): Promise<void> {
  const res = await getDb().delete(tolerances).where(and(eq(tolerances.id, toleranceId), eq(tolerances.partId, partId), eq(tolerances.workspaceId, ctx.user.workspaceId)));
  if (res[0].affectedRows === 0) throw new AppError('not-found', 'No such tolerance on this part.');
}

export async function setDatum(ctx: Ctx, partId: string, letter: string, featureId: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    await featureOrThrow(tx, ctx, partId, featureId);
    await tx.delete(datums).where(and(eq(datums.partId, partId), eq(datums.letter, letter)));
    await tx.insert(datums).values({ id: uuidv4(), workspaceId: ctx.user.workspaceId, partId, letter, featureId, createdAt: new Date() });
    await touch(tx, partId);
  });
}

export async function removeDatum(ctx: Ctx, partId: string, letter: string): Promise<void> {
  await partRowOrThrow(getDb(), ctx, partId);
  const used = await getDb().select({ datums: tolerances.datums }).from(tolerances).where(and(eq(tolerances.partId, partId), eq(tolerances.workspaceId, ctx.user.workspaceId)));
  const count = used.filter((t) => t.datums.includes(letter)).length;
  if (count > 0) throw new AppError('conflict', `Datum ${letter} is referenced by ${count} tolerance(s); change those first.`, { path: 'letter' });
  const res = await getDb().delete(datums).where(and(eq(datums.partId, partId), eq(datums.letter, letter), eq(datums.workspaceId, ctx.user.workspaceId)));
  if (res[0].affectedRows === 0) throw new AppError('not-found', `Datum ${letter} is not assigned on this part.`);
}
