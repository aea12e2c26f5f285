'use server';
import { revalidatePath } from 'next/cache';
import { z } from 'zod';
import { revokeInvitation } from '@/db/queries/invitations';
import { authedAction } from '../action';

export const revokeInvitationAction = authedAction({ permission: 'users.manage', input: z.object({ invitationId: z.uuid() }) }, async (ctx, input) => {
  await revokeInvitation(ctx, input.invitationId);
  revalidatePath('/admin/people');
  return null;
});
