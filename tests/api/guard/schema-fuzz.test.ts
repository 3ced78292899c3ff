// Property-based bad input for every write route, from the route's own zod schema
// (RouteEntry.inputs, declared in apps/api/src/http/route-inputs.ts): valid values generated
// from the schema, then mutated (zod-arbitrary.ts, mutations.ts). Each case the schema rejects
// must be answered 400 problem+json naming exactly the fields zod names, never a 5xx, and a
// route's whole batch must leave every data table's checksum unchanged. Query strings of the
// list routes and the path ids of write routes are fuzzed too. SW_FUZZ_RUNS (default 200) sets
// the cases per route; a nightly run can use 5000.
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RouteEntry } from '@seamwright/api';
import { testAppWith } from '../../fixtures/app.js';
import { testPassword } from '../../fixtures/factories.js';
import { signedInFetchClient } from './fetch-client.js';
import type { FetchAnswer, FetchClient } from './fetch-client.js';
import { createGuardWorld } from './guard-world.js';
import type { GuardWorld } from './guard-world.js';
import { asSent, badValue, mutate, mutations } from './mutations.js';
import { fillPath, paramKinds, routeCases } from './route-cases.js';
import { tableChecksums } from './table-snapshot.js';
import { topLevelKeys, validValues } from './zod-arbitrary.js';
import type { Schema } from './zod-arbitrary.js';

const runs = Number(process.env.SW_FUZZ_RUNS ?? 200);
const huge = '1000000000';
// Per-account limits would answer 429 long before a few hundred bad bodies; the limits have
// tests of their own (tests/api/auth/rate-limits.test.ts).
const { app, sequelize } = testAppWith({
  RATE_LIMIT_SIGNUP_PER_EMAIL: huge,
  RATE_LIMIT_RESET_REQUEST_PER_EMAIL: huge,
  RATE_LIMIT_RESET_PER_TOKEN: huge,
  RATE_LIMIT_ACCEPT_PER_TOKEN: huge,
  RATE_LIMIT_ESTIMATE_PER_TOKEN: huge,
  RATE_LIMIT_INVITE_PER_USER: huge,
  LOGIN_MAX_FAILURES: huge,
});
const routes: RouteEntry[] = app.locals.apiRoutes;
const keyOf = (r: RouteEntry) => `${r.method} ${r.path}`;
const writeRoutes = routes.filter((r) => r.method !== 'get');

function urlOf(w: GuardWorld, route: RouteEntry, idOverride?: string): string {
  const ids: Record<string, string> = {};
  for (const [name, kind] of Object.entries(
    paramKinds(route.path, routeCases[keyOf(route)]?.params),
  ))
    if (kind) ids[name] = idOverride ?? w.ids[kind];
  return fillPath(route.path, ids);
}

/** express.json's limit ('1mb'): larger bodies are answered 413 before any schema runs. */
const bodyLimit = 1024 * 1024;

function expectProblem(res: FetchAnswer, where: string) {
  expect(res.status, where).toBeLessThan(500);
  if (res.status >= 400)
    expect(res.headers['content-type'], where).toMatch(/^application\/problem\+json/);
}

/** A 400 naming exactly the fields `schema` names for `sent`. */
function expectFieldErrors(res: FetchAnswer, schema: Schema, sent: unknown, where: string) {
  if (res.bytes > bodyLimit) {
    expect({ status: res.status, code: res.body.code }, where).toEqual({
      status: 413,
      code: 'PAYLOAD_TOO_LARGE',
    });
    return;
  }
  const issues = schema.safeParse(sent ?? {});
  const paths = issues.success ? [] : issues.error.issues.map((i) => i.path.map(String).join('.'));
  expectProblem(res, where);
  expect({ status: res.status, code: res.body.code }, where).toEqual({
    status: 400,
    code: 'VALIDATION_FAILED',
  });
  expect(
    (res.body.errors ?? []).map((e) => e.path),
    where,
  ).toEqual(paths);
}

/** Without lone surrogates, which percent-encoding cannot carry. */
const wellFormed = (s: string) => s.replace(/[\uD800-\uDFFF]/g, '?');

const describeCase = (route: RouteEntry, value: unknown) =>
  `${keyOf(route)} ${JSON.stringify(value)?.slice(0, 300)}`;

describe('schema fuzz of every write route', () => {
  let world: GuardWorld;
  let owner: FetchClient;

  beforeAll(async () => {
    world = await createGuardWorld(app);
    owner = await signedInFetchClient(app, world.people.owner.email, testPassword);
  }, 120_000);

  afterAll(async () => {
    await owner.close();
  });

  it('declares the inputs of every write route, and nothing for a route that is gone', async () => {
    expect(writeRoutes.filter((r) => r.inputs === null).map(keyOf)).toEqual([]);
    const { routeInputs } = await import('../../../apps/api/src/http/route-inputs.js');
    expect(Object.keys(routeInputs).filter((k) => !routes.some((r) => keyOf(r) === k))).toEqual([]);
  });

  const bodyRoutes = writeRoutes.filter((r) => r.inputs?.body);
  it.each(bodyRoutes.map((r) => [keyOf(r), r] as const))(
    'rejects mutated bodies of %s with 400 naming the fields, and writes nothing',
    async (_key, route) => {
      const schema = route.inputs!.body!;
      const seed = routeCases[keyOf(route)]?.body?.(world) ?? {};
      const fields = topLevelKeys(schema);
      const cases = fc
        .tuple(validValues(schema, seed), mutations)
        .map(([base, ops]) => asSent(mutate(base, ops, fields)))
        .filter((sent) => !schema.safeParse(sent ?? {}).success);
      const url = urlOf(world, route);
      const before = await tableChecksums(sequelize);
      await fc.assert(
        fc.asyncProperty(cases, async (sent) => {
          const res = await owner.send(route.method, url, sent);
          expectFieldErrors(res, schema, sent, describeCase(route, sent));
        }),
        { numRuns: runs },
      );
      expect(await tableChecksums(sequelize)).toEqual(before);
    },
    120_000,
  );

  const plannerRoutes = writeRoutes.filter((r) => r.inputs?.plannerBody);
  it.each(plannerRoutes.map((r) => [keyOf(r), r] as const))(
    'answers mutated planner requests to %s with a 4xx problem or a plan, never a 5xx',
    async (_key, route) => {
      const seed = routeCases[keyOf(route)]?.body?.(world) ?? {};
      const before = await tableChecksums(sequelize);
      await fc.assert(
        fc.asyncProperty(mutations, async (ops) => {
          const sent = asSent(mutate(seed, ops, []));
          const res = await owner.send(route.method, route.path, sent);
          expectProblem(res, describeCase(route, sent));
        }),
        { numRuns: runs },
      );
      expect(await tableChecksums(sequelize)).toEqual(before);
    },
    120_000,
  );

  // Uploads and the signed webhook take no JSON a schema describes (route-inputs.ts): junk
  // bodies must get a 4xx problem (no file; no signature), never a 5xx, and write nothing.
  const opaqueRoutes = writeRoutes.filter((r) => r.inputs?.multipart || r.inputs?.rawBody);
  it.each(opaqueRoutes.map((r) => [keyOf(r), r] as const))(
    'answers junk bodies to %s with a 4xx problem, never a 5xx, and writes nothing',
    async (_key, route) => {
      const url = urlOf(world, route);
      const before = await tableChecksums(sequelize);
      await fc.assert(
        fc.asyncProperty(mutations, async (ops) => {
          const sent = asSent(mutate({}, ops, []));
          const res = await owner.send(route.method, url, sent);
          const where = describeCase(route, sent);
          expectProblem(res, where);
          expect(res.status, where).toBeGreaterThanOrEqual(400);
        }),
        { numRuns: runs },
      );
      expect(await tableChecksums(sequelize)).toEqual(before);
    },
    120_000,
  );

  const queryRoutes = routes.filter((r) => r.inputs?.query);
  it.each(queryRoutes.map((r) => [keyOf(r), r] as const))(
    'answers fuzzed query strings of %s with the list or a 400 naming the fields',
    async (_key, route) => {
      const schema = route.inputs!.query!;
      const keys = topLevelKeys(schema);
      // Plain strings: what a query string can carry (percent-encoding needs whole characters).
      const text = fc.oneof(
        fc.string({ unit: 'grapheme', maxLength: 20 }),
        fc.constantFrom(
          '',
          '-1',
          '0',
          '1.5',
          'NaN',
          '1e309',
          '99999999999999999999',
          '\u0000',
          'true',
        ),
        fc.integer().map(String),
        fc.integer({ min: 100, max: 1500 }).map((n) => 'x'.repeat(n)),
      );
      const value = fc.oneof(
        { weight: 4, arbitrary: text },
        { weight: 1, arbitrary: fc.array(text, { minLength: 2, maxLength: 3 }) },
      );
      const query = fc.dictionary(fc.constantFrom(...keys), value, { maxKeys: 3 });
      await fc.assert(
        fc.asyncProperty(query, async (q) => {
          const search = new URLSearchParams();
          for (const [k, v] of Object.entries(q))
            for (const one of [v].flat()) search.append(k, one);
          const res = await owner.send(
            route.method,
            `${urlOf(world, route)}?${search.toString()}`,
            undefined,
          );
          const where = describeCase(route, q);
          if (schema.safeParse(q).success) expect(res.status, where).toBe(200);
          else expectFieldErrors(res, schema, q, where);
        }),
        { numRuns: Math.ceil(runs / 2) },
      );
    },
    120_000,
  );

  const idRoutes = writeRoutes.filter((r) => /\/:(?!token\b)/.test(r.path));
  it('answers 404 for fuzzed path ids on every write route, and writes nothing', async () => {
    const id = fc.oneof(
      fc.uuid(),
      fc
        .string({ minLength: 1, maxLength: 40 })
        .filter((s) => !/^\.+$/.test(s))
        .map((s) => encodeURIComponent(wellFormed(s))),
      fc.integer().map(String),
      badValue
        .map((v) => encodeURIComponent(wellFormed(String(JSON.stringify(v)).slice(0, 200))))
        .filter((s) => s.length > 0 && !/^\.+$/.test(s)),
    );
    const before = await tableChecksums(sequelize);
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...idRoutes), id, async (route, value) => {
        const seed = routeCases[keyOf(route)]?.body?.(world) ?? {};
        const res = await owner.send(route.method, urlOf(world, route, value), seed);
        expectProblem(res, `${keyOf(route)} ${value}`);
        expect(res.status, `${keyOf(route)} ${value}`).toBe(404);
      }),
      { numRuns: Math.max(runs, idRoutes.length * 10) },
    );
    expect(await tableChecksums(sequelize)).toEqual(before);
  }, 120_000);
});
