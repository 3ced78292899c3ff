// Indexes for the receivables reports and the owner's dashboard (issue 10), measured with
// `pnpm bench:dashboard` (200,000 invoices, 20,000 jobs; figures and EXPLAINs in
// docs/PERFORMANCE.md). Each one lets its query read the index alone (covering) or dive by key.
import type { Migration } from './types.js';

const indexes: { table: string; name: string; fields: string[] }[] = [
  // Aging and statements: owing invoices (status sent/partly paid) issued by a day, summed per
  // customer and due day from the kept totals, without touching the rows.
  {
    table: 'invoices',
    name: 'invoices_company_owing',
    fields: [
      'company_id',
      'status',
      'customer_id',
      'due_date',
      'issued_on',
      'total_cents',
      'paid_cents',
      'refunded_cents',
      'credited_cents',
    ],
  },
  // Invoiced per month: a range of issue days.
  {
    table: 'invoices',
    name: 'invoices_company_issued',
    fields: ['company_id', 'issued_on', 'status', 'total_cents'],
  },
  // Collected per month: a range of receipt days.
  {
    table: 'payments',
    name: 'payments_company_received',
    fields: ['company_id', 'received_on', 'amount_cents', 'refunded_cents'],
  },
  // Pipeline: each job's latest version and its total, one index dive per job.
  {
    table: 'estimates',
    name: 'estimates_company_job_latest',
    fields: ['company_id', 'job_id', 'version', 'total_cents', 'status', 'subtotal_cents'],
  },
  // Win rate: estimates sent in the period.
  {
    table: 'estimates',
    name: 'estimates_company_sent',
    fields: ['company_id', 'sent_at', 'status', 'valid_until'],
  },
  // Installed in the period: the job history's status changes by time.
  {
    table: 'audit_events',
    name: 'audit_events_company_action',
    fields: ['company_id', 'action', 'created_at'],
  },
  // Remnants returned from a job (material actually used).
  { table: 'rolls', name: 'rolls_company_source_job', fields: ['company_id', 'source_job_id'] },
];

export const reportIndexes: Migration = {
  name: '0020-report-indexes',
  async up({ context: qi }) {
    for (const index of indexes) await qi.addIndex(index.table, index.fields, { name: index.name });
  },
  async down({ context: qi }) {
    for (const index of [...indexes].reverse()) await qi.removeIndex(index.table, index.name);
  },
};
