/** A person of workspace B cannot open a record of workspace A, by page or by API. */
import { expect, test } from '@playwright/test';
import { storageStateFor } from './support/roles';

let partOfA = '';

test.beforeAll(async ({ browser }) => {
  const context = await browser.newContext({ storageState: storageStateFor('admin') });
  const res = await context.request.get('/api/parts');
  expect(res.status()).toBe(200);
  const { parts } = (await res.json()) as { parts: { id: string; number: string }[] };
  partOfA = parts.find((p) => p.number === 'FH-1042')?.id ?? '';
  expect(partOfA).not.toBe('');
  await context.close();
});

test.describe('workspace B admin', () => {
  test.use({ storageState: storageStateFor('other-admin') });

  test('does not list A’s parts and gets 404 for A’s part by URL and API', async ({ page, request }) => {
    const list = (await (await request.get('/api/parts')).json()) as { parts: { id: string }[] };
    expect(list.parts.map((p) => p.id)).not.toContain(partOfA);
    expect(list.parts.length).toBeGreaterThan(0);

    const api = await request.get(`/api/parts/${partOfA}`);
    expect(api.status()).toBe(404);
    expect(((await api.json()) as { error: { code: string } }).error.code).toBe('not-found');

    // The page streams behind the section's loading boundary, so the not-found page comes with status 200.
    await page.goto(`/parts/${partOfA}`);
    await expect(page.getByRole('heading', { name: 'Part not found' })).toBeVisible();
    await expect(page.getByText('Valve manifold block')).toHaveCount(0);
    await expect(page.getByText('FH-1042')).toHaveCount(0);
    await page.screenshot({ path: 'test-results/screenshots/isolation-404.png', fullPage: true });
  });

  test('sees only B’s people in admin', async ({ page, request }) => {
    const { people } = (await (await request.get('/api/admin/people')).json()) as { people: { email: string }[] };
    expect(people.map((p) => p.email).sort()).toEqual(['jonas.hale@stonebridge.example', 'kit.arden@stonebridge.example']);
    await page.goto('/admin/people');
    await expect(page.getByTestId('person-row')).toHaveCount(2);
    await expect(page.getByText('fernhollow.example')).toHaveCount(0);
  });
});

test.describe('workspace A admin', () => {
  test.use({ storageState: storageStateFor('admin') });

  test('opens the same part', async ({ request }) => {
    expect((await request.get(`/api/parts/${partOfA}`)).status()).toBe(200);
  });
});
