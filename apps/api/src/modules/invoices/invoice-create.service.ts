// Creating an invoice: its number (gapless, under the counter lock), lines and totals from the
// accepted estimate and the job's earlier invoices (@seamwright/domain planInvoice), in one
// transaction under the job lock, so two final invoices of one job never both count the same
// earlier invoices.
import {
  addCalendarDays,
  InvoicePlanError,
  localDateOf,
  MoneyInputError,
  planInvoice,
} from '@seamwright/domain';
import type { CreateInvoiceData, InvoiceSummaryView } from '@seamwright/shared';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import { AppError, notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { findOwnCompany } from '../company/company.repository.js';
import { companyRates } from '../estimates/estimate-build.js';
import { listEstimatesOfJob } from '../estimates/estimates.repository.js';
import { lockJob } from '../jobs/jobs.repository.js';
import { invoiceReference, toInvoiceSummary } from './invoice-view.js';
import {
  createInvoiceRow,
  ensureInvoiceCounter,
  listInvoicesOfJob,
  takeNumber,
} from './invoices.repository.js';

/** Jobs that take no more invoices. */
const closedJobStatuses = ['lost', 'cancelled', 'closed'];

function planError(error: unknown): never {
  if (error instanceof InvoicePlanError) {
    // No accepted estimate, or nothing left to bill, is the job's state (409); the rest is input.
    const conflict = error.reason === 'no-accepted-estimate' || error.reason === 'below-zero';
    throw new AppError(
      conflict ? 'CONFLICT' : 'VALIDATION_FAILED',
      `${error.path}: ${error.message}`,
      {
        errors: [{ path: error.path, message: error.message }],
      },
    );
  }
  if (error instanceof MoneyInputError)
    throw new AppError('VALIDATION_FAILED', error.message, {
      errors: [{ path: error.path, message: error.message }],
    });
  throw error;
}

export async function createInvoice(
  ctx: RequestContext,
  sequelize: Sequelize,
  input: CreateInvoiceData,
  now = new Date(),
): Promise<InvoiceSummaryView> {
  const [company, rates] = await Promise.all([findOwnCompany(ctx), companyRates(ctx)]);
  if (!company) throw notFound('Company');
  const today = localDateOf(now, company.timeZone);
  await ensureInvoiceCounter(ctx, sequelize);
  return inTransaction(sequelize, async (tx) => {
    const job = await lockJob(ctx, input.jobId, tx);
    if (!job) {
      const message = 'Job not found';
      throw new AppError('NOT_FOUND', message, { errors: [{ path: 'jobId', message }] });
    }
    if (closedJobStatuses.includes(job.status)) {
      const message = `The job is ${job.status}: it takes no more invoices`;
      throw new AppError('CONFLICT', message, { errors: [{ path: 'jobId', message }] });
    }
    const [estimates, earlier] = await Promise.all([
      listEstimatesOfJob(ctx, job.id, tx),
      listInvoicesOfJob(ctx, job.id, tx),
    ]);
    const accepted = estimates.find((e) => e.status === 'accepted') ?? null;
    let plan;
    try {
      plan = planInvoice({
        kind: input.kind,
        estimate: accepted && {
          reference: `E-${accepted.id.slice(0, 8).toUpperCase()} v${accepted.version}`,
          totalCents: accepted.totalCents,
          depositCents: accepted.depositCents,
        },
        lines: input.lines,
        earlier: earlier
          .filter((i) => i.status !== 'void')
          .map((i) => ({
            reference: invoiceReference(i.number),
            kind: i.kind as CreateInvoiceData['kind'],
            totalCents: i.totalCents,
          })),
        taxRateBasisPoints: rates.taxRateBasisPoints,
      });
    } catch (error) {
      planError(error);
    }
    // The number last, so the counter row is locked for as short a time as possible.
    const number = await takeNumber(ctx, sequelize, 'invoice', tx);
    const row = await createInvoiceRow(
      ctx,
      {
        jobId: job.id,
        customerId: job.customerId,
        estimateId: accepted?.id ?? null,
        number,
        kind: input.kind,
        status: 'draft',
        issuedOn: today,
        dueDate: addCalendarDays(today, company.invoiceDueDays),
        currency: company.currency,
        taxRateBasisPoints: rates.taxRateBasisPoints,
        subtotalCents: plan.subtotalCents,
        taxCents: plan.taxCents,
        totalCents: plan.totalCents,
        notes: input.notes ?? null,
        sentAt: null,
        voidedAt: null,
        voidReason: null,
        createdBy: ctx.userId,
      },
      plan.lines.map((l) => ({
        label: l.label,
        quantity: l.quantity,
        unit: l.unit,
        unitPriceCents: l.unitPriceCents,
        amountCents: l.amountCents,
        taxable: l.taxable,
      })),
      tx,
    );
    await recordAuditEvent(
      ctx,
      {
        action: 'job.invoice_created',
        entity: 'job',
        entityId: job.id,
        data: { invoiceId: row.id, number, kind: input.kind, totalCents: plan.totalCents },
      },
      tx,
    );
    return toInvoiceSummary({ ...row, customer: { name: '' } }, today);
  });
}
