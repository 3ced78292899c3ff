import { lazy, Suspense, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { addCalendarDays } from '@seamwright/domain';
import type { BookingSaved, BookingView } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { SelectField } from '../../../components/ui/form-fields';
import { Loading } from '../../../components/ui/loading';
import { isApiError } from '../../../lib/api-client';
import { useCan } from '../../../lib/session';
import {
  useBookings,
  useCalendarCrews,
  useDeleteBooking,
  useUpdateBooking,
} from '../api/bookings-api';
import { dayOf, type CalendarViewName } from '../utils/calendar-days';
import { BookingForm } from './booking-form';
import { BookingsList } from './bookings-list';

// FullCalendar is large: its chunk loads only when the grid is shown.
const CrewCalendarGrid = lazy(() => import('./crew-calendar-grid'));

type Editing = { booking: BookingView | null; days: { startDate: string; endDate: string } } | null;

function reasonOf(error: unknown): string {
  if (isApiError(error) && error.fieldErrors.length > 0)
    return error.fieldErrors.map((e) => e.message).join(' ');
  return error instanceof Error ? error.message : 'The change could not be saved.';
}

/** The crew calendar: month and week grids, a legend, the crew filter and the bookings list. */
export function CalendarScreen() {
  const [params, setParams] = useSearchParams();
  const crewId = params.get('crew') ?? '';
  const view: CalendarViewName = params.get('view') === 'week' ? 'week' : 'month';
  const date = params.get('date') ?? dayOf(new Date());
  const [range, setRange] = useState<{ from: string; to: string } | null>(null);
  const [refused, setRefused] = useState<string | null>(null);
  const [saved, setSaved] = useState<{ text: string; warnings: string[] } | null>(null);
  const [editing, setEditing] = useState<Editing>(null);
  const canEdit = useCan('bookings.write');
  const crews = useCalendarCrews();
  const bookings = useBookings(range, crewId);
  const update = useUpdateBooking();
  const remove = useDeleteBooking();

  const setParam = (changes: Record<string, string>) =>
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        for (const [key, value] of Object.entries(changes))
          if (value) next.set(key, value);
          else next.delete(key);
        return next;
      },
      { replace: true },
    );

  const afterSave = (result: BookingSaved | null, what: string) => {
    setEditing(null);
    if (!result) return;
    setRefused(null);
    setSaved({ text: what, warnings: result.warnings.map((w) => w.message) });
  };

  const crewList = crews.data ?? [];
  const today = dayOf(new Date());
  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end gap-4">
        <SelectField
          label="Crew"
          value={crewId}
          onChange={(e) => setParam({ crew: e.target.value })}
          wrapperClassName="min-w-56"
        >
          <option value="">All crews</option>
          {crewList.map((crew) => (
            <option key={crew.id} value={crew.id}>
              {crew.name}
            </option>
          ))}
        </SelectField>
        {canEdit ? (
          <Button
            onClick={() =>
              setEditing({ booking: null, days: { startDate: today, endDate: today } })
            }
          >
            Add booking
          </Button>
        ) : null}
      </div>
      <ul aria-label="Crew colours" className="flex flex-wrap gap-3 text-sm">
        {crewList.map((crew) => (
          <li key={crew.id} className="flex items-center gap-2">
            <span
              aria-hidden
              className="inline-block h-4 w-4 rounded"
              style={{ backgroundColor: crew.colourHex }}
            />
            {crew.name}
          </li>
        ))}
      </ul>
      {refused ? (
        <FormAlert>
          <span>Not changed: {refused}</span>
        </FormAlert>
      ) : null}
      <div role="status" aria-live="polite">
        {saved ? (
          <div className="rounded-md border border-moss-200 bg-moss-50 px-4 py-3 text-moss-900">
            <p>{saved.text}</p>
            {saved.warnings.length > 0 ? (
              <ul className="mt-1 list-disc pl-5 text-caution-800">
                {saved.warnings.map((w) => (
                  <li key={w}>{w}</li>
                ))}
              </ul>
            ) : null}
          </div>
        ) : null}
      </div>
      {editing ? (
        <div className="rounded-lg border border-line bg-sand-50 p-6">
          <BookingForm
            key={editing.booking?.id ?? `${editing.days.startDate}-${editing.days.endDate}`}
            crews={crewList}
            booking={editing.booking}
            days={editing.days}
            defaultCrewId={crewId}
            onDone={(result) =>
              afterSave(result, editing.booking ? 'Booking changed.' : 'Crew booked.')
            }
          />
        </div>
      ) : null}
      {/* On a phone the grid keeps readable day columns and scrolls sideways. */}
      <div className="overflow-x-auto rounded-lg border border-line bg-white p-3">
        <div className="min-w-[40rem]">
          <Suspense fallback={<Loading label="Loading the calendar…" />}>
            <CrewCalendarGrid
              bookings={bookings.data ?? []}
              canEdit={canEdit}
              view={view}
              date={date}
              onRangeChange={(next, nextView, nextDate) => {
                setRange((current) =>
                  current?.from === next.from && current.to === next.to ? current : next,
                );
                if (nextView !== view || nextDate !== date)
                  setParam({ view: nextView === 'month' ? '' : nextView, date: nextDate });
              }}
              onChangeDays={(booking, days, revert) => {
                update.mutate(
                  { id: booking.id, version: booking.version, ...days },
                  {
                    onSuccess: (result) =>
                      afterSave(
                        result,
                        `${booking.job.title} moved to ${days.startDate}${days.endDate === days.startDate ? '' : ` to ${days.endDate}`}.`,
                      ),
                    onError: (error) => {
                      revert();
                      setSaved(null);
                      setRefused(reasonOf(error));
                    },
                  },
                );
              }}
              onSelectDays={(days) => setEditing({ booking: null, days })}
            />
          </Suspense>
        </div>
      </div>
      <section aria-labelledby="bookings-in-view" className="flex flex-col gap-2">
        <h2 id="bookings-in-view" className="text-xl font-bold">
          Bookings in view
        </h2>
        <BookingsList
          bookings={bookings.data ?? []}
          canEdit={canEdit}
          onChange={(booking) =>
            setEditing({
              booking,
              days: { startDate: booking.startDate, endDate: booking.endDate },
            })
          }
          onRemove={(booking) =>
            remove.mutate(booking.id, {
              onSuccess: () =>
                afterSave({ id: booking.id, version: 0, warnings: [] }, 'Booking removed.'),
              onError: (error) => setRefused(reasonOf(error)),
            })
          }
        />
      </section>
      <p className="text-sm text-ink-muted">
        Days are the company's calendar days. Drag a booking to move it, stretch its end to resize
        it, or select days to book; the server checks every change.{' '}
        {range ? `Showing ${range.from} to ${addCalendarDays(range.to, 0)}.` : null}
      </p>
    </div>
  );
}
