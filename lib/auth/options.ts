import 'server-only';
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { recordAudit } from '@/db/queries/audit';
import { signInWithPassword } from '@/db/queries/auth';
import { getDb } from '@/db/client';
import { getEnv } from '@/lib/env';
import { clientIp } from '@/lib/server/request';
import { signInSchema } from '@/lib/validation/auth';

let options: NextAuthOptions | undefined;

/** next-auth configuration: e-mail + password, JWT sessions that expire. Built on first use. */
export function getAuthOptions(): NextAuthOptions {
  if (options) return options;
  const env = getEnv();
  options = {
    secret: env.NEXTAUTH_SECRET,
    session: { strategy: 'jwt', maxAge: env.SESSION_MAX_AGE_HOURS * 3600 },
    pages: { signIn: '/sign-in', error: '/sign-in' },
    providers: [
      CredentialsProvider({
        name: 'E-mail and password',
        credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
        async authorize(credentials, req) {
          const parsed = signInSchema.safeParse(credentials);
          if (!parsed.success) return null;
          const ip = clientIp(req.headers ?? {});
          const user = await signInWithPassword({ ...parsed.data, ip });
          return user ? { id: user.id, name: user.name, email: user.email, workspaceId: user.workspaceId } : null;
        },
      }),
    ],
    callbacks: {
      jwt({ token, user }) {
        if (user) token.workspaceId = user.workspaceId;
        return token;
      },
      session({ session, token }) {
        session.user = {
          id: token.sub ?? '',
          name: token.name ?? '',
          email: token.email ?? '',
          workspaceId: token.workspaceId ?? '',
        };
        return session;
      },
    },
    events: {
      async signOut({ token }) {
        if (!token.sub) return;
        await recordAudit(getDb(), {
          workspaceId: token.workspaceId ?? null,
          actorUserId: token.sub,
          actorEmail: token.email ?? null,
          action: 'sign-out',
          summary: `${token.email ?? 'someone'} signed out`,
        });
      },
    },
  };
  return options;
}
