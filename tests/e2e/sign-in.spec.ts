/** Sign-in page: success, wrong password, sign-out, and throttling after repeated failures. */
import { expect, test } from '@playwright/test';
import { PASSWORD, ROLE_PEOPLE } from './support/roles';
import { signInByApi, signInByForm } from './support/sign-in';

test('signs in and out', async ({ page }) => {
  await page.goto('/parts');
  await expect(page).toHaveURL(/\/sign-in/);
  await page.screenshot({ path: 'test-results/screenshots/sign-in.png', fullPage: true });
  await signInByForm(page, ROLE_PEOPLE.engineer.email, PASSWORD);
  await expect(page.getByRole('heading', { level: 1, name: 'Parts' })).toBeVisible();
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await page.goto('/parts');
  await expect(page).toHaveURL(/\/sign-in/);
});

test('a wrong password gives a message and no session', async ({ page }) => {
  await signInByForm(page, ROLE_PEOPLE.reviewer.email, 'not-the-password');
  await expect(page.getByTestId('sign-in-error')).toHaveText('The e-mail address or the password is not right.');
  await page.screenshot({ path: 'test-results/screenshots/sign-in-wrong-password.png', fullPage: true });
  await page.goto('/reviews');
  await expect(page).toHaveURL(/\/sign-in/);
});

test('an empty form says what is missing', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByText('Enter an e-mail address such as name@shop.example')).toBeVisible();
  await expect(page.getByText('Enter your password')).toBeVisible();
});

// The address is a documentation-range value in X-Forwarded-For (RFC 5737), so this
// test's failures do not lock out 127.0.0.1 for the other tests.
test('ten failures for one account → 429 with when to try again', async ({ page, request }) => {
  const headers = { 'X-Forwarded-For': '203.0.113.10' };
  const email = 'nobody-here@fernhollow.example';
  for (let i = 0; i < 10; i += 1) {
    const res = await signInByApi(request, email, `wrong-${i}`, headers);
    expect(res.status()).toBe(401);
  }
  const refused = await signInByApi(request, email, 'wrong-again', headers);
  expect(refused.status()).toBe(429);
  expect(Number(refused.headers()['retry-after'])).toBeGreaterThan(800);
  const body = (await refused.json()) as { error: { code: string; message: string } };
  expect(body.error.code).toBe('throttled');
  expect(body.error.message).toMatch(/Try again in 1[45] minutes \(after \d\d:\d\d UTC\)/);

  // The page shows the same message.
  await page.setExtraHTTPHeaders(headers);
  await signInByForm(page, email, 'still-wrong');
  await expect(page.getByTestId('sign-in-error')).toContainText('Too many failed sign-in attempts. Try again in');
  await page.screenshot({ path: 'test-results/screenshots/sign-in-throttled.png', fullPage: true });
});

test('ten failures from one address → 429 even for a right password', async ({ request }) => {
  const headers = { 'X-Forwarded-For': '203.0.113.20' };
  for (let i = 0; i < 10; i += 1) {
    const res = await signInByApi(request, `guess-${i}@fernhollow.example`, 'wrong', headers);
    expect(res.status()).toBe(401);
  }
  const refused = await signInByApi(request, ROLE_PEOPLE.setup.email, PASSWORD, headers);
  expect(refused.status()).toBe(429);
  // Another address is not affected.
  const ok = await signInByApi(request, ROLE_PEOPLE.setup.email, PASSWORD, { 'X-Forwarded-For': '203.0.113.21' });
  expect(ok.status()).toBe(200);
});
