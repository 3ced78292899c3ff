// A job with an accepted estimate (sent, then signed at the office so no cancellation period
// runs), ready to be invoiced.
import type { InvoiceSummaryView, InvoiceView } from '@seamwright/shared';
import type { Client } from '../../fixtures/client.js';
import { waitForMail } from '../../fixtures/mail.js';
import { testAppUrl } from '../../fixtures/test-env.js';
import { pricedJob } from '../estimate-sending/sending-fixtures.js';
import type { PricedJob } from '../estimate-sending/sending-fixtures.js';

export interface AcceptedJob extends PricedJob {
  totalCents: number;
  depositCents: number;
}

/** `owner` sends the estimate; the office records the paper signature. */
export async function acceptedJob(owner: Client, office: Client = owner): Promise<AcceptedJob> {
  const job = await pricedJob(owner);
  await owner.post(`/api/estimates/${job.estimate.id}/send`, {}).expect(200);
  await office
    .post(`/api/estimates/${job.estimate.id}/acceptances`, {
      name: 'Wren Halloway',
      signedAt: new Date().toISOString(),
      place: 'office',
    })
    .expect(201);
  const res = await owner.get(`/api/estimates/${job.estimate.id}`).expect(200);
  const estimate = res.body.data as { totalCents: number; depositCents: number };
  return { ...job, totalCents: estimate.totalCents, depositCents: estimate.depositCents };
}

export async function createInvoice(
  client: Client,
  body: Record<string, unknown>,
): Promise<InvoiceSummaryView> {
  const res = await client.post('/api/invoices', body).expect(201);
  return res.body.data as InvoiceSummaryView;
}

export async function getInvoice(client: Client, id: string): Promise<InvoiceView> {
  const res = await client.get(`/api/invoices/${id}`).expect(200);
  return res.body.data as InvoiceView;
}

/** Creates and sends a deposit invoice; returns it and the pay-link token from the e-mail. */
export async function sentDeposit(client: Client, job: AcceptedJob) {
  const invoice = await createInvoice(client, { jobId: job.jobId, kind: 'deposit' });
  await client.post(`/api/invoices/${invoice.id}/send`, {}).expect(200);
  const mail = await waitForMail(job.customerEmail);
  return { invoice, token: payToken(mail) };
}

/** The token of the pay link (`${APP_URL}/i/<token>`) in a message. */
export function payToken(message: { text?: string; html?: string; subject: string }): string {
  const escaped = `${testAppUrl}/i/`.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');
  const match = new RegExp(`${escaped}([A-Za-z0-9_-]+)`).exec(message.text ?? message.html ?? '');
  if (!match?.[1]) throw new Error(`no pay link in "${message.subject}"`);
  return match[1];
}

export const progressLine = {
  label: 'Base preparation, first half',
  quantity: 1,
  unit: 'each',
  unitPriceCents: 50_000,
  taxable: true,
};
