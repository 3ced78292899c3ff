import type { StockListParams } from '../utils/list-params';

/** Every stock query key; a key holds every input of its fetcher. */
export const stockKeys = {
  all: ['stock'] as const,
  lists: () => [...stockKeys.all, 'list'] as const,
  list: (params: StockListParams) => [...stockKeys.lists(), params] as const,
  /** The products that have rolls, for the list's product filter. */
  products: () => [...stockKeys.all, 'products'] as const,
  details: () => [...stockKeys.all, 'detail'] as const,
  detail: (id: string) => [...stockKeys.details(), id] as const,
  /** Turf items of the price book, for receiving a delivery (owner and office). */
  turfProducts: () => [...stockKeys.all, 'turf-products'] as const,
  reservations: () => [...stockKeys.all, 'reservation'] as const,
  reservation: (jobId: string) => [...stockKeys.reservations(), jobId] as const,
  /** The rolls of one product and lot, to say where a reserved piece comes from. */
  lot: (turfProductId: string, dyeLot: string) =>
    [...stockKeys.all, 'lot', turfProductId, dyeLot] as const,
};
