/**
 * Database tests run against the local test MariaDB only: 127.0.0.1 and a database
 * whose name ends in `_test` (npm test sets DATABASE_URL). Anything else is refused.
 */
import { eq } from 'drizzle-orm';
import { v4 as uuidv4 } from 'uuid';
import { closeDb, getDb } from '@/db/client';
import { memberships, users, workspaces } from '@/db/schema';
import type { Role } from '@/lib/auth/roles';
import type { Ctx } from '@/lib/server/context';

export function testDatabaseReady(): boolean {
  const url = process.env.DATABASE_URL;
  if (!url) {
    if (process.env.PROBITY_DB_TESTS === 'required') throw new Error('DATABASE_URL is not set but database tests are required');
    return false;
  }
  const parsed = new URL(url);
  if (parsed.hostname !== '127.0.0.1') throw new Error(`database tests refuse host ${parsed.hostname}: only 127.0.0.1`);
  if (!parsed.pathname.endsWith('_test')) throw new Error(`database tests refuse database ${parsed.pathname.slice(1)}: its name must end in _test`);
  return true;
}

export interface TestWorkspace { id: string; ctxFor: (roles: Role[]) => Promise<Ctx>; remove: () => Promise<void> }

/** A throw-away workspace with people created on demand; `remove` deletes it all (cascade). */
export async function makeWorkspace(label: string): Promise<TestWorkspace> {
  const db = getDb();
  const id = uuidv4();
  const created: string[] = [];
  await db.insert(workspaces).values({ id, slug: `t-${id.slice(0, 8)}`, name: `Test ${label}`, createdAt: new Date() });
  return {
    id,
    async ctxFor(roles) {
      const userId = uuidv4();
      const email = `${roles.join('-')}-${userId.slice(0, 8)}@test.example`;
      const membershipId = uuidv4();
      await db.insert(users).values({ id: userId, email, name: `${label} ${roles.join('+')}`, createdAt: new Date() });
      await db.insert(memberships).values({ id: membershipId, workspaceId: id, userId, roles, createdAt: new Date() });
      created.push(userId);
      return { user: { id: userId, email, name: `${label} ${roles.join('+')}`, workspaceId: id, workspaceName: `Test ${label}`, membershipId, roles }, ip: '127.0.0.1' };
    },
    async remove() {
      await db.delete(workspaces).where(eq(workspaces.id, id));
      for (const u of created) await db.delete(users).where(eq(users.id, u));
    },
  };
}

export { closeDb };
