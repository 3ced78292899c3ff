// Recording the customer's answer to an estimate, inside one transaction: the answer row, the
// estimate's new status (and chosen tier), and for an acceptance the job moved to accepted.
// Every refusal throws before anything is written, so nothing changes on a 4xx.
import type { SalePlace } from '@seamwright/domain';
import type { EstimateAcceptanceView } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import { AppError, notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { findOwnCompany } from '../company/company.repository.js';
import { lockJob } from '../jobs/jobs.repository.js';
import { moveJobToAccepted } from './estimate-answer-job.js';
import { periodOfSale } from './estimate-cancellation.js';
import { createEstimateAnswer, findEstimateAnswer } from './estimate-links.repository.js';
import { markEstimateSent } from './estimate-sending.service.js';
import { findEstimate, updateEstimate } from './estimates.repository.js';
import type { EstimateRecord } from './estimates.repository.js';

export interface AnswerMeta {
  /** The person who recorded it (office staff), or null for the customer online. */
  userId: string | null;
  ip: string | null;
  userAgent: string | null;
}

export type AnswerInput =
  | {
      kind: 'accepted';
      name: string;
      tierId: string | null;
      place: 'online' | 'home' | 'office';
      signedAt: Date;
    }
  | { kind: 'declined'; reason: string | null; signedAt: Date };

function conflict(message: string): AppError {
  return new AppError('CONFLICT', message, { errors: [{ path: 'status', message }] });
}

function chooseTier(estimate: EstimateRecord, tierId: string | null) {
  if (tierId === null) {
    if (estimate.tiers.length > 1) {
      const message = 'This estimate has several options: choose one';
      throw new AppError('VALIDATION_FAILED', message, { errors: [{ path: 'tierId', message }] });
    }
    const [only] = estimate.tiers;
    if (!only) throw new Error('An estimate without tiers');
    return only;
  }
  const tier = estimate.tiers.find((t) => t.id === tierId);
  if (!tier) {
    const message = 'No such option on this estimate';
    throw new AppError('VALIDATION_FAILED', message, { errors: [{ path: 'tierId', message }] });
  }
  return tier;
}

/**
 * Where the sale counts as made for the cancellation rules (TRADE.md §8.2). An acceptance typed
 * on the customer's page is taken as `remote`: the FTC rule covers sales at the buyer's home
 * and at temporary places of business, not sales concluded entirely by mail, phone or online,
 * and the page cannot know whether the seller's visit to measure the yard was the sale. A
 * company that sells at the kitchen table records the signed paper as a `home` acceptance.
 */
const salePlace: Record<'online' | 'home' | 'office', SalePlace> = {
  online: 'remote',
  home: 'home',
  office: 'office',
};

export async function recordEstimateAnswer(
  ctx: RequestContext,
  estimateId: string,
  input: AnswerInput,
  meta: AnswerMeta,
  tx: Tx,
): Promise<EstimateAcceptanceView & { jobId: string }> {
  const unlocked = await findEstimate(ctx, estimateId);
  if (!unlocked) throw notFound('Estimate');
  // Job first, then the estimate: the same order as sending, so the two never deadlock.
  const job = await lockJob(ctx, unlocked.jobId, tx);
  if (!job) throw notFound('Estimate');
  // A draft signed on paper is frozen as sent first (an online answer always has a sent one).
  if (unlocked.status === 'draft' && input.kind === 'accepted' && input.place !== 'online')
    await markEstimateSent(ctx, estimateId, { sentAt: input.signedAt }, tx);
  const estimate = await findEstimate(ctx, estimateId, tx);
  if (!estimate) throw notFound('Estimate');
  if (await findEstimateAnswer(ctx, estimateId, tx))
    throw conflict(`This estimate was already ${estimate.status}`);
  if (estimate.status !== 'sent')
    throw conflict(
      estimate.status === 'superseded'
        ? 'A newer version of this estimate replaced it'
        : `This estimate is ${estimate.status}`,
    );
  const jobNow = (await lockJob(ctx, estimate.jobId, tx)) ?? job;

  if (input.kind === 'declined') {
    await createEstimateAnswer(
      ctx,
      {
        estimateId,
        kind: 'declined',
        name: null,
        tierId: null,
        place: 'online',
        signedAt: input.signedAt,
        ip: meta.ip,
        userAgent: meta.userAgent,
        reason: input.reason,
        cancellationEndsAt: null,
      },
      tx,
    );
    await updateEstimate(ctx, estimateId, { status: 'declined' }, tx);
    await recordAuditEvent(
      ctx,
      {
        action: 'job.estimate_declined',
        entity: 'job',
        entityId: estimate.jobId,
        data: { estimateId, version: estimate.version, reason: input.reason },
        userId: meta.userId,
      },
      tx,
    );
    return { acceptedAt: input.signedAt.toISOString(), cancellationEndsAt: null, jobId: job.id };
  }

  const tier = chooseTier(estimate, input.tierId);
  const company = await findOwnCompany(ctx);
  if (!company) throw notFound('Estimate');
  const period = periodOfSale(company, {
    signedAt: input.signedAt,
    place: salePlace[input.place],
    priceCents: tier.totalCents,
  });
  const cancellationEndsAt = period.covered ? period.endsAt : null;
  await createEstimateAnswer(
    ctx,
    {
      estimateId,
      kind: 'accepted',
      name: input.name,
      tierId: tier.id,
      place: input.place,
      signedAt: input.signedAt,
      ip: meta.ip,
      userAgent: meta.userAgent,
      reason: null,
      cancellationEndsAt,
    },
    tx,
  );
  await updateEstimate(
    ctx,
    estimateId,
    {
      status: 'accepted',
      chosenTierId: tier.id,
      subtotalCents: tier.subtotalCents,
      taxCents: tier.taxCents,
      totalCents: tier.totalCents,
      depositCents: tier.depositCents,
    },
    tx,
  );
  await recordAuditEvent(
    ctx,
    {
      action: 'job.estimate_accepted',
      entity: 'job',
      entityId: estimate.jobId,
      data: {
        estimateId,
        version: estimate.version,
        tierId: tier.id,
        name: input.name,
        place: input.place,
        signedAt: input.signedAt.toISOString(),
        cancellationEndsAt: cancellationEndsAt?.toISOString() ?? null,
        cancellationRules: period.covered ? period.ruleIds : [],
      },
      userId: meta.userId,
    },
    tx,
  );
  await moveJobToAccepted(ctx, jobNow, { userId: meta.userId, estimateId }, tx);
  return {
    acceptedAt: input.signedAt.toISOString(),
    cancellationEndsAt: cancellationEndsAt?.toISOString() ?? null,
    jobId: job.id,
  };
}
