// Demo invoices, made once (when the demo company has none) through the same services as the
// bookkeeper's requests, on the job whose estimate was signed at the office: the deposit sent
// and waiting, a progress invoice partly paid by cheque, and one overdue.
import { addCalendarDays, localDateOf } from '@seamwright/domain';
import type { RequestContext } from '../context.js';
import { CompanyModel, InvoiceModel, JobModel } from '../db/models/index.js';
import { inTransaction } from '../db/sequelize.js';
import type { Tx } from '../db/sequelize.js';
import { scoped } from '../db/tenant-scope.js';
import type { ServiceDeps } from '../deps.js';
import { createInvoice } from '../modules/invoices/invoice-create.service.js';
import { createInvoiceLink } from '../modules/invoices/invoice-money.repository.js';
import { recordManualPayment } from '../modules/invoices/invoice-payments.service.js';
import { updateInvoice } from '../modules/invoices/invoices.repository.js';
import { INVOICE_LINK_DAYS_AFTER_DUE } from '../modules/invoices/invoice-send.service.js';
import { createOneTimeToken } from '../tokens.js';

/** The job of the demo estimate signed at the office (demo-estimates.ts). */
const signedJobTitle = 'Front courtyard lawn';

export async function seedDemoInvoices(
  ctx: RequestContext,
  deps: Pick<ServiceDeps, 'sequelize'>,
): Promise<{ jobTitle: string; path: string }[]> {
  if ((await scoped(ctx, InvoiceModel).count()) > 0) return [];
  const { sequelize } = deps;
  const [job] = await scoped(ctx, JobModel).findAll({ where: { title: signedJobTitle } });
  const company = await CompanyModel.findByPk(ctx.companyId);
  if (!job || job.status !== 'accepted' || !company) return [];
  const today = localDateOf(new Date(), company.timeZone);

  /** Marked sent on `issuedOn` as sending would, with a pay link and no e-mail. */
  const markSent = (id: string, issuedOn: string, tx: Tx) => {
    const dueDate = addCalendarDays(issuedOn, company.invoiceDueDays);
    const { token, tokenHash } = createOneTimeToken();
    const expiresAt = new Date(
      Date.parse(`${addCalendarDays(dueDate, INVOICE_LINK_DAYS_AFTER_DUE)}T00:00:00Z`),
    );
    return Promise.all([
      updateInvoice(ctx, id, { status: 'sent', sentAt: new Date(), issuedOn, dueDate }, tx),
      createInvoiceLink(ctx, { invoiceId: id, tokenHash, expiresAt }, tx),
    ]).then(() => token);
  };

  const deposit = await createInvoice(ctx, sequelize, {
    jobId: job.id,
    kind: 'deposit',
    lines: [],
  });
  const depositToken = await inTransaction(sequelize, (tx) => markSent(deposit.id, today, tx));

  const progress = await createInvoice(ctx, sequelize, {
    jobId: job.id,
    kind: 'progress',
    lines: [
      {
        label: 'Old sod removed and hauled away',
        quantity: 1,
        unit: 'each',
        unitPriceCents: 68_000,
        taxable: true,
      },
    ],
  });
  await inTransaction(sequelize, (tx) => markSent(progress.id, addCalendarDays(today, -5), tx));
  await recordManualPayment(ctx, sequelize, progress.id, {
    amountCents: 30_000,
    method: 'cheque',
    receivedOn: today,
    reference: 'Cheque 1042',
  });

  const late = await createInvoice(ctx, sequelize, {
    jobId: job.id,
    kind: 'progress',
    lines: [
      {
        label: 'Sprinkler heads capped (8)',
        quantity: 8,
        unit: 'each',
        unitPriceCents: 1_850,
        taxable: true,
      },
    ],
  });
  // Issued 30 days ago: past its due day, so it shows as overdue.
  await inTransaction(sequelize, (tx) => markSent(late.id, addCalendarDays(today, -30), tx));
  return [{ jobTitle: signedJobTitle, path: `/i/${depositToken}` }];
}
