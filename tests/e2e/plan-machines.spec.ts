/** Engineer: a trunnion from a preset, its C sense reversed (a new version), a pose tried both ways. */
import { expect, test } from '@playwright/test';
import { storageStateFor } from './support/roles';

test.use({ storageState: storageStateFor('engineer') });
test.setTimeout(120_000);

test('engineer creates an AC trunnion from a preset, reverses C, tries a pose', async ({ page }) => {
  const name = `Trunnion e2e ${Date.now()}`;
  await page.goto('/machines');
  await page.getByLabel('New machine from a preset').selectOption('ac-trunnion');
  await page.getByRole('button', { name: 'Start from this preset' }).click();
  await page.getByLabel('Name', { exact: true }).fill(name);
  await page.getByRole('button', { name: 'Create machine' }).click();
  await expect(page.getByRole('heading', { name })).toBeVisible({ timeout: 60_000 });
  await expect(page.getByTestId('machine-version')).toContainText('Version 1');
  await expect(page.getByTestId('machine-view').locator('canvas')).toBeVisible({ timeout: 30_000 });
  await page.screenshot({ path: 'test-results/screens/plan-machine-created.png', fullPage: true });

  // C is the second rotary of the preset: reverse its sense and save a new version.
  await page.getByRole('button', { name: 'Edit' }).click();
  const c = page.getByRole('group', { name: 'Rotary 2' });
  const z = c.getByLabel('Z').first();
  const before = Number(await z.inputValue());
  await c.getByRole('button', { name: 'Reverse the sense' }).click();
  await expect(z).toHaveValue(String(-before));
  await page.getByLabel('What changed').fill('C sense reversed after the table test');
  await page.getByRole('button', { name: 'Save as a new version' }).click();
  await expect(page.getByTestId('machine-version')).toContainText('Version 2', { timeout: 30_000 });
  await expect(page.getByRole('cell', { name: 'C sense reversed after the table test' })).toBeVisible();

  // Forward: A = 30° tilts the tool axis in the part frame away from +Z.
  await page.getByLabel('A', { exact: true }).fill('30');
  await page.getByRole('button', { name: 'Compute tip' }).click();
  await expect(page.getByTestId('fk-result')).toContainText('tool axis', { timeout: 30_000 });
  // Inverse: a tilted axis has solutions, the chosen one marked; an impossible one says why in words.
  await page.getByLabel('Tool axis i, j, k').fill('0, -0.5, 0.8660254');
  await page.getByRole('button', { name: 'Find every solution' }).click();
  await expect(page.getByTestId('ik-result')).toContainText('chosen', { timeout: 30_000 });
  await page.screenshot({ path: 'test-results/screens/plan-machine-pose.png', fullPage: true });
  await page.getByLabel('Tool axis i, j, k').fill('0, 0, -1');
  await page.getByRole('button', { name: 'Find every solution' }).click();
  await expect(page.getByTestId('ik-result')).toHaveText(/limits|No rotary angles/);
});
