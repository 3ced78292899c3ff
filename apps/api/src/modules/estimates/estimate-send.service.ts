// Sending an estimate to the customer: a new private link (only its hash is stored) and the
// estimate frozen as sent, in one transaction; after commit, the e-mail with the PDF attached.
import { longCalendarDate, startOfLocalDay, addCalendarDays } from '@seamwright/domain';
import type { EstimateView, SendEstimateData } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { AppError, notFound } from '../../errors.js';
import { estimateMail } from '../../mail/templates.js';
import { createOneTimeToken } from '../../tokens.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { renderEstimatePdf } from '../estimate-document/index.js';
import { getEstimateForDocument } from './estimate-document.service.js';
import type { EstimateDocument } from './estimate-document.service.js';
import { estimateNumber, toEstimateDocumentInput, validityOf } from './estimate-document-input.js';
import { createEstimateLink, revokeEstimateLinks } from './estimate-links.repository.js';
import { markEstimateSent } from './estimate-sending.service.js';
import { findEstimate } from './estimates.repository.js';

/** The customer's page for a link; the web app serves it (after this step). */
export function customerPageUrl(appUrl: string, token: string): string {
  return `${appUrl}/e/${token}`;
}

/** The link works until the end (local midnight) of the estimate's last valid day. */
function linkExpiry(doc: EstimateDocument, now: Date): { expiresAt: Date; validUntil: string } {
  const { validUntil } = validityOf(doc, now);
  const expiresAt = startOfLocalDay(addCalendarDays(validUntil, 1), doc.company.timeZone);
  if (expiresAt <= now) {
    const message = `The estimate was valid until ${validUntil}: change the date before sending it`;
    throw new AppError('CONFLICT', message, { errors: [{ path: 'validUntil', message }] });
  }
  return { expiresAt, validUntil };
}

export function createEstimateSendService({ sequelize, mailer, logger, env }: ServiceDeps) {
  async function send(
    ctx: RequestContext,
    estimateId: string,
    input: SendEstimateData,
  ): Promise<EstimateView> {
    const doc = await getEstimateForDocument(ctx, estimateId);
    const to = input.to ?? doc.customer.email;
    if (!to) {
      const message = 'The customer has no e-mail address: give one to send to';
      throw new AppError('VALIDATION_FAILED', message, { errors: [{ path: 'to', message }] });
    }
    const now = new Date();
    const { expiresAt, validUntil } = linkExpiry(doc, now);
    const { token, tokenHash } = createOneTimeToken();
    const sent = await inTransaction(sequelize, async (tx) => {
      const view = await markEstimateSent(ctx, estimateId, { sentAt: now }, tx);
      await createEstimateLink(ctx, { estimateId, tokenHash, expiresAt }, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'job.estimate_emailed',
          entity: 'job',
          entityId: doc.job.id,
          data: { estimateId, version: view.version, to, linkExpiresAt: expiresAt.toISOString() },
        },
        tx,
      );
      return view;
    });
    // After commit: the PDF shows the estimate as sent, and a failed e-mail never undoes the
    // link (the office can send again; the error is logged).
    const pdf = await renderEstimatePdf(toEstimateDocumentInput({ ...doc, estimate: sent }, now));
    const content = estimateMail({
      companyName: doc.company.name,
      customerName: doc.customer.name,
      jobTitle: doc.job.title,
      validUntilText: longCalendarDate(validUntil),
      link: customerPageUrl(env.appUrl, token),
    });
    try {
      await mailer.send({
        to,
        ...content,
        attachments: [
          {
            filename: `estimate-${estimateNumber(doc)}-v${sent.version}.pdf`,
            content: pdf,
            contentType: 'application/pdf',
          },
        ],
      });
    } catch (error) {
      logger.error({ err: error, estimateId }, 'estimate e-mail could not be sent');
      throw new AppError(
        'SERVICE_BUSY',
        'The estimate is marked sent, but the e-mail could not be sent: try sending again',
        { headers: { 'Retry-After': '60' } },
      );
    }
    return sent;
  }

  async function revokeLinks(
    ctx: RequestContext,
    estimateId: string,
  ): Promise<{ revoked: number }> {
    const estimate = await findEstimate(ctx, estimateId);
    if (!estimate) throw notFound('Estimate');
    const revoked = await inTransaction(sequelize, async (tx) => {
      const count = await revokeEstimateLinks(ctx, estimateId, new Date(), tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'job.estimate_links_revoked',
          entity: 'job',
          entityId: estimate.jobId,
          data: { estimateId, count },
        },
        tx,
      );
      return count;
    });
    return { revoked };
  }

  return { send, revokeLinks };
}
