// Payment reminders (issue 10, item 3).
//
// - `reminder_settings`: one row per company (absent = the standard schedule and wording).
// - `invoices.next_reminder_on`: the company-local day the worker should next look at the
//   invoice, NULL when nothing is scheduled (draft, paid, void, schedule finished). The index
//   leads with the day so the worker's claim reads only due rows across all companies.
// - `invoice_reminders`: every reminder sent, scheduled or by hand. The unique key on
//   (company_id, invoice_id, offset_days) is what makes a scheduled step impossible to log
//   twice; manual reminders carry offset_days NULL, and NULLs never collide.
import { DataTypes } from 'sequelize';
import { executeSql } from '../sql.js';
import type { Migration } from './types.js';

const companyColumn = {
  type: DataTypes.UUID,
  allowNull: false,
  references: { model: 'companies', key: 'id' },
  onDelete: 'CASCADE',
} as const;

export const reminders: Migration = {
  name: '0019-reminders',
  async up({ context: qi }) {
    await qi.createTable('reminder_settings', {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
      company_id: { ...companyColumn, unique: true },
      enabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      offsets: { type: DataTypes.JSON, allowNull: false },
      sender_name: { type: DataTypes.STRING(120), allowNull: true },
      templates: { type: DataTypes.JSON, allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addColumn('invoices', 'next_reminder_on', {
      type: DataTypes.DATEONLY,
      allowNull: true,
    });
    await qi.addIndex('invoices', ['next_reminder_on', 'company_id'], {
      name: 'invoices_next_reminder',
    });
    await qi.createTable('invoice_reminders', {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
      company_id: companyColumn,
      invoice_id: { type: DataTypes.UUID, allowNull: false },
      kind: { type: DataTypes.STRING(10), allowNull: false },
      offset_days: { type: DataTypes.INTEGER, allowNull: true },
      due_on: { type: DataTypes.DATEONLY, allowNull: true },
      sent_at: { type: DataTypes.DATE(3), allowNull: true },
      message_id: { type: DataTypes.STRING(255), allowNull: true },
      to_address: { type: DataTypes.STRING(320), allowNull: false },
      error: { type: DataTypes.STRING(500), allowNull: true },
      created_by: {
        type: DataTypes.UUID,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
      },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('invoice_reminders', ['company_id', 'invoice_id', 'offset_days'], {
      unique: true,
      name: 'invoice_reminders_step_once',
    });
    await qi.addIndex('invoice_reminders', ['company_id', 'invoice_id', 'created_at'], {
      name: 'invoice_reminders_company_invoice',
    });
    await executeSql(
      qi.sequelize,
      `ALTER TABLE invoice_reminders ADD CONSTRAINT invoice_reminders_invoice_same_company
         FOREIGN KEY (company_id, invoice_id) REFERENCES invoices (company_id, id)`,
    );
  },
  async down({ context: qi }) {
    await qi.dropTable('invoice_reminders');
    await qi.removeIndex('invoices', 'invoices_next_reminder');
    await qi.removeColumn('invoices', 'next_reminder_on');
    await qi.dropTable('reminder_settings');
  },
};
