'use client';

import { useTransition } from 'react';
import { toast } from 'sonner';
import { revokeInvitationAction } from '@/lib/server/admin/revoke-invitation';

export function RevokeInvitationButton({ id, email }: { id: string; email: string }) {
  const [pending, start] = useTransition();
  return (
    <button type="button" className="btn-secondary py-1" disabled={pending} aria-label={`Withdraw invitation for ${email}`}
      onClick={() => start(async () => {
        const r = await revokeInvitationAction({ invitationId: id });
        if (r.ok) toast.success(`Invitation for ${email} withdrawn`); else toast.error(r.message);
      })}>
      Withdraw
    </button>
  );
}
