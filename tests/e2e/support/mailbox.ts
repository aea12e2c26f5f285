/** Reads the fake SMTP server's mailbox (lib/tasks/mail-fake.mjs). */
import { expect } from '@playwright/test';

export interface MailboxMessage { id: number; receivedAt: string; from: string; to: string[]; subject: string; text: string; html: string | null }

const MAILBOX_URL = process.env.MAILBOX_URL ?? 'http://127.0.0.1:2680';

export async function listMail(to?: string): Promise<MailboxMessage[]> {
  const url = new URL('/messages', MAILBOX_URL);
  if (to) url.searchParams.set('to', to.toLowerCase());
  const res = await fetch(url);
  if (!res.ok) throw new Error(`mailbox answered ${res.status}`);
  return (await res.json()) as MailboxMessage[];
}

/** Waits (polling) until a message for `to` whose subject contains `subject` arrives. */
export async function waitForMail(to: string, subject: string, timeoutMs = 20_000): Promise<MailboxMessage> {
  let found: MailboxMessage | undefined;
  await expect.poll(async () => {
    found = (await listMail(to)).find((m) => m.subject.includes(subject));
    return Boolean(found);
  }, { timeout: timeoutMs, intervals: [250, 500, 1000] }).toBe(true);
  if (!found) throw new Error('unreachable: poll passed without a message');
  return found;
}

/** The first http(s) link in a message's text. */
export function firstLink(message: MailboxMessage): string {
  const match = /https?:\/\/\S+/.exec(message.text);
  if (!match) throw new Error(`no link in message "${message.subject}"`);
  return match[0];
}
