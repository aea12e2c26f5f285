/** Signs in each demo role once and keeps the browser state for the specs. */
import { expect, test as setup } from '@playwright/test';
import { OTHER_WORKSPACE_ADMIN, PASSWORD, ROLE_PEOPLE, storageStateFor } from './roles';
import { signInByApi } from './sign-in';

const everyone = [...Object.entries(ROLE_PEOPLE), ['other-admin', OTHER_WORKSPACE_ADMIN] as const];

for (const [who, person] of everyone) {
  setup(`sign in as ${who}`, async ({ request }) => {
    const res = await signInByApi(request, person.email, PASSWORD);
    expect(res.status(), await res.text()).toBe(200);
    const session = await (await request.get('/api/auth/session')).json() as { user?: { email?: string } };
    expect(session.user?.email).toBe(person.email);
    await request.storageState({ path: storageStateFor(who as Parameters<typeof storageStateFor>[0]) });
  });
}
