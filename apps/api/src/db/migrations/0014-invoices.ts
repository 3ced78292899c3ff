// Invoices, their lines, payments, credit notes and the customer's pay links.
//
// - Numbers are gapless per company: `invoice_counters` holds one row per company with the next
//   invoice number and, in its own sequence, the next credit-note number; the row is locked
//   (SELECT … FOR UPDATE) in the transaction that takes a number, so a rolled-back creation
//   gives its number back and two creations never take the same one. The unique keys on
//   (company_id, number) are the last line of defence.
// - Every child points at its parent through (company_id, …) like the other tenant tables
//   (0004, 0010, 0011), so no row can hang under another company's invoice, job or customer.
// - An invoice is never deleted, only voided (voided_at, void_reason).
// - A processor payment's ids are unique per company, so a webhook delivered twice records one
//   payment.
import { DataTypes } from 'sequelize';
import { executeSql } from '../sql.js';
import type { Migration } from './types.js';

const companyColumn = {
  type: DataTypes.UUID,
  allowNull: false,
  references: { model: 'companies', key: 'id' },
  onDelete: 'CASCADE',
} as const;
const userColumn = {
  type: DataTypes.UUID,
  allowNull: true,
  references: { model: 'users', key: 'id' },
  onDelete: 'SET NULL',
} as const;
const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false } as const;
const cents = { type: DataTypes.BIGINT, allowNull: false } as const;
const createdAt = { type: DataTypes.DATE(3), allowNull: false } as const;

async function sameCompany(
  qi: Parameters<Migration['up']>[0]['context'],
  table: string,
  name: string,
  columns: string,
  parent: string,
) {
  // Plain SQL: Sequelize 6's addConstraint types take a single referenced column only.
  await executeSql(
    qi.sequelize,
    `ALTER TABLE ${table} ADD CONSTRAINT ${table}_${name}_same_company
       FOREIGN KEY (company_id, ${columns}) REFERENCES ${parent} (company_id, id)`,
  );
}

export const invoices: Migration = {
  name: '0014-invoices',
  async up({ context: qi }) {
    await qi.addColumn('companies', 'invoice_due_days', {
      type: DataTypes.INTEGER,
      allowNull: false,
      defaultValue: 14,
    });
    await qi.createTable('invoice_counters', {
      company_id: { ...companyColumn, primaryKey: true },
      next_number: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      next_credit_note_number: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    });
    await qi.createTable('invoices', {
      id,
      company_id: companyColumn,
      job_id: { type: DataTypes.UUID, allowNull: false },
      customer_id: { type: DataTypes.UUID, allowNull: false },
      estimate_id: { type: DataTypes.UUID, allowNull: true },
      number: { type: DataTypes.INTEGER, allowNull: false },
      kind: { type: DataTypes.STRING(10), allowNull: false },
      status: { type: DataTypes.STRING(12), allowNull: false },
      issued_on: { type: DataTypes.DATEONLY, allowNull: false },
      due_date: { type: DataTypes.DATEONLY, allowNull: false },
      currency: { type: DataTypes.CHAR(3), allowNull: false },
      tax_rate_basis_points: { type: DataTypes.INTEGER, allowNull: false },
      subtotal_cents: cents,
      tax_cents: cents,
      total_cents: cents,
      // Kept totals, changed in the same transaction as the row they sum.
      paid_cents: { ...cents, defaultValue: 0 },
      refunded_cents: { ...cents, defaultValue: 0 },
      credited_cents: { ...cents, defaultValue: 0 },
      notes: { type: DataTypes.TEXT, allowNull: true },
      sent_at: { type: DataTypes.DATE(3), allowNull: true },
      voided_at: { type: DataTypes.DATE(3), allowNull: true },
      void_reason: { type: DataTypes.STRING(500), allowNull: true },
      created_by: userColumn,
      created_at: createdAt,
      updated_at: createdAt,
    });
    await qi.addIndex('invoices', ['company_id', 'id'], {
      unique: true,
      name: 'invoices_company_id_id',
    });
    await qi.addIndex('invoices', ['company_id', 'number'], {
      unique: true,
      name: 'invoices_company_number',
    });
    // The list's filters: by status (with the due day, which splits sent from overdue), by
    // customer, and a job's invoices; each ordered by number.
    await qi.addIndex('invoices', ['company_id', 'status', 'due_date', 'number'], {
      name: 'invoices_company_status_due',
    });
    await qi.addIndex('invoices', ['company_id', 'customer_id', 'number'], {
      name: 'invoices_company_customer',
    });
    await qi.addIndex('invoices', ['company_id', 'job_id', 'number'], {
      name: 'invoices_company_job',
    });
    await sameCompany(qi, 'invoices', 'job', 'job_id', 'jobs');
    await sameCompany(qi, 'invoices', 'customer', 'customer_id', 'customers');
    await sameCompany(qi, 'invoices', 'estimate', 'estimate_id', 'estimates');

    await qi.createTable('invoice_lines', {
      id,
      company_id: companyColumn,
      invoice_id: { type: DataTypes.UUID, allowNull: false },
      position: { type: DataTypes.INTEGER, allowNull: false },
      label: { type: DataTypes.STRING(300), allowNull: false },
      quantity: { type: DataTypes.DECIMAL(18, 6), allowNull: false },
      unit: { type: DataTypes.STRING(30), allowNull: false },
      unit_price_cents: cents,
      amount_cents: cents,
      taxable: { type: DataTypes.BOOLEAN, allowNull: false },
    });
    await qi.addIndex('invoice_lines', ['company_id', 'invoice_id', 'position'], {
      unique: true,
      name: 'invoice_lines_company_invoice_position',
    });
    await sameCompany(qi, 'invoice_lines', 'invoice', 'invoice_id', 'invoices');

    await qi.createTable('payments', {
      id,
      company_id: companyColumn,
      invoice_id: { type: DataTypes.UUID, allowNull: false },
      method: { type: DataTypes.STRING(20), allowNull: false },
      amount_cents: cents,
      refunded_cents: { ...cents, defaultValue: 0 },
      received_on: { type: DataTypes.DATEONLY, allowNull: false },
      received_at: { type: DataTypes.DATE(3), allowNull: true },
      reference: { type: DataTypes.STRING(200), allowNull: true },
      processor_payment_intent_id: { type: DataTypes.STRING(255), allowNull: true },
      processor_checkout_session_id: { type: DataTypes.STRING(255), allowNull: true },
      recorded_by: userColumn,
      created_at: createdAt,
    });
    await qi.addIndex('payments', ['company_id', 'invoice_id', 'received_on'], {
      name: 'payments_company_invoice',
    });
    // NULLs never collide in a unique key, so manual payments are not held back by these.
    await qi.addIndex('payments', ['company_id', 'processor_payment_intent_id'], {
      unique: true,
      name: 'payments_company_payment_intent',
    });
    await qi.addIndex('payments', ['company_id', 'processor_checkout_session_id'], {
      unique: true,
      name: 'payments_company_checkout_session',
    });
    await sameCompany(qi, 'payments', 'invoice', 'invoice_id', 'invoices');

    await qi.createTable('credit_notes', {
      id,
      company_id: companyColumn,
      invoice_id: { type: DataTypes.UUID, allowNull: false },
      number: { type: DataTypes.INTEGER, allowNull: false },
      amount_cents: cents,
      reason: { type: DataTypes.STRING(500), allowNull: false },
      issued_on: { type: DataTypes.DATEONLY, allowNull: false },
      created_by: userColumn,
      created_at: createdAt,
    });
    await qi.addIndex('credit_notes', ['company_id', 'number'], {
      unique: true,
      name: 'credit_notes_company_number',
    });
    await qi.addIndex('credit_notes', ['company_id', 'invoice_id'], {
      name: 'credit_notes_company_invoice',
    });
    await sameCompany(qi, 'credit_notes', 'invoice', 'invoice_id', 'invoices');

    await qi.createTable('invoice_links', {
      id,
      company_id: companyColumn,
      invoice_id: { type: DataTypes.UUID, allowNull: false },
      token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE(3), allowNull: false },
      revoked_at: { type: DataTypes.DATE(3), allowNull: true },
      created_at: createdAt,
    });
    await qi.addIndex('invoice_links', ['company_id', 'invoice_id'], {
      name: 'invoice_links_company_invoice',
    });
    await sameCompany(qi, 'invoice_links', 'invoice', 'invoice_id', 'invoices');
  },
  async down({ context: qi }) {
    for (const table of ['invoice_links', 'credit_notes', 'payments', 'invoice_lines', 'invoices'])
      await qi.dropTable(table);
    await qi.dropTable('invoice_counters');
    await qi.removeColumn('companies', 'invoice_due_days');
  },
};
