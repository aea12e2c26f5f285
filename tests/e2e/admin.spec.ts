/** Admin people table (sort, filter, change roles, deactivate) and the audit log filters. */
import { expect, test } from '@playwright/test';
import { PASSWORD, ROLE_PEOPLE, storageStateFor } from './support/roles';
import { signInByApi } from './support/sign-in';

test.use({ storageState: storageStateFor('admin') });

test('the people table sorts and filters', async ({ page }) => {
  await page.goto('/admin/people');
  const rows = page.getByTestId('person-row');
  await expect(rows.first()).toContainText('Ada Quint');
  await page.getByRole('button', { name: 'Name' }).click(); // → descending
  await expect(rows.first()).toContainText('Sam Tierney');
  await page.getByLabel('Role').selectOption('reviewer');
  await expect(rows).toHaveCount(2); // Rafael Okoro, Mira Lund
  await page.getByLabel('Find').fill('mira');
  await expect(rows).toHaveCount(1);
  await expect(rows.first()).toContainText('Programmer, Reviewer');
});

test('changing roles takes effect on the person’s next request; deactivation shuts them out', async ({ page, browser }) => {
  const reviewer = ROLE_PEOPLE.reviewer;
  const theirs = await browser.newContext();
  expect((await signInByApi(theirs.request, reviewer.email, PASSWORD)).status()).toBe(200);
  const theirPage = await theirs.newPage();
  expect((await theirPage.goto('/reviews'))?.status()).toBe(200);

  await page.goto('/admin/people');
  const row = page.getByTestId('person-row').filter({ hasText: reviewer.email });
  await row.getByRole('button', { name: `Change roles of ${reviewer.name}` }).click();
  await row.getByLabel('Reviewer').uncheck();
  await row.getByLabel('Setup technician').check();
  await row.getByRole('button', { name: 'Save roles' }).click();
  await expect(row).toContainText('Setup technician');
  // Their session (same JWT) now gets the setup navigation: roles are re-read from the database.
  expect((await theirPage.goto('/reviews'))?.status()).toBe(403);

  await row.getByRole('button', { name: `Deactivate ${reviewer.name}` }).click();
  await expect(row).toContainText('Deactivated');
  await theirPage.goto('/parts');
  await expect(theirPage).toHaveURL(/\/sign-in/);
  expect((await signInByApi((await browser.newContext()).request, reviewer.email, PASSWORD)).status()).toBe(401);

  // Put everything back for the other tests.
  await row.getByRole('button', { name: `Reactivate ${reviewer.name}` }).click();
  await expect(row).toContainText('Active');
  await row.getByRole('button', { name: `Change roles of ${reviewer.name}` }).click();
  await row.getByLabel('Setup technician').uncheck();
  await row.getByLabel('Reviewer').check();
  await row.getByRole('button', { name: 'Save roles' }).click();
  await expect(row).toContainText('Reviewer');
  await theirs.close();
});

test('the audit log lists sign-ins and role changes and filters them', async ({ page }) => {
  await page.goto('/admin/audit');
  await expect(page.getByTestId('audit-row').first()).toBeVisible();
  await page.getByLabel('Event').selectOption('sign-in-failed');
  await page.getByRole('button', { name: 'Filter' }).click();
  await expect(page).toHaveURL(/action=sign-in-failed/);
  const rows = page.getByTestId('audit-row');
  await expect(rows.first()).toBeVisible();
  for (const text of await rows.allInnerTexts()) expect(text).toContain('sign-in-failed');
  await page.getByLabel('Event').selectOption('roles-changed');
  await page.getByRole('button', { name: 'Filter' }).click();
  await expect(rows.filter({ hasText: ROLE_PEOPLE.reviewer.email }).first()).toBeVisible();
  await page.screenshot({ path: 'test-results/screenshots/audit.png', fullPage: true });
  await page.goto('/admin/audit?from=2020-01-01&to=2020-01-02');
  await expect(page.getByText('No events match these filters.')).toBeVisible();
});
