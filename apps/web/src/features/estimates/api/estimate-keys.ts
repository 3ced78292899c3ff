/** Every estimates query key; a key holds every input of its fetcher. */
export const estimateKeys = {
  all: ['estimates'] as const,
  ofJob: (jobId: string) => [...estimateKeys.all, 'job', jobId] as const,
  details: () => [...estimateKeys.all, 'detail'] as const,
  detail: (id: string) => [...estimateKeys.details(), id] as const,
  /** The price book's turf items a new tier may be priced with. */
  turfProducts: () => [...estimateKeys.all, 'turf-products'] as const,
};
