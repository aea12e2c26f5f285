import 'server-only';
import { getServerSession } from 'next-auth';
import { forbidden, redirect } from 'next/navigation';
import { cache } from 'react';
import { loadSessionUser } from '@/db/queries/auth';
import { can, type Permission } from '@/lib/auth/permissions';
import { getAuthOptions } from '@/lib/auth/options';
import { ensureOutboxWorker } from '@/lib/mail/worker';
import type { Ctx, SessionUser } from './context';

/**
 * The signed-in person with roles re-read from the database (a JWT's copy goes stale),
 * or null. Memoised per request.
 */
export const getSessionUser = cache(async (): Promise<SessionUser | null> => {
  const session = await getServerSession(getAuthOptions());
  const { id, workspaceId } = session?.user ?? {};
  if (!id || !workspaceId) return null;
  ensureOutboxWorker();
  return loadSessionUser(id, workspaceId);
});

/** For pages: sends the anonymous to sign-in and shows the 403 page to those without `permission`. */
export async function requirePageUser(permission?: Permission): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) redirect('/sign-in');
  if (permission && !can(user, permission)) forbidden();
  return user;
}

/** requirePageUser, packed as the ctx the data layer takes. */
export async function requirePageCtx(permission: Permission): Promise<Ctx> {
  return { user: await requirePageUser(permission), ip: null };
}
