import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db/client';
import { recordAudit } from '@/db/queries/audit';
import { acceptInvitation, createInvitation } from '@/db/queries/invitations';
import { auditEvents, invitations, mailOutbox, memberships, users } from '@/db/schema';
import { enqueueMail } from '@/lib/mail/outbox';
import { closeDb, makeWorkspace, testDatabaseReady, type TestWorkspace } from './support';

const ready = testDatabaseReady();

describe.skipIf(!ready)('transactions leave nothing half-written', () => {
  let ws: TestWorkspace;
  beforeAll(async () => { ws = await makeWorkspace('tx'); });
  afterAll(async () => { await ws.remove(); await closeDb(); });

  const mailTo = (to: string) => getDb().select({ id: mailOutbox.id }).from(mailOutbox).where(eq(mailOutbox.toAddress, to));

  it('an invitation whose last step (audit) fails leaves no invitation and no e-mail', async () => {
    const admin = await ws.ctxFor(['admin']);
    const email = `late-fail-${Date.now()}@test.example`;
    // The audit row's address column holds 64 characters; this one is longer, so the third insert fails.
    const badCtx = { ...admin, ip: 'x'.repeat(65) };
    await expect(createInvitation(badCtx, { email, name: 'Late Fail', roles: ['setup'] })).rejects.toThrow();
    expect(await getDb().select().from(invitations).where(eq(invitations.email, email))).toHaveLength(0);
    expect(await mailTo(email)).toHaveLength(0);

    // The same call with a good context writes all three.
    await createInvitation(admin, { email, name: 'Late Fail', roles: ['setup'] });
    expect(await getDb().select().from(invitations).where(eq(invitations.email, email))).toHaveLength(1);
    expect(await mailTo(email)).toHaveLength(1);
    const audit = await getDb().select({ action: auditEvents.action }).from(auditEvents)
      .where(and(eq(auditEvents.workspaceId, ws.id), eq(auditEvents.action, 'invitation-sent')));
    expect(audit.length).toBeGreaterThanOrEqual(1);
  });

  it('accepting an invitation that fails at the end creates no account and keeps the link usable', async () => {
    const admin = await ws.ctxFor(['admin']);
    const email = `accept-fail-${Date.now()}@test.example`;
    await createInvitation(admin, { email, name: 'Accept Fail', roles: ['engineer'] });
    // Read the token from the queued e-mail, as the person would.
    const [mail] = await getDb().select({ text: mailOutbox.textBody }).from(mailOutbox).where(eq(mailOutbox.toAddress, email));
    const token = /\/invitation\/([A-Za-z0-9_-]+)/.exec(mail?.text ?? '')?.[1];
    expect(token).toBeTruthy();
    await expect(acceptInvitation(token ?? '', 'a-good-long-password', 'y'.repeat(65))).rejects.toThrow();
    expect(await getDb().select().from(users).where(eq(users.email, email))).toHaveLength(0);
    const [inv] = await getDb().select({ acceptedAt: invitations.acceptedAt }).from(invitations).where(eq(invitations.email, email));
    expect(inv?.acceptedAt).toBeNull();

    const ok = await acceptInvitation(token ?? '', 'a-good-long-password', '127.0.0.1');
    expect(ok.email).toBe(email);
    const [user] = await getDb().select({ id: users.id }).from(users).where(eq(users.email, email));
    const member = await getDb().select({ roles: memberships.roles }).from(memberships).where(eq(memberships.userId, user?.id ?? ''));
    expect(member).toEqual([{ roles: ['engineer'] }]);
    await expect(acceptInvitation(token ?? '', 'a-good-long-password', '127.0.0.1')).rejects.toThrow(/already been used/);
  });

  it('a thrown error inside a transaction rolls back every write made in it', async () => {
    const to = `rollback-${Date.now()}@test.example`;
    await expect(getDb().transaction(async (tx) => {
      await enqueueMail(tx, { workspaceId: ws.id, kind: 'test', to, subject: 's', text: 't' });
      await recordAudit(tx, { workspaceId: ws.id, action: 'test-event', summary: to });
      throw new Error('step three fails');
    })).rejects.toThrow('step three fails');
    expect(await mailTo(to)).toHaveLength(0);
    expect(await getDb().select().from(auditEvents).where(eq(auditEvents.summary, to))).toHaveLength(0);
  });
});
