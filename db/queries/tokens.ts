import 'server-only';
/**
 * Per-user API tokens: created by their owner (the token is shown once), listed
 * and revoked by their owner; only the SHA-256 digest is stored. A bearer token
 * acts as its owner in the token's workspace, with roles re-read every request.
 */
import { and, desc, eq, isNull } from 'drizzle-orm';
import { randomBytes } from 'node:crypto';
import { v4 as uuidv4 } from 'uuid';
import { getDb } from '@/db/client';
import { apiTokens } from '@/db/schema';
import { sha256Hex } from '@/lib/auth/tokens';
import { AppError } from '@/lib/server/app-error';
import type { Ctx, SessionUser } from '@/lib/server/context';
import { tokenPrefix } from '@/lib/validation/tokens';
import { loadSessionUser } from './auth';

export type TokenRow = { id: string; name: string; createdAt: string; lastUsedAt: string | null; revokedAt: string | null };

export async function listTokens(ctx: Ctx): Promise<TokenRow[]> {
  const rows = await getDb().select({ id: apiTokens.id, name: apiTokens.name, createdAt: apiTokens.createdAt, lastUsedAt: apiTokens.lastUsedAt, revokedAt: apiTokens.revokedAt })
    .from(apiTokens).where(and(eq(apiTokens.userId, ctx.user.id), eq(apiTokens.workspaceId, ctx.user.workspaceId))).orderBy(desc(apiTokens.createdAt));
  return rows.map((r) => ({ id: r.id, name: r.name, createdAt: r.createdAt.toISOString(), lastUsedAt: r.lastUsedAt?.toISOString() ?? null, revokedAt: r.revokedAt?.toISOString() ?? null }));
}

export async function createToken(ctx: Ctx, name: string): Promise<{ id: string; token: string }> {
  const token = `${tokenPrefix}${randomBytes(32).toString('base64url')}`;
  const id = uuidv4();
  await getDb().insert(apiTokens).values({ id, workspaceId: ctx.user.workspaceId, userId: ctx.user.id, name, tokenHash: sha256Hex(token), createdAt: new Date() });
  return { id, token };
}

export async function revokeToken(ctx: Ctx, tokenId: string): Promise<void> {
  const res = await getDb().update(apiTokens).set({ revokedAt: new Date() })
    .where(and(eq(apiTokens.id, tokenId), eq(apiTokens.userId, ctx.user.id), eq(apiTokens.workspaceId, ctx.user.workspaceId), isNull(apiTokens.revokedAt)));
  if (res[0].affectedRows === 0) throw new AppError('not-found', 'No such active token of yours.');
}

/** The person a bearer token stands for, or null when it is unknown, revoked, or its membership is inactive. */
export async function userForToken(token: string): Promise<SessionUser | null> {
  const hash = sha256Hex(token);
  const rows = await getDb().select({ id: apiTokens.id, userId: apiTokens.userId, workspaceId: apiTokens.workspaceId, revokedAt: apiTokens.revokedAt })
    .from(apiTokens).where(eq(apiTokens.tokenHash, hash)).limit(1);
  const row = rows[0];
  if (!row || row.revokedAt) return null;
  const user = await loadSessionUser(row.userId, row.workspaceId);
  if (user) await getDb().update(apiTokens).set({ lastUsedAt: new Date() }).where(eq(apiTokens.id, row.id));
  return user;
}
