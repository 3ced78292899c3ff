// Demo estimates, made once (when the demo company has none) through the same services as the
// office's requests: a draft with two options, one sent and waiting for the customer, and one
// signed at the office (its job moves to accepted).
import type { RequestContext } from '../context.js';
import type { ServiceDeps } from '../deps.js';
import { EstimateModel, JobModel } from '../db/models/index.js';
import { inTransaction } from '../db/sequelize.js';
import { scoped } from '../db/tenant-scope.js';
import { recordEstimateAnswer } from '../modules/estimates/estimate-answer-record.js';
import { createEstimateLink } from '../modules/estimates/estimate-links.repository.js';
import { markEstimateSent } from '../modules/estimates/estimate-sending.service.js';
import { createEstimatesService } from '../modules/estimates/estimates.service.js';
import { findPriceBookItemByKey } from '../modules/price-book/price-book.repository.js';
import { createOneTimeToken } from '../tokens.js';

/** The customer's page of the estimate sent and waiting (its token is known only here). */
export interface DemoCustomerLink {
  jobTitle: string;
  path: string;
}

const linkDays = 30;

async function jobId(ctx: RequestContext, title: string): Promise<string> {
  const [job] = await scoped(ctx, JobModel).findAll({ where: { title } });
  if (!job) throw new Error(`No demo job "${title}".`);
  return job.id;
}

export async function seedDemoEstimates(
  ctx: RequestContext,
  deps: Pick<ServiceDeps, 'sequelize'>,
): Promise<DemoCustomerLink[]> {
  if ((await scoped(ctx, EstimateModel).count()) > 0) return [];
  const estimates = createEstimatesService(deps);
  const { sequelize } = deps;
  const turf = (key: string) =>
    inTransaction(sequelize, (tx) => findPriceBookItemByKey(ctx, key, tx));
  const [landscape, pet] = await Promise.all([turf('turf-landscape-175'), turf('turf-pet-125')]);

  // A lead's draft that prices the back yard two ways.
  await estimates.create(ctx, await jobId(ctx, 'Back yard lawn and path'), {
    tiers: [
      { name: 'Landscape turf', turfProductId: landscape?.id ?? null },
      { name: 'Pet-friendly turf', turfProductId: pet?.id ?? null },
    ],
    notes: 'Both options include the path to the side gate.',
  });

  // Sent and waiting: the private link is made here, as sending would, without an e-mail.
  const waiting = await estimates.create(ctx, await jobId(ctx, 'Front lawn on the slope'), {});
  const { token, tokenHash } = createOneTimeToken();
  const now = new Date();
  await inTransaction(sequelize, async (tx) => {
    await markEstimateSent(ctx, waiting.id, { sentAt: now }, tx);
    const expiresAt = new Date(now.getTime() + linkDays * 24 * 3600 * 1000);
    await createEstimateLink(ctx, { estimateId: waiting.id, tokenHash, expiresAt }, tx);
  });

  // Signed on paper at the office: no cancellation period, and the job is accepted.
  const signed = await estimates.create(ctx, await jobId(ctx, 'Front courtyard lawn'), {});
  await inTransaction(sequelize, (tx) =>
    recordEstimateAnswer(
      ctx,
      signed.id,
      { kind: 'accepted', name: 'Ines Harrowgate', tierId: null, place: 'office', signedAt: now },
      { userId: ctx.userId, ip: null, userAgent: null },
      tx,
    ),
  );
  return [{ jobTitle: 'Front lawn on the slope', path: `/e/${token}` }];
}
