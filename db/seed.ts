/**
 * Seeds the demo shop (db/seed-data.ts). Idempotent: every row has a fixed UUID
 * derived from its name, and an existing row is left as it is.
 * Run by npm start and npm test: `tsx db/seed.ts`.
 */
import { getTableColumns, sql } from 'drizzle-orm';
import type { MySqlTable } from 'drizzle-orm/mysql-core';
import { v5 as uuidv5 } from 'uuid';
import { featureSchema } from '@/lib/features/schema';
import { DEMO_HEAD_PIVOT_MM, machinePreset, type PresetId } from '@/lib/kinematics/presets';
import { hashPassword } from '@/lib/auth/password';
import { closeDb, getDb, type Tx } from './client';
import * as t from './schema';
import { DEMO_PASSWORD, FERNHOLLOW, STONEBRIDGE, type SeedPart, type SeedWorkspace } from './seed-data';

const NAMESPACE = '6f1d7c1e-3b0a-4c55-9a8e-2f4b5d6c7e80';
export const seedId = (...parts: string[]): string => uuidv5(parts.join('/'), NAMESPACE);

async function put(tx: Tx, table: MySqlTable, rows: Record<string, unknown>[]): Promise<void> {
  const key = rows[0] ? Object.keys(rows[0])[0] : undefined;
  const column = key ? getTableColumns(table)[key] : undefined;
  if (!key || !column) return;
  // A no-op update (key = key) keeps an existing row as it is.
  await tx.insert(table).values(rows).onDuplicateKeyUpdate({ set: { [key]: sql`${sql.identifier(column.name)}` } });
}

async function seedPeople(tx: Tx, ws: SeedWorkspace, wsId: string, now: Date, passwordHash: string) {
  for (const p of ws.people) {
    const userId = seedId('user', p.email);
    await put(tx, t.users, [{ id: userId, email: p.email, name: p.name, passwordHash, active: true, createdAt: now }]);
    await put(tx, t.memberships, [{ id: seedId(ws.slug, 'member', p.email), workspaceId: wsId, userId, roles: p.roles, active: true, createdAt: now }]);
  }
}

async function seedPart(tx: Tx, ws: SeedWorkspace, wsId: string, part: SeedPart, now: Date) {
  const partId = seedId(ws.slug, 'part', part.number, part.revision);
  const featureId = (label: string) => seedId(ws.slug, 'feature', part.number, part.revision, label);
  await put(tx, t.parts, [{ id: partId, workspaceId: wsId, number: part.number, revision: part.revision, name: part.name, material: part.material, notes: part.notes, createdAt: now, updatedAt: now }]);
  await put(tx, t.features, part.features.map((f, i) => {
    const checked = featureSchema.parse({ ...f, uuid: featureId(f.label) });
    const { uuid: _u, label, type, points, levels, margin, startAngle, ...geometry } = checked;
    const pointOptions = Object.fromEntries(Object.entries({ points, levels, margin, startAngle }).filter(([, v]) => v !== undefined));
    return { id: featureId(label), workspaceId: wsId, partId, type, label, geometry, pointOptions, sortOrder: i, createdAt: now };
  }));
  await put(tx, t.tolerances, part.tolerances.map((tol) => ({
    id: seedId(ws.slug, 'tolerance', part.number, part.revision, tol.reference), workspaceId: wsId, partId,
    featureId: featureId(tol.feature), characteristic: tol.characteristic, value: tol.value ?? null, upper: tol.upper ?? null,
    lower: tol.lower ?? null, fit: tol.fit ?? null, material: tol.material ?? null, datums: tol.datums ?? [], reference: tol.reference, createdAt: now,
  })));
  await put(tx, t.datums, Object.entries(part.datums).map(([letter, label]) => ({
    id: seedId(ws.slug, 'datum', part.number, part.revision, letter), workspaceId: wsId, partId, letter, featureId: featureId(label), createdAt: now,
  })));
}

async function seedEquipment(tx: Tx, ws: SeedWorkspace, wsId: string, now: Date, engineerId: string | null) {
  for (const m of ws.machines) {
    const machineId = seedId(ws.slug, 'machine', m.key);
    const versionId = seedId(ws.slug, 'machine-version', m.key, '1');
    const model = { ...machinePreset(m.preset as PresetId), name: m.name };
    await put(tx, t.machines, [{ id: machineId, workspaceId: wsId, name: m.name, layout: m.layout, controller: m.controller, currentVersionId: versionId, createdAt: now, updatedAt: now }]);
    await put(tx, t.machineVersions, [{ id: versionId, workspaceId: wsId, machineId, version: 1, model, headPivotMm: m.headPivot ? DEMO_HEAD_PIVOT_MM : null, postId: m.postId, note: 'Demo machine', createdBy: engineerId, createdAt: now }]);
  }
  for (const p of ws.probes) {
    const probeId = seedId(ws.slug, 'probe', p.key);
    await put(tx, t.probes, [{
      id: probeId, workspaceId: wsId, name: p.name, stylusDiameterMm: p.stylus, effectiveDiameterMm: p.effective, stylusLengthMm: p.length,
      repeatability2SigmaMm: p.repeat2s, approachMm: 5, overtravelMm: 4, clearanceMm: 10, fastFeedMmPerMin: 1500, measureFeedMmPerMin: 150, createdAt: now, updatedAt: now,
    }]);
    await put(tx, t.probeCalibrations, [{
      id: seedId(ws.slug, 'calibration', p.key, '1'), workspaceId: wsId, probeId, kind: 'calibration', occurredAt: now,
      effectiveDiameterMm: p.effective, repeatability2SigmaMm: p.repeat2s, reference: 'Demo ring gauge Ø25', note: 'Demo calibration at seeding', recordedBy: engineerId, createdAt: now,
    }]);
  }
}

async function seedWorkspace(ws: SeedWorkspace, passwordHash: string): Promise<void> {
  const now = new Date();
  const wsId = seedId('workspace', ws.slug);
  await getDb().transaction(async (tx) => {
    await put(tx, t.workspaces, [{ id: wsId, slug: ws.slug, name: ws.name, createdAt: now }]);
    await put(tx, t.workspaceSettings, [{ workspaceId: wsId, calibrationAgeLimitDays: 7, warningShare: 0.8, updatedAt: now }]);
    await seedPeople(tx, ws, wsId, now, passwordHash);
    const engineer = ws.people.find((p) => p.roles.includes('engineer'));
    await seedEquipment(tx, ws, wsId, now, engineer ? seedId('user', engineer.email) : null);
    for (const part of ws.parts) await seedPart(tx, ws, wsId, part, now);
  });
}

async function main(): Promise<void> {
  const started = Date.now();
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  for (const ws of [FERNHOLLOW, STONEBRIDGE]) await seedWorkspace(ws, passwordHash);
  console.log(`[seed] demo workspaces ready (${Date.now() - started} ms)`);
}

main()
  .catch((error: unknown) => {
    console.error('[seed] failed:', error);
    process.exitCode = 1;
  })
  .finally(() => closeDb());
