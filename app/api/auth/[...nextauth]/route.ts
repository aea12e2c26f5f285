import NextAuth from 'next-auth';
import type { NextRequest } from 'next/server';
import { getSignInThrottle, recordThrottledSignIn } from '@/db/queries/auth';
import { throttleMessage } from '@/lib/auth/throttle';
import { getAuthOptions } from '@/lib/auth/options';
import { getEnv } from '@/lib/env';
import { AppError } from '@/lib/server/app-error';
import { toAppError } from '@/lib/server/errors';
import { clientIp } from '@/lib/server/request';
import { errorResponse } from '@/lib/server/route';

type Context = { params: Promise<{ nextauth: string[] }> };

function handle(req: NextRequest, context: Context): Promise<Response> {
  return NextAuth(req, context, getAuthOptions()) as Promise<Response>;
}

/** Refuses a sign-in try with 429 while the account or the address is throttled. */
async function throttled(req: NextRequest): Promise<Response | null> {
  const form = await req.clone().formData().catch(() => null);
  const email = String(form?.get('email') ?? '').trim().toLowerCase();
  const ip = clientIp(req.headers);
  const now = new Date();
  const decision = await getSignInThrottle(email, ip, now);
  if (decision.allowed) return null;
  await recordThrottledSignIn(email, ip, decision.retryAt);
  const retryAfterSeconds = Math.max(1, Math.ceil((decision.retryAt.getTime() - now.getTime()) / 1000));
  const error = new AppError('throttled', throttleMessage(decision.retryAt, now), { retryAfterSeconds });
  const response = errorResponse(error);
  // next-auth's client reads `url`; keep it so a stock signIn() call also sees an error.
  const body = { ...error.toBody(), retryAt: decision.retryAt.toISOString(), url: `${getEnv().NEXTAUTH_URL}/sign-in?error=Throttled` };
  return new Response(JSON.stringify(body), { status: 429, headers: response.headers });
}

export const GET = handle;

export async function POST(req: NextRequest, context: Context): Promise<Response> {
  const { nextauth } = await context.params;
  if (nextauth[0] === 'callback' && nextauth[1] === 'credentials') {
    try {
      const refused = await throttled(req);
      if (refused) return refused;
    } catch (error) {
      return errorResponse(toAppError(error, 'sign-in'));
    }
  }
  return handle(req, context);
}
