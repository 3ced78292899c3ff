import { formatNumber } from '../units/format-length.js';

/** Short number formatting for rule sentences: 2 decimals unless told otherwise. */
export const n = (value: number, decimals = 2): string => formatNumber(value, decimals);

/** "1 bag" / "3 bags" style wording. */
export const plural = (count: number, one: string, many: string): string =>
  `${n(count)} ${count === 1 ? one : many}`;
