// Walks the access matrix (packages/shared/src/access-matrix.ts): every route the app registers
// × every role of company A × the owner of company B, one request per cell, against the real
// API and MariaDB. Refused cells (403, 404) are walked first, between two checksums of every
// data table, which must be equal; then the allowed cells, which must get past the access check.
import { beforeAll, describe, expect, it } from 'vitest';
import { expectedAnswer, matrixColumns, roles } from '@seamwright/shared';
import type { ExpectedAnswer, MatrixColumn, MatrixRoute } from '@seamwright/shared';
import type { RouteEntry } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { columnClient, createGuardWorld, creators } from './guard-world.js';
import type { GuardWorld } from './guard-world.js';
import { fillPath, paramKinds, routeCases } from './route-cases.js';
import { tableChecksums } from './table-snapshot.js';

interface Cell {
  route: RouteEntry;
  column: MatrixColumn;
  expected: ExpectedAnswer;
}

const keyOf = (r: RouteEntry) => `${r.method} ${r.path}`;

async function send(w: GuardWorld, cell: Cell, fresh: boolean) {
  const { route, column } = cell;
  const routeCase = routeCases[keyOf(route)]!;
  const ids: Record<string, string> = {};
  for (const [name, kind] of Object.entries(paramKinds(route.path, routeCase.params))) {
    if (!kind) continue;
    // A DELETE that is allowed uses up its row: give each such cell a row of its own.
    ids[name] = fresh ? await creators[kind](w) : w.ids[kind];
  }
  const client = columnClient(w, column);
  const url = fillPath(route.path, ids);
  const body = routeCase.body?.(w) ?? {};
  switch (route.method) {
    case 'get':
      return client.get(url);
    case 'delete':
      return client.del(url);
    default:
      return client[route.method === 'put' ? 'put' : route.method === 'post' ? 'post' : 'patch'](
        url,
        body,
      );
  }
}

function describeCell(cell: Cell, status: number, body: unknown): string {
  return `${keyOf(cell.route)} as ${cell.column}: expected ${cell.expected}, got ${status} ${JSON.stringify(body).slice(0, 200)}`;
}

describe('access matrix', () => {
  const { app, sequelize } = testApp();
  const routes: RouteEntry[] = app.locals.apiRoutes;
  let world: GuardWorld;

  beforeAll(async () => {
    world = await createGuardWorld(app);
  }, 120_000);

  it('has a case for every registered route and none for a route that is gone', () => {
    const registered = routes.map(keyOf);
    expect(registered.filter((key) => !(key in routeCases))).toEqual([]);
    expect(Object.keys(routeCases).filter((key) => !registered.includes(key))).toEqual([]);
    // Every path parameter resolves to a row kind (throws naming the route otherwise).
    for (const route of routes) paramKinds(route.path, routeCases[keyOf(route)]?.params);
  });

  it('derives the expected answers from the permission table', () => {
    const route = (permission: MatrixRoute['permission'], path = '/api/x/:id'): MatrixRoute => ({
      method: 'get',
      path,
      access: 'tenant',
      permission,
    });
    expect(expectedAnswer(route('members.read'), 'owner')).toBe('allowed');
    expect(expectedAnswer(route('members.read'), 'office')).toBe('forbidden');
    expect(expectedAnswer(route('members.read'), 'other-company')).toBe('not-found');
    expect(expectedAnswer(route('customers.read', '/api/x'), 'other-company')).toBe('own-company');
    expect(expectedAnswer(route(null), 'crew_lead')).toBe('allowed');
    const open: MatrixRoute = {
      method: 'get',
      path: '/api/p/:token',
      access: 'public',
      permission: null,
    };
    expect(roles.map((r) => expectedAnswer(open, r))).toEqual(roles.map(() => 'allowed'));
  });

  it('answers every cell as declared and refused cells change no row', async () => {
    const cells: Cell[] = routes.flatMap((route) =>
      matrixColumns.map((column) => ({ route, column, expected: expectedAnswer(route, column) })),
    );
    const refused = cells.filter((c) => c.expected === 'forbidden' || c.expected === 'not-found');
    const allowed = cells.filter((c) => !refused.includes(c));
    expect(refused.length).toBeGreaterThan(50);

    const failures: string[] = [];
    const before = await tableChecksums(sequelize);
    for (const cell of refused) {
      const res = await send(world, cell, false);
      const want = cell.expected === 'forbidden' ? 403 : 404;
      const code = (res.body as { code?: string }).code;
      const wantCode = cell.expected === 'forbidden' ? 'FORBIDDEN' : 'NOT_FOUND';
      if (res.status !== want || code !== wantCode)
        failures.push(describeCell(cell, res.status, res.body));
    }
    expect(failures).toEqual([]);
    expect(await tableChecksums(sequelize)).toEqual(before);

    const isLast = (c: Cell) => routeCases[keyOf(c.route)]?.last === true;
    const ordered = [...allowed.filter((c) => !isLast(c)), ...allowed.filter(isLast)];
    for (const cell of ordered) {
      const res = await send(world, cell, cell.route.method === 'delete');
      // Public routes have no access check: a made-up token's 404 is the token speaking.
      const refusedStatuses = cell.route.access === 'public' ? [401, 403] : [401, 403, 404];
      if (refusedStatuses.includes(res.status) || res.status >= 500)
        failures.push(describeCell(cell, res.status, res.body));
    }
    expect(failures).toEqual([]);
    // The allowed writes did change rows, so the checksums above would have seen a change.
    expect(await tableChecksums(sequelize)).not.toEqual(before);
  }, 180_000);
});
