'use server';
import { acceptInvitation } from '@/db/queries/invitations';
import { acceptInvitationSchema } from '@/lib/validation/auth';
import { publicAction } from '../action';

/** Open to the signed-out: the single-use token is the credential. */
export const acceptInvitationAction = publicAction({ input: acceptInvitationSchema }, async (input, ip) => {
  return acceptInvitation(input.token, input.password, ip);
});
