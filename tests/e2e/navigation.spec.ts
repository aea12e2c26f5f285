/** Each role sees the sections it may use, and only those; the shell works at phone width. */
import { expect, test } from '@playwright/test';
import { ROLES, type Role } from '../../lib/auth/roles';
import { MULTI_ROLE_PERSON, PASSWORD, ROLE_PEOPLE, storageStateFor } from './support/roles';
import { signInByForm } from './support/sign-in';

const ALL = ['Parts', 'Machines', 'Probes', 'Programs', 'Runs', 'Reviews', 'Admin'];

const EXPECTED: Record<Role, string[]> = {
  admin: ['Parts', 'Machines', 'Probes', 'Programs', 'Runs', 'Admin'],
  programmer: ['Parts', 'Machines', 'Probes', 'Programs', 'Runs', 'Reviews'],
  engineer: ['Parts', 'Machines', 'Probes', 'Programs', 'Runs', 'Reviews'],
  reviewer: ['Parts', 'Machines', 'Probes', 'Programs', 'Runs', 'Reviews'],
  setup: ['Parts', 'Machines', 'Probes', 'Programs', 'Runs'],
};

for (const role of ROLES) {
  test.describe(`${role}`, () => {
    test.use({ storageState: storageStateFor(role) });

    test(`sees the right navigation`, async ({ page }) => {
      await page.goto('/');
      const nav = page.getByRole('navigation', { name: 'Sections' });
      await expect(nav).toBeVisible();
      await expect(nav.getByRole('link')).toHaveText(EXPECTED[role]);
      for (const hidden of ALL.filter((s) => !EXPECTED[role].includes(s))) {
        await expect(nav.getByRole('link', { name: hidden })).toHaveCount(0);
      }
      await expect(page.getByTestId('user-name')).toHaveText(ROLE_PEOPLE[role].name);
      // Every visible section opens (no 403, no error page).
      for (const section of EXPECTED[role]) {
        await nav.getByRole('link', { name: section }).click();
        await expect(page.getByRole('heading', { level: 1 })).toContainText(section === 'Admin' ? 'People' : section);
      }
      await page.screenshot({ path: `test-results/screenshots/shell-${role}.png`, fullPage: true });
    });
  });
}

test('a person with two roles sees the union of both', async ({ page }) => {
  await signInByForm(page, MULTI_ROLE_PERSON.email, PASSWORD);
  await expect(page.getByRole('navigation', { name: 'Sections' }).getByRole('link'))
    .toHaveText(['Parts', 'Machines', 'Probes', 'Programs', 'Runs', 'Reviews']);
  await expect(page.getByTestId('user-roles')).toHaveText('Programmer, Reviewer');
});

test.describe('phone width', () => {
  test.use({ storageState: storageStateFor('admin'), viewport: { width: 390, height: 844 } });

  test('the menu button opens the section list', async ({ page }) => {
    await page.goto('/parts');
    await expect(page.getByRole('heading', { level: 1, name: 'Parts' })).toBeVisible();
    await page.screenshot({ path: 'test-results/screenshots/phone-parts.png', fullPage: true });
    await page.getByRole('button', { name: 'Menu' }).click();
    const nav = page.locator('#mobile-nav');
    await expect(nav.getByRole('link')).toHaveText(EXPECTED.admin);
    await page.screenshot({ path: 'test-results/screenshots/phone-menu.png' });
    await nav.getByRole('link', { name: 'Machines' }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Machines' })).toBeVisible();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
  });
});
