// Keeps the request path lean: each signed-in GET route may send at most the number of SQL
// statements DEVELOPERS.md states for it ("Request budget"). Statements are counted, not timed,
// so the check is exact and cannot flake. A new signed-in GET route fails here until it has a
// line in the table below (and in DEVELOPERS.md).
import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../fixtures/app.js';
import type { Client } from '../../fixtures/client.js';
import { addMember, createCustomer, createSite, signUpCompany } from '../../fixtures/factories.js';
import { recordStatements } from '../../fixtures/statements.js';
import { createArea, turfProducts } from '../../fixtures/areas.js';
import { pngImage, uploadFile } from '../../fixtures/images.js';
import { acceptedJob, createCrew } from '../../fixtures/bookings.js';

/** The default for a signed-in read: the session with the membership, then the data. */
const defaultReadBudget = 2;

/** Route (as registered) → the statements it may send, and a request that exercises it. */
const budgets: Record<string, { budget: number; urls: (ids: Ids) => string[] }> = {
  '/api/me': { budget: 2, urls: () => ['/api/me'] },
  '/api/company': { budget: 2, urls: () => ['/api/company'] },
  '/api/members': { budget: 2, urls: () => ['/api/members'] },
  '/api/customers': {
    budget: 2,
    urls: () => [
      '/api/customers',
      '/api/customers?q=fern&status=all&sort=-createdAt',
      '/api/customers?status=archived&sort=updatedAt',
    ],
  },
  '/api/customers/:id': { budget: 2, urls: (ids) => [`/api/customers/${ids.customerId}`] },
  // The customer is checked first so another company's customer is a 404, then rows and total.
  '/api/customers/:id/sites': {
    budget: 4,
    urls: (ids) => [`/api/customers/${ids.customerId}/sites`],
  },
  '/api/sites/:id': { budget: 2, urls: (ids) => [`/api/sites/${ids.siteId}`] },
  '/api/invitations': { budget: 2, urls: () => ['/api/invitations'] },
  // Count, page, then the names of the people on the page (not tuned yet; see DEVELOPERS.md).
  '/api/audit-events': { budget: 4, urls: () => ['/api/audit-events'] },
  '/api/jobs': {
    budget: 2,
    urls: () => ['/api/jobs', '/api/jobs?status=lead&q=fern&sort=-createdAt'],
  },
  '/api/estimating-settings': { budget: 2, urls: () => ['/api/estimating-settings'] },
  // Count, then the page (findAndCountAll); not tuned yet (see DEVELOPERS.md).
  '/api/price-book': {
    budget: 3,
    urls: () => ['/api/price-book', '/api/price-book?kind=turf&q=turf'],
  },
  '/api/price-book/export.csv': { budget: 2, urls: () => ['/api/price-book/export.csv'] },
  // The job with its customer and site in one join, then its activity (audit events).
  '/api/jobs/:id': { budget: 3, urls: (ids) => [`/api/jobs/${ids.jobId}`] },
  '/api/areas/:id': { budget: 2, urls: (ids) => [`/api/areas/${ids.areaId}`] },
  // The area, then its file's row in `uploads` (the one record of every stored file).
  '/api/areas/:id/underlay': {
    budget: 3,
    urls: (ids) => [`/api/areas/${ids.areaId}/underlay`],
  },
  // The job is checked first (another company's is a 404), then its areas.
  '/api/jobs/:id/areas': { budget: 3, urls: (ids) => [`/api/jobs/${ids.jobId}/areas`] },
  // The job, its areas and the company's estimating settings, read in parallel.
  '/api/jobs/:id/takeoff': { budget: 4, urls: (ids) => [`/api/jobs/${ids.jobId}/takeoff`] },
  '/api/rolls': { budget: 2, urls: () => ['/api/rolls', '/api/rolls?kind=remnant&pageSize=5'] },
  '/api/rolls/:id': { budget: 2, urls: (ids) => [`/api/rolls/${ids.rollId}`] },
  // The job and its reservations read in parallel, then the reservations' pieces.
  '/api/jobs/:id/reservations': {
    budget: 4,
    urls: (ids) => [`/api/jobs/${ids.jobId}/reservations`],
  },
  // The job (another company's is a 404) and its tickets, read in parallel.
  '/api/jobs/:id/locate-tickets': {
    budget: 3,
    urls: (ids) => [`/api/jobs/${ids.jobId}/locate-tickets`],
  },
  // The job checked (another company's is a 404) and its versions, read in parallel.
  '/api/jobs/:id/estimates': { budget: 3, urls: (ids) => [`/api/jobs/${ids.jobId}/estimates`] },
  '/api/estimates/:id': { budget: 2, urls: (ids) => [`/api/estimates/${ids.estimateId}`] },
  // The estimate, then its job, company and areas in parallel, then the customer, the site and
  // the estimating settings (for the cautions) in parallel.
  '/api/estimates/:id/pdf': {
    budget: 8,
    urls: (ids) => [`/api/estimates/${ids.estimateId}/pdf`],
  },
  // The company (its time zone decides which invoices are overdue), then the page with its
  // customers' names and the total in one SELECT.
  '/api/invoices': {
    budget: 3,
    urls: (ids) => [
      '/api/invoices',
      `/api/invoices?status=overdue,sent&customerId=${ids.customerId}`,
    ],
  },
  // The invoice with its customer, the company, lines, payments, credit notes and links in
  // parallel, then the job's title (not tuned yet).
  '/api/invoices/:id': { budget: 8, urls: (ids) => [`/api/invoices/${ids.invoiceId}`] },
  // The invoice read whole (as above), then the company, customer, job and site for the
  // document (not tuned yet).
  '/api/invoices/:id/pdf': { budget: 12, urls: (ids) => [`/api/invoices/${ids.invoiceId}/pdf`] },
  '/api/settings/reminders': { budget: 2, urls: () => ['/api/settings/reminders'] },
  // The invoice (another company's is a 404) and its reminder log, read in parallel.
  '/api/invoices/:id/reminders': {
    budget: 3,
    urls: (ids) => [`/api/invoices/${ids.invoiceId}/reminders`],
  },
  // The crews and every crew's people, read in parallel.
  '/api/crews': { budget: 3, urls: () => ['/api/crews', '/api/crews?includeArchived=true'] },
  '/api/crews/:id': { budget: 3, urls: (ids) => [`/api/crews/${ids.crewId}`] },
  // The bookings with crew, job, customer and site in one join and the company's zone in
  // parallel, then the jobs' tickets, reservations and areas in parallel for the warnings.
  '/api/bookings': {
    budget: 6,
    urls: (ids) => [
      '/api/bookings?from=2031-06-01&to=2031-06-30',
      `/api/bookings?from=2031-06-01&to=2031-06-30&crewId=${ids.crewId}`,
    ],
  },
  // The company (its time zone gives today) when `asOf` is not given, then one grouped SELECT.
  '/api/reports/aging': {
    budget: 3,
    urls: () => ['/api/reports/aging', '/api/reports/aging?asOf=2026-03-31'],
  },
  // Company and customer in parallel, then the owing invoices, their payments and credits, and
  // the customer's aging in parallel.
  '/api/customers/:id/statement.pdf': {
    budget: 6,
    urls: (ids) => [`/api/customers/${ids.customerId}/statement.pdf`],
  },
  // The rows and the company (today, for overdue) in parallel.
  '/api/exports/invoices.csv': {
    budget: 3,
    urls: () => ['/api/exports/invoices.csv', '/api/exports/invoices.csv?from=2026-01-01'],
  },
  '/api/exports/payments.csv': { budget: 2, urls: () => ['/api/exports/payments.csv'] },
  // The company (time zone and region), then one statement per figure (crew utilisation
  // included), in parallel.
  '/api/reports/dashboard': {
    budget: 8,
    urls: () => ['/api/reports/dashboard', '/api/reports/dashboard?from=2026-01-01&to=2026-06-30'],
  },
};

interface Ids {
  customerId: string;
  siteId: string;
  jobId: string;
  areaId: string;
  rollId: string;
  estimateId: string;
  invoiceId: string;
  crewId: string;
}

describe('statement budget of signed-in requests', () => {
  let owner: Client;
  let ids: Ids;

  beforeAll(async () => {
    const { app } = testApp();
    const signedIn = await signUpCompany(app);
    owner = signedIn.client;
    await addMember(app, owner, 'office');
    const customer = await createCustomer(owner, { name: 'Fern Marlgrove' });
    const site = await createSite(owner, customer.id);
    await createCustomer(owner);
    const job = await owner
      .post('/api/jobs', { customerId: customer.id, siteId: site.id, title: 'Front lawn' })
      .expect(201);
    const jobId = (job.body as { data: { id: string } }).data.id;
    const area = await createArea(owner, jobId);
    await uploadFile(owner, `/api/areas/${area.id}/underlay`, pngImage(20, 10), 'yard.png').expect(
      201,
    );
    const [turf] = await turfProducts(owner);
    const rolls = await owner
      .post('/api/rolls/deliveries', {
        turfProductId: turf!.id,
        dyeLot: 'BUDGET-1',
        rolls: [{ widthFt: 15, lengthFt: 100 }],
      })
      .expect(201);
    const rollId = (rolls.body as { data: { id: string }[] }).data[0]!.id;
    await owner
      .post(`/api/jobs/${jobId}/locate-tickets`, {
        number: 'BUDGET-811',
        calledAt: new Date(Date.now() - 60_000).toISOString(),
      })
      .expect(201);
    const estimate = await owner.post(`/api/jobs/${jobId}/estimates`, {}).expect(201);
    const estimateId = (estimate.body as { data: { id: string } }).data.id;
    const invoice = await owner
      .post('/api/invoices', {
        jobId,
        kind: 'progress',
        lines: [{ label: 'Base preparation', quantity: 1, unitPriceCents: 50_000 }],
      })
      .expect(201);
    const invoiceId = (invoice.body as { data: { id: string } }).data.id;
    const crewId = await createCrew(owner, { members: [{ name: 'Budget helper' }] });
    const bookedJobId = await acceptedJob(owner, 'Budget booked job');
    await owner
      .post('/api/bookings', {
        crewId,
        jobId: bookedJobId,
        startDate: '2031-06-02',
        endDate: '2031-06-03',
        phase: 'finishing',
      })
      .expect(201);
    ids = {
      customerId: customer.id,
      siteId: site.id,
      jobId,
      areaId: area.id,
      rollId,
      estimateId,
      invoiceId,
      crewId,
    };
  });

  it('has a budget for every signed-in GET route, no larger than the default without a reason', () => {
    const { app } = testApp();
    const reads = app.locals.apiRoutes
      .filter((r) => r.method === 'get' && r.access === 'tenant')
      .map((r) => r.path);
    expect(reads.filter((path) => !(path in budgets))).toEqual([]);
    // Only routes listed with a reason in DEVELOPERS.md go above the default.
    const above = Object.entries(budgets).filter(([, b]) => b.budget > defaultReadBudget);
    expect(above.map(([path]) => path)).toEqual([
      '/api/customers/:id/sites',
      '/api/audit-events',
      '/api/price-book',
      '/api/jobs/:id',
      '/api/areas/:id/underlay',
      '/api/jobs/:id/areas',
      '/api/jobs/:id/takeoff',
      '/api/jobs/:id/reservations',
      '/api/jobs/:id/locate-tickets',
      '/api/jobs/:id/estimates',
      '/api/estimates/:id/pdf',
      '/api/invoices',
      '/api/invoices/:id',
      '/api/invoices/:id/pdf',
      '/api/invoices/:id/reminders',
      '/api/crews',
      '/api/crews/:id',
      '/api/bookings',
      '/api/reports/aging',
      '/api/customers/:id/statement.pdf',
      '/api/exports/invoices.csv',
      '/api/reports/dashboard',
    ]);
  });

  it.each(Object.entries(budgets))(
    '%s stays within its budget',
    async (_path, { budget, urls }) => {
      const recorder = recordStatements(testApp().sequelize);
      try {
        for (const url of urls(ids)) {
          const statements = await recorder.during(() => owner.get(url).expect(200));
          expect(statements.length, `${url}:\n${statements.join('\n')}`).toBeLessThanOrEqual(
            budget,
          );
        }
      } finally {
        recorder.stop();
      }
    },
  );

  it('reads session and membership in one statement and writes nothing on a plain read', async () => {
    const recorder = recordStatements(testApp().sequelize);
    try {
      const statements = await recorder.during(() => owner.get('/api/customers').expect(200));
      expect(statements[0]).toMatch(/FROM sessions s\s+LEFT JOIN memberships m/);
      expect(statements.filter((sql) => /^\s*(UPDATE|INSERT|DELETE)/i.test(sql))).toEqual([]);
    } finally {
      recorder.stop();
    }
  });

  it('looks nothing up for the health check, even with a session cookie', async () => {
    const recorder = recordStatements(testApp().sequelize);
    try {
      const statements = await recorder.during(() => owner.get('/api/health').expect(200));
      expect(statements).toEqual(['SELECT 1 AS ok']);
    } finally {
      recorder.stop();
    }
  });
});
