// Areas of a job: each saved with its plan, the exact planner request and the engine version.
// Plans are made in the planner pool before the transaction, so no lock is held while planning.
import { toGrainChoice } from '@seamwright/shared';
import type { AreaView, CreateAreaData, UpdateAreaData } from '@seamwright/shared';
import type { LayoutPlan } from '@seamwright/takeoff';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { findJob } from '../jobs/jobs.repository.js';
import { planNewArea, planValues, plannerInputOf, plannerKeys } from './area-values.js';
import { lockEditableJob, turfProductFor } from './area-rules.js';
import {
  createArea,
  deleteArea,
  findArea,
  listAreasOfJob,
  updateArea,
} from './areas.repository.js';
import type { AreaRecord, AreaValues } from './areas.repository.js';
import { underlayViewOf } from './area-underlay.js';
import { createAreaUnderlayService } from './area-underlay.service.js';
import { removeStoredFiles } from '../uploads/uploads.service.js';

export function toAreaView(record: AreaRecord): AreaView<LayoutPlan> {
  return {
    id: record.id,
    jobId: record.jobId,
    name: record.name,
    usage: record.usage,
    grainChoice: record.grainChoice,
    turfProductId: record.turfProductId,
    turfProduct: record.turfProduct,
    baseDepthIn: record.baseDepthIn,
    areaSqFt: record.areaSqFt,
    orderedSqFt: record.orderedSqFt,
    wastePct: record.plan.wastePct,
    request: record.request,
    plan: record.plan,
    alternatives: record.alternatives,
    underlay: underlayViewOf(record),
    createdAt: record.createdAt.toISOString(),
    updatedAt: record.updatedAt.toISOString(),
  };
}

function auditData(record: { name: string }, id: string, values: Partial<AreaValues>) {
  return {
    areaId: id,
    name: values.name ?? record.name,
    ...(values.orderedSqFt === undefined ? {} : { orderedSqFt: values.orderedSqFt }),
  };
}

export function createAreasService(deps: ServiceDeps) {
  const { sequelize, plannerPool } = deps;
  const underlays = createAreaUnderlayService(deps);

  async function get(ctx: RequestContext, id: string): Promise<AreaView<LayoutPlan>> {
    const record = await findArea(ctx, id);
    if (!record) throw notFound('Area');
    return toAreaView(record);
  }

  async function listForJob(ctx: RequestContext, jobId: string) {
    if (!(await findJob(ctx, jobId))) throw notFound('Job');
    return (await listAreasOfJob(ctx, jobId)).map(toAreaView);
  }

  async function create(
    ctx: RequestContext,
    jobId: string,
    input: CreateAreaData,
  ): Promise<AreaView<LayoutPlan>> {
    if (!(await findJob(ctx, jobId))) throw notFound('Job');
    const values = await planNewArea(ctx, plannerPool, input);
    const id = await inTransaction(sequelize, async (tx) => {
      await lockEditableJob(ctx, jobId, tx);
      const created = await createArea(ctx, jobId, values, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'job.area_added',
          entity: 'job',
          entityId: jobId,
          data: auditData(values, created, values),
        },
        tx,
      );
      return created;
    });
    return get(ctx, id);
  }

  /** Planning fields changed → planned again; name, usage or base depth alone → no new plan. */
  async function update(
    ctx: RequestContext,
    id: string,
    input: UpdateAreaData,
  ): Promise<AreaView<LayoutPlan>> {
    const current = await findArea(ctx, id);
    if (!current) throw notFound('Area');
    const values: Partial<AreaValues> = {};
    if (input.name !== undefined) values.name = input.name;
    if (input.usage !== undefined) values.usage = input.usage;
    if (input.baseDepthIn !== undefined) values.baseDepthIn = input.baseDepthIn;
    const replans =
      input.grain !== undefined ||
      input.turfProductId !== undefined ||
      plannerKeys.some((key) => input[key] !== undefined);
    if (replans) {
      const product =
        input.turfProductId === undefined
          ? current.turfProduct
          : await turfProductFor(ctx, input.turfProductId);
      const grainChoice =
        input.grain === undefined ? current.grainChoice : toGrainChoice(input.grain);
      const plannerInput = plannerInputOf({ ...current.input, ...plannerInputOf(input) });
      Object.assign(values, await planValues(plannerPool, product, grainChoice, plannerInput));
    }
    await inTransaction(sequelize, async (tx) => {
      await lockEditableJob(ctx, current.jobId, tx);
      if (!(await findArea(ctx, id, tx))) throw notFound('Area');
      await updateArea(ctx, id, values, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'job.area_changed',
          entity: 'job',
          entityId: current.jobId,
          data: { ...auditData(current, id, values), fields: Object.keys(input) },
        },
        tx,
      );
    });
    return get(ctx, id);
  }

  async function remove(ctx: RequestContext, id: string): Promise<void> {
    const current = await findArea(ctx, id);
    if (!current) throw notFound('Area');
    const files = await inTransaction(sequelize, async (tx) => {
      await lockEditableJob(ctx, current.jobId, tx);
      const locked = await findArea(ctx, id, tx);
      if (!locked) throw notFound('Area');
      await deleteArea(ctx, id, tx);
      const underlayFiles = await underlays.dropUpload(ctx, locked.underlayUploadId, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'job.area_removed',
          entity: 'job',
          entityId: current.jobId,
          data: { areaId: id, name: current.name },
        },
        tx,
      );
      return underlayFiles;
    });
    await removeStoredFiles(deps.storage, files, (error) =>
      deps.logger.warn({ err: error }, 'a stored file could not be removed'),
    );
  }

  return { get, listForJob, create, update, remove };
}
