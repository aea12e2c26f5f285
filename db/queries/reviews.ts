import 'server-only';
/**
 * Review queue, revision comparison and review decisions. Workspace-scoped; returns only
 * what the review screens show. Decisions run in one transaction with their audit event
 * and e-mail, and only from the expected status (a concurrent decision gets a 409).
 */
import { and, desc, eq, inArray } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import { v4 as uuidv4 } from 'uuid';
import { getDb, type DbOrTx } from '@/db/client';
import { parts, programs, reviewDecisions, revisions, users } from '@/db/schema';
import type { RevisionStatus } from '@/db/schema';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';

export interface Finding { line: number | null; code: string; severity: string; message: string }

export function findingsOf(value: unknown): Finding[] {
  if (!Array.isArray(value)) return [];
  return value.filter((f): f is Finding => typeof f === 'object' && f !== null && 'severity' in f && 'message' in f);
}

export const errorCount = (findings: unknown): number => findingsOf(findings).filter((f) => f.severity === 'error').length;

export interface RevisionRow {
  id: string;
  programId: string;
  programName: string;
  partNumber: string;
  number: number;
  status: RevisionStatus;
  authorId: string;
  authorName: string;
  message: string;
  errors: number;
  createdAt: string;
  submittedAt: string | null;
  approvedAt: string | null;
}

const author = alias(users, 'author');

function baseSelect(db: DbOrTx) {
  return db
    .select({
      id: revisions.id, programId: revisions.programId, programName: programs.name, partNumber: parts.number,
      number: revisions.number, status: revisions.status, authorId: revisions.authorId, authorName: author.name,
      message: revisions.message, findings: revisions.findings, createdAt: revisions.createdAt,
      submittedAt: revisions.submittedAt, approvedAt: revisions.approvedAt,
    })
    .from(revisions)
    .innerJoin(programs, eq(programs.id, revisions.programId))
    .innerJoin(parts, eq(parts.id, programs.partId))
    .innerJoin(author, eq(author.id, revisions.authorId));
}

type BaseRow = Awaited<ReturnType<ReturnType<typeof baseSelect>['where']>>[number];

function toRow(r: BaseRow): RevisionRow {
  return {
    id: r.id, programId: r.programId, programName: r.programName, partNumber: r.partNumber, number: r.number,
    status: r.status, authorId: r.authorId, authorName: r.authorName, message: r.message, errors: errorCount(r.findings),
    createdAt: r.createdAt.toISOString(), submittedAt: r.submittedAt?.toISOString() ?? null, approvedAt: r.approvedAt?.toISOString() ?? null,
  };
}

export async function listRevisionsByStatus(ctx: Ctx, statuses: RevisionStatus[], limit = 100): Promise<RevisionRow[]> {
  const rows = await baseSelect(getDb())
    .where(and(eq(revisions.workspaceId, ctx.user.workspaceId), inArray(revisions.status, statuses)))
    .orderBy(desc(revisions.createdAt))
    .limit(limit);
  return rows.map(toRow);
}

/** The caller's own drafts and sent-back revisions, newest first. */
export async function listOwnOpenRevisions(ctx: Ctx): Promise<RevisionRow[]> {
  const rows = await baseSelect(getDb())
    .where(and(eq(revisions.workspaceId, ctx.user.workspaceId), eq(revisions.authorId, ctx.user.id), inArray(revisions.status, ['draft', 'sent-back'])))
    .orderBy(desc(revisions.createdAt))
    .limit(50);
  return rows.map(toRow);
}

export async function getRevisionRowOrThrow(db: DbOrTx, ctx: Ctx, revisionId: string): Promise<RevisionRow> {
  const rows = await baseSelect(db).where(and(eq(revisions.id, revisionId), eq(revisions.workspaceId, ctx.user.workspaceId))).limit(1);
  const row = rows[0];
  if (!row) throw new AppError('not-found', 'No such revision in this workspace.');
  return toRow(row);
}

export interface RevisionContent { id: string; number: number; programText: string; plan: unknown; findings: Finding[]; sha256: string }

export async function getRevisionContentOrThrow(ctx: Ctx, revisionId: string): Promise<RevisionContent> {
  const rows = await getDb()
    .select({ id: revisions.id, number: revisions.number, programText: revisions.programText, plan: revisions.plan, findings: revisions.findings, sha256: revisions.sha256 })
    .from(revisions)
    .where(and(eq(revisions.id, revisionId), eq(revisions.workspaceId, ctx.user.workspaceId)))
    .limit(1);
  const row = rows[0];
  if (!row) throw new AppError('not-found', 'No such revision in this workspace.');
  return { ...row, findings: findingsOf(row.findings) };
}

/** Every revision of a program (for the "compare with" choice), newest first. */
export async function listProgramRevisions(ctx: Ctx, programId: string): Promise<{ id: string; number: number; status: RevisionStatus }[]> {
  return getDb()
    .select({ id: revisions.id, number: revisions.number, status: revisions.status })
    .from(revisions)
    .where(and(eq(revisions.programId, programId), eq(revisions.workspaceId, ctx.user.workspaceId)))
    .orderBy(desc(revisions.number));
}

export interface DecisionRow { id: string; decision: string; comment: string | null; reviewerName: string; createdAt: string }

export async function listDecisions(ctx: Ctx, revisionId: string): Promise<DecisionRow[]> {
  const rows = await getDb()
    .select({ id: reviewDecisions.id, decision: reviewDecisions.decision, comment: reviewDecisions.comment, reviewerName: users.name, createdAt: reviewDecisions.createdAt })
    .from(reviewDecisions)
    .innerJoin(users, eq(users.id, reviewDecisions.reviewerId))
    .where(and(eq(reviewDecisions.revisionId, revisionId), eq(reviewDecisions.workspaceId, ctx.user.workspaceId)))
    .orderBy(desc(reviewDecisions.createdAt));
  return rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
}

/** Moves a revision from one of `from` to `to`; 409 when someone else changed it first. */
export async function transitionRevision(
  tx: DbOrTx,
  ctx: Ctx,
  revisionId: string,
  from: RevisionStatus[],
  to: RevisionStatus,
  extra: Partial<{ submittedAt: Date; approverId: string; approvedAt: Date }> = {},
): Promise<void> {
  const [result] = await tx
    .update(revisions)
    .set({ status: to, ...extra })
    .where(and(eq(revisions.id, revisionId), eq(revisions.workspaceId, ctx.user.workspaceId), inArray(revisions.status, from)));
  if (result.affectedRows !== 1) {
    throw new AppError('conflict', 'This revision changed while you were looking at it. Reload the page to see its status.');
  }
}

export async function insertDecision(tx: DbOrTx, ctx: Ctx, revisionId: string, decision: 'approved' | 'sent-back', comment: string | null): Promise<void> {
  await tx.insert(reviewDecisions).values({
    id: uuidv4(), workspaceId: ctx.user.workspaceId, revisionId, reviewerId: ctx.user.id, decision, comment, createdAt: new Date(),
  });
}
