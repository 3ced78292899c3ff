import type { LocateTicketStatus } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { LocateTicketModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

/** The rule as it was when the ticket was called in. */
export interface LocateRuleSnapshot {
  id: string;
  region: string | null;
  isDefault: boolean;
  title: string;
  source: string;
  maxAhead: { days: number; unit: 'calendar' | 'business' } | null;
  lifeIsCompanyDefault: boolean;
}

export interface LocateTicketRecord {
  id: string;
  jobId: string;
  number: string;
  calledAt: Date;
  earliestDigAt: Date;
  expiresAt: Date;
  latestStartAt: Date | null;
  /** As recorded: requested, clear or conflict (expired is computed on read). */
  status: LocateTicketStatus;
  timeZone: string;
  rule: LocateRuleSnapshot;
  explanation: string;
  createdAt: Date;
  updatedAt: Date;
}

export type LocateTicketValues = Omit<
  LocateTicketRecord,
  'id' | 'jobId' | 'createdAt' | 'updatedAt'
>;

/** MariaDB hands JSON columns back as text; the snapshot was built by us before it was written. */
const fromJson = (value: unknown): unknown =>
  typeof value === 'string' ? JSON.parse(value) : value;

function toRecord(row: LocateTicketModel['_attributes']): LocateTicketRecord {
  return {
    id: row.id,
    jobId: row.jobId,
    number: row.number,
    calledAt: row.calledAt,
    earliestDigAt: row.earliestDigAt,
    expiresAt: row.expiresAt,
    latestStartAt: row.latestStartAt,
    status: row.status as LocateTicketStatus,
    timeZone: row.timeZone,
    rule: fromJson(row.rule) as LocateRuleSnapshot,
    explanation: row.explanation,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
}

export async function findLocateTicket(
  ctx: RequestContext,
  id: string,
  tx?: Tx,
): Promise<LocateTicketRecord | null> {
  const row = await scoped(ctx, LocateTicketModel).findById(id, tx ? { tx, lock: true } : {});
  return row ? toRecord(row) : null;
}

/** A job's tickets, newest call first (the one that counts now is on top). */
export async function listLocateTicketsOfJob(
  ctx: RequestContext,
  jobId: string,
): Promise<LocateTicketRecord[]> {
  const rows = await scoped(ctx, LocateTicketModel).findAll({
    where: { jobId },
    order: [
      ['calledAt', 'DESC'],
      ['id', 'ASC'],
    ],
  });
  return rows.map(toRecord);
}

export async function createLocateTicket(
  ctx: RequestContext,
  jobId: string,
  values: LocateTicketValues,
  tx: Tx,
): Promise<string> {
  const row = await scoped(ctx, LocateTicketModel).create({ jobId, ...values }, tx);
  return row.id;
}

export async function updateLocateTicketStatus(
  ctx: RequestContext,
  id: string,
  status: LocateTicketStatus,
  tx: Tx,
): Promise<void> {
  await scoped(ctx, LocateTicketModel).update(id, { status }, tx);
}
