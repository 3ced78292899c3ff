// The job lifecycle from DOMAIN.md: lead → estimated → accepted → scheduled → in progress →
// installed → invoiced → paid → closed, or lost / cancelled at any point before installed.
// Later work (estimates, bookings, invoices) will drive several of these moves and add guards
// of its own; this module only knows which moves the lifecycle itself allows.

/** Every job status, in lifecycle order; `lost` and `cancelled` are the two ways out. */
export const jobStatuses = [
  'lead',
  'estimated',
  'accepted',
  'scheduled',
  'in_progress',
  'installed',
  'invoiced',
  'paid',
  'closed',
  'lost',
  'cancelled',
] as const;

/** One status of a job. */
export type JobStatus = (typeof jobStatuses)[number];

/** Statuses a job can end in (no move leaves them). */
export const finalJobStatuses: readonly JobStatus[] = ['closed', 'lost', 'cancelled'];

/** The forward path, one step at a time. */
const forward: Partial<Record<JobStatus, JobStatus>> = {
  lead: 'estimated',
  estimated: 'accepted',
  accepted: 'scheduled',
  scheduled: 'in_progress',
  in_progress: 'installed',
  installed: 'invoiced',
  invoiced: 'paid',
  paid: 'closed',
};

/** Statuses before installed, from which a job may still be lost or cancelled. */
const beforeInstalled: readonly JobStatus[] = [
  'lead',
  'estimated',
  'accepted',
  'scheduled',
  'in_progress',
];

/** Whether `value` names a job status. */
export function isJobStatus(value: unknown): value is JobStatus {
  return typeof value === 'string' && (jobStatuses as readonly string[]).includes(value);
}

/**
 * The statuses a job in `status` may move to next: the next step forward, then `lost` and
 * `cancelled` while the job is not yet installed. Final statuses allow nothing.
 */
export function allowedNextStatuses(status: JobStatus): JobStatus[] {
  const next: JobStatus[] = [];
  const step = forward[status];
  if (step) next.push(step);
  if (beforeInstalled.includes(status)) next.push('lost', 'cancelled');
  return next;
}

/** Whether the lifecycle allows moving a job from `from` to `to`. */
export function canTransition(from: JobStatus, to: JobStatus): boolean {
  return allowedNextStatuses(from).includes(to);
}

/** Thrown by {@link assertTransition}; `message` says what is not allowed and what is. */
export class JobTransitionError extends Error {
  readonly from: JobStatus;
  readonly to: JobStatus;
  readonly allowed: JobStatus[];

  constructor(from: JobStatus, to: JobStatus, allowed: JobStatus[]) {
    const options = allowed.length
      ? `allowed from ${label(from)}: ${allowed.map(label).join(', ')}`
      : `${label(from)} is final; no further moves are allowed`;
    super(`A job cannot move from ${label(from)} to ${label(to)}; ${options}`);
    this.name = 'JobTransitionError';
    this.from = from;
    this.to = to;
    this.allowed = allowed;
  }
}

/** Words for each status as people in the trade say them. */
export const jobStatusLabels: Record<JobStatus, string> = {
  lead: 'lead',
  estimated: 'estimated',
  accepted: 'accepted',
  scheduled: 'scheduled',
  in_progress: 'in progress',
  installed: 'installed',
  invoiced: 'invoiced',
  paid: 'paid',
  closed: 'closed',
  lost: 'lost',
  cancelled: 'cancelled',
};

function label(status: JobStatus): string {
  return jobStatusLabels[status];
}

/**
 * Throws {@link JobTransitionError} unless the lifecycle allows `from` → `to`. Staying in the
 * same status is not a move and is refused too, so callers skip it before asking.
 */
export function assertTransition(from: JobStatus, to: JobStatus): void {
  if (!canTransition(from, to)) throw new JobTransitionError(from, to, allowedNextStatuses(from));
}
