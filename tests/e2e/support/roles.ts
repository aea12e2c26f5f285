/** Demo people (db/seed-data.ts) and where each one's signed-in browser state is kept. */
import { FERNHOLLOW, STONEBRIDGE, DEMO_PASSWORD } from '../../../db/seed-data';
import type { Role } from '../../../lib/auth/roles';

export const PASSWORD = DEMO_PASSWORD;

function person(ws: typeof FERNHOLLOW, key: string) {
  const p = ws.people.find((x) => x.key === key);
  if (!p) throw new Error(`no demo person ${key} in ${ws.slug}`);
  return p;
}

/** One person per role in the demo workspace. */
export const ROLE_PEOPLE: Record<Role, { name: string; email: string }> = {
  admin: person(FERNHOLLOW, 'admin'),
  programmer: person(FERNHOLLOW, 'programmer'),
  engineer: person(FERNHOLLOW, 'engineer'),
  reviewer: person(FERNHOLLOW, 'reviewer'),
  setup: person(FERNHOLLOW, 'setup'),
};
export const MULTI_ROLE_PERSON = person(FERNHOLLOW, 'multi');
/** The second workspace's admin (isolation tests). */
export const OTHER_WORKSPACE_ADMIN = person(STONEBRIDGE, 'admin');

export const STATE_DIR = 'test-results/e2e-auth';
export const storageStateFor = (who: Role | 'other-admin') => `${STATE_DIR}/${who}.json`;
