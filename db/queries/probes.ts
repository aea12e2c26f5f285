import 'server-only';
/**
 * Probes, calibration records and logged events (stylus change, collision). The
 * effective diameter in use is the latest calibration's; a probe past the
 * workspace's calibration age limit, or with an event logged since, is stale.
 */
import { and, asc, desc, eq, inArray, isNull } from 'drizzle-orm';
import { v4 as uuidv4 } from 'uuid';
import { getDb, type DbOrTx } from '@/db/client';
import { probeCalibrations, probes, users, workspaceSettings } from '@/db/schema';
import { AppError, isDuplicateKey } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import type { Probe } from '@/lib/features/schema';
import { calibrationStatus, type Calibration, type CalibrationStatus, type ProbeEvent, type ProbeRecord } from '@/lib/validation/probes';

export type ProbeSummary = Omit<ProbeRecord, 'effectiveDiameter'> & { id: string; effectiveDiameter: number | null; lastCalibratedOn: string | null; status: CalibrationStatus };
export type CalibrationRow = {
  id: string; kind: string; on: string; artifact: string; certificate: string;
  effectiveDiameter: number | null; feedMmPerMin: number | null; note: string; by: string | null;
};
export type ProbeDetail = ProbeSummary & { history: CalibrationRow[]; limitDays: number };

const isoDay = (d: Date) => d.toISOString().slice(0, 10);

export async function calibrationLimitDays(db: DbOrTx, ctx: Ctx): Promise<number> {
  const rows = await db.select({ days: workspaceSettings.calibrationAgeLimitDays }).from(workspaceSettings).where(eq(workspaceSettings.workspaceId, ctx.user.workspaceId)).limit(1);
  return rows[0]?.days ?? 7;
}

const probeColumns = {
  id: probes.id, name: probes.name, stylusDiameter: probes.stylusDiameterMm, effectiveDiameter: probes.effectiveDiameterMm,
  lengthMm: probes.stylusLengthMm, repeatabilityMm: probes.repeatability2SigmaMm, approach: probes.approachMm,
  overtravel: probes.overtravelMm, clearance: probes.clearanceMm, fastFeed: probes.fastFeedMmPerMin, measureFeed: probes.measureFeedMmPerMin,
};

type ProbeRow = { [K in keyof typeof probeColumns]: K extends 'effectiveDiameter' ? number | null : K extends 'id' | 'name' ? string : number };

async function historyOf(db: DbOrTx, ctx: Ctx, probeIds: string[]) {
  if (probeIds.length === 0) return [];
  return db.select({
    id: probeCalibrations.id, probeId: probeCalibrations.probeId, kind: probeCalibrations.kind, occurredAt: probeCalibrations.occurredAt,
    reference: probeCalibrations.reference, certificate: probeCalibrations.certificate, effectiveDiameter: probeCalibrations.effectiveDiameterMm,
    feed: probeCalibrations.feedMmPerMin, note: probeCalibrations.note, by: users.name, createdAt: probeCalibrations.createdAt,
  }).from(probeCalibrations).leftJoin(users, eq(users.id, probeCalibrations.recordedBy))
    .where(and(eq(probeCalibrations.workspaceId, ctx.user.workspaceId), inArray(probeCalibrations.probeId, probeIds)))
    .orderBy(desc(probeCalibrations.occurredAt), desc(probeCalibrations.createdAt));
}

function summarise(p: ProbeRow, history: Awaited<ReturnType<typeof historyOf>>, limitDays: number, today: string): ProbeSummary {
  const mine = history.filter((h) => h.probeId === p.id);
  const latest = mine.find((h) => h.kind === 'calibration');
  // Events recorded after the latest calibration (same day counts when entered later).
  const later = (h: (typeof mine)[number]) => !latest || h.occurredAt > latest.occurredAt || (isoDay(h.occurredAt) === isoDay(latest.occurredAt) && h.createdAt > latest.createdAt);
  const events = mine.filter((h) => h.kind !== 'calibration' && later(h)).map((h) => ({ kind: h.kind, happenedOn: isoDay(h.occurredAt) })).reverse();
  const lastOn = latest ? isoDay(latest.occurredAt) : null;
  return { ...p, notes: '', lastCalibratedOn: lastOn, status: calibrationStatus(lastOn, events, limitDays, today) };
}

export async function listProbes(ctx: Ctx, today = isoDay(new Date())): Promise<ProbeSummary[]> {
  const db = getDb();
  const rows = await db.select(probeColumns).from(probes).where(and(eq(probes.workspaceId, ctx.user.workspaceId), isNull(probes.archivedAt))).orderBy(asc(probes.name));
  const [history, limit] = await Promise.all([historyOf(db, ctx, rows.map((r) => r.id)), calibrationLimitDays(db, ctx)]);
  return rows.map((r) => summarise(r, history, limit, today));
}

async function probeRowOrThrow(db: DbOrTx, ctx: Ctx, probeId: string): Promise<ProbeRow> {
  const rows = await db.select(probeColumns).from(probes).where(and(eq(probes.id, probeId), eq(probes.workspaceId, ctx.user.workspaceId), isNull(probes.archivedAt))).limit(1);
  const row = rows[0];
  if (!row) throw new AppError('not-found', 'No such probe in this workspace.');
  return row;
}

export async function getProbe(ctx: Ctx, probeId: string, today = isoDay(new Date())): Promise<ProbeDetail> {
  const db = getDb();
  const row = await probeRowOrThrow(db, ctx, probeId);
  const [history, limitDays] = await Promise.all([historyOf(db, ctx, [probeId]), calibrationLimitDays(db, ctx)]);
  return {
    ...summarise(row, history, limitDays, today), limitDays,
    history: history.map((h) => ({ id: h.id, kind: h.kind, on: isoDay(h.occurredAt), artifact: h.reference ?? '', certificate: h.certificate ?? '', effectiveDiameter: h.effectiveDiameter, feedMmPerMin: h.feed, note: h.note ?? '', by: h.by })),
  };
}

/** The engine's probe for planning: the effective diameter from the latest calibration. */
export async function engineProbe(db: DbOrTx, ctx: Ctx, probeId: string): Promise<{ probe: Probe; lengthMm: number; name: string }> {
  const p = await probeRowOrThrow(db, ctx, probeId);
  return {
    name: p.name, lengthMm: p.lengthMm,
    probe: { stylusDiameter: p.stylusDiameter, ...(p.effectiveDiameter ? { effectiveDiameter: p.effectiveDiameter } : {}), approach: p.approach, overtravel: p.overtravel, clearance: p.clearance, fastFeed: p.fastFeed, measureFeed: p.measureFeed },
  };
}

const toColumns = (r: ProbeRecord) => ({
  name: r.name, stylusDiameterMm: r.stylusDiameter, stylusLengthMm: r.lengthMm, repeatability2SigmaMm: r.repeatabilityMm,
  approachMm: r.approach, overtravelMm: r.overtravel, clearanceMm: r.clearance, fastFeedMmPerMin: r.fastFeed, measureFeedMmPerMin: r.measureFeed,
});

function duplicateName(error: unknown, name: string): never {
  if (isDuplicateKey(error)) throw new AppError('conflict', `A probe named "${name}" already exists in this workspace.`, { path: 'name' });
  throw error;
}

export async function createProbe(ctx: Ctx, record: ProbeRecord): Promise<{ id: string }> {
  const id = uuidv4();
  const now = new Date();
  try {
    await getDb().insert(probes).values({ id, workspaceId: ctx.user.workspaceId, ...toColumns(record), createdAt: now, updatedAt: now });
  } catch (error) { duplicateName(error, record.name); }
  return { id };
}

export async function updateProbe(ctx: Ctx, probeId: string, record: ProbeRecord): Promise<void> {
  await probeRowOrThrow(getDb(), ctx, probeId);
  try {
    await getDb().update(probes).set({ ...toColumns(record), updatedAt: new Date() }).where(and(eq(probes.id, probeId), eq(probes.workspaceId, ctx.user.workspaceId)));
  } catch (error) { duplicateName(error, record.name); }
}

export async function archiveProbe(ctx: Ctx, probeId: string): Promise<void> {
  await probeRowOrThrow(getDb(), ctx, probeId);
  await getDb().update(probes).set({ archivedAt: new Date() }).where(and(eq(probes.id, probeId), eq(probes.workspaceId, ctx.user.workspaceId)));
}

/** Records a calibration and makes its effective diameter the one in use, together. */
export async function addCalibration(ctx: Ctx, probeId: string, c: Calibration): Promise<{ id: string }> {
  const id = uuidv4();
  await getDb().transaction(async (tx) => {
    await probeRowOrThrow(tx, ctx, probeId);
    await tx.insert(probeCalibrations).values({
      id, workspaceId: ctx.user.workspaceId, probeId, kind: 'calibration', occurredAt: new Date(`${c.calibratedOn}T12:00:00Z`),
      effectiveDiameterMm: c.measuredEffectiveDiameter, reference: c.artifact, certificate: c.certificate, feedMmPerMin: c.feedMmPerMin,
      note: c.notes || null, recordedBy: ctx.user.id, createdAt: new Date(),
    });
    const latest = await tx.select({ on: probeCalibrations.occurredAt, d: probeCalibrations.effectiveDiameterMm }).from(probeCalibrations)
      .where(and(eq(probeCalibrations.probeId, probeId), eq(probeCalibrations.kind, 'calibration'))).orderBy(desc(probeCalibrations.occurredAt), desc(probeCalibrations.createdAt)).limit(1);
    await tx.update(probes).set({ effectiveDiameterMm: latest[0]?.d ?? c.measuredEffectiveDiameter, updatedAt: new Date() }).where(eq(probes.id, probeId));
  });
  return { id };
}

export async function addProbeEvent(ctx: Ctx, probeId: string, e: ProbeEvent): Promise<{ id: string }> {
  const id = uuidv4();
  await probeRowOrThrow(getDb(), ctx, probeId);
  await getDb().insert(probeCalibrations).values({
    id, workspaceId: ctx.user.workspaceId, probeId, kind: e.kind, occurredAt: new Date(`${e.happenedOn}T12:00:00Z`),
    note: e.note || null, recordedBy: ctx.user.id, createdAt: new Date(),
  });
  return { id };
}
