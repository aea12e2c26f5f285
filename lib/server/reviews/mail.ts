import 'server-only';
/**
 * Review and run notifications, written to the persisted mail outbox inside the caller's
 * transaction (delivered and retried by the outbox worker). Recipients are looked up by
 * role in the workspace, active members only.
 */
import { and, eq, inArray } from 'drizzle-orm';
import { v4 as uuidv4 } from 'uuid';
import type { DbOrTx } from '@/db/client';
import { mailOutbox, memberships, users } from '@/db/schema';
import type { Role } from '@/lib/auth/roles';
import { getEnv } from '@/lib/env';

export interface Recipient { id: string; email: string; name: string }

export async function membersWithRoles(db: DbOrTx, workspaceId: string, roles: readonly Role[]): Promise<Recipient[]> {
  const rows = await db
    .select({ id: users.id, email: users.email, name: users.name, roles: memberships.roles })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.active, true), eq(users.active, true)));
  return rows.filter((r) => r.roles.some((role) => roles.includes(role))).map(({ id, email, name }) => ({ id, email, name }));
}

export async function usersByIds(db: DbOrTx, ids: string[]): Promise<Recipient[]> {
  if (ids.length === 0) return [];
  return db.select({ id: users.id, email: users.email, name: users.name }).from(users).where(inArray(users.id, ids));
}

/** Absolute link into the app for an e-mail. */
export function appLink(path: string): string {
  return new URL(path, getEnv().NEXTAUTH_URL).toString();
}

export async function queueMail(
  db: DbOrTx,
  mail: { workspaceId: string; kind: string; to: Recipient[]; subject: string; text: string },
): Promise<number> {
  const now = new Date();
  const seen = new Set<string>();
  const rows = mail.to.filter((r) => !seen.has(r.email) && seen.add(r.email)).map((r) => ({
    id: uuidv4(),
    workspaceId: mail.workspaceId,
    kind: mail.kind,
    toAddress: r.email,
    subject: mail.subject.slice(0, 200),
    textBody: `Hello ${r.name},\n\n${mail.text}\n\n— Probity`,
    htmlBody: null,
    status: 'pending' as const,
    attempts: 0,
    nextAttemptAt: now,
    createdAt: now,
  }));
  if (rows.length > 0) await db.insert(mailOutbox).values(rows);
  return rows.length;
}
