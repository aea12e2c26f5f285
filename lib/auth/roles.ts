/** The roles a workspace membership can hold; a person may hold several. */
export const ROLES = ['admin', 'programmer', 'engineer', 'reviewer', 'setup'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  programmer: 'Programmer',
  engineer: 'Engineer',
  reviewer: 'Reviewer',
  setup: 'Setup technician',
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
