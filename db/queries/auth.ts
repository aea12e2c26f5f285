import 'server-only';
import { and, asc, eq, gte, or } from 'drizzle-orm';
import { v4 as uuidv4 } from 'uuid';
import { getDb } from '@/db/client';
import { memberships, signInAttempts, users, workspaces } from '@/db/schema';
import { dummyPasswordHash, verifyPassword } from '@/lib/auth/password';
import { isRole } from '@/lib/auth/roles';
import { throttleDecision, WINDOW_MS, type ThrottleDecision } from '@/lib/auth/throttle';
import type { SessionUser } from '@/lib/server/context';
import { recordAudit } from './audit';

/** Re-reads the person and their roles; null when the account or membership is inactive. */
export async function loadSessionUser(userId: string, workspaceId: string): Promise<SessionUser | null> {
  const rows = await getDb()
    .select({
      id: users.id, email: users.email, name: users.name, userActive: users.active,
      membershipId: memberships.id, roles: memberships.roles, memberActive: memberships.active,
      workspaceId: workspaces.id, workspaceName: workspaces.name,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
    .where(and(eq(memberships.userId, userId), eq(memberships.workspaceId, workspaceId)))
    .limit(1);
  const row = rows[0];
  if (!row || !row.userActive || !row.memberActive) return null;
  return {
    id: row.id, email: row.email, name: row.name,
    workspaceId: row.workspaceId, workspaceName: row.workspaceName,
    membershipId: row.membershipId, roles: row.roles.filter(isRole),
  };
}

export async function getSignInThrottle(email: string, ip: string, now: Date): Promise<ThrottleDecision> {
  const since = new Date(now.getTime() - WINDOW_MS);
  const rows = await getDb()
    .select({ email: signInAttempts.email, ip: signInAttempts.ip, at: signInAttempts.createdAt })
    .from(signInAttempts)
    .where(and(
      eq(signInAttempts.success, false),
      gte(signInAttempts.createdAt, since),
      or(eq(signInAttempts.email, email), eq(signInAttempts.ip, ip)),
    ))
    .orderBy(asc(signInAttempts.createdAt));
  return throttleDecision({
    byAccount: rows.filter((r) => r.email === email).map((r) => r.at),
    byAddress: rows.filter((r) => r.ip === ip).map((r) => r.at),
  }, now);
}

export interface SignedIn { id: string; name: string; email: string; workspaceId: string }

/** Checks a password, records the try (throttling and audit) and picks the workspace. */
export async function signInWithPassword(input: { email: string; password: string; ip: string }): Promise<SignedIn | null> {
  const email = input.email.trim().toLowerCase();
  const db = getDb();
  const found = await db
    .select({ id: users.id, name: users.name, email: users.email, hash: users.passwordHash, active: users.active })
    .from(users).where(eq(users.email, email)).limit(1);
  const user = found[0];
  const passwordOk = user?.hash ? await verifyPassword(user.hash, input.password) : await verifyPassword(await dummyPasswordHash(), input.password);
  const membership = user
    ? (await db
      .select({ workspaceId: memberships.workspaceId })
      .from(memberships)
      .where(and(eq(memberships.userId, user.id), eq(memberships.active, true)))
      .orderBy(asc(memberships.createdAt))
      .limit(1))[0]
    : undefined;
  const ok = Boolean(user && user.active && passwordOk && membership);
  const now = new Date();
  await db.transaction(async (tx) => {
    await tx.insert(signInAttempts).values({ id: uuidv4(), email, ip: input.ip, success: ok, createdAt: now });
    if (ok && user) await tx.update(users).set({ lastSignInAt: now }).where(eq(users.id, user.id));
    await recordAudit(tx, {
      workspaceId: membership?.workspaceId ?? null,
      actorUserId: user?.id ?? null,
      actorEmail: email,
      action: ok ? 'sign-in' : 'sign-in-failed',
      summary: ok ? `${email} signed in` : `Failed sign-in for ${email}${user && !user.active ? ' (account deactivated)' : ''}`,
      ip: input.ip,
    });
  });
  if (!ok || !user || !membership) return null;
  return { id: user.id, name: user.name, email: user.email, workspaceId: membership.workspaceId };
}

/** Audits a refused (throttled) try; it does not count as a further failure. */
export async function recordThrottledSignIn(email: string, ip: string, retryAt: Date): Promise<void> {
  const db = getDb();
  const user = (await db.select({ id: users.id }).from(users).where(eq(users.email, email)).limit(1))[0];
  const membership = user
    ? (await db.select({ workspaceId: memberships.workspaceId }).from(memberships)
      .where(eq(memberships.userId, user.id)).orderBy(asc(memberships.createdAt)).limit(1))[0]
    : undefined;
  await recordAudit(db, {
    workspaceId: membership?.workspaceId ?? null,
    actorUserId: user?.id ?? null,
    actorEmail: email,
    action: 'sign-in-throttled',
    summary: `Sign-in for ${email} refused until ${retryAt.toISOString()} (too many failures)`,
    ip,
  });
}
