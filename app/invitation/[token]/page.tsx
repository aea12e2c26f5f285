import type { Metadata } from 'next';
import Link from 'next/link';
import { AcceptInvitationForm } from '@/components/auth/accept-invitation-form';
import { AuthCard } from '@/components/auth/auth-card';
import { getInvitationByToken } from '@/db/queries/invitations';
import { ROLE_LABELS } from '@/lib/auth/roles';
import { INVITATION_STATE_MESSAGES } from '@/lib/auth/tokens';

export const metadata: Metadata = { title: 'Invitation' };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = /^[A-Za-z0-9_-]{20,100}$/.test(token) ? await getInvitationByToken(token) : null;
  if (!invitation || invitation.state !== 'usable') {
    const message = invitation && invitation.state !== 'usable' ? INVITATION_STATE_MESSAGES[invitation.state]
      : 'This invitation link is not valid. Check that you copied all of it.';
    return (
      <AuthCard title="Invitation">
        <p role="alert" className="text-body">{message}</p>
        <Link href="/sign-in" className="btn-secondary mt-4">Go to sign-in</Link>
      </AuthCard>
    );
  }
  return (
    <AuthCard title={`Join ${invitation.workspaceName}`}
      intro={<>Hello {invitation.name} ({invitation.email}). You are invited as {invitation.roles.map((r) => ROLE_LABELS[r]).join(', ')}.</>}>
      <AcceptInvitationForm token={token} email={invitation.email} hasAccount={invitation.hasAccount} />
    </AuthCard>
  );
}
