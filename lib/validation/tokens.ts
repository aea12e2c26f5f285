/**
 * Per-user API tokens: the create form, and the shape of a token string. A token
 * is shown once when created; only its SHA-256 digest is stored.
 */
import { z } from 'zod';

export const tokenPrefix = 'prb_';
/** prb_ + 43 base64url characters (32 random bytes). */
export const tokenPattern = /^prb_[A-Za-z0-9_-]{43}$/;

export const createTokenSchema = z.object({
  name: z.string().trim().min(1, 'name the token (what script uses it)').max(80),
});
export type CreateTokenInput = z.input<typeof createTokenSchema>;
export type CreateToken = z.output<typeof createTokenSchema>;

/** The Authorization header value, or null when it is not a Probity bearer token. */
export function bearerToken(header: string | null): string | null {
  if (!header) return null;
  const m = /^Bearer\s+(\S+)$/i.exec(header.trim());
  const token = m?.[1];
  return token && tokenPattern.test(token) ? token : null;
}
