'use server';
import { revalidatePath } from 'next/cache';
import { createInvitation } from '@/db/queries/invitations';
import { kickOutbox } from '@/lib/mail/worker';
import { inviteSchema } from '@/lib/validation/auth';
import { authedAction } from '../action';

export const invitePerson = authedAction({ permission: 'users.manage', input: inviteSchema }, async (ctx, input) => {
  const result = await createInvitation(ctx, input);
  kickOutbox();
  revalidatePath('/admin/people');
  return { id: result.id, expiresAt: result.expiresAt.toISOString() };
});
