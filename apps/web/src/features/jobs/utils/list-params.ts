import { z } from 'zod';
import { jobSortFields, jobStatuses, type JobStatus } from '@seamwright/shared';
import { joinSort as joinSortWith, type SortDirection } from '../../../lib/list-sort';

export const jobPageSizes = [10, 25, 50, 100] as const;
const sortValues = [
  ...jobSortFields,
  ...jobSortFields.map((field) => `-${field}` as const),
] as const;

const defaults = { page: 1, pageSize: 25, sort: '-createdAt', q: '', from: '', to: '' } as const;

const isoDay = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/)
  .catch('');

/**
 * The jobs list's state as it lives in the URL. Anything unreadable falls back to the default
 * instead of failing, so an old or hand-edited link still opens a list; unknown statuses are
 * dropped one by one.
 */
export const jobListParamsSchema = z.object({
  page: z.coerce.number().int().min(1).catch(defaults.page),
  pageSize: z.coerce.number().pipe(z.literal(jobPageSizes)).catch(defaults.pageSize),
  sort: z.enum(sortValues).catch(defaults.sort),
  q: z
    .string()
    .trim()
    .transform((value) => value.slice(0, 100))
    .catch(defaults.q),
  status: z
    .array(z.string())
    .catch([])
    .transform((values) =>
      jobStatuses.filter((status) => values.flatMap((v) => v.split(',')).includes(status)),
    ),
  from: isoDay,
  to: isoDay,
});
export type JobListParams = z.output<typeof jobListParamsSchema>;

/** Reads the list state from the URL's search params (`status` may repeat). */
export function parseJobListParams(search: URLSearchParams): JobListParams {
  return jobListParamsSchema.parse({
    ...Object.fromEntries(search),
    status: search.getAll('status'),
  });
}

/** Writes the list state back, leaving out defaults so URLs stay short. */
export function toJobSearchParams(params: JobListParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.q) search.set('q', params.q);
  for (const status of params.status) search.append('status', status);
  if (params.from) search.set('from', params.from);
  if (params.to) search.set('to', params.to);
  if (params.sort !== defaults.sort) search.set('sort', params.sort);
  if (params.pageSize !== defaults.pageSize) search.set('pageSize', String(params.pageSize));
  if (params.page !== defaults.page) search.set('page', String(params.page));
  return search;
}

/** Whether the list is narrowed by anything but paging and order. */
export function isFiltered(params: JobListParams): boolean {
  return params.q !== '' || params.status.length > 0 || params.from !== '' || params.to !== '';
}

export { splitSort } from '../../../lib/list-sort';

export function joinSort(field: string, direction: SortDirection): JobListParams['sort'] {
  return joinSortWith(jobListParamsSchema.shape.sort, field, direction);
}

/** Toggles one status in the filter, keeping lifecycle order. */
export function toggleStatus(current: readonly JobStatus[], status: JobStatus): JobStatus[] {
  const next = current.includes(status)
    ? current.filter((s) => s !== status)
    : [...current, status];
  return jobStatuses.filter((s) => next.includes(s));
}
