// The FullCalendar grid. Loaded lazily (React.lazy in calendar-screen.tsx), so FullCalendar is
// fetched only when the calendar opens. Drag to move, stretch to resize and select days to
// book; the screen decides what the server said and reverts a refused change.
import FullCalendar from '@fullcalendar/react';
import dayGridPlugin from '@fullcalendar/daygrid';
import interactionPlugin from '@fullcalendar/interaction';
import type { EventContentArg } from '@fullcalendar/core';
import type { BookingView } from '@seamwright/shared';
import {
  calendarViews,
  dayOf,
  lastDayOf,
  toEvent,
  type CalendarViewName,
} from '../utils/calendar-days';

export interface GridProps {
  bookings: BookingView[];
  canEdit: boolean;
  view: CalendarViewName;
  date: string;
  onRangeChange: (
    range: { from: string; to: string },
    view: CalendarViewName,
    date: string,
  ) => void;
  onChangeDays: (
    booking: BookingView,
    days: { startDate: string; endDate: string },
    revert: () => void,
  ) => void;
  onSelectDays: (days: { startDate: string; endDate: string }) => void;
}

function EventText({ event }: EventContentArg) {
  const booking = (event.extendedProps as { booking: BookingView }).booking;
  const warnings = booking.warnings.length;
  return (
    <div
      className="overflow-hidden px-1 text-xs leading-tight text-white"
      data-booking-id={booking.id}
    >
      <strong>{booking.crew.name}</strong> · {booking.phaseLabel}
      <br />
      {booking.job.title}
      {warnings > 0 ? (
        <span className="ml-1 rounded bg-white px-1 font-bold text-ink">
          {warnings === 1 ? '1 warning' : `${warnings} warnings`}
        </span>
      ) : null}
    </div>
  );
}

export default function CrewCalendarGrid(props: GridProps) {
  const { bookings, canEdit, view, date, onRangeChange, onChangeDays, onSelectDays } = props;
  return (
    <FullCalendar
      plugins={[dayGridPlugin, interactionPlugin]}
      initialView={calendarViews[view]}
      initialDate={date}
      firstDay={1}
      height="auto"
      headerToolbar={{
        left: 'prev,next today',
        center: 'title',
        right: 'dayGridMonth,dayGridWeek',
      }}
      buttonText={{ today: 'Today', month: 'Month', week: 'Week' }}
      events={bookings.map(toEvent)}
      eventContent={EventText}
      editable={canEdit}
      eventStartEditable={canEdit}
      eventDurationEditable={canEdit}
      selectable={canEdit}
      selectMirror
      dayMaxEvents={false}
      datesSet={(info) => {
        const name: CalendarViewName = info.view.type === 'dayGridWeek' ? 'week' : 'month';
        onRangeChange(
          { from: dayOf(info.start), to: lastDayOf(info.start, info.end) },
          name,
          dayOf(info.view.currentStart),
        );
      }}
      eventDrop={(info) => {
        const booking = (info.event.extendedProps as { booking: BookingView }).booking;
        const start = info.event.start;
        if (!start) return info.revert();
        onChangeDays(
          booking,
          { startDate: dayOf(start), endDate: lastDayOf(start, info.event.end) },
          info.revert,
        );
      }}
      eventResize={(info) => {
        const booking = (info.event.extendedProps as { booking: BookingView }).booking;
        const start = info.event.start;
        if (!start) return info.revert();
        onChangeDays(
          booking,
          { startDate: dayOf(start), endDate: lastDayOf(start, info.event.end) },
          info.revert,
        );
      }}
      select={(info) => {
        onSelectDays({ startDate: dayOf(info.start), endDate: lastDayOf(info.start, info.end) });
        info.view.calendar.unselect();
      }}
    />
  );
}
