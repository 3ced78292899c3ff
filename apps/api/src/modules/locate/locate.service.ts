// Locate tickets of a job: the times come from the company's region rule in its zone
// (@seamwright/domain), computed once when the ticket is recorded and stored with the rule.
import {
  allowedLocateStatusMoves,
  computeLocateTicket,
  effectiveLocateStatus,
  finalJobStatuses,
} from '@seamwright/domain';
import { jobStatusLabels } from '@seamwright/shared';
import type {
  CreateLocateTicketData,
  LocateTicketView,
  UpdateLocateTicketInput,
} from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { Tx } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { AppError, notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { findOwnCompany } from '../company/company.repository.js';
import { findJob, lockJob } from '../jobs/jobs.repository.js';
import {
  createLocateTicket,
  findLocateTicket,
  listLocateTicketsOfJob,
  updateLocateTicketStatus,
} from './locate.repository.js';
import type { LocateTicketRecord } from './locate.repository.js';

/** Clocks of phones and offices drift: a call "now" may arrive stamped a little ahead. */
const futureAllowanceMs = 2 * 60 * 1000;

export function toLocateTicketView(record: LocateTicketRecord, now: Date): LocateTicketView {
  return {
    id: record.id,
    jobId: record.jobId,
    number: record.number,
    calledAt: record.calledAt.toISOString(),
    earliestDigAt: record.earliestDigAt.toISOString(),
    expiresAt: record.expiresAt.toISOString(),
    latestStartAt: record.latestStartAt?.toISOString() ?? null,
    status: effectiveLocateStatus(record.status, record.expiresAt, now),
    rule: {
      id: record.rule.id,
      region: record.rule.region,
      isDefault: record.rule.isDefault,
      title: record.rule.title,
      source: record.rule.source,
      maxAhead: record.rule.maxAhead,
      explanation: record.explanation,
    },
    timeZone: record.timeZone,
    createdAt: record.createdAt.toISOString(),
    updatedAt: record.updatedAt.toISOString(),
  };
}

/**
 * Locks the job inside `tx`; 404 when missing, 409 naming its status when it is over (closed,
 * lost or cancelled: no new tickets, no status changes).
 */
async function lockOpenJob(ctx: RequestContext, jobId: string, tx: Tx): Promise<void> {
  const job = await lockJob(ctx, jobId, tx);
  if (!job) throw notFound('Job');
  if (!finalJobStatuses.includes(job.status)) return;
  const message = `The job is ${jobStatusLabels[job.status].toLowerCase()}: its locate tickets can no longer change`;
  throw new AppError('CONFLICT', message, { errors: [{ path: 'status', message }] });
}

function badCalledAt(message: string): AppError {
  return new AppError('VALIDATION_FAILED', `calledAt: ${message}`, {
    errors: [{ path: 'calledAt', message }],
  });
}

export function createLocateService(deps: ServiceDeps) {
  const { sequelize } = deps;

  async function get(ctx: RequestContext, id: string): Promise<LocateTicketView> {
    const record = await findLocateTicket(ctx, id);
    if (!record) throw notFound('Locate ticket');
    return toLocateTicketView(record, new Date());
  }

  async function listForJob(ctx: RequestContext, jobId: string): Promise<LocateTicketView[]> {
    // Read together: one round trip; the job decides between 404 and the list.
    const [job, records] = await Promise.all([
      findJob(ctx, jobId),
      listLocateTicketsOfJob(ctx, jobId),
    ]);
    if (!job) throw notFound('Job');
    const now = new Date();
    return records.map((record) => toLocateTicketView(record, now));
  }

  async function create(
    ctx: RequestContext,
    jobId: string,
    input: CreateLocateTicketData,
  ): Promise<LocateTicketView> {
    const calledAt = new Date(input.calledAt);
    if (Number.isNaN(calledAt.getTime())) throw badCalledAt('Not a date and time that exists');
    if (calledAt.getTime() > Date.now() + futureAllowanceMs)
      throw badCalledAt('The call cannot be in the future');
    const id = await inTransaction(sequelize, async (tx) => {
      await lockOpenJob(ctx, jobId, tx);
      const company = await findOwnCompany(ctx, tx);
      if (!company) throw notFound('Company');
      const ticket = computeLocateTicket({
        calledAt,
        timeZone: company.timeZone,
        region: company.region,
      });
      const created = await createLocateTicket(
        ctx,
        jobId,
        {
          number: input.number,
          calledAt,
          earliestDigAt: new Date(ticket.earliestDigAt),
          expiresAt: new Date(ticket.expiresAt),
          latestStartAt: ticket.latestStartAt ? new Date(ticket.latestStartAt) : null,
          status: 'requested',
          timeZone: ticket.timeZone,
          rule: {
            id: ticket.rule.id,
            region: ticket.rule.region,
            isDefault: ticket.rule.isDefault,
            title: ticket.rule.title,
            source: ticket.rule.source,
            maxAhead: ticket.maxAhead,
            lifeIsCompanyDefault: ticket.rule.lifeIsCompanyDefault,
          },
          explanation: ticket.explanation,
        },
        tx,
      );
      await recordAuditEvent(
        ctx,
        {
          action: 'job.locate_ticket_added',
          entity: 'job',
          entityId: jobId,
          data: {
            ticketId: created,
            number: input.number,
            earliestDigAt: ticket.earliestDigAt,
            expiresAt: ticket.expiresAt,
            ruleId: ticket.rule.id,
          },
        },
        tx,
      );
      return created;
    });
    return get(ctx, id);
  }

  async function updateStatus(
    ctx: RequestContext,
    id: string,
    input: UpdateLocateTicketInput,
  ): Promise<LocateTicketView> {
    const current = await findLocateTicket(ctx, id);
    if (!current) throw notFound('Locate ticket');
    await inTransaction(sequelize, async (tx) => {
      await lockOpenJob(ctx, current.jobId, tx);
      const locked = await findLocateTicket(ctx, id, tx);
      if (!locked) throw notFound('Locate ticket');
      const from = effectiveLocateStatus(locked.status, locked.expiresAt, new Date());
      if (from === input.status) return;
      if (!allowedLocateStatusMoves(from).includes(input.status)) {
        const message =
          from === 'expired'
            ? 'The ticket has expired: call in a new ticket'
            : `A ${from} ticket cannot become ${input.status}`;
        throw new AppError('CONFLICT', message, { errors: [{ path: 'status', message }] });
      }
      await updateLocateTicketStatus(ctx, id, input.status, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'job.locate_ticket_status_changed',
          entity: 'job',
          entityId: locked.jobId,
          data: { ticketId: id, number: locked.number, from, to: input.status },
        },
        tx,
      );
    });
    return get(ctx, id);
  }

  return { get, listForJob, create, updateStatus };
}
