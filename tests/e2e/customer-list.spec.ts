// The customers list and page: sort, filter and page size live in the URL; archive can be
// undone; delete asks once; a site can be edited and deleted.
import { expect, test, type Page } from '@playwright/test';
import { expectAccessible } from './support/a11y';
import { emailFor, runStamp, signUpCompany } from './support/people';

test.use({ bypassCSP: true });

/** Adds customers through the API with the page's own session, as the app itself would. */
async function addCustomers(page: Page, names: string[]): Promise<Map<string, string>> {
  const headers = await csrfHeaders(page);
  const ids = new Map<string, string>();
  for (const name of names) {
    const response = await page.request.post('/api/customers', { data: { name }, headers });
    expect(response.status()).toBe(201);
    ids.set(name, ((await response.json()) as { data: { id: string } }).data.id);
  }
  return ids;
}

async function csrfHeaders(page: Page): Promise<Record<string, string>> {
  const csrf = await page.request.get('/api/auth/csrf');
  const { data } = (await csrf.json()) as { data: { token: string } };
  return { 'x-csrf-token': data.token };
}

function nameCells(page: Page) {
  return page.getByRole('table').getByRole('row').locator('td:first-child a');
}

test('sorting, status filter and page size are kept in the URL and survive a reload', async ({
  page,
}) => {
  await signUpCompany(page, {
    companyName: `Brindle Yards ${runStamp}`,
    name: 'Perrin Vale',
    email: emailFor('owner-list'),
  });
  const ids = await addCustomers(page, [
    'Alder Nook',
    'Bracken Hill',
    'Cobble Lane',
    'Dunlin Farm',
    'Elmstead Park',
    'Fallow Rise',
    'Gorse End',
    'Heron Reach',
    'Ivybridge Court',
    'Juniper Row',
    'Kestrel Way',
    'Lapwing Hollow',
  ]);
  const archived = await page.request.patch(`/api/customers/${ids.get('Lapwing Hollow')}`, {
    data: { archived: true },
    headers: await csrfHeaders(page),
  });
  expect(archived.status()).toBe(200);

  await page.goto('/customers');
  await expect(nameCells(page)).toHaveCount(11); // the archived one is left out by default
  await expect(nameCells(page).first()).toHaveText('Alder Nook');

  await page.getByLabel('Show').selectOption({ label: 'Archived' });
  await expect(page).toHaveURL(/status=archived/);
  await expect(nameCells(page)).toHaveText(['Lapwing Hollow']);
  await page.reload();
  await expect(nameCells(page)).toHaveText(['Lapwing Hollow']);
  await page.getByLabel('Show').selectOption({ label: 'Active' });
  await expect(nameCells(page)).toHaveCount(11);

  await page.getByRole('button', { name: /^Name/ }).click();
  await expect(page).toHaveURL(/sort=-name/);
  await expect(nameCells(page).first()).toHaveText('Kestrel Way');
  await expect(page.getByRole('columnheader', { name: /Name/ })).toHaveAttribute(
    'aria-sort',
    'descending',
  );

  await page.getByLabel('Rows per page').selectOption('10');
  await expect(page).toHaveURL(/pageSize=10/);
  await expect(nameCells(page)).toHaveCount(10);
  await page.getByRole('button', { name: 'Next' }).click();
  await expect(page).toHaveURL(/page=2/);
  await expect(nameCells(page)).toHaveText(['Alder Nook']);

  await page.reload();
  await expect(nameCells(page)).toHaveText(['Alder Nook']);
  await expect(page.getByText('Page 2 of 2')).toBeVisible();
  await expectAccessible(page, 'Customers, page 2');
});

test('archive can be undone, delete asks once, and a site can be edited and deleted', async ({
  page,
}) => {
  await signUpCompany(page, {
    companyName: `Thornbury Greens ${runStamp}`,
    name: 'Ada Merrow',
    email: emailFor('owner-edit'),
  });
  await addCustomers(page, ['Quenby Marsh']);
  await page.goto('/customers');
  await page.getByRole('link', { name: 'Quenby Marsh' }).click();

  await page.getByRole('button', { name: 'Edit', exact: true }).click();
  const editForm = page.getByRole('form', { name: 'Save changes' });
  await editForm.getByLabel('Name').fill('');
  await expect(editForm.getByText('Name is required')).toBeVisible();
  await expectAccessible(page, 'Edit customer with an error showing');
  await editForm.getByLabel('Name').fill('Quenby Marsh');
  await editForm.getByLabel('Notes').fill('Prefers calls after 4 pm.');
  await editForm.getByRole('button', { name: 'Save changes' }).click();
  await expect(page.getByText('Prefers calls after 4 pm.')).toBeVisible();

  await page.getByRole('button', { name: 'Archive' }).click();
  await expect(page.getByText(/^Archived on /)).toBeVisible();
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(page.getByText(/^Archived on /)).toBeHidden();
  await expect(page.getByRole('button', { name: 'Archive' })).toBeVisible();

  await page.getByRole('button', { name: 'Add a site' }).click();
  const siteForm = page.getByRole('form', { name: 'Save site' });
  await siteForm.getByLabel('Street address').fill('3 Sedge Walk');
  await siteForm.getByLabel('Sprinkler heads to cap (heads)').fill('-2');
  await expect(siteForm.getByText('Sprinkler heads cannot be negative')).toBeVisible();
  await siteForm.getByLabel('Sprinkler heads to cap (heads)').fill('');
  await siteForm.getByRole('button', { name: 'Save site' }).click();
  await expect(siteForm.getByText('Town or city is required')).toBeVisible();
  await expect(siteForm.getByLabel('Street address')).toHaveValue('3 Sedge Walk');
  await siteForm.getByLabel('Town or city').fill('Ashvale');
  await siteForm.getByRole('button', { name: 'Save site' }).click();
  await expect(page.getByText('Not counted yet')).toBeVisible();
  await expect(siteForm).toHaveCount(0); // the new-site form has closed

  await page.getByRole('button', { name: 'Edit site 3 Sedge Walk' }).click();
  await page
    .getByRole('form', { name: 'Save site' })
    .getByLabel('Pets')
    .fill('Two terriers; keep the side gate shut.');
  await page
    .getByRole('form', { name: 'Save site' })
    .getByRole('button', { name: 'Save site' })
    .click();
  await expect(page.getByText('Two terriers; keep the side gate shut.')).toBeVisible();

  await page.getByRole('button', { name: 'Delete site 3 Sedge Walk' }).click();
  const siteDialog = page.getByRole('dialog', { name: /Delete the site/ });
  await expect(siteDialog).toBeVisible();
  await expectAccessible(page, 'Delete-site confirmation');
  await siteDialog.getByRole('button', { name: 'Delete site' }).click();
  await expect(page.getByRole('heading', { name: 'No sites yet' })).toBeVisible();

  await page.getByRole('button', { name: 'Delete', exact: true }).click();
  const dialog = page.getByRole('dialog', { name: 'Delete Quenby Marsh?' });
  await dialog.getByRole('button', { name: 'Keep it' }).click();
  await expect(dialog).toBeHidden();
  await page.getByRole('button', { name: 'Delete', exact: true }).click();
  await dialog.getByRole('button', { name: 'Delete customer' }).click();
  await expect(page).toHaveURL(/\/customers$/);
  await expect(page.getByRole('heading', { name: 'No customers yet' })).toBeVisible();
});

test('an address that is not a page says so inside the app frame', async ({ page }) => {
  await signUpCompany(page, {
    companyName: `Wickham Sward ${runStamp}`,
    name: 'Nell Ambrose',
    email: emailFor('owner-404'),
  });
  await page.goto('/no-such-page');
  await expect(page.getByRole('heading', { name: 'There is no page here' })).toBeVisible();
  await expect(page.getByRole('navigation', { name: 'Sections' }).first()).toBeVisible();
  await expectAccessible(page, 'Not found');
});
