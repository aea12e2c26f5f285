import 'server-only';
/**
 * The persisted mail outbox. A message is written in the same transaction as the
 * change that causes it (so it exists exactly when the change does), then delivered;
 * a failed delivery stays pending and is retried with a growing delay.
 */
import { and, asc, eq, lte } from 'drizzle-orm';
import type { Transporter } from 'nodemailer';
import { v4 as uuidv4 } from 'uuid';
import { getDb, type DbOrTx } from '@/db/client';
import { mailOutbox } from '@/db/schema';
import { getEnv } from '@/lib/env';
import { createMailTransport } from './transport';

export interface OutgoingMail {
  workspaceId: string | null;
  kind: string;
  to: string;
  subject: string;
  text: string;
  html?: string;
}

/** After this many failed tries a message is marked failed (still kept, still visible). */
export const MAX_ATTEMPTS = 12;

/** Seconds until the next try after `attempts` failures: 5 s, 10 s, 20 s … capped at 10 minutes. */
export function retryDelaySeconds(attempts: number): number {
  return Math.min(600, 5 * 2 ** Math.max(0, attempts - 1));
}

export async function enqueueMail(db: DbOrTx, mail: OutgoingMail): Promise<string> {
  const id = uuidv4();
  const now = new Date();
  await db.insert(mailOutbox).values({
    id, workspaceId: mail.workspaceId, kind: mail.kind, toAddress: mail.to, subject: mail.subject,
    textBody: mail.text, htmlBody: mail.html ?? null, status: 'pending', attempts: 0, nextAttemptAt: now, createdAt: now,
  });
  return id;
}

export interface DeliveryReport { sent: number; failed: number }

/** Delivers every due pending message once. Safe to call concurrently with itself only from one process. */
export async function deliverDueMail(options: { transport?: Transporter; now?: Date; limit?: number } = {}): Promise<DeliveryReport> {
  const db = getDb();
  const now = options.now ?? new Date();
  const due = await db
    .select({ id: mailOutbox.id, to: mailOutbox.toAddress, subject: mailOutbox.subject, text: mailOutbox.textBody, html: mailOutbox.htmlBody, attempts: mailOutbox.attempts })
    .from(mailOutbox)
    .where(and(eq(mailOutbox.status, 'pending'), lte(mailOutbox.nextAttemptAt, now)))
    .orderBy(asc(mailOutbox.createdAt))
    .limit(options.limit ?? 20);
  if (due.length === 0) return { sent: 0, failed: 0 };
  const transport = options.transport ?? createMailTransport();
  const report: DeliveryReport = { sent: 0, failed: 0 };
  for (const m of due) {
    try {
      await transport.sendMail({ from: getEnv().MAIL_FROM, to: m.to, subject: m.subject, text: m.text, ...(m.html ? { html: m.html } : {}) });
      await db.update(mailOutbox).set({ status: 'sent', sentAt: new Date(), attempts: m.attempts + 1, lastError: null }).where(eq(mailOutbox.id, m.id));
      report.sent += 1;
    } catch (error) {
      const attempts = m.attempts + 1;
      await db.update(mailOutbox).set({
        attempts,
        status: attempts >= MAX_ATTEMPTS ? 'failed' : 'pending',
        lastError: (error instanceof Error ? error.message : String(error)).slice(0, 500),
        nextAttemptAt: new Date(now.getTime() + retryDelaySeconds(attempts) * 1000),
      }).where(eq(mailOutbox.id, m.id));
      report.failed += 1;
    }
  }
  return report;
}
