// Day arithmetic shared by the dated legal rules (cancellation periods, locate tickets): calendar
// dates, holiday rules, the public-holiday dataset and business-day counting.
export { businessDaysAfter, holidayNameOn, isBusinessDay } from './business-days.js';
export type { BusinessCalendar, HolidayLookup } from './business-days.js';
export type { CalendarDate } from './calendar.js';
export {
  addCalendarDays,
  calendarDaysBetween,
  isCalendarDate,
  localDateOf,
  localInstantAt,
  localMinuteOf,
  startOfLocalDay,
  weekdayOf,
} from './calendar.js';
export { holidayDate } from './holidays.js';
export type { HolidayRule } from './holidays.js';
export { publicHolidayLookup } from './public-holidays.js';
export type { PublicHolidaySet } from './public-holidays.js';
