import type { z } from 'zod';

export type SortDirection = 'asc' | 'desc';

/** `-createdAt` ⇄ `{ field: 'createdAt', direction: 'desc' }`, for a list table's headers. */
export function splitSort(sort: string): { field: string; direction: SortDirection } {
  return sort.startsWith('-')
    ? { field: sort.slice(1), direction: 'desc' }
    : { field: sort, direction: 'asc' };
}

/** The URL form of a header's sort, checked against the list's own sort schema. */
export function joinSort<S extends string>(
  sortSchema: z.ZodType<S>,
  field: string,
  direction: SortDirection,
): S {
  return sortSchema.parse(direction === 'desc' ? `-${field}` : field);
}
