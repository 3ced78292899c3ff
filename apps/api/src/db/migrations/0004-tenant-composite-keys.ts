// A child row of a tenant table can point only at a parent in its own company: the foreign key
// covers (company_id, parent id), so the database itself refuses a site whose customer belongs to
// another company, whatever the code above it does. The parent needs a unique (company_id, id)
// key for that. sites → customers is the only pair of tenant tables where both carry company_id
// (memberships and invitations point at users, which belong to no company).
import type { QueryInterface } from 'sequelize';
import { executeSql, selectRows } from '../sql.js';
import type { Migration } from './types.js';

/** The single-column foreign key sites.customer_id → customers.id made by 0001 (auto-named). */
async function siteCustomerKeyNames(qi: QueryInterface): Promise<string[]> {
  const rows = await selectRows<{ name: string }>(
    qi.sequelize,
    `SELECT k.CONSTRAINT_NAME AS name FROM information_schema.KEY_COLUMN_USAGE k
      WHERE k.TABLE_SCHEMA = DATABASE() AND k.TABLE_NAME = 'sites'
        AND k.REFERENCED_TABLE_NAME = 'customers'
      GROUP BY k.CONSTRAINT_NAME HAVING COUNT(*) = 1 AND MAX(k.COLUMN_NAME) = 'customer_id'`,
  );
  return rows.map((row) => row.name);
}

export const tenantCompositeKeys: Migration = {
  name: '0004-tenant-composite-keys',
  async up({ context: qi }) {
    await qi.addIndex('customers', ['company_id', 'id'], {
      unique: true,
      name: 'customers_company_id_id',
    });
    // The composite key replaces the single-column one (same cascade on delete).
    for (const name of await siteCustomerKeyNames(qi)) await qi.removeConstraint('sites', name);
    // Plain SQL: Sequelize 6's addConstraint types take a single referenced column only.
    await executeSql(
      qi.sequelize,
      `ALTER TABLE sites ADD CONSTRAINT sites_customer_same_company
         FOREIGN KEY (company_id, customer_id) REFERENCES customers (company_id, id)
         ON DELETE CASCADE`,
    );
  },
  async down({ context: qi }) {
    await qi.removeConstraint('sites', 'sites_customer_same_company');
    await executeSql(
      qi.sequelize,
      `ALTER TABLE sites ADD CONSTRAINT sites_customer_id_foreign_idx
         FOREIGN KEY (customer_id) REFERENCES customers (id) ON DELETE CASCADE`,
    );
    await qi.removeIndex('customers', 'customers_company_id_id');
  },
};
