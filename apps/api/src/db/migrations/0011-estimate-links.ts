// The customer's private links to a sent estimate, and the customer's answer to it.
// A link keeps only the SHA-256 of its token (the raw token lives only in the e-mail), expires,
// and can be revoked. An answer is an acceptance (online, or signed on paper at the customer's
// home or the office) or a decline; one estimate has at most one answer (the unique key makes
// two simultaneous acceptances impossible). Both point at their estimate through
// (company_id, estimate_id), like estimates → jobs (0010), so no row hangs under another
// company's estimate.
import { DataTypes } from 'sequelize';
import { executeSql } from '../sql.js';
import type { Migration } from './types.js';

const companyColumn = {
  type: DataTypes.UUID,
  allowNull: false,
  references: { model: 'companies', key: 'id' },
  onDelete: 'CASCADE',
} as const;

export const estimateLinks: Migration = {
  name: '0011-estimate-links',
  async up({ context: qi }) {
    // The parent key the children reference.
    await qi.addIndex('estimates', ['company_id', 'id'], {
      unique: true,
      name: 'estimates_company_id_id',
    });
    await qi.createTable('estimate_links', {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
      company_id: companyColumn,
      estimate_id: { type: DataTypes.UUID, allowNull: false },
      token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE(3), allowNull: false },
      revoked_at: { type: DataTypes.DATE(3), allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.createTable('estimate_answers', {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
      company_id: companyColumn,
      estimate_id: { type: DataTypes.UUID, allowNull: false },
      kind: { type: DataTypes.STRING(10), allowNull: false },
      name: { type: DataTypes.STRING(200), allowNull: true },
      tier_id: { type: DataTypes.STRING(36), allowNull: true },
      place: { type: DataTypes.STRING(10), allowNull: false },
      signed_at: { type: DataTypes.DATE(3), allowNull: false },
      ip: { type: DataTypes.STRING(64), allowNull: true },
      user_agent: { type: DataTypes.STRING(500), allowNull: true },
      reason: { type: DataTypes.TEXT, allowNull: true },
      cancellation_ends_at: { type: DataTypes.DATE(3), allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    // Plain SQL: Sequelize 6's addConstraint types take a single referenced column only.
    for (const table of ['estimate_links', 'estimate_answers'])
      await executeSql(
        qi.sequelize,
        `ALTER TABLE ${table}
           ADD CONSTRAINT ${table}_estimate_same_company
             FOREIGN KEY (company_id, estimate_id) REFERENCES estimates (company_id, id)`,
      );
    await qi.addIndex('estimate_links', ['company_id', 'estimate_id'], {
      name: 'estimate_links_company_estimate',
    });
    await qi.addIndex('estimate_answers', ['company_id', 'estimate_id'], {
      unique: true,
      name: 'estimate_answers_one_per_estimate',
    });
  },
  async down({ context: qi }) {
    await qi.dropTable('estimate_answers');
    await qi.dropTable('estimate_links');
    await qi.removeIndex('estimates', 'estimates_company_id_id');
  },
};
