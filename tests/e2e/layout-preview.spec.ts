// The Layout screen: a fresh company opens it from the rail, types a yard as the trade writes
// lengths, and sees the plan drawn and counted; a bad length is named under its field.
import { expect, test } from '@playwright/test';
import { expectAccessible } from './support/a11y';
import { emailFor, rail, runStamp, signUpCompany } from './support/people';

test.use({ bypassCSP: true });

test('a rectangle 30′ × 20′ on a 15 ft roll, grain east–west, orders 600 sq ft in two pieces', async ({
  page,
}) => {
  await signUpCompany(page, {
    companyName: `Sedgefield Turf ${runStamp}`,
    name: 'Maren Tolley',
    email: emailFor('owner-layout'),
  });
  await rail(page).getByRole('link', { name: 'Layout' }).click();
  await expect(page).toHaveURL(/\/layout$/);
  await expect(page.getByRole('heading', { level: 1, name: 'Layout' })).toBeVisible();

  const form = page.getByRole('form', { name: 'Yard and roll' });
  await form.getByRole('radio', { name: 'Rectangle' }).check();
  await form.getByLabel('Length (north–south)').fill(`30'`);
  await form.getByLabel('Width (east–west)').fill(`20'`);
  await form.getByRole('radio', { name: `15' 0"` }).check();
  await form.getByRole('radio', { name: 'Runs east–west' }).check();

  // Check value: 30 × 20 ft with a 15 ft roll, grain along the 20 ft side → two 15 × 20 ft
  // pieces, 600 sq ft, one 20 ft seam (arithmetic; TRADE.md row 1).
  const figures = page.getByRole('group', { name: 'Plan figures' });
  await expect(
    figures.locator('div', { has: page.locator('dt', { hasText: 'Turf ordered' }) }),
  ).toContainText('600 sq ft');
  await expect(
    figures
      .locator('div', { has: page.locator('dt', { hasText: /^Pieces$/ }) })
      .locator('dd')
      .first(),
  ).toHaveText('2');
  const drawing = page.getByRole('img', { name: /Layout plan/ });
  await expect(drawing.locator('[data-cut]')).toHaveCount(2);
  await expect(page.getByText(`Piece 2 — 15' 0" × 20' 0"`)).toBeVisible();
  await expect(page).toHaveURL(/grain=east-west/);

  // The state is in the URL: a reload shows the same plan.
  await page.reload();
  await expect(page.getByRole('img', { name: /600 sq ft ordered/ })).toBeVisible();
  await expectAccessible(page, 'Layout with a plan');

  // Tag the north edge as a planting bed: the perimeter names it and the takeoff adds edging.
  const perimeter = page
    .getByRole('group', { name: 'Plan figures' })
    .locator('div', { has: page.locator('dt', { hasText: /^Perimeter$/ }) });
  await expect(perimeter).toContainText(`100' 0" not tagged yet`);
  const edges = page.getByRole('group', { name: 'What does each edge meet?' });
  await expect(edges.getByLabel('North edge')).toHaveValue('unknown');
  await edges.getByLabel('North edge').selectOption({ label: 'Planting bed' });
  // Check value: 30 ft N–S × 20 ft E–W, so the north side is 20 ft and the other three
  // 30 + 20 + 30 = 80 ft (arithmetic).
  await expect(perimeter).toContainText(`20' 0" against beds`);
  await expect(perimeter).toContainText(`80' 0" not tagged yet`);
  await expect(
    page.getByRole('table', { name: 'Material takeoff' }).getByText('Edging / bender board'),
  ).toBeVisible();
  await expect(page).toHaveURL(/redges=bed%2Cunknown%2Cunknown%2Cunknown/);
  await expectAccessible(page, 'Layout with a bed edge');

  await page
    .getByRole('form', { name: 'Yard and roll' })
    .getByLabel('Width (east–west)')
    .fill(`20' 14"`);
  await expect(page.getByText(/^Inches must be less than 12 when feet are given/)).toBeVisible();
  await expect(
    page.getByRole('form', { name: 'Yard and roll' }).getByLabel('Width (east–west)'),
  ).toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByText(/Showing the last plan that worked/)).toBeVisible();
  await expectAccessible(page, 'Layout with a bad length');
});
