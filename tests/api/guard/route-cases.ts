// How the access matrix sends each route: which row fills each path parameter and the body.
// Every registered route needs a line here (the matrix test fails otherwise). A line is usually
// just `{}` (GET, DELETE) or `{ body }` with a body that passes validation for company A's
// members, so the other company's request reaches the lookup and gets its 404.
// Path parameters are filled by the segment before them (`/customers/:id` → a customer, see
// `kindBySegment`); `:token` gets a made-up token; name others in `params`.
import { progressLine } from '../invoices/invoice-fixtures.js';
import type { GuardWorld, RowKind } from './guard-world.js';

export interface RouteCase {
  /** The JSON body (POST/PATCH/PUT). Defaults to `{}`. */
  body?: (w: GuardWorld) => object;
  /** Row kinds for path parameters the segment rule does not cover. */
  params?: Record<string, RowKind>;
  /** Walked after every other cell (it ends the caller's session). */
  last?: boolean;
}

export const kindBySegment: Record<string, RowKind> = {
  customers: 'customer',
  sites: 'site',
  jobs: 'job',
  areas: 'area',
  estimates: 'estimate',
  rolls: 'roll',
  'price-book': 'priceItem',
  members: 'member',
  invitations: 'invitation',
  'locate-tickets': 'locateTicket',
  invoices: 'invoice',
  payments: 'payment',
  crews: 'crew',
  bookings: 'booking',
};

const tenMinutesAgo = () => new Date(Date.now() - 600_000).toISOString();
const today = () => new Date().toISOString().slice(0, 10);

/** A plain 12 × 10 ft area for the stateless planner previews. */
const square = {
  outer: [
    [0, 0],
    [12, 0],
    [12, 10],
    [0, 10],
  ],
};

export const routeCases: Record<string, RouteCase> = {
  'get /api/health': {},
  'get /api/auth/csrf': {},
  'post /api/auth/signup': {},
  'post /api/auth/login': {},
  'post /api/auth/logout': { last: true },
  'post /api/auth/password-reset': {},
  'post /api/auth/password-reset/:token': {},
  'get /api/invitations/:token': {},
  'post /api/invitations/:token/accept': {},
  'get /api/me': {},
  'patch /api/me': {},
  // `{}` is refused (400) so the walk never changes anyone's password.
  'post /api/me/password': {},
  'get /api/me/companies': {},
  'post /api/me/company': { body: (w) => ({ companyId: w.companyId }) },
  'get /api/company': {},
  'patch /api/company': {},
  'get /api/members': {},
  'patch /api/members/:id': { body: () => ({ role: 'bookkeeper' }) },
  'delete /api/members/:id': {},
  'get /api/invitations': {},
  'post /api/invitations': {},
  'delete /api/invitations/:id': {},
  'get /api/customers': {},
  'post /api/customers': {},
  'get /api/customers/:id': {},
  'patch /api/customers/:id': { body: () => ({ name: 'Matrix Customer' }) },
  'delete /api/customers/:id': {},
  'get /api/customers/:id/sites': {},
  'post /api/customers/:id/sites': {
    body: () => ({ addressLine1: '1 Matrix Way', city: 'Quillmere' }),
  },
  'get /api/sites/:id': {},
  'patch /api/sites/:id': { body: () => ({ hazards: 'Matrix hazard' }) },
  'delete /api/sites/:id': {},
  'get /api/jobs': {},
  'post /api/jobs': {
    body: (w) => ({ customerId: w.ids.customer, siteId: w.ids.site, title: 'Matrix job' }),
  },
  'get /api/jobs/:id': {},
  'patch /api/jobs/:id': { body: () => ({ title: 'Matrix job renamed' }) },
  'get /api/jobs/:id/areas': {},
  'post /api/jobs/:id/areas': {
    body: () => ({ name: 'Matrix area', usage: 'landscape', area: square, roll: { widthFt: 12 } }),
  },
  'get /api/jobs/:id/takeoff': {},
  'get /api/jobs/:id/estimates': {},
  'post /api/jobs/:id/estimates': {},
  'get /api/estimates/:id': {},
  'patch /api/estimates/:id': { body: () => ({ notes: 'Matrix notes' }) },
  'post /api/estimates/:id/revisions': {},
  'get /api/estimates/:id/pdf': {},
  'post /api/estimates/:id/send': { body: () => ({ to: 'matrix@example.test' }) },
  'post /api/estimates/:id/acceptances': {
    body: () => ({ name: 'Matrix Signer', signedAt: tenMinutesAgo(), place: 'office' }),
  },
  'post /api/estimates/:id/links/revoke': {},
  'get /api/public/estimates/:token': {},
  'post /api/public/estimates/:token/accept': {},
  'post /api/public/estimates/:token/decline': {},
  'get /api/areas/:id': {},
  'patch /api/areas/:id': { body: () => ({ name: 'Matrix area renamed' }) },
  'delete /api/areas/:id': {},
  'get /api/rolls': {},
  'post /api/rolls': {
    body: (w) => ({ turfProductId: w.turfProductId, dyeLot: 'M-1', widthFt: 15, lengthFt: 50 }),
  },
  'post /api/rolls/deliveries': {
    body: (w) => ({
      turfProductId: w.turfProductId,
      dyeLot: 'M-2',
      rolls: [{ widthFt: 15, lengthFt: 50 }],
    }),
  },
  'get /api/rolls/:id': {},
  'patch /api/rolls/:id': { body: () => ({ location: 'Matrix rack' }) },
  'get /api/jobs/:id/reservations': {},
  'post /api/jobs/:id/reservations': {},
  'delete /api/jobs/:id/reservations': {},
  'post /api/jobs/:id/remnants': {
    body: (w) => ({ remnants: [{ rollId: w.ids.roll, lengthFt: 5 }] }),
  },
  'get /api/jobs/:id/locate-tickets': {},
  'post /api/jobs/:id/locate-tickets': {
    body: () => ({ number: 'MATRIX-811', calledAt: tenMinutesAgo() }),
  },
  'patch /api/locate-tickets/:id': { body: () => ({ status: 'clear' }) },
  'post /api/plans/preview': { body: () => ({ area: square, roll: { widthFt: 12 } }) },
  'post /api/plans/job-preview': {
    body: () => ({ areas: [{ id: 'front', area: square }], rolls: [{ widthFt: 12 }] }),
  },
  'get /api/audit-events': {},
  'get /api/price-book': {},
  'post /api/price-book': {},
  'get /api/price-book/export.csv': {},
  'post /api/price-book/import': {},
  'patch /api/price-book/:id': { body: () => ({ priceMillicents: 1 }) },
  'delete /api/price-book/:id': {},
  'get /api/estimating-settings': {},
  'patch /api/estimating-settings': {},
  // Unsigned, so every caller gets the signature's 400 and nothing is recorded.
  'post /api/webhooks/processor': {},
  // Sent as JSON, not multipart: no file, so the allowed cells get the upload's 400.
  'post /api/areas/:id/underlay': {},
  'put /api/areas/:id/underlay/scale': {
    params: { id: 'underlaidArea' },
    body: () => ({ a: { x: 0, y: 0 }, b: { x: 30, y: 0 }, distanceFt: 10 }),
  },
  'get /api/areas/:id/underlay': { params: { id: 'underlaidArea' } },
  'delete /api/areas/:id/underlay': { params: { id: 'underlaidArea' } },
  'get /api/invoices': {},
  'post /api/invoices': {
    body: (w) => ({ jobId: w.ids.acceptedJob, kind: 'progress', lines: [progressLine] }),
  },
  'get /api/invoices/:id': {},
  'get /api/invoices/:id/pdf': {},
  'post /api/invoices/:id/send': {},
  'post /api/invoices/:id/payments': {
    body: () => ({ amountCents: 100, method: 'cheque', receivedOn: today() }),
  },
  'post /api/invoices/:id/void': { body: () => ({ reason: 'Matrix void' }) },
  'post /api/invoices/:id/credit-notes': {
    body: () => ({ amountCents: 100, reason: 'Matrix credit' }),
  },
  'post /api/invoices/:id/payments/:paymentId/refunds': {
    body: () => ({ amountCents: 100, reason: 'Matrix refund' }),
  },
  'get /api/public/invoices/:token': {},
  'post /api/public/invoices/:token/checkout': {},
  'get /api/settings/reminders': {},
  'put /api/settings/reminders': { body: () => ({ enabled: false, offsets: [-3, 0, 7] }) },
  'get /api/invoices/:id/reminders': {},
  'post /api/invoices/:id/reminders': {},
  'get /api/crews': {},
  'post /api/crews': { body: () => ({ name: 'Matrix crew', colour: 'pine' }) },
  'get /api/crews/:id': {},
  'patch /api/crews/:id': { body: () => ({ name: 'Matrix crew renamed' }) },
  'delete /api/crews/:id': {},
  // Without from and to: the list's 400 (past the access check) is enough for the matrix.
  'get /api/bookings': {},
  'post /api/bookings': {
    body: (w) => ({
      crewId: w.ids.crew,
      jobId: w.ids.bookableJob,
      startDate: '2031-09-01',
      endDate: '2031-09-01',
      phase: 'finishing',
    }),
  },
  'patch /api/bookings/:id': { body: () => ({ notes: 'Matrix notes' }) },
  'delete /api/bookings/:id': {},
  'get /api/reports/aging': {},
  'get /api/customers/:id/statement.pdf': {},
  'post /api/customers/:id/statement': {},
  'get /api/exports/invoices.csv': {},
  'get /api/exports/payments.csv': {},
  'get /api/reports/dashboard': {},
};

/** The row kind for each path parameter of `path` (`:token` → undefined: a credential). */
export function paramKinds(path: string, explicit: RouteCase['params'] = {}) {
  const kinds: Record<string, RowKind | undefined> = {};
  const segments = path.split('/');
  segments.forEach((segment, i) => {
    if (!segment.startsWith(':')) return;
    const name = segment.slice(1);
    if (name === 'token') kinds[name] = undefined;
    else kinds[name] = explicit[name] ?? kindBySegment[segments[i - 1] ?? ''];
    if (name !== 'token' && !kinds[name])
      throw new Error(`${path}: no row kind for :${name}; add it to params or kindBySegment`);
  });
  return kinds;
}

/** `path` with its parameters filled from `ids` (a made-up token for `:token`). */
export function fillPath(path: string, ids: Partial<Record<string, string>>): string {
  return path.replace(/:([A-Za-z]+)/g, (_m, name: string) =>
    name === 'token' ? 'matrix-token-that-names-nothing-0123456789abc' : (ids[name] ?? 'missing'),
  );
}
