'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { signInWithCredentials } from '@/lib/auth/sign-in-client';
import { signInSchema } from '@/lib/validation/auth';

type Input = z.input<typeof signInSchema>;
type Output = z.output<typeof signInSchema>;

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const [failure, setFailure] = useState<{ message: string; throttled: boolean } | null>(null);
  const { register, handleSubmit, formState: { errors, isSubmitting } } = useForm<Input, unknown, Output>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: '', password: '' },
  });

  const onSubmit = handleSubmit(async ({ email, password }) => {
    setFailure(null);
    const outcome = await signInWithCredentials(email, password, callbackUrl);
    if (outcome.ok) {
      window.location.assign(callbackUrl);
      return;
    }
    setFailure(outcome);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Sign in">
      {failure ? (
        <div role="alert" data-testid="sign-in-error" data-throttled={failure.throttled}
          className="rounded-control border border-danger/40 bg-danger-soft px-3 py-2 text-small text-danger">
          {failure.message}
        </div>
      ) : null}
      <div>
        <label htmlFor="email" className="field-label">E-mail</label>
        <input id="email" type="email" autoComplete="username" className="field-input" aria-invalid={Boolean(errors.email)}
          aria-describedby={errors.email ? 'email-error' : undefined} {...register('email')} />
        {errors.email ? <p id="email-error" className="field-error">{errors.email.message}</p> : null}
      </div>
      <div>
        <label htmlFor="password" className="field-label">Password</label>
        <input id="password" type="password" autoComplete="current-password" className="field-input"
          aria-invalid={Boolean(errors.password)} aria-describedby={errors.password ? 'password-error' : undefined} {...register('password')} />
        {errors.password ? <p id="password-error" className="field-error">{errors.password.message}</p> : null}
      </div>
      <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
        {isSubmitting ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}
