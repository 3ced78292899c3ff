// The owner keeps the price book: edits a starter turf price, exports the CSV, and imports a
// file with one bad row, which the preview shows with its error before anything is written.
import { expect, test } from '@playwright/test';
import { expectAccessible } from './support/a11y';
import { emailFor, runStamp, signUpCompany } from './support/people';
import { baseUrl } from './support/servers';

const badCsv = [
  'kind,key,name,unit,packSize,price,pileHeightIn,rollWidthsFt,maxRollLengthFt,recommendedInfill,infillRateLbPerSqFt,labourBasis,isStarter',
  'material,base-stone,Crushed base stone,ton,,41.50,,,,,,,no',
  'labour,labour-day,Day rate,day,,abc,,,,,,per_hour,no',
].join('\n');

test('an owner edits a turf price, exports the price book and sees a bad import row', async ({
  browser,
}) => {
  const context = await browser.newContext({
    baseURL: baseUrl,
    bypassCSP: true,
    viewport: { width: 1280, height: 800 },
    acceptDownloads: true,
  });
  const page = await context.newPage();
  await signUpCompany(page, {
    companyName: `Pricewell Turf ${runStamp}`,
    name: 'Ivo Pricewell',
    email: emailFor('owner-prices'),
  });
  await page.goto('/settings#price-book');
  const book = page.getByRole('region', { name: 'Price book' });
  await expect(book.getByRole('cell', { name: /^Landscape turf 1¾ in \(starter\)/ })).toBeVisible();
  await expect(
    page
      .getByRole('region', { name: 'Estimating' })
      .getByText('CalRecycle', { exact: false })
      .first(),
  ).toBeVisible();
  await expectAccessible(page, 'Settings with estimating and price book (owner)');

  await book.getByRole('button', { name: 'Edit Landscape turf 1¾ in (starter)' }).click();
  const edit = book.getByRole('region', { name: 'Edit Landscape turf 1¾ in (starter)' });
  await edit.getByLabel('Price per sq ft').fill('2.65');
  await edit.getByRole('button', { name: 'Save item' }).click();
  await expect(book.getByText('$2.65 / sq ft')).toBeVisible();

  const download = page.waitForEvent('download');
  await book.getByRole('link', { name: 'Export CSV' }).click();
  const file = await download;
  expect(file.suggestedFilename()).toBe('price-book.csv');

  await book.getByLabel('Import a price book CSV').setInputFiles({
    name: 'prices.csv',
    mimeType: 'text/csv',
    buffer: Buffer.from(badCsv),
  });
  const preview = book.getByRole('table', { name: 'Import preview' });
  await expect(preview.getByText('labour-day')).toBeVisible();
  await expect(preview.getByText(/Enter a price like 2\.35/)).toBeVisible();
  await expect(book.getByText(/nothing was imported/)).toBeVisible();
  await expectAccessible(page, 'Price book import preview (owner)');
  await page.screenshot({ path: '../.tmp/screens/price-book-desktop.png', fullPage: false });

  await page.setViewportSize({ width: 390, height: 844 });
  await page.goto('/settings#estimating');
  await expect(page.getByRole('heading', { name: 'Estimating' })).toBeVisible();
  await page.screenshot({ path: '../.tmp/screens/estimating-phone.png' });
  await page.goto('/settings#price-book');
  await expect(
    page
      .getByRole('region', { name: 'Price book' })
      .getByRole('cell', { name: /^Crushed base stone/ })
      .first(),
  ).toBeVisible();
  await page.screenshot({ path: '../.tmp/screens/price-book-phone.png' });
  await page.setViewportSize({ width: 1280, height: 800 });
  await page.goto('/settings#estimating');
  await expect(page.getByRole('heading', { name: 'Estimating' })).toBeVisible();
  await page.screenshot({ path: '../.tmp/screens/estimating-desktop.png' });
  await context.close();
});
