// A job's areas: the owner draws an L-shaped yard by typing its sides in the area editor, lets
// the planner pick the cheapest grain, saves, reads the plan with its alternatives and cut
// sheet, and finds the area and the job's takeoff on the job page; then changes the area on a
// tablet.
import { expect, test, type Page } from '@playwright/test';
import { expectAccessible } from './support/a11y';
import { typeLShapedYard } from './support/area-drawing';
import { baseUrl } from './support/servers';
import { emailFor, rail, runStamp, signUpCompany } from './support/people';

test.use({ bypassCSP: true });

async function send(page: Page, method: 'POST' | 'PATCH', path: string, data: unknown) {
  const csrf = await page.request.get('/api/auth/csrf');
  const { data: token } = (await csrf.json()) as { data: { token: string } };
  const res = await page.request.fetch(path, {
    method,
    data,
    headers: { 'x-csrf-token': token.token },
  });
  expect(res.ok()).toBe(true);
  return ((await res.json()) as { data: { id: string } }).data.id;
}

const post = (page: Page, path: string, data: unknown) => send(page, 'POST', path, data);

/** The page at 1280 × 800 (top of the page) and on a phone at 390 × 844 (whole page), into .tmp/. */
async function shoot(page: Page, name: string) {
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: `../.tmp/screens/${name}-desktop.png` });
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: `../.tmp/screens/${name}-phone.png`, fullPage: true });
  await expectAccessible(page, `${name} on a phone`);
  await page.setViewportSize({ width: 1280, height: 800 });
}

test('owner draws an L-shaped yard, saves it with the cheapest grain, and sees plan and takeoff', async ({
  page,
  browser,
}) => {
  // One long journey (two contexts, five accessibility checks, phone screenshots) on a shared
  // 2-core machine: more than the default minute.
  test.setTimeout(150_000);
  await signUpCompany(page, {
    companyName: `Hollowmere Turf ${runStamp}`,
    name: 'Ada Penwick',
    email: emailFor('owner-areas'),
  });
  const customerId = await post(page, '/api/customers', { name: 'Osric Fennimore' });
  const siteId = await post(page, `/api/customers/${customerId}/sites`, {
    label: 'Back yard',
    addressLine1: '12 Larch Row',
    city: 'Brindleford',
  });
  const jobId = await post(page, '/api/jobs', { customerId, siteId, title: 'Back yard play lawn' });

  await page.goto(`/jobs/${jobId}`);
  await expect(page.getByRole('heading', { level: 1, name: 'Back yard play lawn' })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'No areas yet' })).toBeVisible();
  await page.getByRole('link', { name: 'Add area' }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'New area' })).toBeVisible();

  await typeLShapedYard(page);

  const form = page.getByRole('form', { name: 'New area' });
  await form.getByRole('button', { name: 'Save area' }).click();
  await expect(form.getByText('Give the area a name')).toBeVisible();
  await form.getByLabel('Area name').fill('Play lawn');
  await form.getByLabel('Used for').selectOption({ label: 'Play area' });
  await expect(form.getByLabel('Turf product')).not.toHaveValue('');
  await form.getByLabel('Base depth').fill('3 in');
  await form.getByRole('radio', { name: /buys the least turf/ }).check();
  await expectAccessible(page, 'New area');
  await page.getByRole('button', { name: 'Fit the drawing' }).click();
  await shoot(page, 'area-editor');
  await form.getByRole('button', { name: 'Save area' }).click();

  // The area's page: the plan drawn, the alternatives side by side, the cut sheet, cautions.
  await expect(page.getByRole('heading', { level: 1, name: 'Play lawn' })).toBeVisible();
  await expect(page).toHaveURL(/\/areas\/[0-9a-f-]{36}$/);
  const areaUrl = page.url();
  const figures = page.getByRole('group', { name: 'Plan figures' });
  await expect(figures).toContainText('1,020 sq ft');
  await expect(figures).toContainText('Chosen for you: the way that buys the least turf');
  await expect(
    page.getByRole('img', { name: /Layout plan/ }).locator('[data-cut]'),
  ).not.toHaveCount(0);
  const ways = page.getByRole('list', { name: 'Ways to lay it' }).getByRole('listitem');
  expect(await ways.count()).toBeGreaterThanOrEqual(2);
  await expect(ways.first()).toContainText('Turf ordered');
  await expect(ways.first()).toContainText('Seams in walkways');
  const sheet = page.getByRole('table', { name: 'Cut sheet' });
  await expect(sheet.locator('tbody tr').first()).toContainText(/\d+' \d+"/);
  await expect(page.getByRole('heading', { level: 2, name: 'Cautions' })).toBeVisible();
  await expectAccessible(page, 'Area plan');
  await shoot(page, 'area-plan');
  // On paper the app's navigation is left out.
  await page.emulateMedia({ media: 'print' });
  await expect(rail(page)).toBeHidden();
  await page.emulateMedia({ media: 'screen' });

  // Back on the job: the area listed with its numbers, and the job's takeoff.
  await page.getByRole('link', { name: '← Back yard play lawn' }).click();
  const areas = page.getByRole('table', { name: 'Areas of this job' });
  const row = areas.getByRole('row', { name: /Play lawn/ });
  await expect(row).toContainText('Play area');
  await expect(row).toContainText('1,020 sq ft');
  await expect(row).toContainText('%');
  const takeoff = page.getByRole('table', { name: 'Material takeoff for the whole job' });
  await expect(takeoff.locator('tbody tr')).not.toHaveCount(0);
  await expect(takeoff).toContainText('sq ft');
  await expectAccessible(page, 'Job page with an area');

  // On a tablet: change the area's name; it is planned again and saved.
  const tablet = await browser.newContext({
    baseURL: baseUrl,
    bypassCSP: true,
    viewport: { width: 820, height: 1180 },
    storageState: await page.context().storageState(),
  });
  const pad = await tablet.newPage();
  await pad.goto(areaUrl);
  await pad.getByRole('link', { name: 'Change area' }).click();
  await expect(pad.getByRole('heading', { level: 1, name: 'Change Play lawn' })).toBeVisible();
  await expect(pad.getByTestId('editor-area')).toHaveText('1,020 sq ft');
  const change = pad.getByRole('form', { name: 'Change Play lawn' });
  await expect(change.getByLabel('Base depth')).toHaveValue(`0' 3"`);
  await expect(change.getByLabel('Used for')).toHaveValue('play');
  await expect(change.getByRole('radio', { name: /buys the least turf/ })).toBeChecked();
  await change.getByLabel('Area name').fill('Play lawn and swings');
  await change.getByRole('button', { name: 'Save changes' }).click();
  await expect(pad.getByRole('heading', { level: 1, name: 'Play lawn and swings' })).toBeVisible();
  await expect(pad.getByRole('table', { name: 'Cut sheet' })).toBeVisible();
  await pad.screenshot({ path: '../.tmp/screens/area-plan-tablet.png', fullPage: true });
  await tablet.close();

  // Once the job is sold its areas are fixed: no "Add area", and the server's refusal of a
  // save reaches the form's alert with what was typed kept.
  await send(page, 'PATCH', `/api/jobs/${jobId}`, { status: 'estimated' });
  await send(page, 'PATCH', `/api/jobs/${jobId}`, { status: 'accepted' });
  await page.reload();
  await expect(areas.getByRole('row', { name: /Play lawn and swings/ })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Add area' })).toHaveCount(0);
  await page.goto(`/jobs/${jobId}/areas/new`);
  await page.getByRole('button', { name: 'Start from a rectangle' }).click();
  await form.getByLabel('Area name').fill('Side strip');
  await form.getByRole('button', { name: 'Save area' }).click();
  await expect(form.getByRole('alert')).toContainText(
    'areas can change only while a job is a lead or estimated',
  );
  await expect(form.getByLabel('Area name')).toHaveValue('Side strip');
});
