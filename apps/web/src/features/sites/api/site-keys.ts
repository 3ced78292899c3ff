/** Sites are read per customer; a key holds the customer it belongs to. */
export const siteKeys = {
  all: ['sites'] as const,
  lists: () => [...siteKeys.all, 'list'] as const,
  list: (customerId: string) => [...siteKeys.lists(), customerId] as const,
};
