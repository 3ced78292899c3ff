// Customer search served by an index (docs/PERFORMANCE.md, "Search"): the words each customer
// is found by, keyed by (company_id, word), so a search reads the entries starting with its
// terms instead of testing a substring against every customer of the company. The service
// rewrites a customer's words in the same transaction as the change; this migration fills the
// table for the customers that exist. The words come from the same function the service uses.
import { DataTypes, QueryTypes } from 'sequelize';
import {
  searchWordLength,
  unsafeInsertSearchWords,
} from '../../modules/customers/customer-search-words.js';
import type { SearchWordRow } from '../../modules/customers/customer-search-words.js';
import { executeSql } from '../sql.js';
import type { Migration } from './types.js';

const batchSize = 1000;

export const customerSearchWordsMigration: Migration = {
  name: '0018-customer-search-words',
  async up({ context: qi }) {
    await qi.createTable('customer_search_words', {
      company_id: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
      word: { type: DataTypes.STRING(searchWordLength), allowNull: false, primaryKey: true },
      customer_id: { type: DataTypes.UUID, allowNull: false, primaryKey: true },
    });
    await qi.addIndex('customer_search_words', ['company_id', 'customer_id'], {
      name: 'customer_search_words_customer',
    });
    // Plain SQL: Sequelize 6's addConstraint types take a single referenced column only.
    await executeSql(
      qi.sequelize,
      `ALTER TABLE customer_search_words ADD CONSTRAINT customer_search_words_same_company
         FOREIGN KEY (company_id, customer_id) REFERENCES customers (company_id, id)
         ON DELETE CASCADE`,
    );
    for (let after = ''; ;) {
      const rows = await qi.sequelize.query<SearchWordRow>(
        `SELECT id, company_id AS companyId, name, email, phone FROM customers
         WHERE id > ? ORDER BY id LIMIT ?`,
        { replacements: [after, batchSize], type: QueryTypes.SELECT },
      );
      if (rows.length === 0) break;
      await unsafeInsertSearchWords(qi.sequelize, rows);
      after = rows[rows.length - 1]!.id;
    }
  },
  async down({ context: qi }) {
    await qi.dropTable('customer_search_words');
  },
};
