import 'server-only';
/**
 * Review and run notifications, written to the persisted mail outbox (lib/mail) inside the
 * caller's transaction; the caller kicks the outbox after the commit. Recipients are looked up by
 * role in the workspace, active members only.
 */
import { and, eq, inArray } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { memberships, users } from '@/db/schema';
import type { Role } from '@/lib/auth/roles';
import { getEnv } from '@/lib/env';
import { enqueueMail } from '@/lib/mail/outbox';

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

/** Queues one message per distinct recipient through the outbox (call kickOutbox after the commit). */
export async function queueMail(
  db: DbOrTx,
  mail: { workspaceId: string; kind: string; to: Recipient[]; subject: string; text: string },
): Promise<number> {
  const seen = new Set<string>();
  const to = mail.to.filter((r) => !seen.has(r.email) && seen.add(r.email));
  for (const r of to) {
    await enqueueMail(db, { workspaceId: mail.workspaceId, kind: mail.kind, to: r.email, subject: mail.subject.slice(0, 200), text: `Hello ${r.name},\n\n${mail.text}\n\n— Probity` });
  }
  return to.length;
}
