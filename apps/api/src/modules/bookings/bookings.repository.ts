// Rows of `bookings`, with their crew, job, customer and site read in one join for the
// calendar (the parents share the booking's company by the keys of migrations 0007 and 0016).
import { Op } from 'sequelize';
import type { Includeable, WhereOptions } from 'sequelize';
import type { RequestContext } from '../../context.js';
import {
  BookingModel,
  CrewModel,
  CustomerModel,
  JobModel,
  SiteModel,
} from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

type BookingAttributes = Awaited<
  ReturnType<ReturnType<typeof scoped<BookingModel>>['findAll']>
>[number];
export type BookingRow = BookingAttributes;

export interface BookingCalendarRow extends BookingAttributes {
  crew: { id: string; name: string; colour: string; workingDays: unknown };
  job: {
    id: string;
    title: string;
    status: string;
    customer: { name: string };
    site: { addressLine1: string; city: string };
  };
}

const calendarParents: Includeable[] = [
  { model: CrewModel, as: 'crew', attributes: ['id', 'name', 'colour', 'workingDays'] },
  {
    model: JobModel,
    as: 'job',
    attributes: ['id', 'title', 'status'],
    include: [
      { model: CustomerModel, as: 'customer', attributes: ['name'] },
      { model: SiteModel, as: 'site', attributes: ['addressLine1', 'city'] },
    ],
  },
];

/** Bookings sharing a day with `from`…`to` (inclusive). */
const overlapping = (from: string, to: string) => ({
  startDate: { [Op.lte]: to },
  endDate: { [Op.gte]: from },
});

export async function listCalendarBookings(
  ctx: RequestContext,
  query: { from: string; to: string; crewIds?: string[] },
): Promise<BookingCalendarRow[]> {
  const where: Record<string, unknown> = overlapping(query.from, query.to);
  if (query.crewIds) where.crewId = query.crewIds;
  const rows = await scoped(ctx, BookingModel).findAll({
    where: where as WhereOptions<BookingAttributes>,
    include: calendarParents,
    order: [
      ['startDate', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return rows as BookingCalendarRow[];
}

export function findBooking(ctx: RequestContext, id: string, tx?: Tx) {
  return scoped(ctx, BookingModel).findById(id, tx ? { tx, lock: true } : {});
}

/**
 * The crew's bookings sharing a day with the range, this one left out. Read after the crew's
 * row lock is taken (the transaction's first statement), so the snapshot already holds every
 * booking committed by a transaction that held the lock before.
 */
export function listCrewBookingsBetween(
  ctx: RequestContext,
  crewId: string,
  range: { startDate: string; endDate: string },
  exceptId: string | null,
  tx: Tx,
) {
  const where: Record<string | symbol, unknown> = {
    crewId,
    ...overlapping(range.startDate, range.endDate),
  };
  if (exceptId) where.id = { [Op.ne]: exceptId };
  return scoped(ctx, BookingModel).findAll({
    where: where as WhereOptions<BookingAttributes>,
    tx,
  });
}

export function countBookingsOfJob(ctx: RequestContext, jobId: string, tx: Tx) {
  return scoped(ctx, BookingModel).count({ jobId }, tx);
}

export function createBooking(
  ctx: RequestContext,
  values: Omit<BookingAttributes, 'id' | 'companyId' | 'createdAt' | 'updatedAt' | 'version'>,
  tx: Tx,
) {
  return scoped(ctx, BookingModel).create(values, tx);
}

export function updateBooking(
  ctx: RequestContext,
  id: string,
  values: Partial<
    Pick<BookingAttributes, 'crewId' | 'startDate' | 'endDate' | 'phase' | 'notes' | 'version'>
  >,
  tx: Tx,
) {
  return scoped(ctx, BookingModel).update(id, values, tx);
}

export async function deleteBooking(ctx: RequestContext, id: string, tx: Tx): Promise<void> {
  await scoped(ctx, BookingModel).destroy({ id }, tx);
}
