// Signing out, forgetting the password, choosing a new one from the e-mailed link, and
// coming back to the page the person was sent away from.
import { expect, test } from '@playwright/test';
import { expectAccessible } from './support/a11y';
import { linkFromMail } from './support/mail';
import { emailFor, runStamp, signUpCompany } from './support/people';

test.use({ bypassCSP: true });

test('a forgotten password is replaced through the e-mailed link, then sign-in returns to where you were', async ({
  page,
}) => {
  const email = emailFor('owner-reset');
  await signUpCompany(page, {
    companyName: `Osier Fields ${runStamp}`,
    name: 'Bram Tolliver',
    email,
  });

  await page.getByRole('complementary').getByText('Bram Tolliver').click();
  await page.getByRole('complementary').getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in$/);

  await page.getByRole('link', { name: 'Forgot your password?' }).click();
  // The sign-in page has an E-mail field too and stays on screen while the next route loads.
  await expect(page.getByRole('heading', { name: 'Forgot your password?' })).toBeVisible();
  await page.getByLabel('E-mail').fill(email);
  await page.getByRole('button', { name: 'Send me a reset link' }).click();
  await expect(page.getByRole('status')).toContainText(email);

  const resetPath = await linkFromMail(email, /\/reset-password\/[A-Za-z0-9_-]+/);
  await page.goto(resetPath);
  await page.getByLabel('New password').fill('short');
  await expect(page.getByText('Use at least 10 characters')).toBeVisible();
  await page.getByLabel('New password').fill('a-fresh-long-password');
  await page.getByRole('button', { name: 'Save new password' }).click();
  await expect(page.getByRole('status')).toContainText('Your password is changed');
  await expectAccessible(page, 'Reset password done');

  await page.goto('/customers?status=all');
  await expect(page).toHaveURL(/\/sign-in\?next=/);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('a-fresh-long-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL(/\/customers\?status=all$/);
  await expect(page.getByLabel('Show')).toHaveValue('all');
});
