import { jobStatuses, type JobStatus } from '@seamwright/shared';

/** Whether a value read from an audit event's data names a job status. */
export function isJobStatusValue(value: unknown): value is JobStatus {
  return typeof value === 'string' && (jobStatuses as readonly string[]).includes(value);
}
