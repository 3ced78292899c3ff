// Crew-days, booked and available, over a period: pure counting for crew utilisation.
import { addCalendarDays, weekdayOf } from '@seamwright/domain';

export interface CrewWorkWeek {
  crewId: string;
  /** Weekdays the crew works, 0 = Sunday … 6 = Saturday; null: Monday to Friday. */
  workingDays: readonly number[] | null;
}

export interface CrewBooking {
  crewId: string;
  startDate: string;
  endDate: string;
}

const mondayToFriday = [1, 2, 3, 4, 5];

/**
 * Available: every working day of every crew in [from, to]. Booked: the distinct working days
 * of a crew that a booking of it covers inside [from, to] (two bookings of one crew on one day
 * count once; a booked non-working day is overtime and not counted), so booked ≤ available.
 */
export function crewDays(
  crews: readonly CrewWorkWeek[],
  bookings: readonly CrewBooking[],
  from: string,
  to: string,
): { bookedCrewDays: number; availableCrewDays: number; rate: number | null } {
  const works = new Map(crews.map((c) => [c.crewId, new Set(c.workingDays ?? mondayToFriday)]));
  let available = 0;
  for (let day = from; day <= to; day = addCalendarDays(day, 1))
    for (const days of works.values()) if (days.has(weekdayOf(day))) available += 1;
  const booked = new Set<string>();
  for (const booking of bookings) {
    const days = works.get(booking.crewId);
    if (!days) continue;
    const start = booking.startDate > from ? booking.startDate : from;
    const end = booking.endDate < to ? booking.endDate : to;
    for (let day = start; day <= end; day = addCalendarDays(day, 1))
      if (days.has(weekdayOf(day))) booked.add(`${booking.crewId} ${day}`);
  }
  return {
    bookedCrewDays: booked.size,
    availableCrewDays: available,
    rate: available === 0 ? null : booked.size / available,
  };
}
