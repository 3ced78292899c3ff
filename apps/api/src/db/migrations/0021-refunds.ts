// Refunds of card payments, made by the owner through the processor. One row per refund, keyed
// by the processor's refund id (unique per company), so the refund recorded when the owner
// asks and the `refund.created` webhook that follows are one record, whichever lands first.
import { DataTypes } from 'sequelize';
import { executeSql } from '../sql.js';
import type { Migration } from './types.js';

export const refunds: Migration = {
  name: '0021-refunds',
  async up({ context: qi }) {
    // A refund points at its payment through (company_id, id), as every child row does.
    await qi.addIndex('payments', ['company_id', 'id'], {
      unique: true,
      name: 'payments_company_id_id',
    });
    await qi.createTable('refunds', {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
      company_id: {
        type: DataTypes.UUID,
        allowNull: false,
        references: { model: 'companies', key: 'id' },
        onDelete: 'CASCADE',
      },
      invoice_id: { type: DataTypes.UUID, allowNull: false },
      payment_id: { type: DataTypes.UUID, allowNull: false },
      amount_cents: { type: DataTypes.BIGINT, allowNull: false },
      reason: { type: DataTypes.STRING(500), allowNull: false },
      processor_refund_id: { type: DataTypes.STRING(255), allowNull: false },
      created_by: {
        type: DataTypes.UUID,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
      },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('refunds', ['company_id', 'processor_refund_id'], {
      unique: true,
      name: 'refunds_company_processor_refund',
    });
    await qi.addIndex('refunds', ['company_id', 'invoice_id'], { name: 'refunds_company_invoice' });
    for (const [name, column, parent] of [
      ['invoice', 'invoice_id', 'invoices'],
      ['payment', 'payment_id', 'payments'],
    ] as const)
      await executeSql(
        qi.sequelize,
        `ALTER TABLE refunds ADD CONSTRAINT refunds_${name}_same_company
           FOREIGN KEY (company_id, ${column}) REFERENCES ${parent} (company_id, id)`,
      );
  },
  async down({ context: qi }) {
    await qi.dropTable('refunds');
    await qi.removeIndex('payments', 'payments_company_id_id');
  },
};
