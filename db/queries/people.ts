import 'server-only';
import { and, asc, desc, eq, isNull } from 'drizzle-orm';
import { getDb } from '@/db/client';
import { invitations, memberships, users } from '@/db/schema';
import { ROLE_LABELS, type Role } from '@/lib/auth/roles';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import { recordAudit } from './audit';

export interface PersonRow {
  membershipId: string; userId: string; name: string; email: string; roles: Role[];
  active: boolean; lastSignInAt: Date | null; joinedAt: Date;
}

export async function listPeople(ctx: Ctx): Promise<PersonRow[]> {
  return getDb()
    .select({
      membershipId: memberships.id, userId: users.id, name: users.name, email: users.email, roles: memberships.roles,
      active: memberships.active, lastSignInAt: users.lastSignInAt, joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.workspaceId, ctx.user.workspaceId))
    .orderBy(asc(users.name));
}

export interface PendingInvitationRow { id: string; email: string; name: string; roles: Role[]; expiresAt: Date; createdAt: Date }

export async function listPendingInvitations(ctx: Ctx): Promise<PendingInvitationRow[]> {
  return getDb()
    .select({ id: invitations.id, email: invitations.email, name: invitations.name, roles: invitations.roles, expiresAt: invitations.expiresAt, createdAt: invitations.createdAt })
    .from(invitations)
    .where(and(eq(invitations.workspaceId, ctx.user.workspaceId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt)))
    .orderBy(desc(invitations.createdAt));
}

async function memberOrThrow(ctx: Ctx, membershipId: string) {
  const [row] = await getDb()
    .select({ id: memberships.id, userId: memberships.userId, roles: memberships.roles, active: memberships.active, email: users.email })
    .from(memberships).innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.id, membershipId), eq(memberships.workspaceId, ctx.user.workspaceId)))
    .limit(1);
  if (!row) throw new AppError('not-found', 'No such person in this workspace.');
  return row;
}

const labels = (roles: readonly Role[]) => roles.map((r) => ROLE_LABELS[r]).join(', ');

export async function changeRoles(ctx: Ctx, membershipId: string, roles: Role[]): Promise<void> {
  const member = await memberOrThrow(ctx, membershipId);
  if (member.userId === ctx.user.id && !roles.includes('admin')) {
    throw new AppError('conflict', 'You cannot remove your own admin role; ask another admin to do it.', { path: 'roles' });
  }
  await getDb().transaction(async (tx) => {
    await tx.update(memberships).set({ roles }).where(and(eq(memberships.id, member.id), eq(memberships.workspaceId, ctx.user.workspaceId)));
    await recordAudit(tx, {
      workspaceId: ctx.user.workspaceId, actorUserId: ctx.user.id, actorEmail: ctx.user.email, action: 'roles-changed',
      targetType: 'membership', targetId: member.id, ip: ctx.ip,
      summary: `Roles of ${member.email}: ${labels(member.roles)} → ${labels(roles)}`,
      details: { before: member.roles, after: roles },
    });
  });
}

export async function setMemberActive(ctx: Ctx, membershipId: string, active: boolean): Promise<void> {
  const member = await memberOrThrow(ctx, membershipId);
  if (member.userId === ctx.user.id && !active) throw new AppError('conflict', 'You cannot deactivate yourself.');
  if (member.active === active) return;
  await getDb().transaction(async (tx) => {
    await tx.update(memberships).set({ active, deactivatedAt: active ? null : new Date() })
      .where(and(eq(memberships.id, member.id), eq(memberships.workspaceId, ctx.user.workspaceId)));
    await recordAudit(tx, {
      workspaceId: ctx.user.workspaceId, actorUserId: ctx.user.id, actorEmail: ctx.user.email,
      action: active ? 'member-reactivated' : 'member-deactivated', targetType: 'membership', targetId: member.id, ip: ctx.ip,
      summary: `${member.email} ${active ? 'reactivated' : 'deactivated'}`,
    });
  });
}
