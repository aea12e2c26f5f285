import { describe, expect, it } from 'vitest';
import { assertNotAuthor, assertPermission, can, PERMISSIONS, permissionsFor, ROLE_PERMISSIONS, type Permission } from '@/lib/auth/permissions';
import { ROLES, type Role } from '@/lib/auth/roles';
import { AppError } from '@/lib/server/app-error';

/** The table as the product describes it: who may do what (DESIGN.md, "Who uses it"). */
const MAY: Record<Permission, Role[]> = {
  'parts.read': ['admin', 'programmer', 'engineer', 'reviewer', 'setup'],
  'parts.edit': ['programmer'],
  'machines.read': ['admin', 'programmer', 'engineer', 'reviewer', 'setup'],
  'machines.edit': ['engineer'],
  'probes.read': ['admin', 'programmer', 'engineer', 'reviewer', 'setup'],
  'probes.edit': ['engineer'],
  'probes.calibrate': ['engineer', 'setup'],
  'programs.read': ['admin', 'programmer', 'engineer', 'reviewer', 'setup'],
  'programs.generate': ['programmer'],
  'programs.edit': ['programmer'],
  'revisions.read': ['programmer', 'engineer', 'reviewer'],
  'revisions.submit': ['programmer'],
  'revisions.approve': ['reviewer'],
  'packages.download': ['programmer', 'reviewer', 'setup'],
  'results.upload': ['setup'],
  'results.read': ['admin', 'programmer', 'engineer', 'reviewer', 'setup'],
  'users.manage': ['admin'],
  'audit.read': ['admin'],
  'settings.manage': ['admin', 'engineer'],
};

describe('permission table', () => {
  it('lists every permission once and every role has an entry', () => {
    expect(new Set(PERMISSIONS).size).toBe(PERMISSIONS.length);
    expect(Object.keys(ROLE_PERMISSIONS).sort()).toEqual([...ROLES].sort());
    expect(Object.keys(MAY).sort()).toEqual([...PERMISSIONS].sort());
  });

  for (const permission of PERMISSIONS) {
    it(`${permission}: exactly ${MAY[permission].join(', ')}`, () => {
      const holders = ROLES.filter((role) => can({ roles: [role] }, permission));
      expect(holders).toEqual(MAY[permission]);
    });
  }

  it('setup cannot read drafts, approve, or manage people', () => {
    for (const p of ['revisions.read', 'revisions.approve', 'users.manage', 'programs.edit'] as const) {
      expect(can({ roles: ['setup'] }, p)).toBe(false);
    }
  });

  it('several roles give the union', () => {
    const both = permissionsFor(['programmer', 'reviewer']);
    expect(both.has('programs.edit')).toBe(true);
    expect(both.has('revisions.approve')).toBe(true);
    expect(both.has('users.manage')).toBe(false);
    expect(can({ roles: [] }, 'parts.read')).toBe(false);
  });

  it('assertPermission throws a 403 AppError naming the permission', () => {
    expect(() => assertPermission({ roles: ['admin'] }, 'users.manage')).not.toThrow();
    try {
      assertPermission({ roles: ['setup'] }, 'revisions.approve');
      expect.unreachable('should have thrown');
    } catch (e) {
      expect(e).toBeInstanceOf(AppError);
      expect((e as AppError).status).toBe(403);
      expect((e as AppError).message).toContain('revisions.approve');
    }
  });

  it('nobody approves a revision they wrote', () => {
    expect(() => assertNotAuthor({ id: 'u1' }, 'u1')).toThrow(AppError);
    expect(() => assertNotAuthor({ id: 'u1' }, 'u2')).not.toThrow();
  });
});
