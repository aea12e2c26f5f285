'use server';
import { revalidatePath } from 'next/cache';
import { setMemberActive } from '@/db/queries/people';
import { setActiveSchema } from '@/lib/validation/auth';
import { authedAction } from '../action';

export const setMemberActiveAction = authedAction({ permission: 'users.manage', input: setActiveSchema }, async (ctx, input) => {
  await setMemberActive(ctx, input.membershipId, input.active);
  revalidatePath('/admin/people');
  return null;
});
