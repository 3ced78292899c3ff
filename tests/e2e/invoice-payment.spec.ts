// Paying a deposit online: the company e-mails a deposit invoice; the homeowner opens the link
// from the e-mail on a phone, is declined with one test card (told so in words, nothing
// recorded), pays with the card that succeeds on the processor fake's page, comes back and sees
// the invoice paid once the processor's webhook has landed; the office sees it paid too.
import { expect, test, type Page } from '@playwright/test';
import { expectAccessible } from './support/a11y';
import { call, rectangleArea } from './support/api-call';
import { linkFromMail } from './support/mail';
import { emailFor, runStamp, signUpCompany } from './support/people';
import { baseUrl } from './support/servers';

test.use({ bypassCSP: true });

const phone = { width: 390, height: 844 };

/** A job with a 30 × 20 ft lawn and an estimate signed at the office (no cancellation period). */
async function acceptedJob(page: Page, customerEmail: string): Promise<{ jobId: string }> {
  const customer = await call<{ id: string }>(page, 'POST', '/api/customers', {
    name: 'Odile Pennyroyal',
    email: customerEmail,
  });
  const site = await call<{ id: string }>(page, 'POST', `/api/customers/${customer.id}/sites`, {
    label: 'Home',
    addressLine1: '22 Hawthorn Rise',
    city: 'Hollin Vale',
  });
  const job = await call<{ id: string }>(page, 'POST', '/api/jobs', {
    customerId: customer.id,
    siteId: site.id,
    title: 'Back garden lawn',
  });
  await call(page, 'POST', `/api/jobs/${job.id}/areas`, rectangleArea('Back lawn', 30, 20));
  const estimate = await call<{ id: string }>(page, 'POST', `/api/jobs/${job.id}/estimates`, {});
  await call(page, 'POST', `/api/estimates/${estimate.id}/send`, {});
  await call(page, 'POST', `/api/estimates/${estimate.id}/acceptances`, {
    name: 'Odile Pennyroyal',
    signedAt: new Date().toISOString(),
    place: 'office',
  });
  return { jobId: job.id };
}

test('the homeowner pays a deposit invoice by card from the e-mail, after one declined card', async ({
  page,
  browser,
}) => {
  test.setTimeout(180_000);
  await signUpCompany(page, {
    companyName: `Larkmoor Turf ${runStamp}`,
    name: 'Bryn Larkmoor',
    email: emailFor('owner-pay'),
  });
  const customerEmail = emailFor('homeowner-pay');
  const { jobId } = await acceptedJob(page, customerEmail);
  const invoice = await call<{ id: string; totalCents: number }>(page, 'POST', '/api/invoices', {
    jobId,
    kind: 'deposit',
  });
  await call(page, 'POST', `/api/invoices/${invoice.id}/send`, {});
  const amount = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(
    invoice.totalCents / 100,
  );

  // The homeowner, in a browser that has never signed in, opens the link in the e-mail.
  const link = await linkFromMail(customerEmail, /\/i\/[A-Za-z0-9_-]{20,}/);
  const home = await browser.newContext({ baseURL: baseUrl, bypassCSP: true, viewport: phone });
  const customer = await home.newPage();
  await customer.goto(link);
  await expect(customer.getByRole('heading', { level: 1, name: /Deposit invoice/ })).toBeVisible();
  await expect(customer.getByTestId('balance')).toHaveText(amount);
  await expectAccessible(customer, 'Customer invoice page on a phone');
  await customer.screenshot({ path: '../.tmp/screens/customer-invoice-phone.png', fullPage: true });

  // A declined card: the processor's page says so, and back on ours nothing is paid.
  await customer.getByRole('button', { name: `Pay ${amount} by card` }).click();
  await expect(customer.getByLabel('Card number')).toBeVisible();
  await customer.getByLabel('Card number').fill('4000 0000 0000 0002');
  await customer.getByRole('button', { name: `Pay ${amount}` }).click();
  await expect(customer.getByRole('alert')).toContainText('The card was declined');
  await customer.getByRole('button', { name: 'Go back without paying' }).click();
  await expect(customer.getByRole('heading', { name: 'Payment not completed' })).toBeVisible();
  await expect(customer.getByRole('alert')).toContainText('nothing was charged');
  await expect(customer.getByTestId('balance')).toHaveText(amount);

  // The card that succeeds: back on our page, "paid" only once the webhook has been recorded.
  await customer.getByRole('button', { name: `Pay ${amount} by card` }).click();
  await customer.getByLabel('Card number').fill('4242 4242 4242 4242');
  await customer.getByRole('button', { name: `Pay ${amount}` }).click();
  await expect(customer.getByRole('heading', { name: 'Paid in full' })).toBeVisible({
    timeout: 30_000,
  });
  await expect(customer.getByTestId('balance')).toHaveText('$0.00');
  await expectAccessible(customer, 'Customer invoice paid');
  await customer.screenshot({
    path: '../.tmp/screens/customer-invoice-paid-phone.png',
    fullPage: true,
  });
  await home.close();

  // The office: the invoice is paid, by card, once.
  const paid = await call<{ status: string; payments: { method: string }[] }>(
    page,
    'GET',
    `/api/invoices/${invoice.id}`,
  );
  expect(paid.status).toBe('paid');
  expect(paid.payments.map((p) => p.method)).toEqual(['card']);
});
