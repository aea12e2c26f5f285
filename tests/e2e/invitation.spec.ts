/** Admin invites → e-mail in the fake mailbox → link → set password → signed in with the invited roles. */
import { expect, test } from '@playwright/test';
import { firstLink, waitForMail } from './support/mailbox';
import { storageStateFor } from './support/roles';

test('an invited person sets a password and arrives with the invited roles', async ({ browser }) => {
  const email = `nia.brook.${Date.now()}@fernhollow.example`;
  const admin = await browser.newContext({ storageState: storageStateFor('admin') });
  const adminPage = await admin.newPage();
  await adminPage.goto('/admin/people');
  const form = adminPage.getByRole('form', { name: 'Invite a person' });
  await form.getByLabel('Name').fill('Nia Brook');
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('Engineer').check();
  await form.getByLabel('Setup technician').check();
  await form.getByRole('button', { name: 'Send invitation' }).click();
  await expect(adminPage.getByText(`Invitation sent to ${email}`)).toBeVisible();
  await expect(adminPage.getByTestId('invitation-row').filter({ hasText: email })).toBeVisible();
  await adminPage.screenshot({ path: 'test-results/screenshots/admin-people.png', fullPage: true });

  const mail = await waitForMail(email, 'You are invited');
  expect(mail.text).toContain('Engineer, Setup technician');
  const link = firstLink(mail);
  expect(link).toMatch(/\/invitation\/[A-Za-z0-9_-]{43}$/);

  const guest = await browser.newContext();
  const page = await guest.newPage();
  await page.goto(link);
  await expect(page.getByRole('heading', { name: /Join Fernhollow/ })).toBeVisible();
  await page.getByLabel('New password').fill('short');
  await page.getByLabel('Repeat the password').fill('short');
  await page.getByRole('button', { name: 'Set password and sign in' }).click();
  await expect(page.getByText('Use at least 10 characters')).toBeVisible();
  await page.getByLabel('New password').fill('nia-chooses-this-one');
  await page.getByLabel('Repeat the password').fill('nia-chooses-this-one');
  await page.screenshot({ path: 'test-results/screenshots/invitation.png', fullPage: true });
  await page.getByRole('button', { name: 'Set password and sign in' }).click();

  await expect(page.getByTestId('user-name')).toHaveText('Nia Brook');
  await expect(page.getByTestId('user-roles')).toHaveText('Engineer, Setup technician');
  await expect(page.getByRole('navigation', { name: 'Sections' }).getByRole('link'))
    .toHaveText(['Parts', 'Machines', 'Probes', 'Programs', 'Runs', 'Reviews']);

  // The link works once.
  const again = await (await browser.newContext()).newPage();
  await again.goto(link);
  await expect(again.getByText('This invitation link has already been used.')).toBeVisible();

  // The admin sees the new person and the audit trail.
  await adminPage.goto('/admin/people');
  await expect(adminPage.getByTestId('person-row').filter({ hasText: email })).toContainText('Engineer, Setup technician');
  await adminPage.goto(`/admin/audit?text=${encodeURIComponent(email)}`);
  await expect(adminPage.getByTestId('audit-row').filter({ hasText: 'invitation-accepted' })).toHaveCount(1);
  await expect(adminPage.getByTestId('audit-row').filter({ hasText: 'invitation-sent' })).toHaveCount(1);
  await admin.close();
  await guest.close();
});

test('a made-up invitation link says it is not valid', async ({ page }) => {
  await page.goto('/invitation/this-token-does-not-exist-anywhere-at-all');
  await expect(page.getByText('This invitation link is not valid.')).toBeVisible();
});
