import { eq } from 'drizzle-orm';
import type { AddressInfo } from 'node:net';
import nodemailer from 'nodemailer';
import { SMTPServer } from 'smtp-server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db/client';
import { mailOutbox } from '@/db/schema';
import { deliverDueMail, enqueueMail, retryDelaySeconds } from '@/lib/mail/outbox';
import { closeDb, makeWorkspace, testDatabaseReady, type TestWorkspace } from './support';

const ready = testDatabaseReady();

const transportTo = (port: number) => nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true, connectionTimeout: 1000, greetingTimeout: 1000 });

/** A free loopback port: listen on 0, read it, close. */
async function freePort(): Promise<number> {
  const s = new SMTPServer({ authOptional: true });
  await new Promise<void>((r) => s.listen(0, '127.0.0.1', () => r()));
  const port = (s.server.address() as AddressInfo).port;
  await new Promise<void>((r) => s.close(() => r()));
  return port;
}

describe.skipIf(!ready)('mail outbox', () => {
  let ws: TestWorkspace;
  beforeAll(async () => { ws = await makeWorkspace('mail'); });
  afterAll(async () => { await ws.remove(); await closeDb(); });

  it('keeps a message when the SMTP server is down and delivers it on a later try', async () => {
    const to = `outbox-${Date.now()}@test.example`;
    const id = await enqueueMail(getDb(), { workspaceId: ws.id, kind: 'test', to, subject: 'Outbox check', text: 'hello' });
    const port = await freePort();

    const first = await deliverDueMail({ transport: transportTo(port) });
    expect(first.failed).toBeGreaterThanOrEqual(1);
    const [afterFail] = await getDb().select().from(mailOutbox).where(eq(mailOutbox.id, id));
    expect(afterFail).toMatchObject({ status: 'pending', attempts: 1 });
    expect(afterFail?.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect(afterFail?.nextAttemptAt.getTime()).toBeGreaterThan(Date.now());

    // The server comes up; a pass after the retry delay delivers.
    const received: string[] = [];
    const server = new SMTPServer({
      authOptional: true, disabledCommands: ['STARTTLS', 'AUTH'],
      onData(stream, session, cb) { stream.resume(); stream.on('end', () => { received.push(...session.envelope.rcptTo.map((r) => r.address)); cb(); }); },
    });
    await new Promise<void>((r) => server.listen(port, '127.0.0.1', () => r()));
    try {
      const later = new Date(Date.now() + retryDelaySeconds(1) * 1000 + 1000);
      const second = await deliverDueMail({ transport: transportTo(port), now: later });
      expect(second.sent).toBeGreaterThanOrEqual(1);
    } finally {
      await new Promise<void>((r) => server.close(() => r()));
    }
    expect(received).toContain(to);
    const [sent] = await getDb().select().from(mailOutbox).where(eq(mailOutbox.id, id));
    expect(sent).toMatchObject({ status: 'sent', attempts: 2, lastError: null });
    expect(sent?.sentAt).toBeInstanceOf(Date);
  });

  it('backs off 5 s, 10 s, 20 s … up to 10 minutes', () => {
    expect([1, 2, 3, 4].map(retryDelaySeconds)).toEqual([5, 10, 20, 40]);
    expect(retryDelaySeconds(20)).toBe(600);
  });
});
