// The owner sets up payment reminders: reads the schedule back in words, sees the preview
// follow the template, is stopped by an unknown placeholder beside the field, and saves.
import { expect, test } from '@playwright/test';
import { expectAccessible } from './support/a11y';
import { emailFor, runStamp, signUpCompany } from './support/people';
import { baseUrl } from './support/servers';

test('an owner edits the reminder schedule and wording, with a preview', async ({ browser }) => {
  const context = await browser.newContext({
    baseURL: baseUrl,
    bypassCSP: true,
    viewport: { width: 1280, height: 800 },
  });
  const page = await context.newPage();
  await signUpCompany(page, {
    companyName: `Duewell Turf ${runStamp}`,
    name: 'Nell Duewell',
    email: emailFor('owner-reminders'),
  });
  await page.goto('/settings#reminders');
  const panel = page.getByRole('region', { name: 'Payment reminders' });
  const schedule = panel.getByRole('list', { name: 'Schedule' });
  await expect(schedule.getByText('3 days before due')).toBeVisible();
  await expect(schedule.getByText('30 days overdue')).toBeVisible();

  await panel.getByLabel('When to send (days from the due date)').fill('-5, 0, 10');
  await expect(schedule.getByText('5 days before due')).toBeVisible();
  await expect(schedule.getByText('10 days overdue')).toBeVisible();

  const overdue = panel.getByRole('group', { name: 'Overdue' });
  await overdue.getByLabel('Subject').fill('Still open: {invoiceNumber} for {custmerName}');
  await expect(overdue.getByText('Use only the placeholders listed below')).toBeVisible();
  await overdue.getByLabel('Subject').fill('Still open: {invoiceNumber} for {customerName}');
  await expect(
    panel
      .getByRole('region', { name: 'Preview: Overdue' })
      .getByText('Still open: INV-000042 for Robin Fairweather'),
  ).toBeVisible();
  await panel.getByRole('button', { name: 'Save reminder settings' }).click();
  await expect(panel.getByText('Reminder settings saved.')).toBeVisible();
  await expectAccessible(page, 'Settings with payment reminders (owner)');
  await panel.scrollIntoViewIfNeeded();
  await page.screenshot({ path: '../.tmp/screens/reminder-settings-desktop.png' });

  await page.setViewportSize({ width: 390, height: 844 });
  await page.reload();
  await page.goto('/settings#reminders');
  await expect(
    page.getByRole('region', { name: 'Payment reminders' }).getByText('10 days overdue'),
  ).toBeVisible();
  await page.screenshot({ path: '../.tmp/screens/reminder-settings-phone.png' });
  await context.close();
});
