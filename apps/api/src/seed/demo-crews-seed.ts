// Two demo crews and a few bookings on the scheduled demo job, once (when the demo company has
// no crews), through the same services a request uses, so every booking passes the rules.
// The days follow today (next week, in the company's zone), so the calendar opens on them.
import { addCalendarDays, localDateOf, weekdayOf } from '@seamwright/domain';
import type { BookingPhase } from '@seamwright/domain';
import type { RequestContext } from '../context.js';
import type { ServiceDeps } from '../deps.js';
import { CrewModel, JobModel, MembershipModel } from '../db/models/index.js';
import { scoped } from '../db/tenant-scope.js';
import { AppError } from '../errors.js';
import { createBookingsService } from '../modules/bookings/bookings.service.js';
import { findOwnCompany } from '../modules/company/company.repository.js';
import { createCrewsService } from '../modules/crews/crews.service.js';

const bookedJobTitle = 'Play yard with fall padding';

/** Offsets from next Monday: the turf crew lays it over two days, the other finishes. */
const demoBookings: { crew: 0 | 1; from: number; days: number; phase: BookingPhase }[] = [
  { crew: 0, from: 0, days: 2, phase: 'turf_seams_infill' },
  { crew: 1, from: 2, days: 1, phase: 'finishing' },
];

export async function seedDemoCrews(
  ctx: RequestContext,
  deps: Pick<ServiceDeps, 'sequelize'>,
): Promise<void> {
  if ((await scoped(ctx, CrewModel).count()) > 0) return;
  const crews = createCrewsService(deps);
  const [lead] = await scoped(ctx, MembershipModel).findAll({ where: { role: 'crew_lead' } });
  const made = [
    await crews.create(ctx, {
      name: 'Juniper crew',
      colour: 'pine',
      workingDays: [1, 2, 3, 4, 5],
      jobsPerDay: 1,
      members: [...(lead ? [{ userId: lead.userId }] : []), { name: 'Abel Thornquist' }],
    }),
    await crews.create(ctx, {
      name: 'Heather crew',
      colour: 'harbour',
      workingDays: [1, 2, 3, 4, 5, 6],
      jobsPerDay: 2,
      members: [{ name: 'Lise Corrander' }, { name: 'Oren Pashley' }],
    }),
  ];
  const [job] = await scoped(ctx, JobModel).findAll({ where: { title: bookedJobTitle } });
  if (!job) return;
  const today = localDateOf(new Date(), (await findOwnCompany(ctx))?.timeZone ?? 'UTC');
  const nextMonday = addCalendarDays(today, (8 - weekdayOf(today)) % 7 || 7);
  const bookings = createBookingsService(deps);
  for (const booking of demoBookings) {
    const startDate = addCalendarDays(nextMonday, booking.from);
    try {
      await bookings.create(ctx, {
        crewId: made[booking.crew]!.id,
        jobId: job.id,
        startDate,
        endDate: addCalendarDays(startDate, booking.days - 1),
        phase: booking.phase,
        notes: null,
      });
    } catch (error) {
      // A rule that refuses the demo booking (the job moved on) leaves it out, not the demo.
      if (!(error instanceof AppError)) throw error;
    }
  }
}
