/**
 * Browser side of sign-in: posts to next-auth's credentials callback and reads the
 * answer, including the 429 the throttle gives (next-auth's signIn() would drop its message).
 */
import { getCsrfToken } from 'next-auth/react';

export type SignInOutcome = { ok: true } | { ok: false; throttled: boolean; message: string };

export async function signInWithCredentials(email: string, password: string, callbackUrl: string): Promise<SignInOutcome> {
  const csrfToken = (await getCsrfToken()) ?? '';
  let res: Response;
  try {
    res = await fetch('/api/auth/callback/credentials', {
      method: 'POST',
      headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ email, password, csrfToken, callbackUrl, json: 'true' }),
    });
  } catch {
    return { ok: false, throttled: false, message: 'Probity could not be reached. Check the connection and try again.' };
  }
  const body: unknown = await res.json().catch(() => null);
  if (res.status === 429) {
    const message = readErrorMessage(body) ?? 'Too many failed sign-in attempts. Try again later.';
    return { ok: false, throttled: true, message };
  }
  const url = typeof body === 'object' && body && 'url' in body && typeof body.url === 'string' ? body.url : '';
  if (!res.ok || url.includes('error=')) {
    if (res.status >= 500) return { ok: false, throttled: false, message: readErrorMessage(body) ?? 'Sign-in is not available right now. Try again in a moment.' };
    return { ok: false, throttled: false, message: 'The e-mail address or the password is not right.' };
  }
  return { ok: true };
}

function readErrorMessage(body: unknown): string | null {
  if (typeof body !== 'object' || !body || !('error' in body)) return null;
  const e = body.error;
  return typeof e === 'object' && e && 'message' in e && typeof e.message === 'string' ? e.message : null;
}

/** Only same-site relative paths are followed after sign-in. */
export function safeCallbackUrl(raw: string | undefined | null): string {
  return raw && raw.startsWith('/') && !raw.startsWith('//') ? raw : '/';
}
