import { z } from 'zod';
import { invoiceStatuses, type InvoiceStatus } from '@seamwright/shared';

export const invoicePageSizes = [10, 25, 50, 100] as const;
const defaults = { page: 1, pageSize: 25 } as const;

/**
 * The invoices list's state as it lives in the URL. Anything unreadable falls back to the
 * default, and unknown statuses are dropped one by one, so an old link still opens a list.
 */
export const invoiceListParamsSchema = z.object({
  page: z.coerce.number().int().min(1).catch(defaults.page),
  pageSize: z.coerce.number().pipe(z.literal(invoicePageSizes)).catch(defaults.pageSize),
  status: z
    .array(z.string())
    .catch([])
    .transform((values) =>
      invoiceStatuses.filter((status) => values.flatMap((v) => v.split(',')).includes(status)),
    ),
});
export type InvoiceListParams = z.output<typeof invoiceListParamsSchema>;

export function parseInvoiceListParams(search: URLSearchParams): InvoiceListParams {
  return invoiceListParamsSchema.parse({
    ...Object.fromEntries(search),
    status: search.getAll('status'),
  });
}

/** Writes the list state back, leaving out defaults so URLs stay short. */
export function toInvoiceSearchParams(params: InvoiceListParams): URLSearchParams {
  const search = new URLSearchParams();
  for (const status of params.status) search.append('status', status);
  if (params.pageSize !== defaults.pageSize) search.set('pageSize', String(params.pageSize));
  if (params.page !== defaults.page) search.set('page', String(params.page));
  return search;
}

/** Toggles one status in the filter, keeping the statuses' own order. */
export function toggleInvoiceStatus(
  current: readonly InvoiceStatus[],
  status: InvoiceStatus,
): InvoiceStatus[] {
  const next = current.includes(status)
    ? current.filter((s) => s !== status)
    : [...current, status];
  return invoiceStatuses.filter((s) => next.includes(s));
}
