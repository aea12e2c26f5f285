import { eq, sql } from 'drizzle-orm';
import { v4 as uuidv4 } from 'uuid';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db/client';
import { features, memberships, parts } from '@/db/schema';
import { closeDb, makeWorkspace, testDatabaseReady, type TestWorkspace } from './support';

const ready = testDatabaseReady();

describe.skipIf(!ready)('JSON columns on MariaDB', () => {
  let ws: TestWorkspace;
  beforeAll(async () => { ws = await makeWorkspace('json'); });
  afterAll(async () => { await ws.remove(); await closeDb(); });

  it('MariaDB stores JSON as text, and drizzle reads give objects back', async () => {
    const ctx = await ws.ctxFor(['programmer', 'reviewer']);
    const [columns] = await getDb().execute(sql`SELECT DATA_TYPE AS t FROM information_schema.COLUMNS
      WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = 'memberships' AND COLUMN_NAME = 'roles'`);
    expect(columns).toEqual([{ t: 'longtext' }]);
    const [row] = await getDb().select({ roles: memberships.roles }).from(memberships).where(eq(memberships.id, ctx.user.membershipId));
    expect(row?.roles).toEqual(['programmer', 'reviewer']);
  });

  it('nested geometry round-trips with full float64 precision', async () => {
    const now = new Date();
    const partId = uuidv4();
    const featureId = uuidv4();
    const geometry = { center: [0.1 + 0.2, -1e-9, 123456.789012345], axis: [0, 0, 1], diameter: 12.0000001 };
    await getDb().insert(parts).values({ id: partId, workspaceId: ws.id, number: 'J-1', revision: 'A', name: 'json', createdAt: now, updatedAt: now });
    await getDb().insert(features).values({ id: featureId, workspaceId: ws.id, partId, type: 'bore', label: 'B1', geometry, pointOptions: { points: 6, levels: [2, 8] }, createdAt: now });
    const [f] = await getDb().select({ geometry: features.geometry, pointOptions: features.pointOptions }).from(features).where(eq(features.id, featureId));
    expect(f?.geometry).toEqual(geometry);
    expect(f?.pointOptions).toEqual({ points: 6, levels: [2, 8] });
  });

  it('MariaDB refuses text that is not JSON in a JSON column', async () => {
    const ctx = await ws.ctxFor(['setup']);
    await expect(getDb().execute(sql`UPDATE memberships SET roles = ${'not json'} WHERE id = ${ctx.user.membershipId}`)).rejects.toThrow();
  });
});
