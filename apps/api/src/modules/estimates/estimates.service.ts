// Estimates of a job: priced from the takeoff when made, edited while a draft, frozen once
// sent; a revision copies a sent version into the next draft version.
import type { CreateEstimateData, EstimateView, UpdateEstimateData } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { AppError, notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { findJob } from '../jobs/jobs.repository.js';
import { listAllPriceBookItems } from '../price-book/price-book.repository.js';
import { buildEstimate, toPricingItem } from './estimate-build.js';
import { applyEstimateEdits, toTierInputs } from './estimate-edit.js';
import {
  assertDraft,
  computeTiers,
  lockJobForEstimate,
  versionsWithoutDraft,
} from './estimate-rules.js';
import { toEstimateView } from './estimate-view.js';
import {
  createEstimate,
  findEstimate,
  listEstimatesOfJob,
  updateEstimate,
} from './estimates.repository.js';
import type { EstimateValues } from './estimates.repository.js';

export async function getEstimate(ctx: RequestContext, id: string): Promise<EstimateView> {
  const record = await findEstimate(ctx, id);
  if (!record) throw notFound('Estimate');
  return toEstimateView(record);
}

export function createEstimatesService(deps: Pick<ServiceDeps, 'sequelize'>) {
  const { sequelize } = deps;

  async function listForJob(ctx: RequestContext, jobId: string): Promise<EstimateView[]> {
    const [job, versions] = await Promise.all([
      findJob(ctx, jobId),
      listEstimatesOfJob(ctx, jobId),
    ]);
    if (!job) throw notFound('Job');
    return versions.map(toEstimateView);
  }

  async function create(
    ctx: RequestContext,
    jobId: string,
    input: CreateEstimateData,
  ): Promise<EstimateView> {
    const built = await buildEstimate(ctx, jobId, input.tiers);
    const totals = computeTiers(built.tiers, built.rates, null);
    const id = await inTransaction(sequelize, async (tx) => {
      await lockJobForEstimate(ctx, jobId, tx);
      const versions = await versionsWithoutDraft(ctx, jobId, tx);
      const version = (versions[0]?.version ?? 0) + 1;
      const values: EstimateValues = {
        version,
        status: 'draft',
        ...totals,
        chosenTierId: null,
        warnings: built.warnings,
        notes: input.notes ?? null,
        validUntil: input.validUntil ?? null,
        ...built.rates,
        sentAt: null,
        createdBy: ctx.userId,
      };
      const created = await createEstimate(ctx, jobId, values, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'job.estimate_created',
          entity: 'job',
          entityId: jobId,
          data: { estimateId: created, version, totalCents: totals.totalCents },
        },
        tx,
      );
      return created;
    });
    return getEstimate(ctx, id);
  }

  async function update(
    ctx: RequestContext,
    id: string,
    input: UpdateEstimateData,
  ): Promise<EstimateView> {
    const current = await findEstimate(ctx, id);
    if (!current) throw notFound('Estimate');
    // Only a tier priced with another product needs the price book.
    const needsBook = input.tiers?.add?.some((t) => t.turfProductId !== undefined) ?? false;
    const items = needsBook ? (await listAllPriceBookItems(ctx)).map(toPricingItem) : [];
    await inTransaction(sequelize, async (tx) => {
      await lockJobForEstimate(ctx, current.jobId, tx);
      const locked = await findEstimate(ctx, id, tx);
      if (!locked) throw notFound('Estimate');
      assertDraft(locked);
      const tiers = applyEstimateEdits(locked.tiers, input, items, locked.markupBasisPoints);
      const depositRule = input.depositRule ?? locked.depositRule;
      const chosenTierId = tiers.some((t) => t.id === locked.chosenTierId)
        ? locked.chosenTierId
        : null;
      const totals = computeTiers(
        tiers,
        { taxRateBasisPoints: locked.taxRateBasisPoints, depositRule },
        chosenTierId,
      );
      await updateEstimate(
        ctx,
        id,
        {
          ...totals,
          chosenTierId,
          depositRule,
          ...(input.notes === undefined ? {} : { notes: input.notes }),
          ...(input.validUntil === undefined ? {} : { validUntil: input.validUntil }),
        },
        tx,
      );
      await recordAuditEvent(
        ctx,
        {
          action: 'job.estimate_changed',
          entity: 'job',
          entityId: locked.jobId,
          data: {
            estimateId: id,
            version: locked.version,
            fields: Object.keys(input),
            totalCents: totals.totalCents,
          },
        },
        tx,
      );
    });
    return getEstimate(ctx, id);
  }

  /** A sent version copied into the next draft version; the sent one becomes superseded. */
  async function revise(ctx: RequestContext, id: string): Promise<EstimateView> {
    const current = await findEstimate(ctx, id);
    if (!current) throw notFound('Estimate');
    const newId = await inTransaction(sequelize, async (tx) => {
      await lockJobForEstimate(ctx, current.jobId, tx);
      const source = await findEstimate(ctx, id, tx);
      if (!source) throw notFound('Estimate');
      if (source.status !== 'sent') {
        const message = `Version ${source.version} is ${source.status}: only a sent estimate is revised`;
        throw new AppError('CONFLICT', message, { errors: [{ path: 'status', message }] });
      }
      const versions = await versionsWithoutDraft(ctx, source.jobId, tx);
      const version = (versions[0]?.version ?? 0) + 1;
      const totals = computeTiers(
        toTierInputs(source.tiers),
        { taxRateBasisPoints: source.taxRateBasisPoints, depositRule: source.depositRule },
        null,
      );
      const created = await createEstimate(
        ctx,
        source.jobId,
        {
          version,
          status: 'draft',
          ...totals,
          chosenTierId: null,
          warnings: source.warnings,
          notes: source.notes,
          validUntil: source.validUntil,
          markupBasisPoints: source.markupBasisPoints,
          taxRateBasisPoints: source.taxRateBasisPoints,
          depositRule: source.depositRule,
          sentAt: null,
          createdBy: ctx.userId,
        },
        tx,
      );
      await updateEstimate(ctx, source.id, { status: 'superseded' }, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'job.estimate_revised',
          entity: 'job',
          entityId: source.jobId,
          data: {
            estimateId: created,
            version,
            fromEstimateId: source.id,
            fromVersion: source.version,
          },
        },
        tx,
      );
      return created;
    });
    return getEstimate(ctx, newId);
  }

  return { listForJob, create, get: getEstimate, update, revise };
}
