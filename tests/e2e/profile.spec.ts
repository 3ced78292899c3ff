// Changing your own name and password while signed in, then signing in with the new password;
// and the owner setting the company's address and metric measurements.
import { expect, test } from '@playwright/test';
import { expectAccessible } from './support/a11y';
import { emailFor, password, runStamp, signUpCompany } from './support/people';

test.use({ bypassCSP: true });

const newPassword = 'a-new-profile-password-7';

test('a signed-in person changes their name and password, then signs in with the new password', async ({
  page,
}) => {
  const email = emailFor('owner-profile');
  await signUpCompany(page, {
    companyName: `Tamsin Lawns ${runStamp}`,
    name: 'Corin Ashdale',
    email,
  });

  const rail = page.getByRole('complementary');
  await rail.getByText('Corin Ashdale').click();
  await rail.getByRole('link', { name: 'Your profile' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Your profile' })).toBeVisible();

  const nameForm = page.getByRole('form', { name: 'Your name' });
  await nameForm.getByLabel('Your name').fill('');
  await expect(nameForm.getByText('Your name is required')).toBeVisible();
  await nameForm.getByLabel('Your name').fill('Corin Ashdale-Reyes');
  await nameForm.getByRole('button', { name: 'Save name' }).click();
  await expect(nameForm.getByRole('status')).toHaveText('Your name is saved.');
  await expect(rail.getByText('Corin Ashdale-Reyes')).toBeVisible();

  const passwordForm = page.getByRole('form', { name: 'Change your password' });
  await passwordForm.getByLabel('Current password').fill('not-the-password');
  await passwordForm.getByLabel('New password').fill(newPassword);
  await passwordForm.getByRole('button', { name: 'Change password' }).click();
  await expect(passwordForm.getByText('That is not your current password')).toBeVisible();
  await expect(passwordForm.getByLabel('Current password')).toHaveAttribute('aria-invalid', 'true');

  await passwordForm.getByLabel('Current password').fill(password);
  await passwordForm.getByRole('button', { name: 'Change password' }).click();
  await expect(passwordForm.getByRole('status')).toContainText('Password changed');
  await expectAccessible(page, 'Your profile');

  await rail.getByText('Corin Ashdale-Reyes').click();
  await rail.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in$/);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('alert')).toContainText('E-mail or password is wrong');
  await page.getByLabel('Password').fill(newPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('heading', { level: 1 })).toContainText('Corin');
});

test('the owner saves the company address and metric, and the layout tool then works in metres', async ({
  page,
}) => {
  await signUpCompany(page, {
    companyName: `Wrenfold Turf ${runStamp}`,
    name: 'Ilse Marrow',
    email: emailFor('owner-metric'),
  });
  await page.goto('/settings');
  const form = page.getByRole('form', { name: 'Company details' });
  await form.getByLabel('Address').fill('22 Kiln Street\nHollowmere, CO 80301');
  await form.getByLabel('Measurements').selectOption('metric');
  await form.getByRole('button', { name: 'Save company details' }).click();
  await expect(form.getByRole('status')).toHaveText('Company details saved.');
  await page.reload();
  await expect(
    page.getByRole('form', { name: 'Company details' }).getByLabel('Address'),
  ).toHaveValue('22 Kiln Street\nHollowmere, CO 80301');

  await page.goto('/layout');
  await page.getByLabel('Length (north–south)').fill('10');
  await page.getByLabel('Width (east–west)').fill('6');
  // 10 m × 6 m = 60 m² (arithmetic).
  const figures = page.getByRole('group', { name: 'Plan figures' });
  await expect(figures.getByText('60 m²', { exact: true })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Cut sheet' })).toContainText(' m');
  await expectAccessible(page, 'Layout in metric');
});
