// recordProcessorPayment (what the webhook route calls) and findInvoiceByToken: a card payment
// is recorded once per payment intent, however often and however concurrently it is reported.
import { beforeAll, describe, expect, it } from 'vitest';
import {
  findInvoiceByToken,
  inTransaction,
  recordProcessorPayment,
  selectRows,
} from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { acceptedJob, getInvoice, sentDeposit } from './invoice-fixtures.js';

describe('recordProcessorPayment and findInvoiceByToken', () => {
  let team: Team;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
  });

  it('finds the invoice by its pay-link token and records a card payment once per intent', async () => {
    const { sequelize } = testApp();
    const job = await acceptedJob(team.owner.client, team.office.client);
    const { invoice, token } = await sentDeposit(team.bookkeeper.client, job);
    const found = await findInvoiceByToken(token);
    expect(found).toMatchObject({ companyId: team.owner.me.company.id, invoiceId: invoice.id });
    expect(found.document.invoice.balanceCents).toBe(job.depositCents);
    await expect(findInvoiceByToken('A'.repeat(43))).rejects.toMatchObject({ code: 'NOT_FOUND' });

    const report = {
      companyId: found.companyId,
      invoiceId: invoice.id,
      amountCents: 1000,
      paymentIntentId: `pi_test_${invoice.id.slice(0, 8)}`,
      checkoutSessionId: `cs_test_${invoice.id.slice(0, 8)}`,
      receivedAt: new Date(),
    };
    const first = await inTransaction(sequelize, (tx) => recordProcessorPayment(report, tx));
    expect(first.created).toBe(true);
    expect(first.payment).toMatchObject({ method: 'card', amountCents: 1000 });
    // Ten concurrent deliveries of the same report, and one more after: nothing changes.
    const again = await Promise.all(
      Array.from({ length: 10 }, () =>
        inTransaction(sequelize, (tx) => recordProcessorPayment(report, tx)),
      ),
    );
    expect(again.every((r) => !r.created && r.payment.id === first.payment.id)).toBe(true);
    const rows = await selectRows(sequelize, 'SELECT id FROM payments WHERE invoice_id = ?', [
      invoice.id,
    ]);
    expect(rows).toHaveLength(1);
    const view = await getInvoice(team.bookkeeper.client, invoice.id);
    expect(view).toMatchObject({
      status: 'partly_paid',
      paidCents: 1000,
      balanceCents: job.depositCents - 1000,
    });
    // The rest by card makes it paid.
    await inTransaction(sequelize, (tx) =>
      recordProcessorPayment(
        {
          ...report,
          amountCents: job.depositCents - 1000,
          paymentIntentId: `${report.paymentIntentId}_2`,
          checkoutSessionId: `${report.checkoutSessionId}_2`,
        },
        tx,
      ),
    );
    expect((await getInvoice(team.bookkeeper.client, invoice.id)).status).toBe('paid');
  });

  it('another company’s invoice is not found', async () => {
    const job = await acceptedJob(team.owner.client, team.office.client);
    const { invoice } = await sentDeposit(team.bookkeeper.client, job);
    const other = await signUpTeam(testApp().app);
    await expect(
      inTransaction(testApp().sequelize, (tx) =>
        recordProcessorPayment(
          {
            companyId: other.owner.me.company.id,
            invoiceId: invoice.id,
            amountCents: 100,
            paymentIntentId: 'pi_cross',
            checkoutSessionId: null,
            receivedAt: new Date(),
          },
          tx,
        ),
      ),
    ).rejects.toMatchObject({ code: 'NOT_FOUND' });
  });
});
