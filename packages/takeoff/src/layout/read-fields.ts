import { LayoutInputError } from './errors.js';

/** Field checks shared by the request parser; each throws a LayoutInputError naming the field. */

export function requireRecord(path: string, value: unknown): Record<string, unknown> {
  if (value === undefined || value === null) throw new LayoutInputError(path, 'is missing');
  if (typeof value !== 'object' || Array.isArray(value))
    throw new LayoutInputError(path, 'must be an object');
  return value as Record<string, unknown>;
}

export function requireArray(path: string, value: unknown): unknown[] {
  if (value === undefined || value === null) throw new LayoutInputError(path, 'is missing');
  if (!Array.isArray(value)) throw new LayoutInputError(path, 'must be an array');
  return value;
}

interface NumberRule {
  readonly positive?: boolean;
  readonly nonNegative?: boolean;
}

export function readNumber(path: string, value: unknown, rule: NumberRule = {}): number {
  if (value === undefined || value === null) throw new LayoutInputError(path, 'is missing');
  const kind = rule.positive
    ? 'a positive number'
    : rule.nonNegative
      ? 'a number ≥ 0'
      : 'a finite number';
  if (typeof value !== 'number' || !Number.isFinite(value))
    throw new LayoutInputError(path, `must be ${kind}`);
  if ((rule.positive && value <= 0) || (rule.nonNegative && value < 0))
    throw new LayoutInputError(path, `must be ${kind}`);
  return value;
}

export function readOptionalNumber(
  path: string,
  value: unknown,
  rule: NumberRule = {},
): number | undefined {
  return value === undefined || value === null ? undefined : readNumber(path, value, rule);
}
