// The signed-out pages: they render, say what to do, and pass the accessibility check.
import { expect, test } from '@playwright/test';
import { expectAccessible } from './support/a11y';

test.use({ bypassCSP: true }); // axe is injected as an inline script

test('sign-in is reachable and accessible, and asks for a return path when sent there', async ({
  page,
}) => {
  await page.goto('/customers?q=lawn');
  await expect(page).toHaveURL(/\/sign-in\?next=%2Fcustomers%3Fq%3Dlawn/);
  await expect(page.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  await expectAccessible(page, 'Sign in');
});

test('wrong credentials show a message and keep the e-mail typed', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill('nobody@e2e.seamwright.test');
  await page.getByLabel('Password').fill('not-the-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('alert').first()).toBeVisible();
  await expect(page.getByLabel('E-mail')).toHaveValue('nobody@e2e.seamwright.test');
  await expectAccessible(page, 'Sign in with an error');
});

test('sign-up validates as you type', async ({ page }) => {
  await page.goto('/sign-up');
  await page.getByLabel('Password').fill('short');
  await expect(page.getByText('Use at least 10 characters')).toBeVisible();
  await expectAccessible(page, 'Sign up');
});

test('forgot password confirms without saying whether the account exists', async ({ page }) => {
  await page.goto('/forgot-password');
  await expectAccessible(page, 'Forgot password');
  await page.getByLabel('E-mail').fill('someone@e2e.seamwright.test');
  await page.getByRole('button', { name: 'Send me a reset link' }).click();
  await expect(page.getByRole('status')).toContainText(
    'If someone@e2e.seamwright.test has a Seamwright account',
  );
});

test('a reset link that does not work says so', async ({ page }) => {
  await page.goto('/reset-password/not-a-real-token');
  await expectAccessible(page, 'Reset password');
  await page.getByLabel('New password').fill('a-brand-new-password');
  await page.getByRole('button', { name: 'Save new password' }).click();
  await expect(page.getByRole('alert').first()).toBeVisible();
});

test('an invitation link that does not work says so', async ({ page }) => {
  await page.goto('/invitations/not-a-real-token');
  await expect(
    page.getByRole('heading', { name: 'This invitation link no longer works' }),
  ).toBeVisible();
  await expectAccessible(page, 'Invitation (dead link)');
});
