import type { PriceBookListQuery } from '@seamwright/shared';

export const estimatingKeys = {
  all: ['estimating'] as const,
  settings: () => [...estimatingKeys.all, 'settings'] as const,
  priceBook: () => [...estimatingKeys.all, 'price-book'] as const,
  priceBookList: (query: PriceBookListQuery) => [...estimatingKeys.priceBook(), query] as const,
};
