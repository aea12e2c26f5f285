'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { PASSWORD_MIN_LENGTH } from '@/lib/auth/password-rules';
import { signInWithCredentials } from '@/lib/auth/sign-in-client';
import { acceptInvitationAction } from '@/lib/server/auth/accept-invitation';
import { acceptInvitationSchema } from '@/lib/validation/auth';

type Input = z.input<typeof acceptInvitationSchema>;
type Output = z.output<typeof acceptInvitationSchema>;

export function AcceptInvitationForm({ token, email, hasAccount }: { token: string; email: string; hasAccount: boolean }) {
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState: { errors, isSubmitting } } = useForm<Input, unknown, Output>({
    resolver: zodResolver(acceptInvitationSchema),
    defaultValues: { token, password: '', confirm: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await acceptInvitationAction(values);
    if (!result.ok) {
      const fieldMessage = result.fieldErrors?.password;
      if (fieldMessage) setError('password', { message: fieldMessage }); else setFailure(result.message);
      return;
    }
    const signedIn = await signInWithCredentials(result.data.email, values.password, '/');
    if (signedIn.ok) window.location.assign('/');
    else setFailure(`Your password is set, but signing in failed: ${signedIn.message}`);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Set your password">
      {failure ? <div role="alert" className="rounded-control border border-danger/40 bg-danger-soft px-3 py-2 text-small text-danger">{failure}</div> : null}
      <input type="hidden" {...register('token')} />
      <input type="email" value={email} autoComplete="username" readOnly hidden />
      <div>
        <label htmlFor="new-password" className="field-label">{hasAccount ? 'Your current Probity password' : 'New password'}</label>
        <input id="new-password" type="password" autoComplete={hasAccount ? 'current-password' : 'new-password'} className="field-input"
          aria-invalid={Boolean(errors.password)} {...register('password')} />
        {errors.password ? <p className="field-error">{errors.password.message}</p>
          : <p className="mt-1 text-caption text-ink-muted">At least {PASSWORD_MIN_LENGTH} characters.</p>}
      </div>
      <div>
        <label htmlFor="confirm-password" className="field-label">Repeat the password</label>
        <input id="confirm-password" type="password" autoComplete="new-password" className="field-input"
          aria-invalid={Boolean(errors.confirm)} {...register('confirm')} />
        {errors.confirm ? <p className="field-error">{errors.confirm.message}</p> : null}
      </div>
      <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
        {isSubmitting ? 'Saving…' : hasAccount ? 'Join the workspace' : 'Set password and sign in'}
      </button>
    </form>
  );
}
