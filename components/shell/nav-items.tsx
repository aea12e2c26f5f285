import type { ReactNode } from 'react';
import { can, type Permission } from '@/lib/auth/permissions';
import type { Role } from '@/lib/auth/roles';
import { AdminIcon, MachineIcon, PartIcon, ProbeIcon, ProgramIcon, ReviewIcon, RunIcon } from '@/components/ui/icons';

export interface NavItem { href: string; label: string; permission: Permission; icon: ReactNode }

/** Every section; each shows only to roles holding its permission. */
export const NAV_ITEMS: NavItem[] = [
  { href: '/parts', label: 'Parts', permission: 'parts.read', icon: <PartIcon /> },
  { href: '/machines', label: 'Machines', permission: 'machines.read', icon: <MachineIcon /> },
  { href: '/probes', label: 'Probes', permission: 'probes.read', icon: <ProbeIcon /> },
  { href: '/programs', label: 'Programs', permission: 'programs.read', icon: <ProgramIcon /> },
  { href: '/runs', label: 'Runs', permission: 'results.read', icon: <RunIcon /> },
  { href: '/reviews', label: 'Reviews', permission: 'revisions.read', icon: <ReviewIcon /> },
  { href: '/admin', label: 'Admin', permission: 'users.manage', icon: <AdminIcon /> },
];

export function navFor(user: { roles: readonly Role[] }): NavItem[] {
  return NAV_ITEMS.filter((item) => can(user, item.permission));
}
