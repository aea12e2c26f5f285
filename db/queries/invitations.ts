import 'server-only';
import { and, eq, isNull } from 'drizzle-orm';
import { v4 as uuidv4 } from 'uuid';
import { getDb } from '@/db/client';
import { invitations, memberships, users, workspaces } from '@/db/schema';
import { hashPassword, verifyPassword } from '@/lib/auth/password';
import { ROLE_LABELS, type Role } from '@/lib/auth/roles';
import { createSecretToken, INVITATION_STATE_MESSAGES, invitationExpiry, invitationState, sha256Hex, type InvitationState } from '@/lib/auth/tokens';
import { getEnv } from '@/lib/env';
import { enqueueMail } from '@/lib/mail/outbox';
import { invitationMail } from '@/lib/mail/templates';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import { recordAudit } from './audit';

export interface InviteInput { email: string; name: string; roles: Role[] }

/** Writes the invitation, its e-mail (outbox) and the audit event in one transaction. */
export async function createInvitation(ctx: Ctx, input: InviteInput, now = new Date()): Promise<{ id: string; expiresAt: Date }> {
  const env = getEnv();
  const { token, hash } = createSecretToken();
  const expiresAt = invitationExpiry(now, env.INVITATION_TTL_HOURS);
  const id = uuidv4();
  await getDb().transaction(async (tx) => {
    const [existing] = await tx.select({ id: memberships.id }).from(memberships).innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.workspaceId, ctx.user.workspaceId), eq(users.email, input.email))).limit(1);
    if (existing) throw new AppError('conflict', `${input.email} is already a member of this workspace.`, { path: 'email' });
    // A new invitation replaces any earlier one still open for the same address.
    await tx.update(invitations).set({ revokedAt: now }).where(and(
      eq(invitations.workspaceId, ctx.user.workspaceId), eq(invitations.email, input.email),
      isNull(invitations.acceptedAt), isNull(invitations.revokedAt)));
    await tx.insert(invitations).values({
      id, workspaceId: ctx.user.workspaceId, email: input.email, name: input.name, roles: input.roles,
      tokenHash: hash, invitedBy: ctx.user.id, expiresAt, createdAt: now,
    });
    const mail = invitationMail({
      name: input.name, workspaceName: ctx.user.workspaceName, inviterName: ctx.user.name, roles: input.roles,
      link: `${env.NEXTAUTH_URL}/invitation/${token}`, expiresAt,
    });
    await enqueueMail(tx, { workspaceId: ctx.user.workspaceId, kind: 'invitation', to: input.email, ...mail });
    await recordAudit(tx, {
      workspaceId: ctx.user.workspaceId, actorUserId: ctx.user.id, actorEmail: ctx.user.email, action: 'invitation-sent',
      targetType: 'invitation', targetId: id, ip: ctx.ip,
      summary: `Invited ${input.email} as ${input.roles.map((r) => ROLE_LABELS[r]).join(', ')}`,
    });
  });
  return { id, expiresAt };
}

export async function revokeInvitation(ctx: Ctx, invitationId: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const [inv] = await tx.select({ id: invitations.id, email: invitations.email }).from(invitations)
      .where(and(eq(invitations.id, invitationId), eq(invitations.workspaceId, ctx.user.workspaceId),
        isNull(invitations.acceptedAt), isNull(invitations.revokedAt))).limit(1);
    if (!inv) throw new AppError('not-found', 'No open invitation with this id in this workspace.');
    await tx.update(invitations).set({ revokedAt: new Date() }).where(eq(invitations.id, inv.id));
    await recordAudit(tx, {
      workspaceId: ctx.user.workspaceId, actorUserId: ctx.user.id, actorEmail: ctx.user.email, action: 'invitation-revoked',
      targetType: 'invitation', targetId: inv.id, ip: ctx.ip, summary: `Invitation for ${inv.email} withdrawn`,
    });
  });
}

export interface InvitationView {
  state: InvitationState; email: string; name: string; workspaceName: string; roles: Role[];
  /** The address already has a Probity account with a password (it accepts with that password). */
  hasAccount: boolean;
}

export async function getInvitationByToken(token: string, now = new Date()): Promise<InvitationView | null> {
  const [row] = await getDb()
    .select({
      email: invitations.email, name: invitations.name, roles: invitations.roles, expiresAt: invitations.expiresAt,
      acceptedAt: invitations.acceptedAt, revokedAt: invitations.revokedAt, workspaceName: workspaces.name,
    })
    .from(invitations).innerJoin(workspaces, eq(workspaces.id, invitations.workspaceId))
    .where(eq(invitations.tokenHash, sha256Hex(token))).limit(1);
  if (!row) return null;
  const [account] = await getDb().select({ hash: users.passwordHash }).from(users).where(eq(users.email, row.email)).limit(1);
  return {
    state: invitationState(row, now), email: row.email, name: row.name, workspaceName: row.workspaceName,
    roles: row.roles, hasAccount: Boolean(account?.hash),
  };
}

/**
 * Uses the link once: creates the account (or, for an existing account, checks its
 * password) and the membership with the invited roles. Returns the e-mail to sign in with.
 */
export async function acceptInvitation(token: string, password: string, ip: string, now = new Date()): Promise<{ email: string }> {
  return getDb().transaction(async (tx) => {
    const [inv] = await tx.select().from(invitations).where(eq(invitations.tokenHash, sha256Hex(token))).limit(1).for('update');
    if (!inv) throw new AppError('not-found', 'This invitation link is not valid. Check that you copied all of it.');
    const state = invitationState(inv, now);
    if (state !== 'usable') throw new AppError('conflict', INVITATION_STATE_MESSAGES[state]);
    const [user] = await tx.select({ id: users.id, hash: users.passwordHash }).from(users).where(eq(users.email, inv.email)).limit(1);
    let userId = user?.id;
    if (user?.hash) {
      if (!(await verifyPassword(user.hash, password))) {
        throw new AppError('invalid', 'This address already has a Probity account: enter its current password.', { path: 'password' });
      }
    } else if (user) {
      await tx.update(users).set({ passwordHash: await hashPassword(password) }).where(eq(users.id, user.id));
    } else {
      userId = uuidv4();
      await tx.insert(users).values({ id: userId, email: inv.email, name: inv.name, passwordHash: await hashPassword(password), active: true, createdAt: now });
    }
    if (!userId) throw new AppError('internal', 'The account could not be created.');
    await tx.insert(memberships).values({ id: uuidv4(), workspaceId: inv.workspaceId, userId, roles: inv.roles, active: true, createdAt: now })
      .onDuplicateKeyUpdate({ set: { roles: inv.roles, active: true, deactivatedAt: null } });
    await tx.update(invitations).set({ acceptedAt: now, acceptedUserId: userId }).where(eq(invitations.id, inv.id));
    await recordAudit(tx, {
      workspaceId: inv.workspaceId, actorUserId: userId, actorEmail: inv.email, action: 'invitation-accepted',
      targetType: 'invitation', targetId: inv.id, ip, summary: `${inv.email} accepted the invitation`,
    });
    return { email: inv.email };
  });
}
