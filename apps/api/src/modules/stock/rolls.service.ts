// Rolls and remnants in stock: receiving, correcting, listing, and remnants coming back from a
// job. Lengths held by reservations change only in reservations.service.ts.
import type {
  CreateRollData,
  ReceiveDeliveryData,
  ReturnRemnantsInput,
  RollListQuery,
  RollView,
  UpdateRollData,
} from '@seamwright/shared';
import { jobStatusLabels } from '@seamwright/shared';
import type { JobStatus } from '@seamwright/domain';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { Tx } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { AppError, notFound } from '../../errors.js';
import { turfProductFor } from '../areas/area-rules.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { lockJob } from '../jobs/jobs.repository.js';
import { formatFeet } from './feet-words.js';
import { conflict } from './reservation-request.js';
import { listAllocations, listReservationsOfJob } from './reservations.repository.js';
import { createRoll, findRoll, listRolls, toRollView, updateRoll } from './rolls.repository.js';
import type { RollValues } from './rolls.repository.js';

function invalid(path: string, message: string): AppError {
  return new AppError('VALIDATION_FAILED', `${path}: ${message}`, {
    errors: [{ path, message }],
  });
}

/** The turf product a roll is of: one of the company's turf items (404/400 naming it). */
async function productOf(ctx: RequestContext, id: string, tx: Tx) {
  const product = await turfProductFor(ctx, id, tx);
  if (!product) throw notFound('Turf product');
  return product;
}

function checkWidth(
  product: { name: string; rollWidthsFt: number[] },
  widthFt: number,
  path: string,
) {
  if (!product.rollWidthsFt.includes(widthFt))
    throw invalid(
      path,
      `${product.name} comes in ${product.rollWidthsFt.map(formatFeet).join(' or ')} widths; record a narrower piece as a remnant`,
    );
}

/** Remnants come back while the crew is on the job or just after. */
const remnantStatuses: readonly JobStatus[] = ['in_progress', 'installed'];

export function createRollsService(deps: Pick<ServiceDeps, 'sequelize'>) {
  const { sequelize } = deps;

  async function get(ctx: RequestContext, id: string): Promise<RollView> {
    const row = await findRoll(ctx, id);
    if (!row) throw notFound('Roll');
    return toRollView(row);
  }

  async function list(ctx: RequestContext, query: RollListQuery) {
    const { rows, total } = await listRolls(ctx, query);
    return {
      data: rows.map(toRollView),
      meta: { page: query.page, pageSize: query.pageSize, total },
    };
  }

  async function create(ctx: RequestContext, input: CreateRollData): Promise<RollView> {
    const id = await inTransaction(sequelize, async (tx) => {
      const product = await productOf(ctx, input.turfProductId, tx);
      if (!input.isRemnant) checkWidth(product, input.widthFt, 'widthFt');
      const values: RollValues = {
        turfProductId: product.id,
        turfProductName: product.name,
        dyeLot: input.dyeLot,
        widthFt: input.widthFt,
        lengthFt: input.lengthFt,
        remainingFt: input.lengthFt,
        location: input.location,
        isRemnant: input.isRemnant,
        sourceJobId: null,
        receivedOn: input.receivedOn,
        notes: input.notes,
        archivedAt: null,
      };
      return (await createRoll(ctx, values, tx)).id;
    });
    return get(ctx, id);
  }

  /** Every roll of a delivery, or none of them. */
  async function receiveDelivery(
    ctx: RequestContext,
    input: ReceiveDeliveryData,
  ): Promise<RollView[]> {
    const ids = await inTransaction(sequelize, async (tx) => {
      const product = await productOf(ctx, input.turfProductId, tx);
      input.rolls.forEach((roll, i) => checkWidth(product, roll.widthFt, `rolls.${i}.widthFt`));
      const made: string[] = [];
      for (const roll of input.rolls) {
        const values: RollValues = {
          turfProductId: product.id,
          turfProductName: product.name,
          dyeLot: input.dyeLot,
          widthFt: roll.widthFt,
          lengthFt: roll.lengthFt,
          remainingFt: roll.lengthFt,
          location: input.location,
          isRemnant: false,
          sourceJobId: null,
          receivedOn: input.receivedOn,
          notes: null,
          archivedAt: null,
        };
        made.push((await createRoll(ctx, values, tx)).id);
      }
      return made;
    });
    return Promise.all(ids.map((id) => get(ctx, id)));
  }

  async function update(ctx: RequestContext, id: string, input: UpdateRollData) {
    await inTransaction(sequelize, async (tx) => {
      const roll = await findRoll(ctx, id, tx, true);
      if (!roll) throw notFound('Roll');
      if (input.remainingFt !== undefined && input.remainingFt + 1e-6 < roll.heldFt)
        throw conflict(
          'remainingFt',
          `Jobs hold ${formatFeet(roll.heldFt)} of this roll; release them before setting less`,
        );
      if (input.archived === true && roll.heldFt > 0)
        throw conflict('archived', `Jobs hold ${formatFeet(roll.heldFt)} of this roll`);
      const { archived, ...rest } = input;
      await updateRoll(
        ctx,
        id,
        {
          ...rest,
          ...(archived === undefined ? {} : { archivedAt: archived ? new Date() : null }),
        },
        tx,
      );
    });
    return get(ctx, id);
  }

  /** Pieces the crew did not use, back in stock as remnants of the rolls they came from. */
  async function returnRemnants(
    ctx: RequestContext,
    jobId: string,
    input: ReturnRemnantsInput,
  ): Promise<RollView[]> {
    const ids = await inTransaction(sequelize, async (tx) => {
      const job = await lockJob(ctx, jobId, tx);
      if (!job) throw notFound('Job');
      if (!remnantStatuses.includes(job.status))
        throw conflict(
          'status',
          `The job is ${jobStatusLabels[job.status].toLowerCase()}: remnants come back once its turf is cut`,
        );
      const cut = (await listReservationsOfJob(ctx, jobId, tx)).filter((r) => r.status === 'cut');
      const cutRolls = new Set(
        (
          await listAllocations(
            ctx,
            cut.map((r) => r.id),
            tx,
          )
        ).map((a) => a.rollId),
      );
      const made: string[] = [];
      for (const [i, remnant] of input.remnants.entries()) {
        const source = cutRolls.has(remnant.rollId)
          ? await findRoll(ctx, remnant.rollId, tx)
          : null;
        if (!source)
          throw invalid(`remnants.${i}.rollId`, 'No turf of this job was cut from that roll');
        const widthFt = remnant.widthFt ?? source.widthFt;
        if (widthFt > source.widthFt)
          throw invalid(`remnants.${i}.widthFt`, `The roll is ${formatFeet(source.widthFt)} wide`);
        const values: RollValues = {
          turfProductId: source.turfProductId,
          turfProductName: source.turfProductName,
          dyeLot: source.dyeLot,
          widthFt,
          lengthFt: remnant.lengthFt,
          remainingFt: remnant.lengthFt,
          location: remnant.location ?? source.location,
          isRemnant: true,
          sourceJobId: jobId,
          receivedOn: null,
          notes: null,
          archivedAt: null,
        };
        made.push((await createRoll(ctx, values, tx)).id);
      }
      await recordAuditEvent(
        ctx,
        {
          action: 'job.remnants_returned',
          entity: 'job',
          entityId: jobId,
          data: { rollIds: made },
        },
        tx,
      );
      return made;
    });
    return Promise.all(ids.map((id) => get(ctx, id)));
  }

  return { get, list, create, receiveDelivery, update, returnRemnants };
}
