/** Single-use secrets (invitation links, API tokens): random, stored only as SHA-256. */
import { createHash, randomBytes } from 'node:crypto';

export function sha256Hex(value: string): string {
  return createHash('sha256').update(value, 'utf8').digest('hex');
}

export function createSecretToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: sha256Hex(token) };
}

export type InvitationState = 'usable' | 'expired' | 'used' | 'revoked';

export interface InvitationTimes {
  expiresAt: Date;
  acceptedAt: Date | null;
  revokedAt: Date | null;
}

/** Whether an invitation link can still be used at `now`. Used and revoked win over expired. */
export function invitationState(invitation: InvitationTimes, now: Date): InvitationState {
  if (invitation.acceptedAt) return 'used';
  if (invitation.revokedAt) return 'revoked';
  if (now.getTime() >= invitation.expiresAt.getTime()) return 'expired';
  return 'usable';
}

export function invitationExpiry(createdAt: Date, ttlHours: number): Date {
  return new Date(createdAt.getTime() + ttlHours * 3_600_000);
}

export const INVITATION_STATE_MESSAGES: Record<Exclude<InvitationState, 'usable'>, string> = {
  expired: 'This invitation link has expired. Ask your workspace admin to send a new one.',
  used: 'This invitation link has already been used. Sign in with the password you set.',
  revoked: 'This invitation was withdrawn. Ask your workspace admin if you still need access.',
};
