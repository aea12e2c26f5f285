import 'server-only';
/**
 * Drives the outbox inside the running server: one timer per process (kept on
 * globalThis), plus an immediate try whenever a message is queued.
 */
import { deliverDueMail } from './outbox';

const INTERVAL_MS = 5000;
const state = globalThis as unknown as { probityOutboxTimer?: NodeJS.Timeout; probityOutboxBusy?: boolean };

async function tick(): Promise<void> {
  if (state.probityOutboxBusy) return;
  state.probityOutboxBusy = true;
  try {
    await deliverDueMail();
  } catch (error) {
    // The database may be down; the next tick tries again.
    console.error('[outbox] delivery pass failed:', error instanceof Error ? error.message : error);
  } finally {
    state.probityOutboxBusy = false;
  }
}

export function ensureOutboxWorker(): void {
  if (state.probityOutboxTimer) return;
  state.probityOutboxTimer = setInterval(() => void tick(), INTERVAL_MS);
  state.probityOutboxTimer.unref();
}

/** Call after committing a transaction that queued mail. */
export function kickOutbox(): void {
  ensureOutboxWorker();
  void tick();
}
