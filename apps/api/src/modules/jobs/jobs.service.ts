import { allowedNextStatuses, assertTransition, JobTransitionError } from '@seamwright/domain';
import type { JobStatus } from '@seamwright/domain';
import type {
  CreateJobData,
  JobDetailView,
  JobListQuery,
  JobView,
  ListResponse,
  UpdateJobData,
} from '@seamwright/shared';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import { AppError, notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { findCustomer } from '../customers/customers.repository.js';
import { findSite } from '../sites/sites.repository.js';
import { assertCancellationPeriodOver } from './job-cancellation-guard.js';
import { applyJobStatusEffects } from './job-status-effects.js';
import type { JobRow } from './jobs.repository.js';
import {
  createJob,
  findJob,
  listJobActivity,
  listJobs,
  lockJob,
  updateJob,
} from './jobs.repository.js';

/** How many of a job's latest audit events its page shows. */
const activityLimit = 50;

function toView(row: JobRow): JobView {
  return {
    id: row.id,
    title: row.title,
    status: row.status,
    allowedNextStatuses: allowedNextStatuses(row.status),
    customerId: row.customerId,
    siteId: row.siteId,
    customer: { id: row.customer.id, name: row.customer.name },
    site: {
      id: row.site.id,
      label: row.site.label,
      addressLine1: row.site.addressLine1,
      city: row.site.city,
    },
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** A 404 that also names the request field that pointed at nothing. */
function missing(what: string, field: string, message: string): AppError {
  return new AppError('NOT_FOUND', `${what} not found`, { errors: [{ path: field, message }] });
}

/** The lifecycle's refusal as a 409 whose detail names the move and the allowed ones. */
function checkMove(from: JobStatus, to: JobStatus): void {
  try {
    assertTransition(from, to);
  } catch (error) {
    if (error instanceof JobTransitionError)
      throw new AppError('CONFLICT', error.message, {
        errors: [{ path: 'status', message: error.message }],
      });
    throw error;
  }
}

export function createJobsService(sequelize: Sequelize) {
  async function list(ctx: RequestContext, query: JobListQuery): Promise<ListResponse<JobView>> {
    const { rows, total } = await listJobs(ctx, query);
    return { data: rows.map(toView), meta: { page: query.page, pageSize: query.pageSize, total } };
  }

  async function get(ctx: RequestContext, id: string): Promise<JobDetailView> {
    const [row, events] = await Promise.all([
      findJob(ctx, id),
      listJobActivity(ctx, id, activityLimit),
    ]);
    if (!row) throw notFound('Job');
    return {
      ...toView(row),
      activity: events.map((e) => ({
        id: e.id,
        action: e.action,
        userName: e.user?.name ?? null,
        data: e.data,
        createdAt: e.createdAt.toISOString(),
      })),
    };
  }

  async function create(ctx: RequestContext, input: CreateJobData): Promise<JobDetailView> {
    const id = await inTransaction(sequelize, async (tx) => {
      if (!(await findCustomer(ctx, input.customerId, tx)))
        throw missing('Customer', 'customerId', 'No such customer in this company');
      const site = await findSite(ctx, input.siteId, tx);
      if (!site || site.customerId !== input.customerId)
        throw missing('Site', 'siteId', 'Choose one of this customer’s sites');
      const created = await createJob(
        ctx,
        { customerId: input.customerId, siteId: input.siteId, title: input.title, status: 'lead' },
        tx,
      );
      await recordAuditEvent(
        ctx,
        {
          action: 'job.created',
          entity: 'job',
          entityId: created.id,
          data: { title: created.title, status: created.status },
        },
        tx,
      );
      return created.id;
    });
    return get(ctx, id);
  }

  async function update(
    ctx: RequestContext,
    id: string,
    input: UpdateJobData,
  ): Promise<JobDetailView> {
    await inTransaction(sequelize, async (tx) => {
      const current = await lockJob(ctx, id, tx);
      if (!current) throw notFound('Job');
      const changes: Partial<{ title: string; status: JobStatus }> = {};
      if (input.title !== undefined && input.title !== current.title) changes.title = input.title;
      if (input.status !== undefined && input.status !== current.status) {
        checkMove(current.status, input.status);
        await assertCancellationPeriodOver(ctx, id, input.status, tx);
        changes.status = input.status;
      }
      if (Object.keys(changes).length === 0) return;
      await updateJob(ctx, id, changes, tx);
      if (changes.title !== undefined)
        await recordAuditEvent(
          ctx,
          {
            action: 'job.renamed',
            entity: 'job',
            entityId: id,
            data: { from: current.title, to: changes.title },
          },
          tx,
        );
      if (changes.status !== undefined) await applyJobStatusEffects(ctx, id, changes.status, tx);
      if (changes.status !== undefined)
        await recordAuditEvent(
          ctx,
          {
            action: 'job.status_changed',
            entity: 'job',
            entityId: id,
            data: { from: current.status, to: changes.status },
          },
          tx,
        );
    });
    return get(ctx, id);
  }

  return { list, get, create, update };
}
