// Keyboard users see where they are: each page names the tab and takes focus at its heading,
// the focus ring shows on the dark rail, dialogs hand focus back, archived customers can be
// restored after the Undo toast has gone, and a role change waits for Save.
import { expect, test, type Page } from '@playwright/test';
import { expectAccessible } from './support/a11y';
import { linkFromMail } from './support/mail';
import {
  acceptInvitation,
  emailFor,
  invite,
  password,
  rail,
  runStamp,
  signUpCompany,
} from './support/people';

test.use({ bypassCSP: true });
test.describe.configure({ mode: 'serial' });

const ownerEmail = emailFor('owner-focus');
const officeEmail = emailFor('office-focus');
const companyName = `Wicken Fields ${runStamp}`;

async function signIn(page: Page): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(ownerEmail);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveTitle('Today · Seamwright');
}

/** The computed outline of the element that has focus now. */
function focusOutline(page: Page) {
  return page.evaluate(() => {
    const element = document.activeElement;
    if (!element) return null;
    const style = getComputedStyle(element);
    return { color: style.outlineColor, width: style.outlineWidth, style: style.outlineStyle };
  });
}

test('pages name the tab and take focus at their heading; the rail shows focus in gold', async ({
  page,
}) => {
  await signUpCompany(page, { companyName, name: 'Nell Ashgrove', email: ownerEmail });
  await expect(page).toHaveTitle('Today · Seamwright');

  await rail(page).getByRole('link', { name: 'Customers' }).click();
  await expect(page).toHaveTitle('Customers · Seamwright');
  const heading = page.getByRole('heading', { level: 1, name: 'Customers' });
  await expect(heading).toBeFocused();

  // Back into the rail with the keyboard: the ring is the dark-surface token, not the blue one.
  const railLink = rail(page).getByRole('link', { name: 'Customers' });
  for (
    let step = 0;
    step < 20 && !(await railLink.evaluate((a) => a === document.activeElement));
    step++
  ) {
    await page.keyboard.press('Shift+Tab');
  }
  await expect(railLink).toBeFocused();
  expect(await focusOutline(page)).toEqual({
    color: 'rgb(242, 196, 109)',
    width: '3px',
    style: 'solid',
  });
  await page.screenshot({ path: '../.tmp/screens/rail-focus-desktop.png' });

  await page.keyboard.press('Enter');
  await expect(page).toHaveTitle('Customers · Seamwright');
  await rail(page).getByRole('link', { name: 'Settings' }).press('Enter');
  await expect(page).toHaveTitle('Settings · Seamwright');
  await expect(page.getByRole('heading', { level: 1, name: 'Settings' })).toBeFocused();
  await expectAccessible(page, 'Settings after keyboard navigation');
});

test('an archived customer keeps a Restore after the toast, and Delete hands focus back on cancel', async ({
  page,
}) => {
  await signIn(page);
  await page.goto('/customers/new');
  await page.getByRole('form', { name: 'Save customer' }).getByLabel('Name').fill('Orrin Dell');
  await page.getByRole('button', { name: 'Save customer' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Orrin Dell' })).toBeVisible();
  await expect(page).toHaveTitle('Orrin Dell · Seamwright');

  await page.getByRole('button', { name: 'Archive' }).click();
  const toast = page.getByRole('status').filter({ hasText: 'Orrin Dell archived.' });
  await expect(toast).toBeVisible();
  await toast.hover();
  await page.waitForTimeout(9000); // longer than a toast lives: hovering holds it
  await expect(toast).toBeVisible();
  await page.screenshot({ path: '../.tmp/screens/toast-desktop.png' });
  await toast.getByRole('button', { name: 'Dismiss' }).click();
  await expect(toast).toBeHidden();
  await page.getByRole('button', { name: 'Restore' }).click();
  await expect(page.getByText(/^Archived on /)).toBeHidden();

  const edit = page.getByRole('button', { name: 'Edit', exact: true });
  await edit.click();
  await expect(page.getByRole('heading', { name: 'Edit customer' })).toBeFocused();
  await page.getByRole('button', { name: 'Cancel' }).click();
  await expect(edit).toBeFocused();

  // More sites than one page: the list says how many there are and brings in the rest.
  const customerId = new URL(page.url()).pathname.split('/').pop() ?? '';
  const csrf = (await (await page.request.get('/api/auth/csrf')).json()) as {
    data: { token: string };
  };
  for (let n = 1; n <= 101; n++) {
    const created = await page.request.post(`/api/customers/${customerId}/sites`, {
      data: { addressLine1: `${n} Tern Row`, city: 'Ashvale' },
      headers: { 'x-csrf-token': csrf.data.token },
    });
    expect(created.status()).toBe(201);
  }
  await page.reload();
  await expect(page.getByText('Showing 100 of 101 sites')).toBeVisible();
  await expect(page.getByRole('heading', { level: 3 })).toHaveCount(100);
  await page.getByText('Showing 100 of 101 sites').scrollIntoViewIfNeeded();
  await page.screenshot({ path: '../.tmp/screens/sites-show-more-desktop.png' });
  await page.setViewportSize({ width: 390, height: 844 });
  await page.getByText('Showing 100 of 101 sites').scrollIntoViewIfNeeded();
  await page.screenshot({ path: '../.tmp/screens/sites-show-more-phone.png' });
  await page.setViewportSize({ width: 1280, height: 800 });
  await page.getByRole('button', { name: 'Show 1 more' }).click();
  await expect(page.getByText('All 101 sites shown')).toBeFocused();
  await expect(page.getByRole('heading', { level: 3, name: '101 Tern Row' })).toBeVisible();

  const remove = page.getByRole('button', { name: 'Delete', exact: true });
  await remove.focus();
  await remove.press('Enter');
  const dialog = page.getByRole('dialog', { name: 'Delete Orrin Dell?' });
  await expect(dialog.getByRole('button', { name: 'Keep it' })).toBeFocused();
  await page.keyboard.press('Escape');
  await expect(dialog).toBeHidden();
  await expect(remove).toBeFocused();
});

test('a role change is sent only on Save', async ({ browser, page }) => {
  await signIn(page);
  await page.goto('/settings');
  await invite(page, officeEmail, 'Office');
  const context = await browser.newContext({ bypassCSP: true });
  const invitee = await context.newPage();
  await acceptInvitation(
    invitee,
    await linkFromMail(officeEmail, /\/invitations\/[A-Za-z0-9_-]+/),
    'Bram Oakes',
  );
  await context.close();

  await page.reload();
  const patches: string[] = [];
  page.on('request', (request) => {
    if (request.method() === 'PATCH' && request.url().includes('/api/members/')) {
      patches.push(request.url());
    }
  });
  const role = page.getByLabel('Role of Bram Oakes', { exact: true });
  await expect(role).toHaveValue('office');
  // Arrow keys step through the roles; none of those steps is a change of role yet.
  await role.focus();
  await role.press('ArrowDown');
  await role.press('ArrowDown');
  await role.selectOption({ label: 'Bookkeeper' });
  await page.waitForTimeout(300);
  expect(patches).toEqual([]);
  await expectAccessible(page, 'Team with an unsaved role change');
  await page.screenshot({ path: '../.tmp/screens/role-save-desktop.png', fullPage: true });
  await page.setViewportSize({ width: 390, height: 844 });
  await role.scrollIntoViewIfNeeded();
  await page.screenshot({ path: '../.tmp/screens/role-save-phone.png' });
  await page.setViewportSize({ width: 1280, height: 800 });

  await page.getByRole('button', { name: 'Save role of Bram Oakes' }).click();
  await expect(page.getByText('Bram Oakes is now bookkeeper.')).toBeVisible();
  expect(patches).toHaveLength(1);
  await expect(page.getByRole('button', { name: 'Save role of Bram Oakes' })).toHaveCount(0);
  await expect(role).toHaveValue('bookkeeper');
});
