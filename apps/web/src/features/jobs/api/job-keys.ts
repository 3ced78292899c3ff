import type { JobListParams } from '../utils/list-params';

/** Every job query key; a key holds every input of its fetcher. */
export const jobKeys = {
  all: ['jobs'] as const,
  lists: () => [...jobKeys.all, 'list'] as const,
  list: (params: JobListParams) => [...jobKeys.lists(), params] as const,
  details: () => [...jobKeys.all, 'detail'] as const,
  detail: (id: string) => [...jobKeys.details(), id] as const,
  /** What the "New job" form offers: customers by search, and one customer's sites. */
  customerChoices: (q: string) => [...jobKeys.all, 'customer-choices', q] as const,
  siteChoices: (customerId: string) => [...jobKeys.all, 'site-choices', customerId] as const,
};
