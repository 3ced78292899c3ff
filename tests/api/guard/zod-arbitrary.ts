// fast-check arbitraries from zod 4 schemas: a small walker over the zod types the shared
// schemas use (objects, strings with lengths and formats, numbers with bounds, enums, unions,
// arrays, records, optional/nullable/default, pipes). Refinements are not modelled, so a value
// can still fail its schema; `validValues` falls back to a known-good seed then.
// (zod-fast-check, the npm package, targets zod 3; these schemas are zod 4.)
import fc from 'fast-check';
import type { RouteEntry } from '@seamwright/api';

/** A zod schema as the API declares it (the tests package does not depend on zod itself). */
export type Schema = NonNullable<NonNullable<RouteEntry['inputs']>['body']>;

/** The parts of zod 4's internal definition the walker reads. */
interface Def {
  type: string;
  checks?: { _zod: { def: CheckDef } }[];
  format?: string;
  shape?: Record<string, Schema>;
  innerType?: Schema;
  in?: Schema;
  element?: Schema;
  valueType?: Schema;
  options?: Schema[];
  entries?: Record<string, string | number>;
  values?: unknown[];
  getter?: () => Schema;
  pattern?: RegExp;
}

interface CheckDef {
  check: string;
  minimum?: number;
  maximum?: number;
  value?: number;
  inclusive?: boolean;
  format?: string;
  pattern?: RegExp;
}

export const defOf = (schema: Schema): Def =>
  (schema as unknown as { _zod: { def: Def } })._zod.def;
const isOptional = (schema: Schema) =>
  (schema as unknown as { _zod: { optin?: string } })._zod.optin === 'optional';

function checks(def: Def): CheckDef[] {
  return (def.checks ?? []).map((c) => c._zod.def);
}

function stringArbitrary(def: Def): fc.Arbitrary<string> {
  const all = checks(def);
  const format = def.format ?? all.find((c) => c.check === 'string_format')?.format;
  if (format === 'email') return fc.emailAddress();
  if (format === 'uuid') return fc.uuid({ version: 4 });
  if (format === 'datetime')
    return fc
      .date({ min: new Date('2020-01-01'), max: new Date('2030-01-01'), noInvalidDate: true })
      .map((d) => d.toISOString());
  if (format === 'date')
    return fc
      .date({ min: new Date('2020-01-01'), max: new Date('2030-01-01'), noInvalidDate: true })
      .map((d) => d.toISOString().slice(0, 10));
  const pattern = def.pattern ?? all.find((c) => c.pattern)?.pattern;
  if (pattern) return fc.stringMatching(pattern);
  const minLength = Math.max(
    0,
    ...all.filter((c) => c.check === 'min_length').map((c) => c.minimum ?? 0),
  );
  const maxLength = Math.min(
    40,
    ...all.filter((c) => c.check === 'max_length').map((c) => c.maximum ?? 40),
  );
  return fc.string({ minLength, maxLength: Math.max(minLength, maxLength) });
}

function numberArbitrary(def: Def): fc.Arbitrary<number> {
  const all = checks(def);
  const lower = all.find((c) => c.check === 'greater_than');
  const upper = all.find((c) => c.check === 'less_than');
  const isInt = def.format === 'safeint' || all.some((c) => c.format === 'safeint');
  const min = lower ? (lower.value ?? 0) + (lower.inclusive ? 0 : 1) : -1_000_000;
  const max = upper ? (upper.value ?? 0) - (upper.inclusive ? 0 : 1) : 1_000_000;
  if (isInt)
    return fc.integer({ min: Math.ceil(min), max: Math.max(Math.ceil(min), Math.floor(max)) });
  return fc.double({ min, max: Math.max(min, max), noNaN: true, noDefaultInfinity: true });
}

/** Values shaped like `schema` (most of them valid). */
export function arbitraryFor(schema: Schema, depth = 0): fc.Arbitrary<unknown> {
  const def = defOf(schema);
  if (depth > 8) return fc.constant(undefined);
  const inner = (s: Schema) => arbitraryFor(s, depth + 1);
  switch (def.type) {
    case 'object': {
      const shape = def.shape ?? {};
      const model = Object.fromEntries(Object.entries(shape).map(([k, s]) => [k, inner(s)]));
      const requiredKeys = Object.keys(shape).filter((k) => !isOptional(shape[k]!));
      return fc.record(model, { requiredKeys });
    }
    case 'string':
      return stringArbitrary(def);
    case 'number':
      return numberArbitrary(def);
    case 'boolean':
      return fc.boolean();
    case 'enum':
      return fc.constantFrom(...Object.values(def.entries ?? {}));
    case 'literal':
      return fc.constantFrom(...(def.values ?? [null]));
    case 'null':
      return fc.constant(null);
    case 'optional':
    case 'default':
    case 'prefault':
      return fc.option(inner(def.innerType!), { nil: undefined });
    case 'nullable':
      return fc.option(inner(def.innerType!), { nil: null });
    case 'readonly':
    case 'catch':
    case 'nonoptional':
      return inner(def.innerType!);
    case 'pipe':
      return inner(def.in!);
    case 'lazy':
      return inner(def.getter!());
    case 'union':
      return fc.oneof(...(def.options ?? []).map(inner));
    case 'array':
      return fc.array(inner(def.element!), { maxLength: 4 });
    case 'record':
      return fc.dictionary(fc.string({ minLength: 1, maxLength: 8 }), inner(def.valueType!), {
        maxKeys: 3,
      });
    default:
      // unknown, any, custom, never, transform: nothing to model.
      return fc.constant(undefined);
  }
}

/** The top-level field names of an object schema (through optional, pipe and the like). */
export function topLevelKeys(schema: Schema): string[] {
  const def = defOf(schema);
  if (def.type === 'object') return Object.keys(def.shape ?? {});
  const next = def.innerType ?? def.in;
  if (next) return topLevelKeys(next);
  if (def.type === 'union') return [...new Set((def.options ?? []).flatMap(topLevelKeys))];
  return [];
}

/** Generated values that pass `schema`, else `seed` (refinements the walker cannot see). */
export function validValues(schema: Schema, seed: unknown): fc.Arbitrary<unknown> {
  return arbitraryFor(schema).map((v) => (schema.safeParse(v).success ? v : seed));
}
