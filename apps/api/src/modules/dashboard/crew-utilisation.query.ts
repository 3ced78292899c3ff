// Crew utilisation (booked vs available crew-days), read from the crew calendar's tables
// (migration 0016): crews(company_id, id, working_days JSON of weekdays 0 = Sunday, archived_at)
// and bookings(company_id, crew_id, start_date, end_date). A company without crews gets
// `crewUtilisation: null` ("no crews yet").
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { scopedSql } from '../../db/tenant-scope.js';
import { crewDays } from './crew-days.js';
import type { CrewBooking, CrewWorkWeek } from './crew-days.js';
import type { DashboardRange } from './dashboard-range.js';

interface CrewCalendar {
  crews: CrewWorkWeek[];
  bookings: CrewBooking[];
}

type CrewCalendarSource = (
  ctx: RequestContext,
  sequelize: Sequelize,
  range: DashboardRange,
  crewId: string | null,
) => Promise<CrewCalendar>;

/**
 * Active crews (or the one asked for) and their bookings overlapping the period, in one
 * statement: a crew row carries `working_days`, a booking row its dates.
 */
export const selectCrewCalendar: CrewCalendarSource = async (ctx, sequelize, range, crewId) => {
  const rows = await scopedSql(ctx, sequelize).select<{
    crewId: string;
    workingDays: string | number[] | null;
    startDate: string | null;
    endDate: string | null;
  }>(
    `SELECT c.id AS crewId, c.working_days AS workingDays,
            DATE_FORMAT(b.start_date, '%Y-%m-%d') AS startDate,
            DATE_FORMAT(b.end_date, '%Y-%m-%d') AS endDate
       FROM crews c
       LEFT JOIN bookings b ON b.company_id = c.company_id AND b.crew_id = c.id
            AND b.start_date <= :to AND b.end_date >= :from
      WHERE c.company_id = :companyId AND c.archived_at IS NULL
        ${crewId ? 'AND c.id = :crewId' : ''}`,
    { from: range.from, to: range.to, crewId },
  );
  const crews = new Map<string, CrewWorkWeek>();
  const bookings: CrewBooking[] = [];
  for (const row of rows) {
    const days: unknown =
      typeof row.workingDays === 'string' ? JSON.parse(row.workingDays) : row.workingDays;
    crews.set(row.crewId, {
      crewId: row.crewId,
      workingDays: Array.isArray(days) ? days.map(Number) : null,
    });
    if (row.startDate && row.endDate)
      bookings.push({ crewId: row.crewId, startDate: row.startDate, endDate: row.endDate });
  }
  return { crews: [...crews.values()], bookings };
};

/** Where the dashboard reads crews and bookings from (a test may pass another source). */
export const crewUtilisationSource: CrewCalendarSource | null = selectCrewCalendar;

export async function crewUtilisation(
  ctx: RequestContext,
  sequelize: Sequelize,
  range: DashboardRange,
  crewId: string | null,
  source: CrewCalendarSource | null = crewUtilisationSource,
) {
  if (!source) return null;
  const { crews, bookings } = await source(ctx, sequelize, range, crewId);
  if (crews.length === 0) return null;
  return crewDays(crews, bookings, range.from, range.to);
}
