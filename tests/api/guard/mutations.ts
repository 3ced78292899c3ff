// Mutations of a valid JSON value: one field replaced by a bad value (wrong type, huge or odd
// strings, negative, NaN, huge and fractional numbers), a field removed, or an extra field.
import fc from 'fast-check';

type Json = unknown;
type Path = (string | number)[];

const controlChars = fc.string({
  unit: fc.integer({ min: 0, max: 31 }).map((c) => String.fromCharCode(c)),
  minLength: 1,
  maxLength: 20,
});

/** Strings that break naive code: huge, unicode of every plane, controls, lone surrogates. */
const oddStrings = fc.oneof(
  fc.string({ unit: 'grapheme', maxLength: 30 }),
  fc.string({ unit: 'binary', maxLength: 30 }),
  controlChars,
  fc.constantFrom(
    '',
    ' ',
    '\u0000',
    '\uD800',
    '\uDFFF\uD800',
    '\u202E',
    '𝕊𝕖𝕒𝕞',
    '🏳️‍🌈',
    "' OR 1=1 --",
    '<script>',
    '%00',
    'NaN',
    '-1',
    '1e309',
    'null',
    '[]',
    '{}',
  ),
  fc
    .tuple(fc.integer({ min: 300, max: 120_000 }), fc.constantFrom('x', 'é', '𝕊', '\u0007', ' '))
    .map(([n, ch]) => ch.repeat(n)),
);

const oddNumbers = fc.oneof(
  fc.integer(),
  fc.double(), // NaN and ±Infinity become null in JSON
  fc.constantFrom(-1, -0, 0.5, -0.000001, 1e308, -1e308, 2 ** 53 + 1, -(2 ** 63), 1e21, 4294967296),
);

/** A value of the wrong kind for (almost) any field. */
export const badValue: fc.Arbitrary<Json> = fc.oneof(
  { weight: 3, arbitrary: oddStrings },
  { weight: 3, arbitrary: oddNumbers },
  { weight: 1, arbitrary: fc.constantFrom(null, true, false, [], {}, [[]], { length: 1 }) },
  { weight: 1, arbitrary: fc.array(fc.jsonValue({ maxDepth: 2 }), { maxLength: 5 }) },
  {
    weight: 1,
    arbitrary: fc.dictionary(fc.string({ maxLength: 6 }), fc.jsonValue({ maxDepth: 1 }), {
      maxKeys: 3,
    }),
  },
);

const extraKey = fc.oneof(
  fc.string({ minLength: 1, maxLength: 12 }),
  fc.constantFrom('__proto__', 'constructor', 'prototype', 'companyId', 'id', 'isAdmin', 'role'),
);

/** Every path inside `value` that holds something (objects and arrays included). */
function pathsOf(value: Json, path: Path = []): Path[] {
  const out: Path[] = path.length ? [path] : [];
  if (Array.isArray(value)) value.forEach((v, i) => out.push(...pathsOf(v, [...path, i])));
  else if (value && typeof value === 'object')
    for (const [k, v] of Object.entries(value)) out.push(...pathsOf(v, [...path, k]));
  return out;
}

function clone(value: Json): Json {
  return value === undefined ? undefined : (JSON.parse(JSON.stringify(value)) as Json);
}

function parentOf(root: Json, path: Path): Record<string | number, Json> | undefined {
  let at = root as Record<string | number, Json> | undefined;
  for (const key of path.slice(0, -1)) at = at?.[key] as Record<string | number, Json> | undefined;
  return at && typeof at === 'object' ? at : undefined;
}

type Op =
  | { kind: 'replace'; pick: number; value: Json }
  | { kind: 'remove'; pick: number }
  | { kind: 'extra'; pick: number; key: string; value: Json }
  | { kind: 'field'; pick: number; value: Json }
  | { kind: 'root'; value: Json };

const op: fc.Arbitrary<Op> = fc.oneof(
  {
    weight: 5,
    arbitrary: fc.record({
      kind: fc.constant('replace' as const),
      pick: fc.nat(),
      value: badValue,
    }),
  },
  { weight: 2, arbitrary: fc.record({ kind: fc.constant('remove' as const), pick: fc.nat() }) },
  {
    weight: 1,
    arbitrary: fc.record({
      kind: fc.constant('extra' as const),
      pick: fc.nat(),
      key: extraKey,
      value: badValue,
    }),
  },
  {
    weight: 3,
    arbitrary: fc.record({ kind: fc.constant('field' as const), pick: fc.nat(), value: badValue }),
  },
  {
    weight: 1,
    arbitrary: fc.record({
      kind: fc.constant('root' as const),
      value: fc.constantFrom([], [{}], {}),
    }),
  },
);

/** Applies one or two mutations; `fields` are the schema's own top-level names. */
export function mutate(base: Json, ops: Op[], fields: string[]): Json {
  let value: Json = clone(base ?? {}) ?? {};
  for (const o of ops) {
    const paths = pathsOf(value);
    if (o.kind === 'root') value = clone(o.value);
    else if (o.kind === 'field' && fields.length && value && typeof value === 'object')
      (value as Record<string, Json>)[fields[o.pick % fields.length]!] = clone(o.value);
    else if (o.kind === 'extra') {
      const objects = [[], ...paths].filter((p) => {
        const target = p.length ? parentOf(value, [...p, 'x']) : value;
        return target && typeof target === 'object' && !Array.isArray(target);
      });
      const at = objects[o.pick % objects.length] ?? [];
      const target = (at.length ? parentOf(value, [...at, 'x']) : value) as Record<string, Json>;
      Object.defineProperty(target, o.key, {
        value: clone(o.value),
        enumerable: true,
        writable: true,
        configurable: true,
      });
    } else if (paths.length) {
      const path = paths[o.pick % paths.length]!;
      const parent = parentOf(value, path)!;
      const key = path[path.length - 1]!;
      if (o.kind === 'remove' && !Array.isArray(parent)) delete parent[key];
      else parent[key] = o.kind === 'replace' ? clone(o.value) : null;
    }
  }
  return value;
}

export const mutations = fc.array(op, { minLength: 1, maxLength: 2 });

/** What the server receives for `value` sent as JSON (NaN → null, undefined dropped). */
export function asSent(value: Json): Json {
  return JSON.parse(JSON.stringify(value ?? {})) as Json;
}
