// Counters for rate limits (failed sign-ins), shared by every API process through the database.
// Not tenant data: the limit applies before anyone is signed in. Keys are stored only as
// SHA-256 hashes so no e-mail address sits in this table.
import { DataTypes } from 'sequelize';
import type { Migration } from './types.js';

export const rateLimitHits: Migration = {
  name: '0002-rate-limit-hits',
  async up({ context: qi }) {
    await qi.createTable('rate_limit_hits', {
      key_hash: { type: DataTypes.CHAR(64), primaryKey: true, allowNull: false },
      hits: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      reset_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('rate_limit_hits', ['reset_at'], { name: 'rate_limit_hits_reset_at' });
  },
  async down({ context: qi }) {
    await qi.dropTable('rate_limit_hits');
  },
};
