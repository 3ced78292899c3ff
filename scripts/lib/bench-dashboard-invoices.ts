// The dashboard benchmark's invoices and payments (scripts/lib/bench-dashboard-seed.ts).
import { randomUUID } from 'node:crypto';
import type { Connection } from 'mariadb';
import { day, insert, isoDay } from './bench-dashboard-insert.js';

export async function seedDashboardInvoices(
  conn: Connection,
  companyId: string,
  jobOf: readonly { id: string; customerId: string }[],
  counts: { jobs: number; invoices: number },
  now: number,
  span: number,
): Promise<void> {
  // Invoices: 10 per job on average, issued over the two years; 85 % paid, 8 % sent, 4 % partly
  // paid, 2 % void, 1 % draft.
  const invoiceColumns = [
    'id',
    'company_id',
    'job_id',
    'customer_id',
    'number',
    'kind',
    'status',
    'issued_on',
    'due_date',
    'currency',
    'tax_rate_basis_points',
    'subtotal_cents',
    'tax_cents',
    'total_cents',
    'paid_cents',
    'refunded_cents',
    'credited_cents',
    'sent_at',
    'created_at',
    'updated_at',
  ];
  const paymentColumns = [
    'id',
    'company_id',
    'invoice_id',
    'method',
    'amount_cents',
    'refunded_cents',
    'received_on',
    'created_at',
  ];
  let invoices: unknown[][] = [];
  let payments: unknown[][] = [];
  for (let i = 0; i < counts.invoices; i += 1) {
    const job = jobOf[i % counts.jobs] as { id: string; customerId: string };
    const issued = now - span + Math.floor((i / counts.invoices) * span);
    const roll = i % 100;
    const status =
      roll < 85
        ? 'paid'
        : roll < 93
          ? 'sent'
          : roll < 97
            ? 'partly_paid'
            : roll < 99
              ? 'void'
              : 'draft';
    const subtotal = 20_000 + (i % 97) * 1_000;
    const tax = Math.round(subtotal * 0.0825);
    const total = subtotal + tax;
    const paid = status === 'paid' ? total : status === 'partly_paid' ? Math.floor(total / 2) : 0;
    const id = randomUUID();
    const issuedAt = new Date(issued);
    invoices.push([
      id,
      companyId,
      job.id,
      job.customerId,
      i + 1,
      i % 3 === 0 ? 'deposit' : 'progress',
      status,
      isoDay(issued),
      isoDay(issued + 14 * day),
      'USD',
      825,
      subtotal,
      tax,
      total,
      paid,
      0,
      0,
      status === 'draft' ? null : issuedAt,
      issuedAt,
      issuedAt,
    ]);
    if (paid > 0)
      payments.push([
        randomUUID(),
        companyId,
        id,
        i % 2 ? 'cheque' : 'card',
        paid,
        0,
        isoDay(issued + (i % 20) * day),
        issuedAt,
      ]);
    if (invoices.length >= 20_000) {
      await insert(conn, 'invoices', invoiceColumns, invoices);
      await insert(conn, 'payments', paymentColumns, payments);
      invoices = [];
      payments = [];
    }
  }
  await insert(conn, 'invoices', invoiceColumns, invoices);
  await insert(conn, 'payments', paymentColumns, payments);
}
