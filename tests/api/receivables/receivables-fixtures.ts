// Invoices with known due dates, built through the API: a customer, a site and a job, then a
// progress invoice (no estimate needed) sent while the company's payment terms are set to the
// days wanted. The terms have no API yet (the invoices work keeps the 14-day default), so the
// setting alone is written in SQL; the invoice itself is the API's.
import type { InvoiceSummaryView } from '@seamwright/shared';
import { executeSql } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import type { Client } from '../../fixtures/client.js';
import { createCustomer, createJob, createSite, uniqueEmail } from '../../fixtures/factories.js';

export interface CustomerJob {
  customerId: string;
  name: string;
  email: string;
  jobId: string;
}

export async function customerWithJob(client: Client, name: string): Promise<CustomerJob> {
  const email = uniqueEmail('statement');
  const customer = await createCustomer(client, { name, email });
  const site = await createSite(client, customer.id);
  const job = await createJob(client, customer.id, site.id, `${name} lawn`);
  return { customerId: customer.id, name, email, jobId: job.id };
}

export async function setPaymentTerms(companyId: string, days: number): Promise<void> {
  await executeSql(testApp().sequelize, 'UPDATE companies SET invoice_due_days = ? WHERE id = ?', [
    days,
    companyId,
  ]);
}

/** A progress invoice of `cents` (untaxed), sent with `dueInDays` terms; returns it as sent. */
export async function sentInvoice(
  client: Client,
  companyId: string,
  jobId: string,
  cents: number,
  dueInDays: number,
): Promise<InvoiceSummaryView> {
  const created = await client
    .post('/api/invoices', {
      jobId,
      kind: 'progress',
      lines: [
        { label: 'Turf work', quantity: 1, unit: 'each', unitPriceCents: cents, taxable: false },
      ],
    })
    .expect(201);
  await setPaymentTerms(companyId, dueInDays);
  const sent = await client.post(`/api/invoices/${created.body.data.id}/send`, {}).expect(200);
  return sent.body.data as InvoiceSummaryView;
}

export async function pay(client: Client, invoiceId: string, cents: number, receivedOn: string) {
  await client
    .post(`/api/invoices/${invoiceId}/payments`, {
      amountCents: cents,
      method: 'cheque',
      receivedOn,
    })
    .expect(201);
}

export async function credit(client: Client, invoiceId: string, cents: number) {
  await client
    .post(`/api/invoices/${invoiceId}/credit-notes`, { amountCents: cents, reason: 'Goodwill' })
    .expect(201);
}

/** Every invoice of the company through the API's own list (pages of 100). */
export async function listAllInvoices(client: Client): Promise<InvoiceSummaryView[]> {
  const all: InvoiceSummaryView[] = [];
  for (let page = 1; ; page += 1) {
    const res = await client.get(`/api/invoices?page=${page}&pageSize=100`).expect(200);
    const rows = res.body.data as InvoiceSummaryView[];
    all.push(...rows);
    if (all.length >= res.body.meta.total || rows.length === 0) return all;
  }
}
