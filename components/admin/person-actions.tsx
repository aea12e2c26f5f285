'use client';

import { useState, useTransition } from 'react';
import { toast } from 'sonner';
import type { Role } from '@/lib/auth/roles';
import { changeMemberRoles } from '@/lib/server/admin/change-roles';
import { setMemberActiveAction } from '@/lib/server/admin/set-member-active';
import type { PersonView } from './people-table';
import { RoleCheckboxes } from './role-checkboxes';

export function PersonActions({ person }: { person: PersonView }) {
  const [editing, setEditing] = useState(false);
  const [roles, setRoles] = useState<Role[]>(person.roles);
  const [pending, startTransition] = useTransition();

  const run = (work: () => Promise<{ ok: boolean; message?: string }>, done: string) => startTransition(async () => {
    const result = await work();
    if (result.ok) { toast.success(done); setEditing(false); } else toast.error(result.message ?? 'Not saved.');
  });

  if (editing) {
    return (
      <div className="flex min-w-72 flex-col gap-2">
        <RoleCheckboxes idPrefix={`roles-${person.membershipId}`} value={roles} onChange={setRoles} />
        <div className="flex gap-2">
          <button type="button" className="btn-primary py-1" disabled={pending || roles.length === 0}
            onClick={() => run(() => changeMemberRoles({ membershipId: person.membershipId, roles }), `Roles of ${person.name} saved`)}>Save roles</button>
          <button type="button" className="btn-secondary py-1" onClick={() => { setRoles(person.roles); setEditing(false); }}>Cancel</button>
        </div>
      </div>
    );
  }
  return (
    <div className="flex justify-end gap-2">
      <button type="button" className="btn-secondary py-1" aria-label={`Change roles of ${person.name}`} onClick={() => setEditing(true)}>Roles…</button>
      {person.isSelf ? null : (
        <button type="button" className={person.active ? 'btn-danger py-1' : 'btn-secondary py-1'} disabled={pending}
          aria-label={`${person.active ? 'Deactivate' : 'Reactivate'} ${person.name}`}
          onClick={() => run(() => setMemberActiveAction({ membershipId: person.membershipId, active: !person.active }),
            `${person.name} ${person.active ? 'deactivated' : 'reactivated'}`)}>
          {person.active ? 'Deactivate' : 'Reactivate'}
        </button>
      )}
    </div>
  );
}
