import { expect, type APIRequestContext, type Page } from '@playwright/test';

/** Signs in through next-auth's endpoints (fast path used for stored states). */
export async function signInByApi(request: APIRequestContext, email: string, password: string, headers: Record<string, string> = {}) {
  const csrf = await request.get('/api/auth/csrf');
  expect(csrf.ok()).toBeTruthy();
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  return request.post('/api/auth/callback/credentials', {
    form: { email, password, csrfToken, callbackUrl: '/', json: 'true' },
    headers,
  });
}

/** Signs in through the page, as a person would. */
export async function signInByForm(page: Page, email: string, password: string) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}
