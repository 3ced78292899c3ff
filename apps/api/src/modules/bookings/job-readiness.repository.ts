// What the booking rules need to know about jobs, read for several jobs at once: their locate
// tickets, turf reservations and whether they have turf to lay (saved areas).
import type { BookingTicket } from '@seamwright/domain';
import type { LocateTicketStatus } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { JobAreaModel, LocateTicketModel, TurfReservationModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

export interface JobReadiness {
  /** Newest call first. */
  tickets: BookingTicket[];
  /** null when the job has no saved area, so no turf to lay. */
  turf: { reserved: boolean; shortFt: number } | null;
}

const fromJson = (value: unknown): unknown =>
  typeof value === 'string' ? JSON.parse(value) : value;

export async function readJobReadiness(
  ctx: RequestContext,
  jobIds: string[],
  tx?: Tx,
): Promise<Map<string, JobReadiness>> {
  const result = new Map<string, JobReadiness>();
  if (jobIds.length === 0) return result;
  const where = { jobId: jobIds };
  const options = tx ? { tx } : {};
  const [tickets, reservations, areas] = await Promise.all([
    scoped(ctx, LocateTicketModel).findAll({
      where,
      order: [
        ['calledAt', 'DESC'],
        ['id', 'ASC'],
      ],
      ...options,
    }),
    scoped(ctx, TurfReservationModel).findAll({ where, ...options }),
    scoped(ctx, JobAreaModel).findAll({ where, attributes: ['jobId'], ...options }),
  ]);
  for (const jobId of jobIds) {
    const held = reservations.filter((r) => r.jobId === jobId);
    const hasAreas = areas.some((a) => a.jobId === jobId);
    result.set(jobId, {
      tickets: tickets
        .filter((t) => t.jobId === jobId)
        .map((t) => ({
          status: t.status as LocateTicketStatus,
          earliestDigAt: t.earliestDigAt.toISOString(),
          expiresAt: t.expiresAt.toISOString(),
          latestStartAt: t.latestStartAt?.toISOString() ?? null,
          timeZone: t.timeZone,
          maxAhead: (fromJson(t.rule) as { maxAhead?: BookingTicket['maxAhead'] }).maxAhead ?? null,
        })),
      turf:
        !hasAreas && held.length === 0
          ? null
          : {
              reserved: held.length > 0,
              shortFt: held.reduce((sum, r) => sum + r.shortFt, 0),
            },
    });
  }
  return result;
}
