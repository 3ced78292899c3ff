import { literal, Op } from 'sequelize';
import type { Includeable, WhereOptions } from 'sequelize';
import type { JobStatus } from '@seamwright/domain';
import type { JobListQuery } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import {
  AuditEventModel,
  CustomerModel,
  JobModel,
  SiteModel,
  UserModel,
} from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

type JobAttributes = Awaited<ReturnType<ReturnType<typeof scoped<JobModel>>['findAll']>>[number];

/** A job with the parts of its customer and site that lists and the job page show. */
export interface JobRow extends JobAttributes {
  customer: { id: string; name: string };
  site: { id: string; label: string | null; addressLine1: string; city: string };
}

// Joined through the (company_id, …) foreign keys of migration 0007, so the parents are always
// in the job's own company: one statement reads a page of jobs with their summaries.
const parents: Includeable[] = [
  { model: CustomerModel, as: 'customer', attributes: ['id', 'name'] },
  { model: SiteModel, as: 'site', attributes: ['id', 'label', 'addressLine1', 'city'] },
];

/** `%` and `_` typed by the user are literal characters, not wildcards. */
function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** Start of the UTC day after `isoDate`, so `to` includes the whole of its day. */
function dayAfter(isoDate: string): Date {
  const date = new Date(`${isoDate}T00:00:00.000Z`);
  date.setUTCDate(date.getUTCDate() + 1);
  return date;
}

function listWhere(query: JobListQuery): WhereOptions<JobModel['_attributes']> {
  // Built as a plain record (symbol keys for Op.*) and returned as Sequelize's where type.
  const where: Record<string | symbol, unknown> = {};
  if (query.status.length > 0) where.status = query.status;
  const created: Record<symbol, Date> = {};
  if (query.from) created[Op.gte] = new Date(`${query.from}T00:00:00.000Z`);
  if (query.to) created[Op.lt] = dayAfter(query.to);
  if (query.from || query.to) where.createdAt = created;
  if (query.q) {
    const pattern = containsPattern(query.q);
    where[Op.or] = [
      { title: { [Op.like]: pattern } },
      { '$customer.name$': { [Op.like]: pattern } },
      { '$site.address_line1$': { [Op.like]: pattern } },
      { '$site.city$': { [Op.like]: pattern } },
      { '$site.label$': { [Op.like]: pattern } },
    ];
  }
  return where;
}

/**
 * The list's total as a sub-select the page carries on each row. Without a search it counts
 * the company's jobs through an index (`jobs_company_status_created` or `jobs_company_created`),
 * evaluated once; `COUNT(*) OVER ()` instead made MariaDB join and sort every job of the
 * company before the LIMIT (342 ms on 20,000 jobs, docs/PERFORMANCE.md). A search still counts
 * with the window: its matches need the customer and site joins anyway.
 */
function totalColumn(ctx: RequestContext, query: JobListQuery) {
  if (query.q) return literal('COUNT(*) OVER ()');
  const sequelize = JobModel.sequelize!;
  const conditions = [`j.company_id = ${sequelize.escape(ctx.companyId)}`];
  if (query.status.length > 0)
    conditions.push(`j.status IN (${query.status.map((s) => sequelize.escape(s)).join(', ')})`);
  if (query.from)
    conditions.push(`j.created_at >= ${sequelize.escape(new Date(`${query.from}T00:00:00.000Z`))}`);
  if (query.to) conditions.push(`j.created_at < ${sequelize.escape(dayAfter(query.to))}`);
  return literal(`(SELECT COUNT(*) FROM jobs j WHERE ${conditions.join(' AND ')})`);
}

/**
 * One page of jobs and the total, in one statement. The id breaks ties in the sort's own
 * direction, so the sort's index serves the order in both directions and the page stops after
 * its rows. Only a page past the end, which has no row to carry the total, costs a second
 * statement.
 */
export async function listJobs(ctx: RequestContext, query: JobListQuery) {
  const jobs = scoped(ctx, JobModel);
  const where = listWhere(query);
  const direction = query.sort.direction.toUpperCase();
  const rows = (await jobs.findAll({
    where,
    include: parents,
    attributes: { include: [[totalColumn(ctx, query), 'totalRows']] },
    order: [
      [query.sort.field, direction],
      ['id', direction],
    ],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  })) as (JobRow & { totalRows: number | bigint | string })[];
  const first = rows[0];
  const total = first
    ? Number(first.totalRows)
    : query.page > 1
      ? await jobs.count(where, undefined, query.q ? parents : undefined)
      : 0;
  return { rows: rows as JobRow[], total };
}

/** The job with its customer and site summaries. */
export async function findJob(ctx: RequestContext, id: string): Promise<JobRow | null> {
  return (await scoped(ctx, JobModel).findById(id, { include: parents })) as JobRow | null;
}

/** The job row alone, locked inside `tx` until it commits (a status move reads, then writes). */
export function lockJob(ctx: RequestContext, id: string, tx: Tx) {
  return scoped(ctx, JobModel).findById(id, { tx, lock: true });
}

export function createJob(
  ctx: RequestContext,
  values: { customerId: string; siteId: string; title: string; status: JobStatus },
  tx: Tx,
) {
  return scoped(ctx, JobModel).create(values, tx);
}

export function updateJob(
  ctx: RequestContext,
  id: string,
  values: Partial<{ title: string; status: JobStatus }>,
  tx: Tx,
) {
  return scoped(ctx, JobModel).update(id, values, tx);
}

/** The job's audit events, newest first, with the name of whoever made each. */
export async function listJobActivity(ctx: RequestContext, jobId: string, limit: number) {
  const rows = await scoped(ctx, AuditEventModel).findAll({
    where: { entity: 'job', entityId: jobId },
    include: [{ model: UserModel, as: 'user', attributes: ['name'] }],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'ASC'],
    ],
    limit,
  });
  return rows as ((typeof rows)[number] & { user: { name: string } | null })[];
}
