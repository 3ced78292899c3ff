import type { JobActivityView } from '@seamwright/shared';
import { describeActivity } from '../utils/activity-words';
import { formatDateTime } from '../../../lib/format';

/** What happened to the job, newest first, from the audit log. */
export function JobActivity({ events, timeZone }: { events: JobActivityView[]; timeZone: string }) {
  if (events.length === 0) return <p className="text-ink-muted">Nothing has happened yet.</p>;
  return (
    <ol className="flex flex-col gap-2">
      {events.map((event) => (
        <li key={event.id} className="rounded-md border border-line bg-white px-4 py-2">
          <p>{describeActivity(event)}</p>
          <p className="text-sm text-ink-muted">
            {event.userName ?? 'Someone'} ·{' '}
            <time dateTime={event.createdAt}>{formatDateTime(event.createdAt, timeZone)}</time>
          </p>
        </li>
      ))}
    </ol>
  );
}
