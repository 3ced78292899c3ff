// A job with an accepted estimate (sent, then signed at the office so no cancellation period
// runs), ready to be invoiced.
import type { InvoiceSummaryView, InvoiceView } from '@seamwright/shared';
import type { Client } from '../../fixtures/client.js';
import { testAppUrl, testMail } from '../../fixtures/test-env.js';
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
  const mail = await waitForInvoiceMail(job.customerEmail, invoice.reference);
  return { invoice, token: payToken(mail) };
}

export interface InvoiceMail {
  subject: string;
  text?: string;
  html?: string;
  to: { address: string }[];
  attachments?: { fileName?: string; contentType: string }[];
}

/** Waits (up to 5 s) for the newest e-mail to `address` about invoice `reference`. */
export async function waitForInvoiceMail(address: string, reference: string) {
  const deadline = Date.now() + 5000;
  while (Date.now() < deadline) {
    const res = await fetch(`${testMail.webUrl}/api/email`);
    const match = ((await res.json()) as InvoiceMail[])
      .filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()))
      .filter((m) => m.subject.includes(`Invoice ${reference}`))
      .at(-1);
    if (match) return match;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error(`no e-mail about ${reference} to ${address} arrived`);
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
