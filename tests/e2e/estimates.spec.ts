// Estimates: the owner builds an estimate from a job's area on the job page (first refused,
// with the reason, while the job has no area), reads its lines and totals, changes a quantity
// and sees the server's new total, types a line by hand, offers a second option and sets a
// fixed deposit; then the estimate on a tablet and on a phone, never wider than the screen. Sending and the PDF come
// with their own step (their routes are another piece of work).
import { expect, test, type Page } from '@playwright/test';
import { expectAccessible } from './support/a11y';
import { baseUrl } from './support/servers';
import { emailFor, runStamp, signUpCompany } from './support/people';

test.use({ bypassCSP: true });

async function post(page: Page, path: string, data: unknown): Promise<{ id: string }> {
  const csrf = await page.request.get('/api/auth/csrf');
  const { data: token } = (await csrf.json()) as { data: { token: string } };
  const res = await page.request.post(path, { data, headers: { 'x-csrf-token': token.token } });
  expect(res.ok()).toBe(true);
  return ((await res.json()) as { data: { id: string } }).data;
}

/** A 30 × 20 ft rectangle (600 sq ft), as tests/fixtures/areas.ts draws it. */
const rectangle = [
  [0, 0],
  [30, 0],
  [30, 20],
  [0, 20],
];

/** The page is no wider than the window (tables scroll in their own box). */
async function expectNoSidewaysScroll(page: Page) {
  const widths = await page.evaluate(() => ({
    page: document.documentElement.scrollWidth,
    window: window.innerWidth,
  }));
  expect(widths.page).toBeLessThanOrEqual(widths.window);
}

const totalOf = (page: Page, tier: string) =>
  page
    .getByRole('region', { name: tier, exact: true })
    .getByRole('definition')
    .nth(2)
    .textContent();

test('owner builds an estimate from the job page, edits lines and adds an option', async ({
  page,
  browser,
}) => {
  test.setTimeout(150_000);
  await signUpCompany(page, {
    companyName: `Wrenfield Turf ${runStamp}`,
    name: 'Bea Lathom',
    email: emailFor('owner-estimates'),
  });
  const customer = await post(page, '/api/customers', {
    name: 'Corwin Ashdale',
    email: 'corwin@example.test',
  });
  const site = await post(page, `/api/customers/${customer.id}/sites`, {
    label: 'Front',
    addressLine1: '4 Sedge Lane',
    city: 'Marlow Cross',
  });
  const job = await post(page, '/api/jobs', {
    customerId: customer.id,
    siteId: site.id,
    title: 'Front lawn',
  });

  // No area yet: the server's reason is shown.
  await page.goto(`/jobs/${job.id}`);
  await expect(page.getByRole('heading', { name: 'No estimates yet' })).toBeVisible();
  await page.getByRole('button', { name: 'Build estimate' }).click();
  await expect(page.getByRole('alert')).toContainText('no areas');

  const turf = await page.request.get('/api/price-book?kind=turf&pageSize=100');
  const products = ((await turf.json()) as { data: { id: string; name: string }[] }).data;
  expect(products.length).toBeGreaterThanOrEqual(2);
  await post(page, `/api/jobs/${job.id}/areas`, {
    name: 'Front lawn',
    usage: 'landscape',
    area: { outer: rectangle, holes: [] },
    roll: { widthFt: 15, maxLengthFt: 100 },
    grain: { angleDeg: 90 },
    turfProductId: products[0]!.id,
  });
  await page.reload();
  await page.getByRole('button', { name: 'Build estimate' }).click();

  // The estimate: lines with where they came from, and totals.
  await expect(page.getByRole('heading', { level: 1, name: 'Estimate, version 1' })).toBeVisible();
  await expect(page.getByText('Draft', { exact: true })).toBeVisible();
  const lines = page.getByRole('table', { name: 'Lines of Standard' });
  await expect(lines.locator('tbody tr')).not.toHaveCount(0);
  // (The source column; below 1024 px the same words sit under the item.)
  await expect(lines.locator('td').getByText('From the takeoff').first()).toBeVisible();
  await expect(page.getByText('How the figures are rounded:')).toBeVisible();
  await expect(page.getByRole('link', { name: 'Download PDF' })).toHaveAttribute(
    'href',
    /\/api\/estimates\/[0-9a-f-]{36}\/pdf$/,
  );
  const before = await totalOf(page, 'Standard');
  expect(before).toMatch(/^\$[\d,]+\.\d\d$/);
  await expectAccessible(page, 'Estimate draft');

  // Change the first line's quantity: it becomes a manual override and the total follows.
  const first = lines.locator('tbody tr').first();
  const quantity = first.getByRole('textbox', { name: /^Quantity of / });
  const was = Number(await quantity.inputValue());
  await quantity.fill(String(was + 100));
  await page.getByRole('button', { name: 'Save line changes' }).click();
  await expect(first.locator('td').getByText('Changed by hand')).toBeVisible();
  await expect.poll(() => totalOf(page, 'Standard')).not.toBe(before);

  // A line typed by hand.
  await page.getByText('Add a line by hand', { exact: true }).click();
  const add = page.getByRole('form', { name: 'Add a line to Standard' });
  await add.getByLabel('Item').fill('Haul away old sod');
  await add.getByLabel('Quantity').fill('1');
  await add.getByLabel('Unit', { exact: true }).fill('job');
  await add.getByLabel('Unit price').fill('185');
  await add.getByRole('button', { name: 'Add line' }).click();
  const typed = lines.getByRole('row', { name: /Haul away old sod/ });
  await expect(typed).toContainText('$185.00');
  await expect(typed).toContainText('Typed by hand');

  // A second option, priced with another turf.
  await page.getByText('Offer another option', { exact: true }).click();
  const option = page.getByRole('form', { name: 'Offer another option' });
  await option.getByLabel('Option name').fill('Pet turf');
  await option.getByLabel('Turf').selectOption({ label: products[1]!.name });
  await option.getByRole('button', { name: 'Add option' }).click();
  await expect(page.getByRole('heading', { level: 2, name: 'Pet turf' })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Lines of Pet turf' })).toContainText(
    'Haul away old sod',
  );
  // A fixed deposit instead of the company's percent: the server's deposit follows.
  const terms = page.getByRole('form', { name: 'Terms of the estimate' });
  await terms.getByRole('radio', { name: 'A fixed amount' }).check();
  await terms.getByLabel('Deposit amount').fill('500');
  await terms.getByRole('button', { name: 'Save terms' }).click();
  await expect(
    page.getByRole('region', { name: 'Pet turf', exact: true }).getByRole('definition').nth(3),
  ).toHaveText('$500.00');
  const estimateUrl = page.url();

  // Desktop and phone pictures; the phone never scrolls the whole page sideways.
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: '../.tmp/screens/estimate-desktop.png' });
  await page.setViewportSize({ width: 390, height: 844 });
  await expectNoSidewaysScroll(page);
  await page.screenshot({ path: '../.tmp/screens/estimate-phone.png', fullPage: true });
  await page.screenshot({ path: '../.tmp/screens/estimate-phone-top.png' });
  await lines.scrollIntoViewIfNeeded();
  await page.screenshot({ path: '../.tmp/screens/estimate-phone-lines.png' });
  await terms.scrollIntoViewIfNeeded();
  await page.screenshot({ path: '../.tmp/screens/estimate-phone-terms.png' });
  await expectAccessible(page, 'Estimate on a phone');
  await page.setViewportSize({ width: 1280, height: 800 });

  // The job page lists the version with its total.
  await page.getByRole('link', { name: '← Front lawn' }).click();
  const versions = page.getByRole('table', { name: 'Estimate versions of this job' });
  await expect(versions.getByRole('row', { name: /Version 1/ })).toContainText('Draft');

  // On a tablet at the customer's gate: the estimate reads without sideways scrolling.
  const tablet = await browser.newContext({
    baseURL: baseUrl,
    bypassCSP: true,
    viewport: { width: 820, height: 1180 },
    storageState: await page.context().storageState(),
  });
  const pad = await tablet.newPage();
  await pad.goto(estimateUrl);
  await expect(pad.getByRole('heading', { level: 2, name: 'Pet turf' })).toBeVisible();
  await expectNoSidewaysScroll(pad);
  await pad.screenshot({ path: '../.tmp/screens/estimate-tablet.png' });
  await tablet.close();
});
