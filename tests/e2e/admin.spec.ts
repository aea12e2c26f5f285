/** Admin people table (sort, filter, change roles, deactivate) and the audit log filters. */
import { expect, test } from '@playwright/test';
import { FERNHOLLOW, STONEBRIDGE } from '../../db/seed-data';
import { PASSWORD, ROLE_PEOPLE, storageStateFor } from './support/roles';
import { signInByApi } from './support/sign-in';

test.describe('demo workspace admin', () => {
  test.use({ storageState: storageStateFor('admin') });

  test('the people table sorts and filters', async ({ page }) => {
    await page.goto('/admin/people');
    const rows = page.getByTestId('person-row');
    await expect(rows).toHaveCount(FERNHOLLOW.people.length);
    await expect(rows.first()).toContainText('Ada Quint');
    await page.getByRole('button', { name: 'Name', exact: true }).click(); // → descending
    await expect(rows.first()).toContainText('Sam Tierney');
    await page.getByLabel('Role', { exact: true }).selectOption('reviewer');
    await expect(rows).toHaveCount(2); // Rafael Okoro, Mira Lund
    await page.getByLabel('Find').fill('mira');
    await expect(rows).toHaveCount(1);
    await expect(rows.first()).toContainText('Programmer, Reviewer');
  });

  test('the audit log lists failed sign-ins and filters them', async ({ page, browser }) => {
    const other = await browser.newContext();
    expect((await signInByApi(other.request, ROLE_PEOPLE.engineer.email, 'wrong-password-for-audit')).status()).toBe(401);
    await other.close();
    await page.goto('/admin/audit');
    await expect(page.getByTestId('audit-row').first()).toBeVisible();
    await page.getByLabel('Event').selectOption('sign-in-failed');
    await page.getByRole('button', { name: 'Filter' }).click();
    await expect(page).toHaveURL(/action=sign-in-failed/);
    const rows = page.getByTestId('audit-row');
    await expect(rows.filter({ hasText: ROLE_PEOPLE.engineer.email }).first()).toBeVisible();
    for (const text of await rows.allInnerTexts()) expect(text).toContain('sign-in-failed');
    await page.screenshot({ path: 'test-results/screenshots/audit.png', fullPage: true });
    await page.goto('/admin/audit?from=2020-01-01&to=2020-01-02');
    await expect(page.getByText('No events match these filters.')).toBeVisible();
    await page.goto('/admin/audit?from=2020-02-01&to=2020-01-02');
    await expect(page.getByText('“From” must be on or before “Until”')).toBeVisible();
  });
});

// Uses the second workspace so the demo workspace's people stay as the other specs expect them.
test.describe('second workspace admin', () => {
  test.use({ storageState: storageStateFor('other-admin') });
  const kit = STONEBRIDGE.people.find((p) => p.key === 'programmer') ?? { name: '', email: '' };

  test('role changes apply on the person’s next request; deactivation shuts them out', async ({ page, browser }) => {
    test.slow(); // two browser contexts and a dozen round trips: 30 s was tight on a loaded 2-core machine
    const theirs = await browser.newContext();
    expect((await signInByApi(theirs.request, kit.email, PASSWORD)).status()).toBe(200);
    const theirPage = await theirs.newPage();
    expect((await theirPage.goto('/reviews'))?.status()).toBe(200);

    await page.goto('/admin/people');
    const row = page.getByTestId('person-row').filter({ hasText: kit.email });
    try {
      await row.getByRole('button', { name: `Change roles of ${kit.name}` }).click();
      await row.getByLabel('Programmer').uncheck();
      await row.getByLabel('Engineer').uncheck();
      await row.getByLabel('Setup technician').check();
      await row.getByRole('button', { name: 'Save roles' }).click();
      await expect(row).toContainText('Setup technician');
      // Same session cookie, new roles: they are re-read from the database on every request.
      expect((await theirPage.goto('/reviews'))?.status()).toBe(403);
      await expect(theirPage.getByRole('heading', { name: 'Your roles do not include this page' })).toBeVisible();

      await row.getByRole('button', { name: `Deactivate ${kit.name}` }).click();
      await expect(row).toContainText('Deactivated');
      await theirPage.goto('/parts');
      await expect(theirPage).toHaveURL(/\/sign-in/);
      expect((await theirs.request.get('/api/parts')).status()).toBe(401);
      expect((await signInByApi((await browser.newContext()).request, kit.email, PASSWORD)).status()).toBe(401);
      await page.goto('/admin/audit?action=roles-changed');
      await expect(page.getByTestId('audit-row').filter({ hasText: kit.email }).first()).toBeVisible();
      await page.goto('/admin/people');
    } finally {
      // Put Kit back for the other specs.
      await row.getByRole('button', { name: `Reactivate ${kit.name}` }).click().catch(() => undefined);
      await expect(row).toContainText('Active');
      await row.getByRole('button', { name: `Change roles of ${kit.name}` }).click();
      await row.getByLabel('Setup technician').uncheck();
      await row.getByLabel('Programmer').check();
      await row.getByLabel('Engineer').check();
      await row.getByRole('button', { name: 'Save roles' }).click();
      await expect(row).toContainText('Programmer, Engineer');
      await theirs.close();
    }
  });

  test('an admin cannot remove their own admin role', async ({ page }) => {
    await page.goto('/admin/people');
    const row = page.getByTestId('person-row').filter({ hasText: 'jonas.hale@stonebridge.example' });
    await row.getByRole('button', { name: 'Change roles of Jonas Hale' }).click();
    await row.getByLabel('Admin').uncheck();
    await row.getByLabel('Programmer').check();
    await row.getByRole('button', { name: 'Save roles' }).click();
    await expect(page.getByText('You cannot remove your own admin role')).toBeVisible();
    await expect(row.getByRole('button', { name: `Deactivate Jonas Hale` })).toHaveCount(0);
  });
});
