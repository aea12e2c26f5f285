/** Refusals: a page the roles do not allow is a 403 page; an API call is a JSON 403; signed-out is 401. */
import { expect, test } from '@playwright/test';
import { storageStateFor } from './support/roles';

test.describe('programmer', () => {
  test.use({ storageState: storageStateFor('programmer') });

  for (const path of ['/admin/people', '/admin/audit', '/admin']) {
    test(`is refused ${path} with the 403 page`, async ({ page }) => {
      const res = await page.goto(path);
      expect(res?.status()).toBe(403);
      await expect(page.getByRole('heading', { name: 'Your roles do not include this page' })).toBeVisible();
      if (path === '/admin/people') await page.screenshot({ path: 'test-results/screenshots/forbidden.png', fullPage: true });
    });
  }

  test('is refused the admin API with a JSON 403', async ({ request }) => {
    for (const [method, path] of [['GET', '/api/admin/people'], ['GET', '/api/admin/audit'], ['POST', '/api/admin/invitations']] as const) {
      const res = method === 'GET' ? await request.get(path)
        : await request.post(path, { data: { email: 'x@fernhollow.example', name: 'X', roles: ['setup'] } });
      expect(res.status(), `${method} ${path}`).toBe(403);
      const body = (await res.json()) as { error: { code: string; message: string } };
      expect(body.error.code).toBe('forbidden');
      expect(body.error.message).toMatch(/^Your roles do not allow this \((users\.manage|audit\.read)\)/);
    }
  });
});

test.describe('setup technician', () => {
  test.use({ storageState: storageStateFor('setup') });

  test('does not see Reviews and is refused the page', async ({ page }) => {
    await page.goto('/parts');
    await expect(page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Reviews' })).toHaveCount(0);
    const res = await page.goto('/reviews');
    expect(res?.status()).toBe(403);
  });
});

test.describe('signed out', () => {
  test('pages go to sign-in and the API answers 401 JSON', async ({ page, request }) => {
    await page.goto('/admin/people');
    await expect(page).toHaveURL(/\/sign-in/);
    const res = await request.get('/api/admin/people');
    expect(res.status()).toBe(401);
    expect(((await res.json()) as { error: { code: string } }).error.code).toBe('unauthenticated');
  });
});

test.describe('admin API', () => {
  test.use({ storageState: storageStateFor('admin') });

  test('bad input is a 400 naming the field', async ({ request }) => {
    const res = await request.post('/api/admin/invitations', { data: { email: 'not-an-address', name: 'X', roles: ['setup'] } });
    expect(res.status()).toBe(400);
    const body = (await res.json()) as { error: { code: string; message: string; path: string } };
    expect(body.error).toMatchObject({ code: 'invalid', path: 'body.email' });
    const broken = await request.post('/api/admin/invitations', { headers: { 'content-type': 'application/json' }, data: Buffer.from('{not json') });
    expect(broken.status()).toBe(400);
    expect(((await broken.json()) as { error: { message: string } }).error.message).toContain('not valid JSON');
  });

  test('inviting an existing member is a 409', async ({ request }) => {
    const res = await request.post('/api/admin/invitations', { data: { email: 'piet.marlowe@fernhollow.example', name: 'Piet', roles: ['setup'] } });
    expect(res.status()).toBe(409);
    expect(((await res.json()) as { error: { message: string } }).error.message).toContain('already a member');
  });
});
