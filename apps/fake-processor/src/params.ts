// Reading the form-encoded parameters the SDK sends (`line_items[0][price_data][unit_amount]=…`,
// parsed by express.urlencoded's extended mode into nested objects). Everything arrives as a
// string, and qs turns a long list into an object keyed by index, so both are accepted.
import { invalid } from './errors.js';

export type Params = Record<string, unknown>;

export function isRecord(value: unknown): value is Params {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

export function listOf(value: unknown): unknown[] {
  if (Array.isArray(value)) return value;
  if (isRecord(value)) return Object.values(value);
  return [];
}

export function optionalString(params: Params, key: string, param = key): string | null {
  const value = params[key];
  if (value === undefined || value === '') return null;
  if (typeof value !== 'string') throw invalid(`Invalid string: ${param}`, param);
  return value;
}

export function requiredString(params: Params, key: string, param = key): string {
  const value = optionalString(params, key, param);
  if (value === null)
    throw invalid(`Missing required param: ${param}.`, param, 'parameter_missing');
  return value;
}

/** A whole number in the form's string (or a number, for JSON bodies). */
export function optionalInteger(params: Params, key: string, param = key): number | null {
  const value = params[key];
  if (value === undefined || value === '') return null;
  const text = typeof value === 'number' ? String(value) : value;
  if (typeof text !== 'string' || !/^-?\d{1,15}$/.test(text))
    throw invalid(`Invalid integer: ${typeof text === 'string' ? text : '(object)'}`, param);
  return Number(text);
}

/** `metadata[key]=value`: at most 50 keys of 40 characters, values of 500, as documented. */
export function metadataOf(value: unknown, param = 'metadata'): Record<string, string> {
  if (value === undefined || value === '') return {};
  if (!isRecord(value)) throw invalid(`Invalid object: ${param}`, param);
  const entries = Object.entries(value);
  if (entries.length > 50) throw invalid('Metadata can have at most 50 keys.', param);
  const out: Record<string, string> = {};
  for (const [key, raw] of entries) {
    if (typeof raw !== 'string')
      throw invalid(`Invalid string: ${param}[${key}]`, `${param}[${key}]`);
    if (key.length > 40 || raw.length > 500)
      throw invalid(`Metadata key ${key} or its value is too long.`, `${param}[${key}]`);
    out[key] = raw;
  }
  return out;
}

/** `expand[]=payment_intent` or `expand[0]=payment_intent`. */
export function expandsOf(params: Params): string[] {
  return listOf(params.expand).filter((v): v is string => typeof v === 'string');
}
