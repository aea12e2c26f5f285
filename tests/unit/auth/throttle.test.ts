import { describe, expect, it } from 'vitest';
import { MAX_FAILURES, throttleDecision, throttleMessage, WINDOW_MS } from '@/lib/auth/throttle';

const now = new Date('2026-03-02T12:00:00.000Z');
const minutesAgo = (m: number) => new Date(now.getTime() - m * 60_000);
const times = (n: number, startMinutesAgo: number) => Array.from({ length: n }, (_, i) => minutesAgo(startMinutesAgo - i));

describe('sign-in throttling', () => {
  it('allows nine failures, refuses at ten (account)', () => {
    expect(throttleDecision({ byAccount: times(9, 10), byAddress: [] }, now)).toEqual({ allowed: true });
    const d = throttleDecision({ byAccount: times(10, 10), byAddress: [] }, now);
    expect(d.allowed).toBe(false);
    if (d.allowed) return;
    expect(d.reason).toBe('account');
    // The oldest of the ten was 10 min ago: allowed again 5 min from now.
    expect(d.retryAt.toISOString()).toBe(new Date(minutesAgo(10).getTime() + WINDOW_MS).toISOString());
  });

  it('counts an address the same way', () => {
    const d = throttleDecision({ byAccount: [], byAddress: times(MAX_FAILURES, 3) }, now);
    expect(d).toMatchObject({ allowed: false, reason: 'address' });
  });

  it('forgets failures older than fifteen minutes', () => {
    expect(throttleDecision({ byAccount: times(10, 24).map((t) => new Date(t.getTime() - 6 * 60_000)), byAddress: [] }, now).allowed).toBe(true);
  });

  it('with more than ten failures waits for the tenth-newest to leave the window', () => {
    const d = throttleDecision({ byAccount: times(12, 14), byAddress: [] }, now);
    if (d.allowed) throw new Error('expected refusal');
    expect(d.retryAt.getTime()).toBe(minutesAgo(12).getTime() + WINDOW_MS);
  });

  it('says when to try again', () => {
    expect(throttleMessage(new Date(now.getTime() + 5 * 60_000), now))
      .toBe('Too many failed sign-in attempts. Try again in 5 minutes (after 12:05 UTC).');
    expect(throttleMessage(new Date(now.getTime() + 10_000), now)).toContain('in 1 minute ');
  });
});
