// POST /api/invoices/:id/send (the e-mail with the PDF and the pay link, only the token's hash
// stored), GET /api/invoices/:id/pdf parsed back, and the customer's GET
// /api/public/invoices/:token with its refusals.
import { createHash } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { executeSql, selectRows } from '@seamwright/api';
import { INVOICE_ROUNDING_RULE } from '@seamwright/domain';
import { testApp } from '../../fixtures/app.js';
import { newClient } from '../../fixtures/client.js';
import type { Client } from '../../fixtures/client.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { dollars, fold, pdfText } from '../estimate-document/pdf-text.js';
import { binary } from '../estimate-sending/sending-fixtures.js';
import {
  acceptedJob,
  createInvoice,
  getInvoice,
  payToken,
  sentDeposit,
  waitForInvoiceMail,
} from './invoice-fixtures.js';

describe('sending invoices and the customer’s view', () => {
  let team: Team;
  let customer: Client;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    customer = await newClient(testApp().app);
  });

  it('sends: status sent, e-mail with the PDF and /i/<token>, only the hash stored', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const invoice = await createInvoice(team.bookkeeper.client, {
      jobId: job.jobId,
      kind: 'deposit',
    });
    const res = await team.bookkeeper.client
      .post(`/api/invoices/${invoice.id}/send`, {})
      .expect(200);
    expect(res.body.data).toMatchObject({ status: 'sent', totalCents: job.depositCents });
    expect(res.body.data.sentAt).toEqual(expect.any(String));
    const mail = await waitForInvoiceMail(job.customerEmail, invoice.reference);
    const pdfs = (mail.attachments ?? []).filter((a) => a.contentType === 'application/pdf');
    expect(pdfs).toHaveLength(1);
    const token = payToken(mail);
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const rows = await selectRows<{ token_hash: string }>(
      testApp().sequelize,
      'SELECT token_hash FROM invoice_links WHERE invoice_id = ?',
      [invoice.id],
    );
    expect(rows.map((r) => r.token_hash)).toEqual([
      createHash('sha256').update(token).digest('hex'),
    ]);
    expect(JSON.stringify(rows)).not.toContain(token);
  });

  it('the PDF’s total and balance are the API’s', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const { invoice } = await sentDeposit(team.bookkeeper.client, job);
    await team.bookkeeper.client
      .post(`/api/invoices/${invoice.id}/payments`, {
        amountCents: 1234,
        method: 'cheque',
        receivedOn: '2026-11-20',
      })
      .expect(201);
    const view = await getInvoice(team.bookkeeper.client, invoice.id);
    const res = await team.office.client
      .get(`/api/invoices/${invoice.id}/pdf`)
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="invoice-INV-\d{6}\.pdf"$/,
    );
    const { text } = await pdfText(res.body as Buffer);
    expect(text).toContain(`Total ${dollars(view.totalCents)}`);
    expect(text).toContain(`Balance due ${dollars(view.balanceCents)}`);
    expect(view.balanceCents).toBe(job.depositCents - 1234);
    expect(text).toContain(view.reference);
    expect(text).toContain('Wren Halloway');
    expect(text).toContain(fold(INVOICE_ROUNDING_RULE.sentence));
  });

  it('the public view shows the invoice without a session, and hides the office’s fields', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const { invoice, token } = await sentDeposit(team.bookkeeper.client, job);
    const res = await customer.get(`/api/public/invoices/${token}`).expect(200);
    expect(res.body.data).toMatchObject({
      reference: invoice.reference,
      status: 'sent',
      totalCents: job.depositCents,
      balanceCents: job.depositCents,
      customer: { name: 'Wren Halloway' },
      roundingRule: INVOICE_ROUNDING_RULE.sentence,
    });
    expect(res.body.data.dueDate).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    const body = JSON.stringify(res.body);
    for (const hidden of ['customerId', 'jobId', 'links', 'createdBy', 'taxable'])
      expect(body).not.toContain(`"${hidden}"`);
  });

  it('refuses unknown, tampered, revoked (void) and expired links', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const { invoice, token } = await sentDeposit(team.bookkeeper.client, job);
    const flipped = `${token.slice(0, -1)}${token.endsWith('A') ? 'B' : 'A'}`;
    for (const bad of [flipped, 'short', `${token}x`, 'A'.repeat(43)])
      await customer.get(`/api/public/invoices/${bad}`).expect(404);
    await executeSql(
      testApp().sequelize,
      'UPDATE invoice_links SET expires_at = ? WHERE invoice_id = ?',
      [new Date(Date.now() - 1000), invoice.id],
    );
    const expired = await customer.get(`/api/public/invoices/${token}`).expect(410);
    expect(expired.body.code).toBe('TOKEN_INVALID');
    await executeSql(
      testApp().sequelize,
      'UPDATE invoice_links SET expires_at = ? WHERE invoice_id = ?',
      [new Date(Date.now() + 86_400_000), invoice.id],
    );
    await customer.get(`/api/public/invoices/${token}`).expect(200);
    await team.owner.client
      .post(`/api/invoices/${invoice.id}/void`, { reason: 'Sent to the wrong customer' })
      .expect(200);
    await customer.get(`/api/public/invoices/${token}`).expect(404);
  });

  it('a void invoice is not sent; a customer without e-mail needs `to`', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const invoice = await createInvoice(team.owner.client, { jobId: job.jobId, kind: 'deposit' });
    await team.owner.client.post(`/api/invoices/${invoice.id}/void`, { reason: 'x' }).expect(200);
    await team.owner.client.post(`/api/invoices/${invoice.id}/send`, {}).expect(409);
  });
});
