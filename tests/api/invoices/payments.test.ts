// Manual payments, credit notes and void: balance and status, over-payment refused naming
// amountCents, the job moving to paid with its final invoice, nothing half-saved.
import { beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import type { InvoiceView, JobView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { errorPaths } from '../../fixtures/estimates.js';
import { moveJob, signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { acceptedJob, createInvoice, getInvoice, progressLine } from './invoice-fixtures.js';

const cheque = (amountCents: number) => ({
  amountCents,
  method: 'cheque',
  receivedOn: '2026-11-20',
});

async function countRows(table: string, invoiceId: string): Promise<number> {
  const [row] = await selectRows<{ n: unknown }>(
    testApp().sequelize,
    `SELECT COUNT(*) AS n FROM ${table} WHERE invoice_id = ?`,
    [invoiceId],
  );
  return Number(row?.n);
}

describe('payments, credit notes and void', () => {
  let team: Team;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
  });

  const sentProgress = async (unitPriceCents = 100_000) => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const invoice = await createInvoice(team.bookkeeper.client, {
      jobId: job.jobId,
      kind: 'progress',
      lines: [{ ...progressLine, unitPriceCents }],
    });
    await team.bookkeeper.client.post(`/api/invoices/${invoice.id}/send`, {}).expect(200);
    return { job, invoice };
  };

  it('a payment makes it partly paid, the rest makes it paid; more than the balance is 409', async () => {
    const { client } = team.bookkeeper;
    const { invoice } = await sentProgress();
    const first = await client.post(`/api/invoices/${invoice.id}/payments`, cheque(40_000));
    expect(first.status).toBe(201);
    expect(first.body.data).toMatchObject({ status: 'partly_paid', balanceCents: 60_000 });
    const over = await client
      .post(`/api/invoices/${invoice.id}/payments`, cheque(60_001))
      .expect(409);
    expect(over.headers['content-type']).toMatch(/problem\+json/);
    expect(errorPaths(over.body)).toEqual(['amountCents']);
    expect(await countRows('payments', invoice.id)).toBe(1);
    await client.post(`/api/invoices/${invoice.id}/payments`, cheque(60_000)).expect(201);
    const paid = await getInvoice(client, invoice.id);
    expect(paid).toMatchObject({ status: 'paid', balanceCents: 0, paidCents: 100_000 });
    expect(paid.payments.map((p) => [p.method, p.amountCents])).toEqual([
      ['cheque', 40_000],
      ['cheque', 60_000],
    ]);
  });

  it('refuses a draft, bad methods and amounts, naming the field', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const draft = await createInvoice(team.owner.client, {
      jobId: job.jobId,
      kind: 'progress',
      lines: [progressLine],
    });
    const client = team.owner.client;
    const res = await client.post(`/api/invoices/${draft.id}/payments`, cheque(100)).expect(409);
    expect(errorPaths(res.body)).toEqual(['amountCents']);
    const method = await client
      .post(`/api/invoices/${draft.id}/payments`, { ...cheque(100), method: 'card' })
      .expect(400);
    expect(errorPaths(method.body)).toEqual(['method']);
    const amount = await client
      .post(`/api/invoices/${draft.id}/payments`, { ...cheque(0), receivedOn: 'soon' })
      .expect(400);
    expect(errorPaths(amount.body).sort()).toEqual(['amountCents', 'receivedOn']);
  });

  it('credit notes lower the balance, are numbered in their own gapless sequence and never exceed it', async () => {
    const { client } = team.bookkeeper;
    const { invoice } = await sentProgress(20_000);
    const a = await client
      .post(`/api/invoices/${invoice.id}/credit-notes`, { amountCents: 5000, reason: 'Goodwill' })
      .expect(201);
    expect(a.body.data).toMatchObject({
      balanceCents: 15_000,
      creditedCents: 5000,
      status: 'sent',
    });
    const over = await client
      .post(`/api/invoices/${invoice.id}/credit-notes`, { amountCents: 15_001, reason: 'Too much' })
      .expect(409);
    expect(errorPaths(over.body)).toEqual(['amountCents']);
    const b = await client
      .post(`/api/invoices/${invoice.id}/credit-notes`, { amountCents: 15_000, reason: 'Rest' })
      .expect(201);
    expect(b.body.data.status).toBe('paid');
    const numbers = (b.body.data.creditNotes as { number: number }[]).map((c) => c.number);
    expect(numbers[1]).toBe(numbers[0]! + 1);
    const noReason = await client
      .post(`/api/invoices/${invoice.id}/credit-notes`, { amountCents: 1 })
      .expect(400);
    expect(errorPaths(noReason.body)).toEqual(['reason']);
  });

  it('void: only without payments; a void invoice takes no payment and keeps its number', async () => {
    const { client } = team.bookkeeper;
    const { invoice } = await sentProgress();
    const noReason = await client.post(`/api/invoices/${invoice.id}/void`, {}).expect(400);
    expect(errorPaths(noReason.body)).toEqual(['reason']);
    const voided = await client
      .post(`/api/invoices/${invoice.id}/void`, { reason: 'Billed the wrong job' })
      .expect(200);
    expect(voided.body.data).toMatchObject({
      status: 'void',
      number: invoice.number,
      voidReason: 'Billed the wrong job',
    });
    const links = (voided.body.data as InvoiceView).links;
    expect(links.length).toBeGreaterThan(0);
    expect(links.every((l) => l.revokedAt)).toBe(true);
    await client.post(`/api/invoices/${invoice.id}/payments`, cheque(1)).expect(409);
    const paid = await sentProgress();
    await client.post(`/api/invoices/${paid.invoice.id}/payments`, cheque(1)).expect(201);
    const refused = await client
      .post(`/api/invoices/${paid.invoice.id}/void`, { reason: 'Oops' })
      .expect(409);
    expect(errorPaths(refused.body)).toEqual(['status']);
    expect((await getInvoice(client, paid.invoice.id)).status).toBe('partly_paid');
  });

  it('sending the final invoice makes an installed job invoiced; paying it makes the job paid', async () => {
    const { client } = team.bookkeeper;
    const job = await acceptedJob(team.owner.client, team.office.client);
    const deposit = await createInvoice(client, { jobId: job.jobId, kind: 'deposit' });
    await client.post(`/api/invoices/${deposit.id}/send`, {}).expect(200);
    await client
      .post(`/api/invoices/${deposit.id}/payments`, cheque(deposit.totalCents))
      .expect(201);
    await moveJob(team.owner.client, job.jobId, ['scheduled', 'in_progress', 'installed']);
    const final = await createInvoice(client, { jobId: job.jobId, kind: 'final' });
    expect(final.totalCents).toBe(job.totalCents - job.depositCents);
    await client.post(`/api/invoices/${final.id}/send`, {}).expect(200);
    const status = async () =>
      ((await team.owner.client.get(`/api/jobs/${job.jobId}`).expect(200)).body.data as JobView)
        .status;
    expect(await status()).toBe('invoiced');
    await client.post(`/api/invoices/${final.id}/payments`, cheque(1000)).expect(201);
    expect(await status()).toBe('invoiced');
    await client
      .post(`/api/invoices/${final.id}/payments`, {
        ...cheque(final.totalCents - 1000),
        method: 'bank_transfer',
      })
      .expect(201);
    expect(await status()).toBe('paid');
  }, 30_000);
});
