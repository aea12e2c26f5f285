import { eq } from 'drizzle-orm';
import { v4 as uuidv4 } from 'uuid';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db/client';
import { listAuditEvents, recordAudit } from '@/db/queries/audit';
import { createInvitation, revokeInvitation } from '@/db/queries/invitations';
import { getPart, listParts } from '@/db/queries/parts';
import { changeRoles, listPeople, listPendingInvitations, setMemberActive } from '@/db/queries/people';
import { invitations, parts } from '@/db/schema';
import type { Ctx } from '@/lib/server/context';
import { closeDb, makeWorkspace, testDatabaseReady, type TestWorkspace } from './support';

const ready = testDatabaseReady();

describe.skipIf(!ready)('workspace isolation in the data layer', () => {
  let a: TestWorkspace;
  let b: TestWorkspace;
  let adminA: Ctx;
  let adminB: Ctx;
  const partA = uuidv4();

  beforeAll(async () => {
    a = await makeWorkspace('A');
    b = await makeWorkspace('B');
    adminA = await a.ctxFor(['admin', 'programmer']);
    adminB = await b.ctxFor(['admin', 'programmer']);
    const now = new Date();
    await getDb().insert(parts).values({ id: partA, workspaceId: a.id, number: 'ISO-1', revision: 'A', name: 'Only in A', createdAt: now, updatedAt: now });
    await recordAudit(getDb(), { workspaceId: a.id, action: 'test-event', summary: 'secret event of A' });
  });
  afterAll(async () => { await a.remove(); await b.remove(); await closeDb(); });

  it('parts: B does not list or open A’s part', async () => {
    expect((await listParts(adminA)).map((p) => p.id)).toContain(partA);
    expect((await listParts(adminB)).map((p) => p.id)).not.toContain(partA);
    await expect(getPart(adminB, partA)).rejects.toMatchObject({ code: 'not-found' });
    await expect(getPart(adminA, partA)).resolves.toMatchObject({ id: partA, name: 'Only in A' });
  });

  it('people: B neither sees nor changes A’s members', async () => {
    const peopleB = await listPeople(adminB);
    expect(peopleB.map((p) => p.email)).not.toContain(adminA.user.email);
    await expect(changeRoles(adminB, adminA.user.membershipId, ['setup'])).rejects.toMatchObject({ code: 'not-found' });
    await expect(setMemberActive(adminB, adminA.user.membershipId, false)).rejects.toMatchObject({ code: 'not-found' });
    expect((await listPeople(adminA)).find((p) => p.membershipId === adminA.user.membershipId)?.roles).toEqual(['admin', 'programmer']);
  });

  it('invitations and audit events stay in their workspace', async () => {
    const email = `iso-${Date.now()}@test.example`;
    const { id } = await createInvitation(adminA, { email, name: 'Iso', roles: ['setup'] });
    expect((await listPendingInvitations(adminB)).map((i) => i.id)).not.toContain(id);
    await expect(revokeInvitation(adminB, id)).rejects.toMatchObject({ code: 'not-found' });
    const [row] = await getDb().select({ revokedAt: invitations.revokedAt }).from(invitations).where(eq(invitations.id, id));
    expect(row?.revokedAt).toBeNull();
    expect((await listAuditEvents(adminB, {})).map((e) => e.summary)).not.toContain('secret event of A');
    expect((await listAuditEvents(adminA, {})).map((e) => e.summary)).toContain('secret event of A');
  });

  it('an admin cannot remove their own admin role or deactivate themselves', async () => {
    await expect(changeRoles(adminA, adminA.user.membershipId, ['programmer'])).rejects.toMatchObject({ code: 'conflict' });
    await expect(setMemberActive(adminA, adminA.user.membershipId, false)).rejects.toMatchObject({ code: 'conflict' });
  });
});
