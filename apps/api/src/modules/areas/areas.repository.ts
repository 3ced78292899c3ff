import type {
  AreaAlternativeView,
  AreaGrainChoice,
  AreaTurfProduct,
  AreaUsage,
} from '@seamwright/shared';
import type { LayoutPlan } from '@seamwright/takeoff';
import type { RequestContext } from '../../context.js';
import { JobAreaModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';
import type { AreaPlannerInput } from './area-planning.js';
import type { StoredUnderlay } from './area-underlay.js';

/** An area row with its JSON columns read back as values. */
export interface AreaRecord {
  id: string;
  jobId: string;
  name: string;
  usage: AreaUsage;
  turfProductId: string | null;
  turfProduct: AreaTurfProduct | null;
  baseDepthIn: number | null;
  grainChoice: AreaGrainChoice;
  input: AreaPlannerInput;
  request: Record<string, unknown>;
  plan: LayoutPlan & { engineVersion: string };
  alternatives: AreaAlternativeView<LayoutPlan>[];
  engineVersion: string;
  areaSqFt: number;
  orderedSqFt: number;
  /** The upload shown under the drawing and its scale and placement (area-underlay.ts). */
  underlayUploadId: string | null;
  underlay: StoredUnderlay | null;
  createdAt: Date;
  updatedAt: Date;
}

/** What a plan write sets; the underlay columns have writes of their own. */
export type AreaValues = Omit<
  AreaRecord,
  'id' | 'jobId' | 'createdAt' | 'updatedAt' | 'underlayUploadId' | 'underlay'
>;

/** MariaDB hands JSON columns back as text; every value was validated before it was written. */
const fromJson = (value: unknown): unknown =>
  typeof value === 'string' ? JSON.parse(value) : value;

function toRecord(row: JobAreaModel['_attributes']): AreaRecord {
  return {
    id: row.id,
    jobId: row.jobId,
    name: row.name,
    usage: row.usage as AreaUsage,
    turfProductId: row.turfProductId,
    turfProduct: fromJson(row.turfProduct) as AreaTurfProduct | null,
    baseDepthIn: row.baseDepthIn,
    grainChoice: fromJson(row.grainChoice) as AreaGrainChoice,
    input: fromJson(row.input) as AreaPlannerInput,
    request: fromJson(row.request) as Record<string, unknown>,
    plan: fromJson(row.plan) as AreaRecord['plan'],
    alternatives: fromJson(row.alternatives) as AreaRecord['alternatives'],
    engineVersion: row.engineVersion,
    areaSqFt: row.areaSqFt,
    orderedSqFt: row.orderedSqFt,
    underlayUploadId: row.underlayUploadId ?? null,
    underlay: (fromJson(row.underlay) as StoredUnderlay | null) ?? null,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
}

export async function findArea(
  ctx: RequestContext,
  id: string,
  tx?: Tx,
): Promise<AreaRecord | null> {
  const row = await scoped(ctx, JobAreaModel).findById(id, tx ? { tx, lock: true } : {});
  return row ? toRecord(row) : null;
}

/** The job's areas, oldest first (the order they were drawn in). */
export async function listAreasOfJob(ctx: RequestContext, jobId: string): Promise<AreaRecord[]> {
  const rows = await scoped(ctx, JobAreaModel).findAll({
    where: { jobId },
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return rows.map(toRecord);
}

export async function createArea(
  ctx: RequestContext,
  jobId: string,
  values: AreaValues,
  tx: Tx,
): Promise<string> {
  return (await scoped(ctx, JobAreaModel).create({ jobId, ...values }, tx)).id;
}

export async function updateArea(
  ctx: RequestContext,
  id: string,
  values: Partial<AreaValues>,
  tx: Tx,
): Promise<void> {
  await scoped(ctx, JobAreaModel).update(id, values, tx);
}

export async function deleteArea(ctx: RequestContext, id: string, tx: Tx): Promise<void> {
  await scoped(ctx, JobAreaModel).destroy({ id }, tx);
}

/** Sets or clears the area's underlay (the upload it shows and its placement). */
export async function updateAreaUnderlay(
  ctx: RequestContext,
  id: string,
  underlayUploadId: string | null,
  underlay: StoredUnderlay | null,
  tx: Tx,
): Promise<void> {
  await scoped(ctx, JobAreaModel).update(id, { underlayUploadId, underlay }, tx);
}
