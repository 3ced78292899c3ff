// Serves every customers-list query from an index (docs/PERFORMANCE.md has the EXPLAINs):
// - one index per sort order behind the status filter (`archived_at IS NULL` is an equality on
//   the index, so the rows come out in order without a sort); the name one also carries e-mail
//   and phone so a search is checked inside the index without reading the rows;
// - `customer_counts`: each company's active and archived totals, kept in the same
//   transaction as every customer insert, archive, restore and delete, so a list page reads its
//   total from one row instead of counting 20,000 index entries on every request.
import { DataTypes, QueryTypes } from 'sequelize';
import type { Migration } from './types.js';

const indexes: { name: string; fields: string[] }[] = [
  {
    name: 'customers_company_archived_name',
    fields: ['company_id', 'archived_at', 'name', 'id', 'email', 'phone'],
  },
  {
    name: 'customers_company_archived_created',
    fields: ['company_id', 'archived_at', 'created_at'],
  },
  {
    name: 'customers_company_archived_updated',
    fields: ['company_id', 'archived_at', 'updated_at'],
  },
  { name: 'customers_company_updated', fields: ['company_id', 'updated_at'] },
];

export const customerList: Migration = {
  name: '0006-customer-list',
  async up({ context: qi }) {
    for (const index of indexes) await qi.addIndex('customers', index.fields, { name: index.name });
    await qi.createTable('customer_counts', {
      company_id: {
        type: DataTypes.UUID,
        primaryKey: true,
        allowNull: false,
        references: { model: 'companies', key: 'id' },
        onDelete: 'CASCADE',
      },
      active: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      archived: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    });
    await qi.sequelize.query(
      `INSERT INTO customer_counts (company_id, active, archived)
       SELECT company_id, SUM(archived_at IS NULL), SUM(archived_at IS NOT NULL)
       FROM customers GROUP BY company_id`,
      { type: QueryTypes.INSERT },
    );
  },
  async down({ context: qi }) {
    await qi.dropTable('customer_counts');
    for (const index of indexes) await qi.removeIndex('customers', index.name);
  },
};
