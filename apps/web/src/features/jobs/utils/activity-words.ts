// A job's audit events in words for its activity list. Events this table does not know yet
// read as their action's words ("job.estimate_sent" → "Estimate sent"), never as a code.
import type { JobActivityView } from '@seamwright/shared';
import { statusLabel } from '../components/job-status';
import { isJobStatusValue } from './job-words';

type Data = Record<string, unknown>;

const text = (value: unknown): string | null => (typeof value === 'string' ? value : null);
const version = (data: Data): string =>
  typeof data.version === 'number' ? ` (version ${data.version})` : '';

const phrases: Record<string, (data: Data) => string | null> = {
  'job.created': () => 'Started the job as a lead',
  'job.status_changed': (data) =>
    isJobStatusValue(data.from) && isJobStatusValue(data.to)
      ? `Moved from ${statusLabel(data.from).toLowerCase()} to ${statusLabel(data.to).toLowerCase()}`
      : null,
  'job.renamed': (data) => (text(data.to) ? `Renamed the job to “${text(data.to)}”` : null),
  'job.area_added': (data) => (text(data.name) ? `Drew the area “${text(data.name)}”` : null),
  'job.area_changed': (data) => (text(data.name) ? `Changed the area “${text(data.name)}”` : null),
  'job.area_removed': (data) => (text(data.name) ? `Removed the area “${text(data.name)}”` : null),
  'job.turf_reserved': (data) => {
    const lots = Array.isArray(data.dyeLots) ? data.dyeLots.filter((l) => text(l)) : [];
    const short = typeof data.shortFt === 'number' && data.shortFt > 0 ? ', some to order' : '';
    return lots.length
      ? `Reserved the turf from dye lot ${lots.join(', ')}${short}`
      : `Reserved the turf${short}`;
  },
  'job.turf_released': () => 'Released the turf held in stock',
  'job.remnants_returned': (data) => {
    const n = Array.isArray(data.rollIds) ? data.rollIds.length : 0;
    return `Returned ${n === 1 ? 'a remnant' : `${n} remnants`} to stock`;
  },
  'job.locate_ticket_added': (data) =>
    text(data.number)
      ? `Called in locate ticket ${text(data.number)}`
      : 'Called in a locate ticket',
  'job.locate_ticket_status_changed': (data) =>
    text(data.number) && text(data.to)
      ? `Marked locate ticket ${text(data.number)} ${text(data.to)}`
      : null,
  'job.estimate_created': (data) => `Built an estimate${version(data)}`,
  'job.estimate_changed': (data) => `Changed the estimate${version(data)}`,
  'job.estimate_revised': (data) => `Made a new estimate version${version(data)}`,
  'job.estimate_sent': (data) => `Sent the estimate${version(data)}`,
};

/** "job.estimate_sent" → "Estimate sent". */
function actionWords(action: string): string {
  const words = action.replace(/^job\./, '').replace(/_/g, ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** One audit event in words. */
export function describeActivity(event: Pick<JobActivityView, 'action' | 'data'>): string {
  return phrases[event.action]?.(event.data ?? {}) ?? actionWords(event.action);
}
