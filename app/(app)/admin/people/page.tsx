import type { Metadata } from 'next';
import { InviteForm } from '@/components/admin/invite-form';
import { PeopleTable } from '@/components/admin/people-table';
import { RevokeInvitationButton } from '@/components/admin/revoke-invitation-button';
import { PageHeader } from '@/components/ui/page-header';
import { listPeople, listPendingInvitations } from '@/db/queries/people';
import { ROLE_LABELS } from '@/lib/auth/roles';
import { requirePageCtx } from '@/lib/server/session';

export const metadata: Metadata = { title: 'People' };

const when = (d: Date) => `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;

export default async function PeoplePage() {
  const ctx = await requirePageCtx('users.manage');
  const [people, invitations] = await Promise.all([listPeople(ctx), listPendingInvitations(ctx)]);
  const view = people.map((p) => ({
    membershipId: p.membershipId, name: p.name, email: p.email, roles: p.roles, active: p.active,
    lastSignIn: p.lastSignInAt ? when(p.lastSignInAt) : null, isSelf: p.userId === ctx.user.id,
  }));
  return (
    <>
      <PageHeader title="People" description={`Who works in ${ctx.user.workspaceName}, with which roles. Changes take effect on the person’s next action.`} />
      <div className="space-y-6">
        <PeopleTable people={view} />
        <div className="grid gap-6 lg:grid-cols-2">
          <InviteForm />
          <section className="card p-4" aria-label="Open invitations">
            <h2 className="text-title">Open invitations</h2>
            {invitations.length === 0 ? <p className="mt-2 text-small text-ink-muted">None. Invitations waiting for an answer will be listed here.</p> : (
              <ul className="mt-2 divide-y divide-line">
                {invitations.map((i) => (
                  <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 py-2" data-testid="invitation-row">
                    <div>
                      <p className="text-small font-medium">{i.name} · {i.email}</p>
                      <p className="text-caption text-ink-muted">{i.roles.map((r) => ROLE_LABELS[r]).join(', ')} · link valid until {when(i.expiresAt)}</p>
                    </div>
                    <RevokeInvitationButton id={i.id} email={i.email} />
                  </li>
                ))}
              </ul>
            )}
          </section>
        </div>
      </div>
    </>
  );
}
