import 'server-only';
import { and, desc, eq, gte, like, lt, or, type SQL } from 'drizzle-orm';
import { v4 as uuidv4 } from 'uuid';
import { getDb, type DbOrTx } from '@/db/client';
import { auditEvents } from '@/db/schema';
import type { Ctx } from '@/lib/server/context';

export const AUDIT_ACTIONS = [
  'sign-in', 'sign-in-failed', 'sign-in-throttled', 'sign-out',
  'invitation-sent', 'invitation-accepted', 'invitation-revoked',
  'roles-changed', 'member-deactivated', 'member-reactivated',
  'revision-approved', 'revision-sent-back', 'package-downloaded',
] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number] | (string & {});

export interface AuditInput {
  workspaceId: string | null;
  actorUserId?: string | null;
  actorEmail?: string | null;
  action: AuditAction;
  targetType?: string;
  targetId?: string;
  summary: string;
  details?: Record<string, unknown>;
  ip?: string | null;
}

/** Appends one audit event; pass the transaction so the event commits with the change. */
export async function recordAudit(db: DbOrTx, event: AuditInput): Promise<void> {
  await db.insert(auditEvents).values({
    id: uuidv4(),
    workspaceId: event.workspaceId,
    actorUserId: event.actorUserId ?? null,
    actorEmail: event.actorEmail ?? null,
    action: event.action,
    targetType: event.targetType ?? null,
    targetId: event.targetId ?? null,
    summary: event.summary.slice(0, 500),
    details: event.details ?? {},
    ip: event.ip ?? null,
    createdAt: new Date(),
  });
}

export interface AuditFilters {
  action?: string;
  /** Matches the actor's e-mail or the summary. */
  text?: string;
  from?: Date;
  /** Exclusive upper bound. */
  to?: Date;
  limit?: number;
}

export interface AuditRow {
  id: string;
  createdAt: Date;
  action: string;
  actorEmail: string | null;
  summary: string;
  ip: string | null;
}

export async function listAuditEvents(ctx: Ctx, filters: AuditFilters): Promise<AuditRow[]> {
  const where: SQL[] = [eq(auditEvents.workspaceId, ctx.user.workspaceId)];
  if (filters.action) where.push(eq(auditEvents.action, filters.action));
  if (filters.from) where.push(gte(auditEvents.createdAt, filters.from));
  if (filters.to) where.push(lt(auditEvents.createdAt, filters.to));
  if (filters.text) {
    const pattern = `%${filters.text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    const match = or(like(auditEvents.actorEmail, pattern), like(auditEvents.summary, pattern));
    if (match) where.push(match);
  }
  return getDb()
    .select({
      id: auditEvents.id,
      createdAt: auditEvents.createdAt,
      action: auditEvents.action,
      actorEmail: auditEvents.actorEmail,
      summary: auditEvents.summary,
      ip: auditEvents.ip,
    })
    .from(auditEvents)
    .where(and(...where))
    .orderBy(desc(auditEvents.createdAt))
    .limit(Math.min(filters.limit ?? 200, 1000));
}
