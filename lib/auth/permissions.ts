/**
 * The one permission table. Pages, server actions and route handlers ask
 * `can`/`assertPermission` with a permission, never a role.
 */
import { AppError } from '@/lib/server/app-error';
import type { Role } from './roles';

export { ROLES, ROLE_LABELS, isRole, type Role } from './roles';

export const PERMISSIONS = [
  'parts.read', 'parts.edit',
  'machines.read', 'machines.edit',
  'probes.read', 'probes.edit', 'probes.calibrate',
  'programs.read', 'programs.generate', 'programs.edit',
  /** Read revisions in every status, drafts included (setup sees approved ones only). */
  'revisions.read', 'revisions.submit', 'revisions.approve',
  'packages.download',
  'results.upload', 'results.read',
  'users.manage', 'audit.read', 'settings.manage',
] as const;
export type Permission = (typeof PERMISSIONS)[number];

const READ_ALL: Permission[] = ['parts.read', 'machines.read', 'probes.read', 'programs.read', 'results.read'];

export const ROLE_PERMISSIONS: Record<Role, readonly Permission[]> = {
  admin: [...READ_ALL, 'users.manage', 'audit.read', 'settings.manage'],
  programmer: [
    ...READ_ALL, 'parts.edit', 'programs.generate', 'programs.edit',
    'revisions.read', 'revisions.submit', 'packages.download',
  ],
  engineer: [...READ_ALL, 'machines.edit', 'probes.edit', 'probes.calibrate', 'revisions.read', 'settings.manage'],
  reviewer: [...READ_ALL, 'revisions.read', 'revisions.approve', 'packages.download'],
  setup: [...READ_ALL, 'probes.calibrate', 'packages.download', 'results.upload'],
};

export function permissionsFor(roles: readonly Role[]): Set<Permission> {
  return new Set(roles.flatMap((r) => ROLE_PERMISSIONS[r]));
}

export function can(user: { roles: readonly Role[] }, permission: Permission): boolean {
  return user.roles.some((r) => ROLE_PERMISSIONS[r].includes(permission));
}

export function assertPermission(user: { roles: readonly Role[] }, permission: Permission): void {
  if (!can(user, permission)) {
    throw new AppError('forbidden', `Your roles do not allow this (${permission}). Ask a workspace admin if you need it.`);
  }
}

/** Nobody approves a revision they wrote (four-eyes rule). */
export function assertNotAuthor(user: { id: string }, authorId: string): void {
  if (user.id === authorId) {
    throw new AppError('forbidden', 'You wrote this revision; another reviewer must approve it.');
  }
}
