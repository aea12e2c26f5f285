/**
 * Test set-up for the run-* end-to-end tests (and by hand: `npx tsx tests/e2e/run-fixtures.ts`
 * with DATABASE_URL set): a program for the demo manifold on the trunnion with two draft
 * revisions written by the demo programmer-reviewer — revision 1 as generated, revision 2 with the slow-touch
 * feed of one feature changed — planned, posted and verified by the engine. Also turns
 * simulated trip points back into the control's TRIP log lines (machine frame).
 */
import { createHash } from 'node:crypto';
import { and, asc, eq } from 'drizzle-orm';
import { v4 as uuidv4 } from 'uuid';
import { getDb, closeDb } from '@/db/client';
import * as t from '@/db/schema';
import { featureSchema, partSchema, type Part, type Probe } from '@/lib/features/schema';
import { planProgram } from '@/lib/features/plan';
import { headOffset, partToMachine } from '@/lib/kinematics/forward';
import { prepareMachine } from '@/lib/kinematics/machine';
import type { Machine, Vec3 } from '@/lib/kinematics/schema';
import { postProgram, requirePost } from '@/lib/program/post';
import { verifyProgram } from '@/lib/program/verify';
import type { Plan } from '@/lib/program/plan-schema';
import { engineMachineFor } from '@/lib/validation/machines';

export const FIXTURE_PART = 'FH-1042';
export const FIXTURE_MACHINE = 'T5-1 AC trunnion';
export const FIXTURE_PROBE = 'TP-1 Ø4 ruby, 50 mm';
/** Mira Lund holds programmer and reviewer: the author who must not approve her own revision. */
export const AUTHOR_EMAIL = 'mira.lund@fernhollow.example';

const orU = <T>(v: T | null): T | undefined => (v === null ? undefined : v);

export interface Fixture { name: string; repeatability2Sigma: number; programId: string; revisionIds: [string, string]; part: Part; probe: Probe; machine: Machine; plan: Plan; partId: string; machineId: string }

async function loadPart(partNumber: string): Promise<{ id: string; part: Part; workspaceId: string }> {
  const db = getDb();
  const [p] = await db.select().from(t.parts).where(eq(t.parts.number, partNumber)).limit(1);
  if (!p) throw new Error(`demo part ${partNumber} is not seeded`);
  const f = await db.select().from(t.features).where(eq(t.features.partId, p.id)).orderBy(asc(t.features.sortOrder));
  const tol = await db.select().from(t.tolerances).where(eq(t.tolerances.partId, p.id));
  const d = await db.select().from(t.datums).where(eq(t.datums.partId, p.id));
  const part = partSchema.parse({
    uuid: p.id, number: p.number, revision: p.revision, material: p.material ?? undefined,
    features: f.map((x) => featureSchema.parse({ ...x.pointOptions, ...x.geometry, uuid: x.id, label: x.label, type: x.type })),
    tolerances: tol.map((x) => ({ uuid: x.id, featureUuid: x.featureId, characteristic: x.characteristic, value: orU(x.value), upper: orU(x.upper), lower: orU(x.lower), fit: orU(x.fit), material: orU(x.material), datums: x.datums.length ? x.datums : undefined })),
    datums: Object.fromEntries(d.map((x) => [x.letter, x.featureId])),
  });
  return { id: p.id, part, workspaceId: p.workspaceId };
}

export async function createFixtureProgram(name = `Op30 check ${uuidv4().slice(0, 6)}`, authorEmail = AUTHOR_EMAIL): Promise<Fixture> {
  const db = getDb();
  const { id: partId, part, workspaceId } = await loadPart(FIXTURE_PART);
  const [m] = await db.select().from(t.machines).where(and(eq(t.machines.workspaceId, workspaceId), eq(t.machines.name, FIXTURE_MACHINE))).limit(1);
  const [pr] = await db.select().from(t.probes).where(and(eq(t.probes.workspaceId, workspaceId), eq(t.probes.name, FIXTURE_PROBE))).limit(1);
  const [author] = await db.select().from(t.users).where(eq(t.users.email, authorEmail)).limit(1);
  if (!m?.currentVersionId || !pr || !author) throw new Error('demo machine, probe or programmer missing: run the seed first');
  const [v] = await db.select().from(t.machineVersions).where(eq(t.machineVersions.id, m.currentVersionId)).limit(1);
  if (!v) throw new Error('machine version missing');
  const machine = engineMachineFor(v.model, pr.stylusLengthMm);
  const probe: Probe = { stylusDiameter: pr.stylusDiameterMm, effectiveDiameter: pr.effectiveDiameterMm ?? undefined, approach: pr.approachMm, overtravel: pr.overtravelMm, clearance: pr.clearanceMm, fastFeed: pr.fastFeedMmPerMin, measureFeed: pr.measureFeedMmPerMin };
  const plan = planProgram({ part, probe, machine });
  const post = requirePost(v.postId);
  const text1 = postProgram({ plan, part, probe, machine, postprocessor: v.postId }, post);
  // Revision 2: planned again with a 1 mm longer approach (every start point moves).
  const plan2 = planProgram({ part, probe: { ...probe, approach: probe.approach + 1 }, machine });
  const text2 = postProgram({ plan: plan2, part, probe: { ...probe, approach: probe.approach + 1 }, machine, postprocessor: v.postId }, post);
  const now = new Date();
  const programId = uuidv4();
  const revisionIds: [string, string] = [uuidv4(), uuidv4()];
  await db.transaction(async (tx) => {
    await tx.insert(t.programs).values({ id: programId, workspaceId, name, partId, machineId: m.id, machineVersionId: v.id, probeId: pr.id, postId: v.postId, createdBy: author.id, createdAt: now, updatedAt: now });
    const versions = [{ text: text1, plan, probe }, { text: text2, plan: plan2, probe: { ...probe, approach: probe.approach + 1 } }];
    for (const [i, { text, plan: p, probe: pb }] of versions.entries()) {
      const findings = verifyProgram({ program: text, part, probe: pb, machine, plan: p }, post).findings;
      await tx.insert(t.revisions).values({
        id: revisionIds[i] as string, workspaceId, programId, number: i + 1, authorId: author.id, message: i === 0 ? 'generated' : 'approach 1 mm longer',
        status: 'draft', programText: text, sha256: createHash('sha256').update(text).digest('hex'), plan: p, findings, createdAt: new Date(now.getTime() + i),
      });
      await tx.insert(t.touchPoints).values(p.touchPoints.map((tp) => ({ id: uuidv4(), workspaceId, revisionId: revisionIds[i] as string, uuid: tp.uuid, featureId: tp.featureUuid, seq: tp.seq, geometry: { surface: tp.surface, normal: tp.normal, direction: tp.direction, target: tp.target, start: tp.start, end: tp.end, toolAxis: tp.toolAxis }, axes: tp.axes })));
    }
  });
  return { name, repeatability2Sigma: pr.repeatability2SigmaMm, programId, revisionIds, part, probe, machine, plan: plan2, partId, machineId: m.id };
}

/** Stylus-centre trip points (part frame) → "TRIP uuid X… Y… Z… A… C…" as the control writes them. */
export function tripLog(plan: Plan, machine: Machine, points: { uuid: string; point?: Vec3 }[]): string {
  const pm = prepareMachine(machine);
  const byUuid = new Map(plan.touchPoints.map((tp) => [tp.uuid, tp]));
  const rotaries = machine.rotaries.map((r) => r.name);
  return points.flatMap((m) => {
    const tp = byUuid.get(m.uuid);
    if (!tp || !m.point) return [];
    const tipM = partToMachine(pm, tp.axes, m.point);
    const head = headOffset(pm, tp.axes).tip;
    const xyz = [tipM[0] - head[0], tipM[1] - head[1], tipM[2] - head[2]];
    const words = [...['X', 'Y', 'Z'].map((w, i) => `${w}${(xyz[i] ?? 0).toFixed(4)}`), ...rotaries.map((r) => `${r}${(tp.axes[r] ?? 0).toFixed(4)}`)];
    return [`TRIP ${m.uuid} ${words.join(' ')}`];
  }).join('\n') + '\n';
}

if (process.argv[1]?.endsWith('run-fixtures.ts')) {
  createFixtureProgram().then((f) => console.log(JSON.stringify({ programId: f.programId, revisionIds: f.revisionIds, points: f.plan.touchPoints.length, warnings: f.plan.warnings.length })))
    .catch((e: unknown) => { console.error(e); process.exitCode = 1; })
    .finally(() => closeDb());
}
