import 'server-only';
/**
 * One revision: its text, findings, plan and who wrote it. Drafts and revisions
 * under review are hidden from those without `revisions.read` (setup technicians
 * open approved revisions only). Saving an edit is optimistic: the edit names the
 * revision it started from, and a newer one means someone saved first (409).
 */
import { and, eq } from 'drizzle-orm';
import { getDb } from '@/db/client';
import { programs, revisions, users } from '@/db/schema';
import { can } from '@/lib/auth/permissions';
import { planSchema, type Plan } from '@/lib/program/plan-schema';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import type { Finding, SaveRevision } from '@/lib/validation/programs';
import { findingSchema } from '@/lib/validation/programs';
import { getProgram, insertRevision, lockProgram } from './programs';

export type RevisionDetail = {
  id: string; programId: string; programName: string; number: number; status: string; message: string; author: string; authorId: string;
  createdAt: string; text: string; sha256: string; findings: Finding[]; plan: Plan; post: string; isLatest: boolean;
};

export async function getRevision(ctx: Ctx, revisionId: string): Promise<RevisionDetail> {
  const rows = await getDb().select({ r: revisions, author: users.name, programName: programs.name, post: programs.postId })
    .from(revisions).innerJoin(users, eq(users.id, revisions.authorId)).innerJoin(programs, eq(programs.id, revisions.programId))
    .where(and(eq(revisions.id, revisionId), eq(revisions.workspaceId, ctx.user.workspaceId))).limit(1);
  const row = rows[0];
  if (!row) throw new AppError('not-found', 'No such revision in this workspace.');
  if (row.r.status !== 'approved' && !can(ctx.user, 'revisions.read')) {
    throw new AppError('forbidden', 'This revision is not approved yet; setup technicians open approved revisions only.');
  }
  const program = await getProgram(ctx, row.r.programId);
  return {
    id: row.r.id, programId: row.r.programId, programName: row.programName, number: row.r.number, status: row.r.status, message: row.r.message,
    author: row.author, authorId: row.r.authorId, createdAt: row.r.createdAt.toISOString(), text: row.r.programText, sha256: row.r.sha256,
    findings: findingSchema.array().catch([]).parse(row.r.findings), plan: planSchema.catch({ touchPoints: [], warnings: [] }).parse(row.r.plan),
    post: row.post, isLatest: program.latest === row.r.number,
  };
}

/**
 * Stores an edited text as a new revision. `verify` checks the text against the
 * base revision's plan (the engine's verifier); it runs before the transaction.
 */
export async function saveEditedRevision(
  ctx: Ctx, programId: string, input: SaveRevision,
  check: (text: string, basePlan: Plan) => Promise<{ findings: Finding[]; sha256: string }>,
): Promise<{ id: string; number: number; findings: Finding[] }> {
  const base = await getDb().select({ id: revisions.id, plan: revisions.plan }).from(revisions)
    .where(and(eq(revisions.programId, programId), eq(revisions.number, input.baseRevision), eq(revisions.workspaceId, ctx.user.workspaceId))).limit(1);
  const baseRow = base[0];
  if (!baseRow) throw new AppError('not-found', `Revision ${input.baseRevision} of this program does not exist.`, { path: 'body.baseRevision' });
  const plan = planSchema.parse(baseRow.plan);
  const { findings, sha256 } = await check(input.text, plan);
  return getDb().transaction(async (tx) => {
    const { latest } = await lockProgram(tx, ctx, programId);
    if (latest !== input.baseRevision) {
      throw new AppError('conflict', `Someone saved revision ${latest} while you were editing revision ${input.baseRevision}. Your text was not saved: copy it, reload, and apply your change to revision ${latest}.`, { path: 'body.baseRevision' });
    }
    const saved = await insertRevision(tx, ctx, programId, latest + 1, { plan, text: input.text, sha256, findings }, { message: input.message, baseRevisionId: baseRow.id });
    return { ...saved, findings };
  });
}
