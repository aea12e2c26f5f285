'use client';

import { ROLE_LABELS, ROLES, type Role } from '@/lib/auth/roles';

export function RoleCheckboxes({ value, onChange, idPrefix }: { value: Role[]; onChange: (roles: Role[]) => void; idPrefix: string }) {
  return (
    <fieldset className="flex flex-wrap gap-x-4 gap-y-1">
      <legend className="sr-only">Roles</legend>
      {ROLES.map((role) => (
        <label key={role} htmlFor={`${idPrefix}-${role}`} className="inline-flex items-center gap-1.5 text-small">
          <input id={`${idPrefix}-${role}`} type="checkbox" className="size-4 accent-brand" checked={value.includes(role)}
            onChange={(e) => onChange(e.target.checked ? [...value, role] : value.filter((r) => r !== role))} />
          {ROLE_LABELS[role]}
        </label>
      ))}
    </fieldset>
  );
}
