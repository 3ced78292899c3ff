// The office receives a delivery of two rolls in one dye lot, finds them in the stock list with
// lengths in feet and inches, and corrects where one of them is kept; the list is checked at
// phone size too.
import { expect, test } from '@playwright/test';
import { expectAccessible } from './support/a11y';
import { linkFromMail } from './support/mail';
import { baseUrl } from './support/servers';
import {
  acceptInvitation,
  emailFor,
  invite,
  rail,
  runStamp,
  signUpCompany,
} from './support/people';

test.use({ bypassCSP: true });

const shots = '../.tmp';

test('office receives two rolls of one lot, sees them listed and moves one', async ({
  page,
  browser,
}) => {
  const officeEmail = emailFor('office-stock');
  await signUpCompany(page, {
    companyName: `Thistlecombe Turf ${runStamp}`,
    name: 'Maren Oakhurst',
    email: emailFor('owner-stock'),
  });
  await page.goto('/settings');
  await invite(page, officeEmail, 'Office');

  const context = await browser.newContext({
    baseURL: baseUrl,
    bypassCSP: true,
    viewport: { width: 1280, height: 800 },
  });
  const office = await context.newPage();
  await acceptInvitation(
    office,
    await linkFromMail(officeEmail, /\/invitations\/[A-Za-z0-9_-]+/),
    'Tobin Vale',
  );

  await rail(office).getByRole('link', { name: 'Stock' }).click();
  await expect(office.getByRole('heading', { level: 1, name: 'Stock' })).toBeVisible();
  await expect(office.getByRole('heading', { name: 'No turf in stock yet' })).toBeVisible();
  await office.screenshot({ path: `${shots}/stock-empty-desktop.png`, fullPage: true });
  await office.getByRole('link', { name: 'Receive a delivery' }).first().click();

  const form = office.getByRole('form', { name: 'Receive a delivery' });
  await form.getByLabel('Turf product').selectOption({ label: 'Landscape turf 1¾ in (starter)' });
  await form.getByLabel('Dye lot').fill('LT-2291');
  await form.getByLabel('Location (optional)').fill('Yard rack A');
  await form.getByLabel('Roll 1 width').selectOption({ label: `15' 0"` });
  await form.getByLabel('Roll 1 length').fill('100');
  await form.getByRole('button', { name: 'Add a roll' }).click();
  await form.getByLabel('Roll 2 width').selectOption({ label: `12' 0"` });
  await form.getByLabel('Roll 2 length').fill(`82' 6"`);
  await expect(form.getByRole('complementary', { name: /Caution: Heavy rolls/ })).toBeVisible();
  await expectAccessible(office, 'Receive a delivery');
  await office.screenshot({ path: `${shots}/stock-receive-desktop.png`, fullPage: true });
  await office.setViewportSize({ width: 390, height: 844 });
  await office.screenshot({ path: `${shots}/stock-receive-phone.png`, fullPage: true });
  await office.setViewportSize({ width: 1280, height: 800 });
  await form.getByRole('button', { name: 'Save delivery' }).click();

  await expect(office.getByRole('heading', { level: 1, name: 'Stock' })).toBeVisible();
  await expect(office.getByText('Received 2 rolls.')).toBeVisible();
  const rows = office.getByRole('table', { name: 'Rolls and remnants' }).getByRole('row');
  await expect(rows).toHaveCount(3); // the header and the two rolls
  const long = rows.filter({ hasText: `100' 0"` });
  const short = rows.filter({ hasText: `82' 6"` });
  await expect(long).toContainText('LT-2291');
  await expect(long).toContainText(`15' 0"`);
  await expect(short).toContainText(`12' 0"`);
  await expect(short).toContainText('Yard rack A');
  await expect(office.getByRole('complementary', { name: /Caution: Heavy rolls/ })).toContainText(
    'team lifts',
  );
  await expectAccessible(office, 'Stock list');
  await office.screenshot({ path: `${shots}/stock-list-desktop.png`, fullPage: true });

  // The shorter roll goes to the other rack.
  await short.getByRole('link', { name: /Landscape turf/ }).click();
  await expect(office.getByRole('heading', { level: 1, name: /lot LT-2291/ })).toBeVisible();
  const edit = office.getByRole('form', { name: 'Edit the roll' });
  await expect(edit.getByLabel('Length left')).toHaveValue(`82' 6"`);
  await edit.getByLabel('Location (optional)').fill('Yard rack C');
  await edit.getByRole('button', { name: 'Save roll' }).click();
  await expect(office.getByText('Roll saved.')).toBeVisible();
  await expect(office.getByText('Yard rack C', { exact: true })).toBeVisible();
  await office.screenshot({ path: `${shots}/stock-roll-desktop.png`, fullPage: true });
  await office.setViewportSize({ width: 390, height: 844 });
  await office.screenshot({ path: `${shots}/stock-roll-phone.png`, fullPage: true });
  await office.setViewportSize({ width: 1280, height: 800 });
  await office.getByRole('link', { name: '← Stock' }).click();
  await expect(rows.filter({ hasText: `82' 6"` })).toContainText('Yard rack C');
  await expect(rows.filter({ hasText: `100' 0"` })).toContainText('Yard rack A');

  // On a phone the list keeps product, width and lengths; lot and place ride under the name.
  await office.setViewportSize({ width: 390, height: 844 });
  await expect(rows.filter({ hasText: `82' 6"` })).toContainText('Lot LT-2291');
  await expect(office.getByText('Lot LT-2291 · Roll · Yard rack C')).toBeVisible();
  const overflow = await office.evaluate(
    () => document.documentElement.scrollWidth - document.documentElement.clientWidth,
  );
  expect(overflow, 'the page does not scroll sideways on a phone').toBeLessThanOrEqual(0);
  const table = office.getByRole('table', { name: 'Rolls and remnants' });
  const box = await table.boundingBox();
  expect(box?.width ?? 999, 'the table fits the phone').toBeLessThanOrEqual(390);
  await expectAccessible(office, 'Stock list (phone)');
  await office.screenshot({ path: `${shots}/stock-list-phone.png`, fullPage: true });
  await context.close();
});
