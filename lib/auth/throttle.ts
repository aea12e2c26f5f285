/**
 * Sign-in throttling rule: after MAX_FAILURES failed tries within WINDOW_MS for one
 * account (e-mail) or one address (IP), further tries are refused until the oldest
 * failure in the window is WINDOW_MS old.
 */
export const MAX_FAILURES = 10;
export const WINDOW_MS = 15 * 60 * 1000;

export interface FailureCounts {
  /** Failure times (within the window) for the account, oldest first. */
  byAccount: readonly Date[];
  /** Failure times (within the window) for the address, oldest first. */
  byAddress: readonly Date[];
}

export type ThrottleDecision = { allowed: true } | { allowed: false; retryAt: Date; reason: 'account' | 'address' };

function unlockTime(failures: readonly Date[], now: Date): Date | null {
  const recent = failures.filter((t) => now.getTime() - t.getTime() < WINDOW_MS);
  if (recent.length < MAX_FAILURES) return null;
  // The try becomes allowed once enough of the oldest failures have left the window.
  const pivot = recent[recent.length - MAX_FAILURES];
  return pivot ? new Date(pivot.getTime() + WINDOW_MS) : null;
}

export function throttleDecision(counts: FailureCounts, now: Date): ThrottleDecision {
  const account = unlockTime(counts.byAccount, now);
  const address = unlockTime(counts.byAddress, now);
  if (address && (!account || address > account)) return { allowed: false, retryAt: address, reason: 'address' };
  if (account) return { allowed: false, retryAt: account, reason: 'account' };
  return { allowed: true };
}

export function throttleMessage(retryAt: Date, now: Date): string {
  const minutes = Math.max(1, Math.ceil((retryAt.getTime() - now.getTime()) / 60_000));
  const clock = retryAt.toISOString().slice(11, 16);
  return `Too many failed sign-in attempts. Try again in ${minutes} minute${minutes === 1 ? '' : 's'} (after ${clock} UTC).`;
}
