import 'server-only';
/**
 * API tokens for scripts: `Authorization: Bearer prb_…` stands for the token's
 * owner. Used by the route wrapper before the session cookie; a malformed,
 * unknown or revoked token is refused outright (never falls back to a cookie).
 */
import type { NextRequest } from 'next/server';
import { userForToken } from '@/db/queries/tokens';
import { AppError } from '@/lib/server/app-error';
import type { Ctx } from '@/lib/server/context';
import { clientIp } from '@/lib/server/request';
import { bearerToken } from '@/lib/validation/tokens';

export async function ctxFromBearer(req: NextRequest): Promise<Ctx | null> {
  const header = req.headers.get('authorization');
  if (!header) return null;
  const token = bearerToken(header);
  if (!token) throw new AppError('unauthenticated', 'The Authorization header is not a Probity API token (Bearer prb_…).');
  const user = await userForToken(token);
  if (!user) throw new AppError('unauthenticated', 'This API token is unknown or has been revoked.');
  return { user, ip: clientIp(req.headers) };
}
