// A photo or sketch under the area editor's drawing (issue 7 item 2): the office opens a saved
// area, chooses a sketch of the yard, sets its scale by clicking two points and typing the
// distance between them, moves it onto the drawing, reloads and finds it again.
import { fileURLToPath } from 'node:url';
import { expect, test, type Page } from '@playwright/test';
import { expectAccessible } from './support/a11y';
import { rectangleArea } from './support/api-call';
import { emailFor, runStamp, signUpCompany } from './support/people';

test.use({ bypassCSP: true });

/** 400 × 300 px: the lawn's long side runs from pixel 40 to 360 (320 px), drawn as 30 ft. */
const sketch = fileURLToPath(new URL('../fixtures/yard-sketch.png', import.meta.url));

async function post(page: Page, path: string, data: unknown): Promise<string> {
  const csrf = await page.request.get('/api/auth/csrf');
  const { data: token } = (await csrf.json()) as { data: { token: string } };
  const res = await page.request.post(path, { data, headers: { 'x-csrf-token': token.token } });
  expect(res.ok()).toBe(true);
  return ((await res.json()) as { data: { id: string } }).data.id;
}

/** Clicks the sketch at one of its own pixels, wherever the drawing shows it. */
async function clickSketchAt(page: Page, x: number, y: number) {
  await page.getByRole('application').scrollIntoViewIfNeeded();
  const box = await page.getByTestId('underlay-image').boundingBox();
  if (!box) throw new Error('the sketch is not drawn');
  await page.mouse.click(box.x + (box.width * x) / 400, box.y + (box.height * y) / 300);
}

test('office puts a yard sketch under an area, scales it by two points, and finds it after a reload', async ({
  page,
}) => {
  test.setTimeout(120_000);
  await signUpCompany(page, {
    companyName: `Underlay Turf ${runStamp}`,
    name: 'Wren Calloway',
    email: emailFor('owner-underlay'),
  });
  const customerId = await post(page, '/api/customers', { name: 'Bramwell Oakes' });
  const siteId = await post(page, `/api/customers/${customerId}/sites`, {
    label: 'Back yard',
    addressLine1: '4 Sedge Lane',
    city: 'Marlow Cross',
  });
  const jobId = await post(page, '/api/jobs', { customerId, siteId, title: 'Sketched lawn' });
  const areaId = await post(page, `/api/jobs/${jobId}/areas`, rectangleArea('Back lawn', 30, 17));

  await page.goto(`/areas/${areaId}/edit`);
  const panel = page.getByRole('region', { name: 'Photo or sketch under the drawing' });
  await panel.getByLabel('Choose a photo or sketch').setInputFiles(sketch);
  await expect(panel.getByRole('status')).toHaveText(
    'Photo added under the drawing. Set its scale next.',
  );
  await expect(page.getByTestId('underlay-image')).toBeVisible();
  await expect(panel.getByText('yard-sketch.png, 400 × 300 pixels')).toBeVisible();

  await panel.getByRole('button', { name: 'Set scale: pick two points' }).click();
  await clickSketchAt(page, 40, 130);
  await expect(panel.getByRole('status')).toContainText('Now click the second point');
  await clickSketchAt(page, 360, 130);
  await expect(panel.getByRole('status')).toContainText('Type the distance');
  await panel.getByLabel('Distance from A to B (feet)').fill(`30'`);
  await panel.getByRole('button', { name: 'Save scale' }).click();
  await expect(panel.getByRole('status')).toHaveText(`Scale set: the two points are 30' 0" apart.`);
  await expect(panel.getByText(`To scale: A to B is 30' 0".`)).toBeVisible();

  // At 30 ft over ~320 px the lawn's west edge lands about 3' 9" east of the drawing's: move it.
  for (let i = 0; i < 4; i++) await panel.getByRole('button', { name: 'West' }).click();
  await expect(panel.getByRole('status')).toHaveText('Photo position saved.');
  await panel.getByLabel(/Photo strength/).fill('70');
  await expect(panel.getByRole('status')).toHaveText('Photo position saved.');
  await expectAccessible(page, 'Area editor with a sketch under it');
  await page.getByRole('button', { name: 'Fit the drawing' }).click();
  await page.screenshot({ path: '../.tmp/screens/area-underlay-desktop.png' });

  await page.reload();
  await expect(page.getByTestId('underlay-image')).toBeVisible();
  await expect(panel.getByText(`To scale: A to B is 30' 0".`)).toBeVisible();
  await expect(panel.getByLabel(/Photo strength \(70%\)/)).toBeVisible();
  const image = page.getByTestId('underlay-image');
  await expect(image).toHaveAttribute('transform', /^translate\(-4 -17\) rotate\(0\) scale\(0\.09/);
  await expect(image).toHaveAttribute('opacity', '0.7');

  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: '../.tmp/screens/area-underlay-phone.png', fullPage: true });
  await expectAccessible(page, 'Area editor with a sketch, on a phone');

  await panel.getByLabel('Show the photo').uncheck();
  await expect(page.getByTestId('underlay-image')).toHaveCount(0);
  await expect(panel.getByRole('status')).toHaveText('Photo hidden.');
});
