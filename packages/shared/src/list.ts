import { z } from 'zod';

/** Paging members every list query accepts; defaults keep a bare request valid. */
export const pageQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(25),
});

/** `meta` of every list answer. */
export interface ListMeta {
  page: number;
  pageSize: number;
  total: number;
}

export interface ListResponse<T> {
  data: T[];
  meta: ListMeta;
}

export interface ItemResponse<T> {
  data: T;
}

/**
 * A sort parameter over a fixed set of fields: `name` ascending, `-name` descending.
 * Returns a schema that yields `{ field, direction }`.
 */
export function sortSchema<const F extends readonly [string, ...string[]]>(
  fields: F,
  fallback: `${'' | '-'}${F[number]}`,
) {
  const allowed = [...fields, ...fields.map((f) => `-${f}`)] as [string, ...string[]];
  return z
    .enum(allowed)
    .default(fallback)
    .transform((raw) => {
      const name = raw.replace(/^-/, '');
      // The enum above admits only these names, so the lookup always finds one.
      const field: F[number] = fields.find((f) => f === name) ?? fields[0];
      return { field, direction: raw.startsWith('-') ? ('desc' as const) : ('asc' as const) };
    });
}
