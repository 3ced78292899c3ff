import type { BookingView } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';

/** The bookings in view as a table: the calendar's text alternative and its keyboard path. */
export function BookingsList({
  bookings,
  canEdit,
  onChange,
  onRemove,
}: {
  bookings: BookingView[];
  canEdit: boolean;
  onChange: (booking: BookingView) => void;
  onRemove: (booking: BookingView) => void;
}) {
  if (bookings.length === 0) return <p className="text-ink-muted">No bookings in these days.</p>;
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-white">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Bookings in view</caption>
        <thead className="bg-sand-50">
          <tr>
            <th scope="col" className="p-2">
              Days
            </th>
            <th scope="col" className="p-2">
              Crew
            </th>
            <th scope="col" className="p-2">
              Phase
            </th>
            <th scope="col" className="p-2">
              Job
            </th>
            <th scope="col" className="p-2">
              Warnings
            </th>
            {canEdit ? (
              <th scope="col" className="p-2">
                <span className="sr-only">Actions</span>
              </th>
            ) : null}
          </tr>
        </thead>
        <tbody>
          {bookings.map((b) => (
            <tr key={b.id} className="border-t border-line align-top">
              <td className="p-2 tabular-nums whitespace-nowrap">
                {b.startDate === b.endDate ? b.startDate : `${b.startDate} to ${b.endDate}`}
              </td>
              <td className="p-2">
                <span className="flex items-center gap-2">
                  <span
                    aria-hidden
                    className="inline-block h-3 w-3 rounded"
                    style={{ backgroundColor: b.crew.colourHex }}
                  />
                  {b.crew.name}
                </span>
              </td>
              <td className="p-2">{b.phaseLabel}</td>
              <td className="p-2">
                {b.job.title}
                <span className="block text-ink-muted">
                  {b.customerName}, {b.siteAddress}
                </span>
              </td>
              <td className="p-2">
                {b.warnings.length === 0 ? (
                  'None'
                ) : (
                  <ul className="list-disc pl-4 text-caution-800">
                    {b.warnings.map((w) => (
                      <li key={w.code}>{w.message}</li>
                    ))}
                  </ul>
                )}
              </td>
              {canEdit ? (
                <td className="p-2 whitespace-nowrap">
                  <Button
                    variant="secondary"
                    onClick={() => onChange(b)}
                    aria-label={`Change booking ${b.job.title} ${b.startDate}`}
                  >
                    Change
                  </Button>
                  <Button
                    variant="quietDanger"
                    onClick={() => onRemove(b)}
                    aria-label={`Remove booking ${b.job.title} ${b.startDate}`}
                  >
                    Remove
                  </Button>
                </td>
              ) : null}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
