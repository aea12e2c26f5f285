import { NextResponse } from 'next/server';
import { createInvitation } from '@/db/queries/invitations';
import { kickOutbox } from '@/lib/mail/worker';
import { apiRoute } from '@/lib/server/route';
import { inviteSchema } from '@/lib/validation/auth';

export const POST = apiRoute({ permission: 'users.manage', body: inviteSchema }, async (ctx, { body }) => {
  const result = await createInvitation(ctx, body);
  kickOutbox();
  return NextResponse.json({ id: result.id, expiresAt: result.expiresAt.toISOString() }, { status: 201 });
});
