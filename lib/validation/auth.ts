/** Sign-in, invitation and people-admin contracts, shared by forms and the server. */
import { z } from 'zod';
import { PASSWORD_MIN_LENGTH } from '@/lib/auth/password-rules';
import { ROLES } from '@/lib/auth/roles';

export const emailSchema = z.string().trim().toLowerCase().pipe(z.email('Enter an e-mail address such as name@shop.example'));

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password').max(200),
});
export type SignInInput = z.input<typeof signInSchema>;

export const rolesSchema = z.array(z.enum(ROLES)).min(1, 'Choose at least one role').max(ROLES.length)
  .transform((roles) => [...new Set(roles)]);

export const inviteSchema = z.object({
  email: emailSchema,
  name: z.string().trim().min(1, 'Enter the person’s name').max(120),
  roles: rolesSchema,
});
export type InviteInput = z.input<typeof inviteSchema>;

export const passwordSchema = z.string()
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(200, 'Use at most 200 characters');

export const acceptInvitationSchema = z.object({
  token: z.string().min(20).max(100),
  password: passwordSchema,
  confirm: z.string(),
}).refine((v) => v.password === v.confirm, { message: 'The two passwords differ', path: ['confirm'] });
export type AcceptInvitationInput = z.input<typeof acceptInvitationSchema>;

export const changeRolesSchema = z.object({ membershipId: z.uuid(), roles: rolesSchema });
export const setActiveSchema = z.object({ membershipId: z.uuid(), active: z.boolean() });
