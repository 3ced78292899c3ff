// The database itself keeps a site inside its customer's company (migration 0004's composite
// foreign key), so a bug that skipped scoping could still not file a site under a stranger.
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { executeSql, selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { createCustomer, signUpCompany } from '../../fixtures/factories.js';

function insertSite(companyId: string, customerId: string) {
  const { sequelize } = testApp();
  const id = randomUUID();
  return {
    id,
    run: () =>
      executeSql(
        sequelize,
        `INSERT INTO sites (id, company_id, customer_id, address_line1, city, created_at, updated_at)
         VALUES (?, ?, ?, '3 Thistle Row', 'Quillmere', NOW(3), NOW(3))`,
        [id, companyId, customerId],
      ),
  };
}

describe('sites → customers composite key', () => {
  it('accepts a site whose customer is in the same company', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const customer = await createCustomer(owner.client);
    const site = insertSite(owner.me.company.id, customer.id);
    await site.run();
    expect(
      await selectRows(sequelize, 'SELECT id FROM sites WHERE id = ?', [site.id]),
    ).toHaveLength(1);
  });

  it('refuses, in the database, a site whose customer belongs to another company', async () => {
    const { app, sequelize } = testApp();
    const ours = await signUpCompany(app);
    const theirs = await signUpCompany(app);
    const theirCustomer = await createCustomer(theirs.client);
    const site = insertSite(ours.me.company.id, theirCustomer.id);
    await expect(site.run()).rejects.toThrow(/foreign key constraint fails/i);
    expect(
      await selectRows(sequelize, 'SELECT id FROM sites WHERE id = ?', [site.id]),
    ).toHaveLength(0);
  });

  it('still removes the sites with their customer', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const customer = await createCustomer(owner.client);
    const site = insertSite(owner.me.company.id, customer.id);
    await site.run();
    await executeSql(sequelize, 'DELETE FROM customers WHERE id = ?', [customer.id]);
    expect(
      await selectRows(sequelize, 'SELECT id FROM sites WHERE id = ?', [site.id]),
    ).toHaveLength(0);
  });
});
