/** Every reports query key; a key holds every input of its fetcher. */
export const reportKeys = {
  all: ['reports'] as const,
  aging: (asOf: string | null) => [...reportKeys.all, 'aging', asOf] as const,
  dashboard: (query: string) => [...reportKeys.all, 'dashboard', query] as const,
};
