import type { JobActivityView } from '@seamwright/shared';
import { isJobStatusValue } from '../utils/job-words';
import { formatDateTime } from '../../../lib/format';
import { statusLabel } from './job-status';

/** One audit event in words. */
function describe(event: JobActivityView): string {
  const data = event.data ?? {};
  if (event.action === 'job.created') return 'Started the job as a lead';
  if (event.action === 'job.status_changed') {
    const from: unknown = data.from;
    const to: unknown = data.to;
    if (isJobStatusValue(from) && isJobStatusValue(to))
      return `Moved from ${statusLabel(from).toLowerCase()} to ${statusLabel(to).toLowerCase()}`;
  }
  if (event.action === 'job.renamed' && typeof data.to === 'string')
    return `Renamed the job to “${data.to}”`;
  return event.action;
}

/** What happened to the job, newest first, from the audit log. */
export function JobActivity({ events, timeZone }: { events: JobActivityView[]; timeZone: string }) {
  if (events.length === 0) return <p className="text-ink-muted">Nothing has happened yet.</p>;
  return (
    <ol className="flex flex-col gap-2">
      {events.map((event) => (
        <li key={event.id} className="rounded-md border border-line bg-white px-4 py-2">
          <p>{describe(event)}</p>
          <p className="text-sm text-ink-muted">
            {event.userName ?? 'Someone'} ·{' '}
            <time dateTime={event.createdAt}>{formatDateTime(event.createdAt, timeZone)}</time>
          </p>
        </li>
      ))}
    </ol>
  );
}
