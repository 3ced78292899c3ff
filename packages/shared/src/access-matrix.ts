/**
 * The access matrix: for every API route, the answer each role of the company, and a person of
 * another company, must get. It is derived from the route's own `access` and `permission` (as
 * declared in the API's RouteTable) and the permission table beside it (roles.ts); the few
 * routes whose answer the table cannot tell are listed in `accessMatrixExceptions` with why.
 * tests/api/guard/access-matrix.test.ts walks every cell against the real API.
 */
import { can, roles } from './roles.js';
import type { Action, Role } from './roles.js';

/**
 * - `allowed`: past the access check (any answer but 401, 403 or 404 counts: a 400, 409 or 422
 *   is the handler speaking);
 * - `forbidden`: 403 for the role;
 * - `not-found`: 404, the other company's ids are unknown to the caller;
 * - `own-company`: the route names no row of another company, so it acts on the caller's own
 *   company and is allowed like it is for the caller's role.
 */
export type ExpectedAnswer = 'allowed' | 'forbidden' | 'not-found' | 'own-company';

/** A column of the matrix: a role of the company, or the owner of another company. */
export type MatrixColumn = Role | 'other-company';
export const matrixColumns: readonly MatrixColumn[] = [...roles, 'other-company'];

/** What the matrix needs of a route (the API's RouteEntry has these fields). */
export interface MatrixRoute {
  method: string;
  path: string;
  access: 'public' | 'tenant' | 'signed-in';
  permission: Action | null;
}

/**
 * Routes whose answer the permission table alone does not give, keyed `method path` as the
 * RouteTable lists them. Name the cells that differ and say why.
 */
export const accessMatrixExceptions: Record<
  string,
  { cells: Partial<Record<MatrixColumn, ExpectedAnswer>>; why: string }
> = {
  'post /api/me/company': {
    cells: { 'other-company': 'not-found' },
    why: 'the body names the company to switch to; one the caller is not a member of is a 404',
  },
  'post /api/jobs': {
    cells: { 'other-company': 'not-found' },
    why: 'the body names a customer and site; another company’s are unknown (404)',
  },
  'post /api/rolls': {
    cells: { 'other-company': 'not-found' },
    why: 'the body names a turf product of the price book; another company’s is a 404',
  },
  'post /api/rolls/deliveries': {
    cells: { 'other-company': 'not-found' },
    why: 'the body names a turf product of the price book; another company’s is a 404',
  },
  'post /api/invoices': {
    cells: { 'other-company': 'not-found' },
    why: 'the body names the job to invoice; another company’s is unknown (404)',
  },
  'post /api/bookings': {
    cells: { 'other-company': 'not-found' },
    why: 'the body names a crew and a job; another company’s are unknown (404)',
  },
};

/** Path parameters that name a row of the company (`:token` is a credential, not an id). */
function namesRow(path: string): boolean {
  return /\/:(?!token\b)[A-Za-z]+/.test(path);
}

/** The expected answer for one cell. */
export function expectedAnswer(route: MatrixRoute, column: MatrixColumn): ExpectedAnswer {
  const exception = accessMatrixExceptions[`${route.method} ${route.path}`]?.cells[column];
  if (exception) return exception;
  if (route.access !== 'tenant') return column === 'other-company' ? 'own-company' : 'allowed';
  if (column === 'other-company') return namesRow(route.path) ? 'not-found' : 'own-company';
  if (route.permission === null) return 'allowed';
  return can(column, route.permission) ? 'allowed' : 'forbidden';
}
