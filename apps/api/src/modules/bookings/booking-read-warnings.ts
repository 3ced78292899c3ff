// Warnings shown with bookings when they are read: the rules run again on today's facts
// (tickets called in and turf reserved since the last change count), for every job in one
// round of reads. A crew's capacity and the cancellation period are checked when a booking is
// saved, not here; a rule that would now refuse the booking is shown as a warning.
import { evaluateBooking } from '@seamwright/domain';
import type { BookingIssue, BookingPhase, JobStatus } from '@seamwright/domain';
import type { RequestContext } from '../../context.js';
import type { BookingCalendarRow } from './bookings.repository.js';
import { readJobReadiness } from './job-readiness.repository.js';

/** MariaDB hands JSON columns back as text. */
function workingDaysOf(value: unknown): number[] {
  const days: unknown = typeof value === 'string' ? JSON.parse(value) : value;
  return Array.isArray(days) ? days.map(Number) : [];
}

export async function warningsOnRead(
  ctx: RequestContext,
  rows: BookingCalendarRow[],
  timeZone: string,
): Promise<Map<string, BookingIssue[]>> {
  const jobIds = [...new Set(rows.map((row) => row.jobId))];
  const readiness = await readJobReadiness(ctx, jobIds);
  const now = new Date();
  const result = new Map<string, BookingIssue[]>();
  for (const row of rows) {
    const job = readiness.get(row.jobId) ?? { tickets: [], turf: null };
    const evaluation = evaluateBooking({
      startDate: row.startDate,
      endDate: row.endDate,
      phase: row.phase as BookingPhase,
      jobId: row.jobId,
      // Past the install the booking is history; its status says nothing about the days.
      jobStatus: 'scheduled' satisfies JobStatus,
      crew: {
        name: row.crew.name,
        workingDays: workingDaysOf(row.crew.workingDays),
        jobsPerDay: Infinity,
      },
      otherBookings: [],
      tickets: job.tickets,
      cancellationEndsAt: null,
      turf: job.turf,
      timeZone,
      now,
    });
    result.set(row.id, [...evaluation.refusals, ...evaluation.warnings]);
  }
  return result;
}
