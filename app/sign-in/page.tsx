import type { Metadata } from 'next';
import { redirect } from 'next/navigation';
import { AuthCard } from '@/components/auth/auth-card';
import { SignInForm } from '@/components/auth/sign-in-form';
import { safeCallbackUrl } from '@/lib/auth/sign-in-client';
import { getSessionUser } from '@/lib/server/session';

export const metadata: Metadata = { title: 'Sign in' };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  if (await getSessionUser()) redirect('/');
  const raw = (await searchParams).callbackUrl;
  const callbackUrl = safeCallbackUrl(typeof raw === 'string' ? raw : null);
  return (
    <AuthCard title="Sign in" intro="On-machine probing for your shop: tolerances to reviewed programs, and results back."
      footer="New here? Your workspace admin sends you an invitation by e-mail.">
      <SignInForm callbackUrl={callbackUrl} />
    </AuthCard>
  );
}
