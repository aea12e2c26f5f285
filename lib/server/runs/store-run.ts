import 'server-only';
/**
 * Stores a run whole or not at all: the run, its measurements, one result per tolerance
 * and the proposed corrections, the audit event and — for a real run with a
 * nonconforming or marginal result — an e-mail to the programmer and the engineers, all
 * in one transaction.
 */
import { v4 as uuidv4 } from 'uuid';
import { getDb } from '@/db/client';
import { kickOutbox } from '@/lib/mail/worker';
import { recordAudit } from '@/db/queries/audit';
import { corrections, measurements, results, runs } from '@/db/schema';
import type { Corrections } from '@/lib/evaluation/corrections';
import type { EvaluateOutput } from '@/lib/evaluation/evaluate';
import type { Vec3 } from '@/lib/kinematics/schema';
import type { Ctx } from '@/lib/server/context';
import { appLink, membersWithRoles, queueMail, usersByIds } from '@/lib/server/reviews/mail';
import type { RevisionContext } from './revision-context';

export interface StoredMeasurement { uuid: string; point: Vec3 | null; line: number | null; axes?: Record<string, number> }

export interface NewRun {
  serial: string;
  temperatureC?: number;
  simulated: boolean;
  measuredAt: Date;
  notes?: string;
  measurements: StoredMeasurement[];
  evaluation: EvaluateOutput;
}

type CorrectionRow = typeof corrections.$inferInsert;

function correctionRows(ctx: Ctx, runId: string, c: Corrections | undefined, now: Date): CorrectionRow[] {
  if (!c) return [];
  const rows: CorrectionRow[] = [];
  c.proposals.forEach((p, group) => {
    const base = { workspaceId: ctx.user.workspaceId, runId, code: p.line ?? '', applied: false, createdAt: now };
    const details = { group, state: p.state, instruction: p.instruction, source: p.source, dialect: c.dialect, note: c.note };
    if (p.kind === 'work-offset') {
      (['X', 'Y', 'Z'] as const).forEach((axis, i) => {
        rows.push({ ...base, id: uuidv4(), kind: 'work-offset', register: `${p.registerName} ${axis}`, oldValue: p.old[i] ?? null, newValue: p.new[i] ?? 0, details: { ...details, shift: p.shift[i], rotationDeg: p.rotationDeg } });
      });
    } else {
      rows.push({ ...base, id: uuidv4(), kind: 'radius-wear', register: `T${p.tool} radius wear`, oldValue: p.old, newValue: p.new, details: { ...details, change: p.change, featureUuid: p.featureUuid } });
    }
  });
  return rows;
}

export async function storeRun(ctx: Ctx, c: RevisionContext, run: NewRun): Promise<{ runId: string; mailed: number }> {
  const runId = uuidv4();
  const now = new Date();
  const ws = ctx.user.workspaceId;
  const out = await getDb().transaction(async (tx) => {
    await tx.insert(runs).values({
      id: runId, workspaceId: ws, revisionId: c.revision.id, serial: run.serial, temperatureC: run.temperatureC ?? null,
      simulated: run.simulated, uploadedBy: ctx.user.id, measuredAt: run.measuredAt, notes: run.notes ?? null, createdAt: now,
    });
    const hits = run.measurements.filter((m): m is StoredMeasurement & { point: Vec3 } => m.point !== null);
    if (hits.length > 0) {
      await tx.insert(measurements).values(hits.map((m) => ({
        id: uuidv4(), workspaceId: ws, runId, touchPointUuid: m.uuid, xMm: m.point[0], yMm: m.point[1], zMm: m.point[2], sourceLine: m.line, axes: m.axes ?? null,
      })));
    }
    const resultRows = run.evaluation.results.map((r) => ({
      id: uuidv4(), workspaceId: ws, runId, toleranceId: r.toleranceUuid, characteristic: r.characteristic, value: r.value,
      nominal: r.nominal ?? null, lowerLimit: r.lower, upperLimit: r.upper, bonus: r.bonus ?? null, status: r.status,
      uncertainty: r.uncertainty?.U ?? null, decisionRule: r.decisionRule ? 'iso-14253-1-default' : 'none',
      details: { ...r } as Record<string, unknown>, createdAt: now,
    }));
    if (resultRows.length > 0) await tx.insert(results).values(resultRows);
    const corr = correctionRows(ctx, runId, run.evaluation.corrections, now);
    if (corr.length > 0) await tx.insert(corrections).values(corr);

    const bad = run.evaluation.results.filter((r) => r.status === 'nonconforming' || r.status === 'marginal');
    const title = `${c.part.number} · ${c.program.name} revision ${c.revision.number}, serial ${run.serial}`;
    let mailed = 0;
    if (!run.simulated && bad.length > 0) {
      const to = [...(await usersByIds(tx, [c.revision.authorId, c.program.createdBy])), ...(await membersWithRoles(tx, ws, ['engineer']))];
      mailed = await queueMail(tx, {
        workspaceId: ws, kind: 'run-attention', to,
        subject: `${bad.some((r) => r.status === 'nonconforming') ? 'Nonconforming' : 'Marginal'} results: ${title}`,
        text: `${bad.length} result${bad.length === 1 ? '' : 's'} need attention:\n${bad.map((r) => `  ${r.label} ${r.characteristic}: ${r.status}${r.value !== null ? ` (${r.value.toFixed(4)})` : ''}`).join('\n')}\n\nOpen the run: ${appLink(`/runs/${runId}`)}`,
      });
    }
    await recordAudit(tx, {
      workspaceId: ws, actorUserId: ctx.user.id, actorEmail: ctx.user.email, ip: ctx.ip,
      action: run.simulated ? 'virtual-run-created' : 'run-uploaded', targetType: 'run', targetId: runId,
      summary: `${run.simulated ? 'Simulated' : 'Uploaded'} ${title}: ${run.evaluation.results.length} results, ${bad.length} need attention`,
      details: { measurements: run.measurements.length },
    });
    return { runId, mailed };
  });
  kickOutbox();
  return out;
}
