import { z } from 'zod';
import { customerSortFields, customerStatuses } from '@seamwright/shared';
import { joinSort as joinSortWith, type SortDirection } from '../../../lib/list-sort';

export const customerPageSizes = [10, 25, 50, 100] as const;
const sortValues = [
  ...customerSortFields,
  ...customerSortFields.map((field) => `-${field}` as const),
] as const;

const defaults = { page: 1, pageSize: 25, sort: 'name', q: '', status: 'active' } as const;

/**
 * The customers list's state as it lives in the URL. Anything unreadable falls back to the
 * default instead of failing, so an old or hand-edited link still opens a list.
 */
export const customerListParamsSchema = z.object({
  page: z.coerce.number().int().min(1).catch(defaults.page),
  pageSize: z.coerce.number().pipe(z.literal(customerPageSizes)).catch(defaults.pageSize),
  sort: z.enum(sortValues).catch(defaults.sort),
  q: z
    .string()
    .trim()
    .transform((value) => value.slice(0, 100))
    .catch(defaults.q),
  status: z.enum(customerStatuses).catch(defaults.status),
});
export type CustomerListParams = z.output<typeof customerListParamsSchema>;

/** Reads the list state from the URL's search params. */
export function parseCustomerListParams(search: URLSearchParams): CustomerListParams {
  return customerListParamsSchema.parse(Object.fromEntries(search));
}

/** Writes the list state back, leaving out defaults so URLs stay short. */
export function toCustomerSearchParams(params: CustomerListParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.q) search.set('q', params.q);
  if (params.status !== defaults.status) search.set('status', params.status);
  if (params.sort !== defaults.sort) search.set('sort', params.sort);
  if (params.pageSize !== defaults.pageSize) search.set('pageSize', String(params.pageSize));
  if (params.page !== defaults.page) search.set('page', String(params.page));
  return search;
}

export { splitSort } from '../../../lib/list-sort';

export function joinSort(field: string, direction: SortDirection): CustomerListParams['sort'] {
  return joinSortWith(customerListParamsSchema.shape.sort, field, direction);
}
