// The first journey of a new company: the owner signs up and invites an office user and a crew
// lead by e-mail; the office user creates a customer and a site; the crew lead cannot reach
// customers; a second company sees none of the first company's customers.
import { expect, test, type Browser, type BrowserContext, type Page } from '@playwright/test';
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
import { baseUrl } from './support/servers';

test.describe.configure({ mode: 'serial' });

const firstCompany = {
  companyName: `Fernhollow Turf ${runStamp}`,
  name: 'Wren Halloway',
  email: emailFor('owner-a'),
};
const officeEmail = emailFor('office-a');
const crewEmail = emailFor('crew-a');
const customerName = `Marlow Pettigrew ${runStamp}`;
let customerPath = '';
let secondOwnerPage: Page | undefined;
const secondCompanyName = `Larchmere Lawns ${runStamp}`;

const contexts: BrowserContext[] = [];
async function newPage(browser: Browser, viewport = { width: 1280, height: 800 }): Promise<Page> {
  // The app's CSP forbids inline scripts; axe is injected as one.
  const context = await browser.newContext({ baseURL: baseUrl, bypassCSP: true, viewport });
  contexts.push(context);
  return context.newPage();
}

test.afterAll(async () => {
  await Promise.all(contexts.map((c) => c.close()));
});

test('an owner signs up a company and invites an office user and a crew lead', async ({
  browser,
}) => {
  const page = await newPage(browser);
  await signUpCompany(page, firstCompany);
  await expect(page.getByText(firstCompany.companyName).first()).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Next steps' })).toBeVisible();
  await expectAccessible(page, 'Today (owner)');

  await rail(page).getByRole('link', { name: 'Settings' }).click();
  await expect(page.getByRole('heading', { name: 'Team' })).toBeVisible();
  await expectAccessible(page, 'Settings (owner)');

  await invite(page, officeEmail, 'Office');
  await invite(page, crewEmail, 'Crew lead');
  const waiting = page.getByRole('region', { name: 'Invitations waiting' });
  await expect(waiting.getByText(officeEmail)).toBeVisible();
  await expect(waiting.getByText(crewEmail)).toBeVisible();
});

test('the office user follows the e-mailed link, sets a password and adds a customer with a site', async ({
  browser,
}) => {
  const page = await newPage(browser);
  const invitationPath = await linkFromMail(officeEmail, /\/invitations\/[A-Za-z0-9_-]+/);
  await page.goto(invitationPath);
  await expect(
    page.getByRole('heading', { name: `Join ${firstCompany.companyName}` }),
  ).toBeVisible();
  await expect(page.getByText(officeEmail)).toBeVisible();
  await expect(page.getByText('Office', { exact: true })).toBeVisible();
  await expectAccessible(page, 'invitation');
  await acceptInvitation(page, invitationPath, 'Ivo Castellane');

  await rail(page).getByRole('link', { name: 'Customers' }).click();
  await expect(page.getByRole('heading', { name: 'No customers yet' })).toBeVisible();
  await expectAccessible(page, 'Customers (empty)');

  await page.getByRole('link', { name: 'New customer' }).click();
  const form = page.getByRole('form', { name: 'Save customer' });
  await form.getByLabel('E-mail').fill('marlow@');
  await expect(form.getByText('Enter a valid e-mail address')).toBeVisible(); // checked as you type
  await expectAccessible(page, 'New customer with an error showing');
  await form.getByLabel('E-mail').fill('marlow.p@example.test');
  await expect(form.getByText('Enter a valid e-mail address')).toBeHidden();
  await form.getByLabel('Name').fill(customerName);
  await form.getByLabel('Phone').fill('555 014 2288');
  await form.getByRole('button', { name: 'Save customer' }).click();

  await expect(page.getByRole('heading', { level: 1, name: customerName })).toBeVisible();
  customerPath = new URL(page.url()).pathname;
  expect(customerPath).toMatch(/^\/customers\/[0-9a-f-]{36}$/);

  await page.getByRole('button', { name: 'Add a site' }).click();
  const siteForm = page.getByRole('form', { name: 'Save site' });
  await siteForm.getByLabel('Street address').fill('14 Quarry Bend Road');
  await siteForm.getByLabel('Town or city').fill('Ashvale');
  await siteForm.getByLabel('Access and gate notes').fill('Side gate is 42 in wide; code 1212.');
  await siteForm.getByLabel('Sprinkler heads to cap (heads)').fill('6');
  await siteForm.getByRole('button', { name: 'Save site' }).click();
  await expect(page.getByRole('heading', { level: 3, name: '14 Quarry Bend Road' })).toBeVisible();
  await expect(page.getByText('6 heads')).toBeVisible();
  await expectAccessible(page, 'Customer page');

  // The list finds the customer, and the search survives a reload because it lives in the URL.
  await page.goto('/customers');
  await page.getByLabel('Search customers').fill('Pettigrew');
  await expect(page).toHaveURL(/q=Pettigrew/);
  await page.reload();
  await expect(page.getByLabel('Search customers')).toHaveValue('Pettigrew');
  const row = page.getByRole('row', { name: new RegExp(customerName) });
  await expect(row).toBeVisible();
  await expect(row.getByRole('cell').nth(3)).toHaveText('1');
  await expectAccessible(page, 'Customers (one customer)');
});

test('the crew lead cannot open customers or their billing details', async ({ browser }) => {
  const page = await newPage(browser);
  const invitationPath = await linkFromMail(crewEmail, /\/invitations\/[A-Za-z0-9_-]+/);
  await acceptInvitation(page, invitationPath, 'Tamsin Orlov');

  await expect(
    page.getByRole('heading', { name: 'No jobs assigned to your crew yet' }),
  ).toBeVisible();
  await expect(page.getByRole('complementary', { name: /^Caution:/ })).toContainText('local codes');
  await expect(rail(page).getByRole('link', { name: 'Customers' })).toHaveCount(0);
  await expectAccessible(page, 'Today (crew lead)');

  await page.goto('/customers');
  await expect(
    page.getByRole('heading', { name: 'Customers is not available for your role' }),
  ).toBeVisible();
  await expectAccessible(page, 'Customers (crew lead, refused)');
  await page.goto(customerPath);
  await expect(
    page.getByRole('heading', { name: 'Customers is not available for your role' }),
  ).toBeVisible();
  await expect(page.getByText('marlow.p@example.test')).toHaveCount(0);

  // The server refuses as well; the client only hides.
  const list = await page.request.get('/api/customers');
  expect(list.status()).toBe(403);
  const detail = await page.request.get(`/api${customerPath}`);
  expect(detail.status()).toBe(403);

  await page.goto('/settings');
  await expect(page.getByText('Crew lead at')).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Team' })).toHaveCount(0);
  await expectAccessible(page, 'Settings (crew lead)');
});

test('on a phone the crew lead gets one column and a bottom bar with Today, Layout, Stock and Profile', async ({
  browser,
}) => {
  const page = await newPage(browser, { width: 390, height: 844 });
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(crewEmail);
  await page.getByLabel('Password').fill('long-enough-pass-2026');
  await page.getByRole('button', { name: 'Sign in' }).click();
  const bottomBar = page.getByRole('navigation', { name: 'Sections' }).last();
  await expect(bottomBar.getByRole('link')).toHaveText(['Today', 'Layout', 'Stock', 'Profile']);
  await expectAccessible(page, 'Today (crew lead, phone)');
  await page.screenshot({ path: '../.tmp/screens/crew-today-phone.png' });

  await bottomBar.getByRole('link', { name: 'Layout' }).click();
  await expect(page).toHaveTitle('Layout · Seamwright');
  await expect(page.getByRole('heading', { level: 1, name: 'Layout' })).toBeFocused();
  // Stock is read-only for a crew lead: no way to receive turf, and the empty list says who does.
  await bottomBar.getByRole('link', { name: 'Stock' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Stock' })).toBeFocused();
  await expect(
    page.getByText('The office records turf here when a delivery arrives'),
  ).toBeVisible();
  await expect(page.getByRole('link', { name: 'Receive a delivery' })).toHaveCount(0);
  await bottomBar.getByRole('link', { name: 'Profile' }).click();
  await expect(page.getByText('Crew lead at')).toBeVisible();
  await expect(bottomBar.getByRole('link', { name: 'Profile' })).toHaveAttribute(
    'aria-current',
    'page',
  );
  await expectAccessible(page, 'Profile (crew lead, phone)');
  await page.screenshot({ path: '../.tmp/screens/crew-profile-phone.png', fullPage: true });
});

test('a second company sees none of the first company’s customers', async ({ browser }) => {
  const page = await newPage(browser);
  secondOwnerPage = page;
  await signUpCompany(page, {
    companyName: secondCompanyName,
    name: 'Oona Fairweather',
    email: emailFor('owner-b'),
  });

  await page.goto(`/customers?q=${encodeURIComponent('Pettigrew')}&status=all`);
  await expect(page.getByRole('heading', { name: 'No customers match' })).toBeVisible();
  await page.goto('/customers');
  await expect(page.getByRole('heading', { name: 'No customers yet' })).toBeVisible();

  await page.goto(customerPath);
  await expect(page.getByRole('heading', { name: 'Not found' })).toBeVisible();
  await expect(page.getByText(customerName)).toHaveCount(0);
  const detail = await page.request.get(`/api${customerPath}`);
  expect(detail.status()).toBe(404);
  await expectAccessible(page, 'Customer page (other company, not found)');
});

test('someone in two companies switches between them and sees only the active one’s customers', async ({
  browser,
}) => {
  const owner = secondOwnerPage;
  if (!owner) throw new Error('the second company was not set up');
  await owner.goto('/settings');
  await invite(owner, officeEmail, 'Bookkeeper');

  // The office user already has an account: the invitation asks only for the password.
  const page = await newPage(browser);
  const invitationPath = await linkFromMail(officeEmail, /\/invitations\/[A-Za-z0-9_-]+/);
  await page.goto(invitationPath);
  await expect(page.getByText('You already have a Seamwright account')).toBeVisible();
  await expect(page.getByLabel('Your name')).toHaveCount(0);
  await page.getByLabel('Your password').fill(password);
  await page.getByRole('button', { name: `Join ${secondCompanyName}` }).click();

  const sidebar = page.getByRole('complementary').first();
  await expect(sidebar.getByText(secondCompanyName)).toBeVisible();
  await rail(page).getByRole('link', { name: 'Customers' }).click();
  await expect(page.getByRole('heading', { name: 'No customers yet' })).toBeVisible();

  await sidebar.getByText('Switch company').click();
  await sidebar.getByRole('button', { name: new RegExp(firstCompany.companyName) }).click();
  // A finished switch lands on Today; clicking on before that races the switch's own navigation.
  await expect(page).toHaveURL((url) => url.pathname === '/');
  // The rail names the new company and role, and the switch list has closed.
  await expect(sidebar.getByText('Office', { exact: true })).toBeVisible();
  await expect(
    sidebar.getByRole('button', { name: new RegExp(firstCompany.companyName) }),
  ).toHaveCount(0);
  await expect(sidebar.getByText(firstCompany.companyName)).toBeVisible();
  await rail(page).getByRole('link', { name: 'Customers' }).click();
  await expect(page.getByRole('link', { name: customerName })).toBeVisible();

  await sidebar.getByText('Switch company').click();
  await sidebar.getByRole('button', { name: new RegExp(secondCompanyName) }).click();
  // Wait for the switch to land (it ends on Today) before moving on, or the two navigations race.
  await expect(sidebar.getByText('Bookkeeper', { exact: true })).toBeVisible();
  await expect(page).toHaveTitle('Today · Seamwright');
  await expect(page).toHaveURL((url) => url.pathname === '/');
  await rail(page).getByRole('link', { name: 'Customers' }).click();
  await expect(page.getByRole('heading', { name: 'No customers yet' })).toBeVisible();
  await expect(page.getByRole('link', { name: customerName })).toHaveCount(0);
});
