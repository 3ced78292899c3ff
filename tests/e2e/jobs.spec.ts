// The office starts a job for a customer's site, moves it from lead to estimated with the only
// buttons the lifecycle offers, and finds it in the jobs list filtered by status.
import { expect, test, type Page } from '@playwright/test';
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

async function csrfHeaders(page: Page): Promise<Record<string, string>> {
  const csrf = await page.request.get('/api/auth/csrf');
  const { data } = (await csrf.json()) as { data: { token: string } };
  return { 'x-csrf-token': data.token };
}

test('office creates a job for a customer’s site, marks it estimated and finds it by status', async ({
  page,
  browser,
}) => {
  const officeEmail = emailFor('office-jobs');
  await signUpCompany(page, {
    companyName: `Sedgefield Turf ${runStamp}`,
    name: 'Corin Ashdown',
    email: emailFor('owner-jobs'),
  });
  // The owner adds the customer and site through the API with the page's session.
  const headers = await csrfHeaders(page);
  const customer = await page.request.post('/api/customers', {
    data: { name: 'Wilhelmina Brough' },
    headers,
  });
  const customerId = ((await customer.json()) as { data: { id: string } }).data.id;
  const site = await page.request.post(`/api/customers/${customerId}/sites`, {
    data: { label: 'Back garden', addressLine1: '3 Tansy Walk', city: 'Quillmere' },
    headers,
  });
  expect(site.status()).toBe(201);
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
    'Pell Marrow',
  );
  await expect(
    office.getByRole('heading', { name: 'Leads and estimates to follow up' }),
  ).toBeVisible();

  await rail(office).getByRole('link', { name: 'Customers' }).click();
  await office.getByRole('link', { name: 'Wilhelmina Brough' }).click();
  await office.getByRole('link', { name: 'New job' }).click();
  await expect(office.getByRole('heading', { level: 1, name: 'New job' })).toBeVisible();
  const form = office.getByRole('form', { name: 'New job' });
  // Her only site is chosen already.
  await expect(form.getByLabel('Site')).toHaveValue(/[0-9a-f-]{36}/);
  await expectAccessible(office, 'New job');
  await form.getByRole('button', { name: 'Save job' }).click();
  await expect(form.getByText('Title is required')).toBeVisible();
  await form.getByLabel('Title').fill('Back garden lawn and path');
  await form.getByRole('button', { name: 'Save job' }).click();

  await expect(
    office.getByRole('heading', { level: 1, name: 'Back garden lawn and path' }),
  ).toBeVisible();
  const moves = office.getByRole('group', { name: 'Move the job to' });
  await expect(moves.getByRole('button')).toHaveText([
    'Mark estimated',
    'Mark lost',
    'Cancel the job',
  ]);
  await expect(office.getByRole('link', { name: 'Wilhelmina Brough' })).toBeVisible();
  await expect(office.getByText('Back garden: 3 Tansy Walk, Quillmere')).toBeVisible();
  await expectAccessible(office, 'Job page (lead)');

  await moves.getByRole('button', { name: 'Mark estimated' }).click();
  await expect(moves.getByRole('button')).toHaveText([
    'Mark accepted',
    'Mark lost',
    'Cancel the job',
  ]);
  await expect(office.getByText('Moved from lead to estimated')).toBeVisible();
  const jobUrl = office.url();
  await office.screenshot({ path: '../.tmp/screens/job-page-desktop.png', fullPage: true });

  await rail(office).getByRole('link', { name: 'Jobs' }).click();
  // The boxes follow the URL, which changes just after the click: click, then wait for it.
  const box = (name: string) => office.getByRole('checkbox', { name });
  await box('Estimated').click();
  await expect(office).toHaveURL(/status=estimated/);
  await expect(box('Estimated')).toBeChecked();
  const rows = office.getByRole('table').getByRole('row');
  await expect(rows.filter({ hasText: 'Back garden lawn and path' })).toHaveCount(1);
  await box('Estimated').click();
  await expect(box('Estimated')).not.toBeChecked();
  await box('Lead').click();
  await expect(office).toHaveURL(/status=lead/);
  await expect(office.getByRole('heading', { name: 'No jobs match' })).toBeVisible();
  await office.reload();
  await expect(box('Lead')).toBeChecked();
  await box('Lead').click();
  await expect(box('Lead')).not.toBeChecked();
  await box('Estimated').click();
  await expect(office).toHaveURL(/status=estimated/);
  await expect(rows.filter({ hasText: 'Back garden lawn and path' })).toHaveCount(1);
  await expectAccessible(office, 'Jobs list (filtered)');
  await office.screenshot({ path: '../.tmp/screens/jobs-list-desktop.png', fullPage: true });
  await office.setViewportSize({ width: 390, height: 844 });
  await office.screenshot({ path: '../.tmp/screens/jobs-list-phone.png', fullPage: true });
  await office.goto(jobUrl);
  await expect(office.getByRole('heading', { level: 2, name: 'Activity' })).toBeVisible();
  await office.screenshot({ path: '../.tmp/screens/job-page-phone.png', fullPage: true });
  await expectAccessible(office, 'Job page (phone)');
  await context.close();
});
