import { describe, expect, it } from 'vitest';
import { createSecretToken, invitationExpiry, invitationState, sha256Hex } from '@/lib/auth/tokens';

const created = new Date('2026-03-02T08:00:00.000Z');
const expiresAt = invitationExpiry(created, 72);

describe('invitation tokens', () => {
  it('expire exactly TTL hours after creation', () => {
    expect(expiresAt.toISOString()).toBe('2026-03-05T08:00:00.000Z');
  });

  it('are usable until the expiry instant, expired from it on', () => {
    const open = { expiresAt, acceptedAt: null, revokedAt: null };
    expect(invitationState(open, new Date('2026-03-05T07:59:59.999Z'))).toBe('usable');
    expect(invitationState(open, expiresAt)).toBe('expired');
    expect(invitationState(open, new Date('2026-04-01T00:00:00Z'))).toBe('expired');
  });

  it('are single use: once accepted they stay used, even before expiry', () => {
    const used = { expiresAt, acceptedAt: new Date('2026-03-02T09:00:00Z'), revokedAt: null };
    expect(invitationState(used, new Date('2026-03-02T10:00:00Z'))).toBe('used');
    const revoked = { expiresAt, acceptedAt: null, revokedAt: new Date('2026-03-02T09:00:00Z') };
    expect(invitationState(revoked, new Date('2026-03-02T10:00:00Z'))).toBe('revoked');
  });

  it('are random, URL-safe, and stored only as their SHA-256', () => {
    const a = createSecretToken();
    const b = createSecretToken();
    expect(a.token).not.toBe(b.token);
    expect(a.token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(a.hash).toBe(sha256Hex(a.token));
    expect(a.hash).not.toContain(a.token);
  });

  it('hash with SHA-256 (FIPS 180-4 test vector "abc")', () => {
    // Source: NIST FIPS 180-4 example, SHA-256("abc").
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });
});
