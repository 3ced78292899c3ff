import { z } from 'zod';
import { rollKinds } from '@seamwright/shared';

export const stockPageSizes = [10, 25, 50, 100] as const;

const defaults = { page: 1, pageSize: 25, product: '', kind: 'all', dyeLot: '' } as const;

/**
 * The stock list's state as it lives in the URL. Anything unreadable falls back to the default
 * instead of failing, so an old or hand-edited link still opens a list.
 */
export const stockListParamsSchema = z.object({
  page: z.coerce.number().int().min(1).catch(defaults.page),
  pageSize: z.coerce.number().pipe(z.literal(stockPageSizes)).catch(defaults.pageSize),
  /** A turf product id; the server answers 400 for anything else, so junk is dropped here. */
  product: z.uuid().catch(defaults.product),
  kind: z.enum(rollKinds).catch(defaults.kind),
  dyeLot: z
    .string()
    .trim()
    .transform((value) => value.slice(0, 60))
    .catch(defaults.dyeLot),
  /** Used-up and archived rolls too. */
  all: z
    .string()
    .transform((value) => value === '1')
    .catch(false),
});
export type StockListParams = z.output<typeof stockListParamsSchema>;

export function parseStockListParams(search: URLSearchParams): StockListParams {
  return stockListParamsSchema.parse(Object.fromEntries(search));
}

/** Writes the list state back, leaving out defaults so URLs stay short. */
export function toStockSearchParams(params: StockListParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.product) search.set('product', params.product);
  if (params.kind !== defaults.kind) search.set('kind', params.kind);
  if (params.dyeLot) search.set('dyeLot', params.dyeLot);
  if (params.all) search.set('all', '1');
  if (params.pageSize !== defaults.pageSize) search.set('pageSize', String(params.pageSize));
  if (params.page !== defaults.page) search.set('page', String(params.page));
  return search;
}

/** The list after a delivery: that product and lot, so the new rolls are on the first page. */
export function stockSearchFor(product: string, dyeLot: string): string {
  const search = toStockSearchParams({
    ...parseStockListParams(new URLSearchParams()),
    product,
    dyeLot,
  });
  return `?${search.toString()}`;
}

/** Whether the list is narrowed by anything but paging. */
export function isFiltered(params: StockListParams): boolean {
  return params.product !== '' || params.kind !== 'all' || params.dyeLot !== '' || params.all;
}
