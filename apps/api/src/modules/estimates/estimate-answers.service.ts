// The customer's page (no account: the e-mailed token is the credential) and the answers to an
// estimate: accepted or declined online, or an acceptance signed on paper recorded by the office.
import { longCalendarDate } from '@seamwright/domain';
import type {
  AcceptEstimateData,
  DeclineEstimateData,
  EstimateAcceptanceView,
  PublicEstimateView,
  RecordAcceptanceData,
} from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { Tx } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { AppError, notFound } from '../../errors.js';
import { estimateAnswerMail } from '../../mail/templates.js';
import { hashToken } from '../../tokens.js';
import { listMembers } from '../members/members.repository.js';
import { recordEstimateAnswer } from './estimate-answer-record.js';
import type { AnswerInput, AnswerMeta } from './estimate-answer-record.js';
import { getEstimateForDocument } from './estimate-document.service.js';
import {
  findEstimateAnswer,
  unsafeFindEstimateLinkByTokenHash,
} from './estimate-links.repository.js';
import type { EstimateLinkRow } from './estimate-links.repository.js';
import { toPublicEstimateView } from './public-estimate-view.js';

/** A token as createOneTimeToken makes it (32 bytes, base64url); anything else is unknown. */
const tokenShape = /^[A-Za-z0-9_-]{43}$/;

/** How far in the future a typed signing time may be (clock drift between devices). */
const futureAllowanceMs = 2 * 60 * 1000;

/**
 * The company's context for the customer's request. The customer has no account, so the
 * context carries no user; audit events written for them pass `userId: null`. Only the
 * estimate the link names is ever read with it.
 */
function customerContext(link: EstimateLinkRow): RequestContext {
  return { userId: '', companyId: link.companyId, role: 'office' };
}

async function openLink(token: string, now: Date, tx?: Tx): Promise<EstimateLinkRow> {
  const link = tokenShape.test(token)
    ? await unsafeFindEstimateLinkByTokenHash(hashToken(token), tx)
    : null;
  // Revoked looks the same as unknown: the office took it back on purpose.
  if (!link || link.revokedAt) throw notFound('Estimate');
  if (link.expiresAt.getTime() <= now.getTime())
    throw new AppError(
      'TOKEN_INVALID',
      'This estimate link has expired: ask the company for a new one',
    );
  return link;
}

export function createEstimateAnswersService({ sequelize, mailer, logger, env }: ServiceDeps) {
  /** After commit: tell the owners and the office; a failed e-mail is logged, never undone. */
  async function tellCompany(
    ctx: RequestContext,
    estimateId: string,
    answer: string,
    details: string[],
  ) {
    try {
      const [doc, members] = await Promise.all([
        getEstimateForDocument(ctx, estimateId),
        listMembers(ctx, { limit: 100, offset: 0 }),
      ]);
      const to = members.rows.filter((m) => m.role === 'owner' || m.role === 'office');
      const content = estimateAnswerMail({
        companyName: doc.company.name,
        customerName: doc.customer.name,
        jobTitle: doc.job.title,
        answer,
        details,
        link: `${env.appUrl}/jobs/${doc.job.id}`,
      });
      await Promise.all(to.map((m) => mailer.send({ to: m.email, ...content })));
    } catch (error) {
      logger.error({ err: error, estimateId }, 'estimate answer e-mail could not be sent');
    }
  }

  function untilText(endsAt: string | null, timeZone: string): string {
    if (!endsAt) return 'No cancellation period applies to this acceptance.';
    const day = new Date(new Date(endsAt).getTime() - 1);
    const local = day.toLocaleDateString('en-CA', { timeZone });
    return `The buyer may cancel until midnight at the end of ${longCalendarDate(local)}; do not schedule the work before then.`;
  }

  async function answer(
    ctx: RequestContext,
    estimateId: string,
    input: AnswerInput,
    meta: AnswerMeta,
    tx?: Tx,
  ) {
    const run = (t: Tx) => recordEstimateAnswer(ctx, estimateId, input, meta, t);
    const result = tx ? await run(tx) : await inTransaction(sequelize, run);
    const doc = await getEstimateForDocument(ctx, estimateId);
    const details =
      input.kind === 'accepted'
        ? [`Signed by ${input.name}.`, untilText(result.cancellationEndsAt, doc.company.timeZone)]
        : [input.reason ? `Their reason: ${input.reason}` : 'They gave no reason.'];
    await tellCompany(
      ctx,
      estimateId,
      input.kind === 'accepted' ? 'accepted' : 'declined',
      details,
    );
    return result;
  }

  async function view(token: string): Promise<PublicEstimateView> {
    const now = new Date();
    const link = await openLink(token, now);
    const ctx = customerContext(link);
    const [doc, existing] = await Promise.all([
      getEstimateForDocument(ctx, link.estimateId),
      findEstimateAnswer(ctx, link.estimateId),
    ]);
    return toPublicEstimateView(doc, existing, now);
  }

  async function acceptOnline(
    token: string,
    input: AcceptEstimateData,
    meta: Omit<AnswerMeta, 'userId'>,
  ): Promise<EstimateAcceptanceView> {
    const now = new Date();
    const link = await openLink(token, now);
    const ctx = customerContext(link);
    const result = await answer(
      ctx,
      link.estimateId,
      {
        kind: 'accepted',
        name: input.name,
        tierId: input.tierId ?? null,
        place: 'online',
        signedAt: now,
      },
      { ...meta, userId: null },
    );
    return { acceptedAt: result.acceptedAt, cancellationEndsAt: result.cancellationEndsAt };
  }

  async function declineOnline(
    token: string,
    input: DeclineEstimateData,
    meta: Omit<AnswerMeta, 'userId'>,
  ): Promise<{ declinedAt: string }> {
    const now = new Date();
    const link = await openLink(token, now);
    const ctx = customerContext(link);
    await answer(
      ctx,
      link.estimateId,
      { kind: 'declined', reason: input.reason, signedAt: now },
      {
        ...meta,
        userId: null,
      },
    );
    return { declinedAt: now.toISOString() };
  }

  /** A signature on paper, recorded by the office (IP and browser are the office's: not kept). */
  async function recordInPerson(
    ctx: RequestContext,
    estimateId: string,
    input: RecordAcceptanceData,
  ): Promise<EstimateAcceptanceView> {
    const signedAt = new Date(input.signedAt);
    if (signedAt.getTime() > Date.now() + futureAllowanceMs) {
      const message = 'The signing time is in the future';
      throw new AppError('VALIDATION_FAILED', message, { errors: [{ path: 'signedAt', message }] });
    }
    const result = await answer(
      ctx,
      estimateId,
      {
        kind: 'accepted',
        name: input.name,
        tierId: input.tierId ?? null,
        place: input.place,
        signedAt,
      },
      { userId: ctx.userId, ip: null, userAgent: null },
    );
    return { acceptedAt: result.acceptedAt, cancellationEndsAt: result.cancellationEndsAt };
  }

  return { view, acceptOnline, declineOnline, recordInPerson };
}
