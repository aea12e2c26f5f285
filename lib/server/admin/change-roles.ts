'use server';
import { revalidatePath } from 'next/cache';
import { changeRoles } from '@/db/queries/people';
import { changeRolesSchema } from '@/lib/validation/auth';
import { authedAction } from '../action';

export const changeMemberRoles = authedAction({ permission: 'users.manage', input: changeRolesSchema }, async (ctx, input) => {
  await changeRoles(ctx, input.membershipId, input.roles);
  revalidatePath('/admin/people');
  return null;
});
