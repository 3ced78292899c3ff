// The estimate's whole journey: the owner draws an L-shaped yard on a tablet, prices it in two
// options and e-mails it; the homeowner opens the link from the e-mail on a phone (no session),
// picks an option, accepts by typing a name and sees the thank-you; the office then finds the
// job accepted.
import { expect, test } from '@playwright/test';
import { call, rectangleArea } from './support/api-call';
import { expectAccessible } from './support/a11y';
import { typeLShapedYard } from './support/area-drawing';
import { linkFromMail } from './support/mail';
import { emailFor, runStamp, signUpCompany } from './support/people';
import { baseUrl } from './support/servers';

test.use({ bypassCSP: true });

const phone = { width: 390, height: 844 };
const tablet = { width: 820, height: 1180 };

test('the homeowner accepts an e-mailed estimate on a phone and the job turns accepted', async ({
  page,
  browser,
}) => {
  // Sign-up, the editor, sending with a PDF, a second browser and four accessibility checks on
  // a shared 2-core machine: more than the default minute.
  test.setTimeout(180_000);
  await page.setViewportSize(tablet);
  await signUpCompany(page, {
    companyName: `Quillfern Turf ${runStamp}`,
    name: 'Mara Quillfern',
    email: emailFor('owner-accept'),
  });
  const customerEmail = emailFor('homeowner');
  const customer = await call<{ id: string }>(page, 'POST', '/api/customers', {
    name: 'Tobias Wrenfield',
    email: customerEmail,
  });
  const site = await call<{ id: string }>(page, 'POST', `/api/customers/${customer.id}/sites`, {
    label: 'Home',
    addressLine1: '7 Bramble Court',
    city: 'Hollin Vale',
  });
  const job = await call<{ id: string }>(page, 'POST', '/api/jobs', {
    customerId: customer.id,
    siteId: site.id,
    title: 'Front and side lawn',
  });

  // On the tablet: the area drawn by typing its sides, the cheapest direction, saved.
  await page.goto(`/jobs/${job.id}`);
  await page.getByRole('link', { name: 'Add area' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'New area' })).toBeVisible();
  await typeLShapedYard(page);
  const form = page.getByRole('form', { name: 'New area' });
  await form.getByLabel('Area name').fill('Side lawn');
  await form.getByLabel('Used for').selectOption({ label: 'Play area' });
  await expect(form.getByLabel('Turf product')).not.toHaveValue('');
  await form.getByLabel('Base depth').fill('3 in');
  await form.getByRole('radio', { name: /buys the least turf/ }).check();
  await form.getByRole('button', { name: 'Save area' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Side lawn' })).toBeVisible();

  // The estimate screens are not in the web app yet: build and send it through the API, in
  // two options so the homeowner has to choose (the second on the price book's pet turf).
  const turf = await call<{ id: string; key: string }[]>(
    page,
    'GET',
    '/api/price-book?kind=turf&pageSize=100',
  );
  const pet = turf.find((item) => item.key === 'turf-pet-125');
  expect(pet, 'the starter price book has a pet turf').toBeTruthy();
  const estimate = await call<{ id: string }>(page, 'POST', `/api/jobs/${job.id}/estimates`, {
    tiers: [{ name: 'Standard turf' }, { name: 'Pet-friendly turf', turfProductId: pet?.id }],
    notes: 'We remove the old sod and haul it away.',
  });
  await call(page, 'POST', `/api/estimates/${estimate.id}/send`, {});

  // The homeowner: the link from the e-mail, in a browser that has never signed in.
  const link = await linkFromMail(customerEmail, /\/e\/[A-Za-z0-9_-]{20,}/);
  const home = await browser.newContext({ baseURL: baseUrl, bypassCSP: true, viewport: phone });
  const customerPage = await home.newPage();
  await customerPage.goto(link);
  await expect(
    customerPage.getByRole('heading', { level: 1, name: 'Your estimate' }),
  ).toBeVisible();
  await expect(customerPage.getByText(`Quillfern Turf ${runStamp}`).first()).toBeVisible();
  await expect(customerPage.getByText('Front and side lawn')).toBeVisible();
  await expect(customerPage.getByText(/7 Bramble Court/)).toBeVisible();
  await expect(customerPage.getByRole('img', { name: 'Plan of Side lawn' })).toBeVisible();
  await expect(customerPage.getByRole('heading', { name: 'Pet-friendly turf' })).toBeVisible();
  await expect(customerPage.getByText('We remove the old sod and haul it away.')).toBeVisible();
  await expect(customerPage.getByTestId('rounding-rule')).not.toBeEmpty();
  await expectAccessible(customerPage, 'Customer estimate page on a phone');
  await customerPage.screenshot({
    path: '../.tmp/screens/customer-estimate-phone.png',
    fullPage: true,
  });
  await customerPage.setViewportSize({ width: 1280, height: 800 });
  await customerPage.screenshot({
    path: '../.tmp/screens/customer-estimate-desktop.png',
    fullPage: true,
  });
  await customerPage.setViewportSize(phone);

  // Accepting without choosing an option is refused beside the choice; then choose and sign.
  const accept = customerPage.getByRole('form', { name: 'Accept this estimate' });
  await accept.getByLabel('Your full name').fill('Tobias Wrenfield');
  await accept.getByRole('button', { name: 'Accept estimate' }).click();
  await expect(accept.getByText('Choose one of the options')).toBeVisible();
  const options = accept.getByRole('group', { name: 'Which option do you choose?' });
  await options.getByRole('radio', { name: /Pet-friendly turf/ }).check();
  await accept.getByRole('button', { name: 'Accept estimate' }).click();
  const thanks = customerPage.getByTestId('answer-panel');
  await expect(thanks.getByRole('heading', { name: /Thank you/ })).toBeVisible();
  await expect(thanks.getByTestId('accepted-at')).toContainText(String(new Date().getFullYear()));
  await expect(customerPage.getByRole('button', { name: 'Accept estimate' })).toHaveCount(0);
  await expect(
    customerPage.getByRole('heading', { level: 2, name: 'What you accepted: Pet-friendly turf' }),
  ).toBeVisible();
  await expect(customerPage.getByRole('heading', { name: 'Standard turf' })).toHaveCount(0);
  await expectAccessible(customerPage, 'Customer estimate accepted');
  await customerPage.screenshot({
    path: '../.tmp/screens/customer-estimate-accepted-phone.png',
    fullPage: true,
  });

  // Opened again later, the link shows the answer; a made-up link says so in words.
  await customerPage.reload();
  await expect(customerPage.getByRole('heading', { name: /Thank you/ })).toBeVisible();
  await customerPage.goto('/e/this-link-was-never-sent-by-anyone-at-all');
  await expect(
    customerPage.getByRole('heading', { level: 1, name: 'This estimate link does not work' }),
  ).toBeVisible();
  await expect(customerPage.getByText(/\b404\b/)).toHaveCount(0);
  await home.close();

  // Back in the office, on the tablet: the job is accepted.
  await page.goto(`/jobs/${job.id}`);
  await expect(page.getByRole('heading', { level: 1, name: 'Front and side lawn' })).toBeVisible();
  await expect(page.getByRole('main').getByText('Accepted', { exact: true }).first()).toBeVisible();
});

test('a homeowner declines with a reason, and a second tab that tries to accept is told it was answered', async ({
  page,
  browser,
}) => {
  test.setTimeout(120_000);
  await signUpCompany(page, {
    companyName: `Thistledown Lawns ${runStamp}`,
    name: 'Ivo Thistledown',
    email: emailFor('owner-decline'),
  });
  const customerEmail = emailFor('homeowner-decline');
  const customer = await call<{ id: string }>(page, 'POST', '/api/customers', {
    name: 'Perpetua Ashgrove',
    email: customerEmail,
  });
  const site = await call<{ id: string }>(page, 'POST', `/api/customers/${customer.id}/sites`, {
    label: 'Home',
    addressLine1: '3 Sorrel Way',
    city: 'Hollin Vale',
  });
  const job = await call<{ id: string }>(page, 'POST', '/api/jobs', {
    customerId: customer.id,
    siteId: site.id,
    title: 'Back lawn refresh',
  });
  const turf = await call<{ id: string; key: string }[]>(
    page,
    'GET',
    '/api/price-book?kind=turf&pageSize=100',
  );
  // A 30 × 20 ft rectangle, as tests/fixtures/areas.ts draws it.
  await call(
    page,
    'POST',
    `/api/jobs/${job.id}/areas`,
    rectangleArea('Back lawn', 30, 20, {
      turfProductId: turf.find((item) => item.key === 'turf-landscape-175')?.id,
    }),
  );
  const estimate = await call<{ id: string }>(page, 'POST', `/api/jobs/${job.id}/estimates`, {});
  await call(page, 'POST', `/api/estimates/${estimate.id}/send`, {});
  const link = await linkFromMail(customerEmail, /\/e\/[A-Za-z0-9_-]{20,}/);

  const home = await browser.newContext({ baseURL: baseUrl, bypassCSP: true, viewport: phone });
  const first = await home.newPage();
  const second = await home.newPage();
  await first.goto(link);
  await second.goto(link);
  // One option: no choice to make, and the statement names its total.
  const accept = second.getByRole('form', { name: 'Accept this estimate' });
  await expect(accept.getByRole('group', { name: 'Which option do you choose?' })).toHaveCount(0);
  await expect(accept).toContainText(/do the work described above for \$[\d,]+\.\d\d/);

  await first.getByRole('button', { name: 'Decline this estimate' }).click();
  const reason = first.getByLabel('Why not? (you can leave this empty)');
  await expect(reason).toBeFocused();
  await reason.fill('We decided to keep the grass this year.');
  await first.getByRole('button', { name: 'Decline estimate' }).click();
  await expect(first.getByRole('heading', { name: 'The estimate is declined' })).toBeVisible();
  await expectAccessible(first, 'Customer estimate declined');

  // The second tab still shows the form; its answer comes too late.
  await accept.getByLabel('Your full name').fill('Perpetua Ashgrove');
  await accept.getByRole('button', { name: 'Accept estimate' }).click();
  await expect(
    second.getByRole('heading', { level: 1, name: 'This estimate has already been answered' }),
  ).toBeVisible();
  await expect(second.getByText(/\b409\b/)).toHaveCount(0);
  await home.close();
});
