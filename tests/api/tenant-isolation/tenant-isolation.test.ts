// Walks every API route: company B's owner must never read, change or delete company A's rows
// (always 404, never A's data), and no list may include A's rows. The table below must name
// every route the app registers, so a new route fails this test until its isolation is proved.
import { beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import type { Client } from '../../fixtures/client.js';
import { areaBody, createArea, turfProducts } from '../../fixtures/areas.js';
import { pngImage, uploadFile } from '../../fixtures/images.js';
import { acceptedJob, createCrew } from '../../fixtures/bookings.js';
import {
  addMember,
  createCustomer,
  createJob,
  createSite,
  signUpCompany,
  testPassword,
  uniqueEmail,
} from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';

interface World {
  a: SignedIn;
  b: SignedIn;
  aCustomerId: string;
  aSiteId: string;
  aJobId: string;
  bCustomerId: string;
  aInvitationId: string;
  aOwnerMemberId: string;
  aOfficeMemberId: string;
  aPriceItemId: string;
  aAreaId: string;
  bJobId: string;
  aTurfProductId: string;
  aRollId: string;
  aLocateTicketId: string;
  aEstimateId: string;
  aInvoiceId: string;
  aPaymentId: string;
  aCrewId: string;
  aBookedJobId: string;
  aBookingId: string;
  bCrewId: string;
}

/** `signed-in` routes need a signed-in person but no active company (choosing a company). */
type Probe =
  | { kind: 'public'; why: string }
  | { kind: 'tenant' | 'signed-in'; run: (b: Client, w: World) => Promise<void> };

const notFound = async (pending: PromiseLike<{ status: number; body: { code?: string } }>) => {
  const res = await pending;
  expect(res.status).toBe(404);
  expect(res.body.code).toBe('NOT_FOUND');
};

const alphaPriceItem = {
  kind: 'material',
  key: 'alpha-only',
  name: 'Alpha only material',
  unit: 'bag',
  packSize: 50,
  priceMillicents: 123_450,
};

const idsOf = (body: unknown) => (body as { data: { id: string }[] }).data.map((row) => row.id);

const probes: Record<string, Probe> = {
  'get /api/health': { kind: 'public', why: 'no company data' },
  'get /api/auth/csrf': { kind: 'public', why: 'issues a CSRF token only' },
  'post /api/auth/signup': { kind: 'public', why: 'creates a new company' },
  'post /api/auth/login': { kind: 'public', why: 'credentials, no company data' },
  'post /api/auth/logout': { kind: 'public', why: "ends the caller's own session" },
  'post /api/auth/password-reset': { kind: 'public', why: 'always 202, no data' },
  'post /api/auth/password-reset/:token': {
    kind: 'public',
    why: 'the e-mailed token is the credential',
  },
  'get /api/invitations/:token': { kind: 'public', why: 'the e-mailed token is the credential' },
  'post /api/invitations/:token/accept': {
    kind: 'public',
    why: 'the e-mailed token is the credential',
  },

  'get /api/me': {
    kind: 'tenant',
    run: async (b, w) => {
      const res = await b.get('/api/me').expect(200);
      expect(res.body.data.company.id).toBe(w.b.me.company.id);
      expect(JSON.stringify(res.body)).not.toContain(w.a.me.company.id);
    },
  },
  'get /api/me/companies': {
    kind: 'signed-in',
    run: async (b, w) => {
      const res = await b.get('/api/me/companies').expect(200);
      const companies = (res.body as { data: { companyId: string }[] }).data;
      expect(companies.map((c) => c.companyId)).toEqual([w.b.me.company.id]);
      expect(JSON.stringify(res.body)).not.toContain(w.a.me.company.id);
    },
  },
  'patch /api/me': {
    kind: 'tenant',
    run: async (b, w) => {
      // Whatever ids the body names, only the session's own user is renamed.
      const res = await b
        .patch('/api/me', { name: 'Bravo Renamed', id: w.a.me.user.id, userId: w.a.me.user.id })
        .expect(200);
      expect(res.body.data.user.id).toBe(w.b.me.user.id);
      const [aUser] = await selectRows(testApp().sequelize, 'SELECT name FROM users WHERE id = ?', [
        w.a.me.user.id,
      ]);
      expect(aUser?.name).toBe(w.a.me.user.name);
    },
  },
  'post /api/me/password': {
    kind: 'tenant',
    run: async (b, w) => {
      const hashOfA = () =>
        selectRows(testApp().sequelize, 'SELECT password_hash FROM users WHERE id = ?', [
          w.a.me.user.id,
        ]);
      const before = await hashOfA();
      await b
        .post('/api/me/password', {
          currentPassword: testPassword,
          newPassword: 'bravo-isolation-password-2',
          userId: w.a.me.user.id,
        })
        .expect(204);
      expect(await hashOfA()).toEqual(before);
      // A's sessions are not B's "other sessions".
      await w.a.client.get('/api/me').expect(200);
    },
  },
  'post /api/me/company': {
    kind: 'signed-in',
    run: (b, w) => notFound(b.post('/api/me/company', { companyId: w.a.me.company.id })),
  },
  'get /api/company': {
    kind: 'tenant',
    run: async (b, w) => {
      expect((await b.get('/api/company').expect(200)).body.data.id).toBe(w.b.me.company.id);
    },
  },
  'patch /api/company': {
    kind: 'tenant',
    run: async (b, w) => {
      const res = await b
        .patch('/api/company', {
          name: 'B renamed',
          id: w.a.me.company.id,
          companyId: w.a.me.company.id,
        })
        .expect(200);
      expect(res.body.data.id).toBe(w.b.me.company.id);
    },
  },
  'get /api/members': {
    kind: 'tenant',
    run: async (b, w) => {
      const ids = idsOf((await b.get('/api/members').expect(200)).body);
      expect(ids).toHaveLength(1);
      expect(ids).not.toContain(w.aOwnerMemberId);
    },
  },
  'patch /api/members/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.patch(`/api/members/${w.aOfficeMemberId}`, { role: 'owner' })),
  },
  'delete /api/members/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.del(`/api/members/${w.aOfficeMemberId}`)),
  },
  'get /api/invitations': {
    kind: 'tenant',
    run: async (b, w) => {
      expect(idsOf((await b.get('/api/invitations').expect(200)).body)).not.toContain(
        w.aInvitationId,
      );
    },
  },
  'post /api/invitations': {
    kind: 'tenant',
    run: async (b, w) => {
      await b
        .post('/api/invitations', {
          email: uniqueEmail('b-invite'),
          role: 'office',
          companyId: w.a.me.company.id,
        })
        .expect(201);
    },
  },
  'delete /api/invitations/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.del(`/api/invitations/${w.aInvitationId}`)),
  },
  'get /api/customers': {
    kind: 'tenant',
    run: async (b, w) => {
      const res = await b.get('/api/customers?status=all&pageSize=100').expect(200);
      expect(idsOf(res.body)).not.toContain(w.aCustomerId);
      expect(res.body.meta.total).toBe(1);
      const search = await b.get('/api/customers?status=all&q=Alpha').expect(200);
      expect(search.body.data).toEqual([]);
    },
  },
  'post /api/customers': {
    kind: 'tenant',
    run: async (b) => {
      await b.post('/api/customers', { name: 'B extra' }).expect(201);
    },
  },
  'get /api/customers/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/customers/${w.aCustomerId}`)),
  },
  'patch /api/customers/:id': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(b.patch(`/api/customers/${w.aCustomerId}`, { name: 'Hijacked', archived: true })),
  },
  'delete /api/customers/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.del(`/api/customers/${w.aCustomerId}`)),
  },
  'get /api/customers/:id/sites': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/customers/${w.aCustomerId}/sites`)),
  },
  'post /api/customers/:id/sites': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(
        b.post(`/api/customers/${w.aCustomerId}/sites`, {
          addressLine1: '1 Intruder Way',
          city: 'Elsewhere',
        }),
      ),
  },
  'get /api/sites/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/sites/${w.aSiteId}`)),
  },
  'patch /api/sites/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.patch(`/api/sites/${w.aSiteId}`, { hazards: 'Hijacked' })),
  },
  'delete /api/sites/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.del(`/api/sites/${w.aSiteId}`)),
  },
  'get /api/jobs': {
    kind: 'tenant',
    run: async (b, w) => {
      const res = await b.get('/api/jobs?pageSize=100').expect(200);
      expect(idsOf(res.body)).toEqual([w.bJobId]);
      expect(res.body.meta.total).toBe(1);
      const search = await b.get('/api/jobs?q=Alpha').expect(200);
      expect(search.body.data).toEqual([]);
    },
  },
  'post /api/jobs': {
    kind: 'tenant',
    run: async (b, w) => {
      // A's customer and site are unknown to B; B's own customer with A's site is refused too.
      await notFound(
        b.post('/api/jobs', { customerId: w.aCustomerId, siteId: w.aSiteId, title: 'Hijack' }),
      );
      await notFound(
        b.post('/api/jobs', { customerId: w.bCustomerId, siteId: w.aSiteId, title: 'Hijack' }),
      );
    },
  },
  'get /api/jobs/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/jobs/${w.aJobId}`)),
  },
  'patch /api/jobs/:id': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(b.patch(`/api/jobs/${w.aJobId}`, { title: 'Hijacked', status: 'lost' })),
  },
  'get /api/jobs/:id/areas': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/jobs/${w.aJobId}/areas`)),
  },
  'post /api/jobs/:id/areas': {
    kind: 'tenant',
    run: async (b, w) => {
      // A's job is unknown to B; so is A's turf product under B's own job.
      await notFound(b.post(`/api/jobs/${w.aJobId}/areas`, areaBody()));
      await notFound(
        b.post(`/api/jobs/${w.bJobId}/areas`, areaBody({ turfProductId: w.aTurfProductId })),
      );
    },
  },
  'get /api/jobs/:id/takeoff': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/jobs/${w.aJobId}/takeoff`)),
  },
  'get /api/jobs/:id/estimates': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/jobs/${w.aJobId}/estimates`)),
  },
  'post /api/jobs/:id/estimates': {
    kind: 'tenant',
    run: async (b, w) => {
      await notFound(b.post(`/api/jobs/${w.aJobId}/estimates`, {}));
      // A's turf product is unknown under B's own job too (checked before B's areas).
      await notFound(
        b.post(`/api/jobs/${w.bJobId}/estimates`, {
          tiers: [{ name: 'Hijack', turfProductId: w.aTurfProductId }],
        }),
      );
    },
  },
  'get /api/estimates/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/estimates/${w.aEstimateId}`)),
  },
  'patch /api/estimates/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.patch(`/api/estimates/${w.aEstimateId}`, { notes: 'Hijacked' })),
  },
  'post /api/estimates/:id/revisions': {
    kind: 'tenant',
    run: (b, w) => notFound(b.post(`/api/estimates/${w.aEstimateId}/revisions`, {})),
  },
  'get /api/estimates/:id/pdf': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/estimates/${w.aEstimateId}/pdf`)),
  },
  'post /api/estimates/:id/send': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(b.post(`/api/estimates/${w.aEstimateId}/send`, { to: 'thief@example.test' })),
  },
  'post /api/estimates/:id/acceptances': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(
        b.post(`/api/estimates/${w.aEstimateId}/acceptances`, {
          name: 'Mallory',
          signedAt: new Date().toISOString(),
          place: 'office',
        }),
      ),
  },
  // The e-mailed token is the credential and names one estimate of one company; the token
  // tests (tests/api/estimate-sending/public-estimate.test.ts) prove tampered ones are 404.
  'get /api/public/estimates/:token': {
    kind: 'public',
    why: 'the e-mailed token is the credential',
  },
  'post /api/public/estimates/:token/accept': {
    kind: 'public',
    why: 'the e-mailed token is the credential',
  },
  'post /api/public/estimates/:token/decline': {
    kind: 'public',
    why: 'the e-mailed token is the credential',
  },
  // The processor's signature is the credential (tests/api/processor/webhook.test.ts: a wrong
  // secret or a stale timestamp is 400 and records nothing). No session is read: the company an
  // event concerns comes from the metadata our own API key put on the checkout session.
  'post /api/webhooks/processor': {
    kind: 'public',
    why: "the processor's signature is the credential",
  },
  'post /api/estimates/:id/links/revoke': {
    kind: 'tenant',
    run: (b, w) => notFound(b.post(`/api/estimates/${w.aEstimateId}/links/revoke`, {})),
  },
  'get /api/areas/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/areas/${w.aAreaId}`)),
  },
  'patch /api/areas/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.patch(`/api/areas/${w.aAreaId}`, { name: 'Hijacked' })),
  },
  'delete /api/areas/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.del(`/api/areas/${w.aAreaId}`)),
  },
  'post /api/areas/:id/underlay': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(uploadFile(b, `/api/areas/${w.aAreaId}/underlay`, pngImage(6, 6), 'hijack.png')),
  },
  'put /api/areas/:id/underlay/scale': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(
        b.put(`/api/areas/${w.aAreaId}/underlay/scale`, {
          a: { x: 0, y: 0 },
          b: { x: 5, y: 0 },
          distanceFt: 1,
        }),
      ),
  },
  'get /api/areas/:id/underlay': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/areas/${w.aAreaId}/underlay`)),
  },
  'delete /api/areas/:id/underlay': {
    kind: 'tenant',
    run: (b, w) => notFound(b.del(`/api/areas/${w.aAreaId}/underlay`)),
  },
  'get /api/rolls': {
    kind: 'tenant',
    run: async (b, w) => {
      const res = await b.get('/api/rolls?includeEmpty=true').expect(200);
      expect(idsOf(res.body)).not.toContain(w.aRollId);
      expect(res.body.meta.total).toBe(0);
      await b.get(`/api/rolls?turfProductId=${w.aTurfProductId}`).expect(200, {
        data: [],
        meta: { page: 1, pageSize: 25, total: 0 },
      });
    },
  },
  'post /api/rolls': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(
        b.post('/api/rolls', {
          turfProductId: w.aTurfProductId,
          dyeLot: 'B-1',
          widthFt: 15,
          lengthFt: 50,
        }),
      ),
  },
  'post /api/rolls/deliveries': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(
        b.post('/api/rolls/deliveries', {
          turfProductId: w.aTurfProductId,
          dyeLot: 'B-1',
          rolls: [{ widthFt: 15, lengthFt: 50 }],
        }),
      ),
  },
  'get /api/rolls/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/rolls/${w.aRollId}`)),
  },
  'patch /api/rolls/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.patch(`/api/rolls/${w.aRollId}`, { remainingFt: 1 })),
  },
  'get /api/jobs/:id/reservations': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/jobs/${w.aJobId}/reservations`)),
  },
  'post /api/jobs/:id/reservations': {
    kind: 'tenant',
    run: (b, w) => notFound(b.post(`/api/jobs/${w.aJobId}/reservations`, {})),
  },
  'delete /api/jobs/:id/reservations': {
    kind: 'tenant',
    run: (b, w) => notFound(b.del(`/api/jobs/${w.aJobId}/reservations`)),
  },
  'post /api/jobs/:id/remnants': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(
        b.post(`/api/jobs/${w.aJobId}/remnants`, {
          remnants: [{ rollId: w.aRollId, lengthFt: 5 }],
        }),
      ),
  },
  'get /api/jobs/:id/locate-tickets': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/jobs/${w.aJobId}/locate-tickets`)),
  },
  'post /api/jobs/:id/locate-tickets': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(
        b.post(`/api/jobs/${w.aJobId}/locate-tickets`, {
          number: 'B-HIJACK',
          calledAt: new Date(Date.now() - 60_000).toISOString(),
        }),
      ),
  },
  'patch /api/locate-tickets/:id': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(b.patch(`/api/locate-tickets/${w.aLocateTicketId}`, { status: 'clear' })),
  },
  'get /api/crews': {
    kind: 'tenant',
    run: async (b, w) => {
      const res = await b.get('/api/crews?includeArchived=true').expect(200);
      expect(idsOf(res.body)).not.toContain(w.aCrewId);
    },
  },
  'post /api/crews': {
    kind: 'tenant',
    run: async (b, w) => {
      // A's people cannot be put on B's crew.
      const res = await b
        .post('/api/crews', {
          name: 'B poach',
          colour: 'pine',
          members: [{ userId: w.a.me.user.id }],
        })
        .expect(400);
      expect(res.body.errors[0].path).toBe('members.0.userId');
    },
  },
  'get /api/crews/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/crews/${w.aCrewId}`)),
  },
  'patch /api/crews/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.patch(`/api/crews/${w.aCrewId}`, { name: 'B renamed' })),
  },
  'delete /api/crews/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.del(`/api/crews/${w.aCrewId}`)),
  },
  'get /api/bookings': {
    kind: 'tenant',
    run: async (b, w) => {
      const all = await b.get('/api/bookings?from=2031-06-01&to=2031-06-30').expect(200);
      expect(all.body.data).toEqual([]);
      const aCrew = await b
        .get(`/api/bookings?from=2031-06-01&to=2031-06-30&crewId=${w.aCrewId}`)
        .expect(200);
      expect(aCrew.body.data).toEqual([]);
    },
  },
  'post /api/bookings': {
    kind: 'tenant',
    run: async (b, w) => {
      const days = { startDate: '2031-06-10', endDate: '2031-06-10', phase: 'finishing' };
      await notFound(b.post('/api/bookings', { ...days, crewId: w.aCrewId, jobId: w.bJobId }));
      await notFound(
        b.post('/api/bookings', { ...days, crewId: w.bCrewId, jobId: w.aBookedJobId }),
      );
    },
  },
  'patch /api/bookings/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.patch(`/api/bookings/${w.aBookingId}`, { startDate: '2031-06-20' })),
  },
  'delete /api/bookings/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.del(`/api/bookings/${w.aBookingId}`)),
  },
  'post /api/plans/preview': {
    kind: 'tenant',
    run: async (b) => {
      // Stateless computation: reads and writes no company rows.
      const body = {
        area: {
          outer: [
            [0, 0],
            [12, 0],
            [12, 10],
            [0, 10],
          ],
        },
        roll: { widthFt: 12 },
      };
      await b.post('/api/plans/preview', body).expect(200);
    },
  },
  'post /api/plans/job-preview': {
    kind: 'tenant',
    run: async (b) => {
      // Stateless computation: reads and writes no company rows.
      const body = {
        areas: [
          {
            id: 'front',
            area: {
              outer: [
                [0, 0],
                [12, 0],
                [12, 10],
                [0, 10],
              ],
            },
          },
        ],
        rolls: [{ widthFt: 12 }],
      };
      await b.post('/api/plans/job-preview', body).expect(200);
    },
  },
  'get /api/audit-events': {
    kind: 'tenant',
    run: async (b, w) => {
      const res = await b.get('/api/audit-events?pageSize=100').expect(200);
      expect(JSON.stringify(res.body)).not.toContain(w.aCustomerId);
      expect(JSON.stringify(res.body)).not.toContain(w.a.me.company.id);
    },
  },
  'get /api/price-book': {
    kind: 'tenant',
    run: async (b, w) => {
      const res = await b.get('/api/price-book?pageSize=100').expect(200);
      expect(idsOf(res.body)).not.toContain(w.aPriceItemId);
      const search = await b.get('/api/price-book?q=alpha-only').expect(200);
      expect(search.body.data).toEqual([]);
    },
  },
  'post /api/price-book': {
    kind: 'tenant',
    run: async (b) => {
      // Keys are per company: B may use the key A already has.
      await b.post('/api/price-book', { ...alphaPriceItem, name: 'Bravo copy' }).expect(201);
    },
  },
  'get /api/reports/aging': {
    kind: 'tenant',
    run: async (b, w) => {
      const res = await b.get('/api/reports/aging').expect(200);
      expect(JSON.stringify(res.body)).not.toContain(w.aCustomerId);
      expect(res.body.data.totalCents).toBe(0);
    },
  },
  'get /api/reports/dashboard': {
    kind: 'tenant',
    run: async (b) => {
      const res = await b.get('/api/reports/dashboard').expect(200);
      const invoiced = (res.body.data.invoicedByMonth as { cents: number }[]).reduce(
        (sum, m) => sum + m.cents,
        0,
      );
      expect(invoiced).toBe(0);
    },
  },
  'get /api/customers/:id/statement.pdf': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/customers/${w.aCustomerId}/statement.pdf`)),
  },
  'post /api/customers/:id/statement': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(b.post(`/api/customers/${w.aCustomerId}/statement`, { to: 'thief@example.test' })),
  },
  'get /api/exports/invoices.csv': {
    kind: 'tenant',
    run: async (b) => {
      const res = await b.get('/api/exports/invoices.csv').expect(200);
      expect(res.text).not.toContain('Alpha Customer');
    },
  },
  'get /api/exports/payments.csv': {
    kind: 'tenant',
    run: async (b) => {
      const res = await b.get('/api/exports/payments.csv').expect(200);
      expect(res.text).not.toContain('Alpha Customer');
    },
  },
  'get /api/price-book/export.csv': {
    kind: 'tenant',
    run: async (b) => {
      const res = await b.get('/api/price-book/export.csv').expect(200);
      expect(res.text).not.toContain('Alpha only material');
    },
  },
  'post /api/price-book/import': {
    kind: 'tenant',
    run: async (b) => {
      // A row with A's key never updates A's item: B's import only sees B's book.
      const csv = 'kind,key,name,unit,price\nmaterial,alpha-only-2,Bravo import,bag,1.00';
      const res = await b.post('/api/price-book/import', { csv, dryRun: false }).expect(200);
      expect(res.body.data.rows[0].action).toBe('create');
    },
  },
  'patch /api/price-book/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.patch(`/api/price-book/${w.aPriceItemId}`, { priceMillicents: 1 })),
  },
  'delete /api/price-book/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.del(`/api/price-book/${w.aPriceItemId}`)),
  },
  'get /api/estimating-settings': {
    kind: 'tenant',
    run: async (b) => {
      const res = await b.get('/api/estimating-settings').expect(200);
      expect(res.body.data.markupBasisPoints).toBe(0);
    },
  },
  'patch /api/estimating-settings': {
    kind: 'tenant',
    run: async (b, w) => {
      await b.patch('/api/estimating-settings', { markupBasisPoints: 999 }).expect(200);
      const a = await w.a.client.get('/api/estimating-settings').expect(200);
      expect(a.body.data.markupBasisPoints).toBe(1234);
    },
  },
  'get /api/invoices': {
    kind: 'tenant',
    run: async (b, w) => {
      const all = await b.get('/api/invoices').expect(200);
      expect(idsOf(all.body)).not.toContain(w.aInvoiceId);
      const byCustomer = await b.get(`/api/invoices?customerId=${w.aCustomerId}`).expect(200);
      expect(idsOf(byCustomer.body)).toEqual([]);
    },
  },
  'post /api/invoices': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(
        b.post('/api/invoices', {
          jobId: w.aJobId,
          kind: 'progress',
          lines: [{ label: 'Hijack', quantity: 1, unitPriceCents: 100 }],
        }),
      ),
  },
  'get /api/invoices/:id': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/invoices/${w.aInvoiceId}`)),
  },
  'get /api/invoices/:id/pdf': {
    kind: 'tenant',
    run: (b, w) => notFound(b.get(`/api/invoices/${w.aInvoiceId}/pdf`)),
  },
  'post /api/invoices/:id/send': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(b.post(`/api/invoices/${w.aInvoiceId}/send`, { to: 'thief@example.test' })),
  },
  'post /api/invoices/:id/payments': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(
        b.post(`/api/invoices/${w.aInvoiceId}/payments`, {
          amountCents: 100,
          method: 'cash',
          receivedOn: '2026-01-05',
        }),
      ),
  },
  'post /api/invoices/:id/void': {
    kind: 'tenant',
    run: (b, w) => notFound(b.post(`/api/invoices/${w.aInvoiceId}/void`, { reason: 'Hijack' })),
  },
  'post /api/invoices/:id/credit-notes': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(
        b.post(`/api/invoices/${w.aInvoiceId}/credit-notes`, { amountCents: 1, reason: 'Hijack' }),
      ),
  },
  // The e-mailed token is the credential and names one invoice of one company; the token
  // tests (tests/api/invoices/send-and-public.test.ts) prove tampered ones are 404.
  'get /api/public/invoices/:token': {
    kind: 'public',
    why: 'the e-mailed token is the credential',
  },
  'post /api/public/invoices/:token/checkout': {
    kind: 'public',
    why: 'the e-mailed token is the credential (tests/api/invoices/pay-online.test.ts)',
  },
  'post /api/invoices/:id/payments/:paymentId/refunds': {
    kind: 'tenant',
    run: (b, w) =>
      notFound(
        b.post(`/api/invoices/${w.aInvoiceId}/payments/${w.aPaymentId}/refunds`, {
          amountCents: 100,
          reason: 'Hijack',
        }),
      ),
  },
};

// Payment reminders (modules/reminders): A's settings, log and schedule stay A's.
Object.assign(probes, {
  'get /api/settings/reminders': {
    kind: 'tenant',
    run: async (b: Client) => {
      const res = await b.get('/api/settings/reminders').expect(200);
      expect(res.body.data.senderName).toBeNull();
      expect(JSON.stringify(res.body)).not.toContain('Alpha Accounts');
    },
  },
  'put /api/settings/reminders': {
    kind: 'tenant',
    run: async (b: Client) => {
      await b
        .put('/api/settings/reminders', { enabled: false, offsets: [1], senderName: 'Bravo' })
        .expect(200);
    },
  },
  'get /api/invoices/:id/reminders': {
    kind: 'tenant',
    run: (b: Client, w: World) => notFound(b.get(`/api/invoices/${w.aInvoiceId}/reminders`)),
  },
  'post /api/invoices/:id/reminders': {
    kind: 'tenant',
    run: (b: Client, w: World) => notFound(b.post(`/api/invoices/${w.aInvoiceId}/reminders`, {})),
  },
} satisfies Record<string, Probe>);

async function snapshotOfA(w: World) {
  const { sequelize } = testApp();
  const company = w.a.me.company.id;
  const q = (sql: string) => selectRows(sequelize, sql, [company]);
  return {
    company: await q('SELECT name, time_zone FROM companies WHERE id = ?'),
    members: await q('SELECT id, user_id, role FROM memberships WHERE company_id = ? ORDER BY id'),
    invitations: await q(
      'SELECT id, email, accepted_at FROM invitations WHERE company_id = ? ORDER BY id',
    ),
    customers: await q(
      'SELECT id, name, archived_at, updated_at FROM customers WHERE company_id = ? ORDER BY id',
    ),
    sites: await q('SELECT id, hazards, updated_at FROM sites WHERE company_id = ? ORDER BY id'),
    jobs: await q(
      'SELECT id, title, status, updated_at FROM jobs WHERE company_id = ? ORDER BY id',
    ),
    priceBook: await q(
      'SELECT id, item_key, price_millicents, updated_at FROM price_book_items WHERE company_id = ? ORDER BY id',
    ),
    areas: await q(
      'SELECT id, name, plan, underlay_upload_id, underlay, updated_at FROM job_areas WHERE company_id = ? ORDER BY id',
    ),
    uploads: await q(
      'SELECT id, sha256, storage_key FROM uploads WHERE company_id = ? ORDER BY id',
    ),
    rolls: await q(
      'SELECT id, remaining_ft, held_ft, location, updated_at FROM rolls WHERE company_id = ? ORDER BY id',
    ),
    reservations: await q('SELECT id FROM turf_reservations WHERE company_id = ? ORDER BY id'),
    locateTickets: await q(
      'SELECT id, number, status, updated_at FROM locate_tickets WHERE company_id = ? ORDER BY id',
    ),
    estimates: await q(
      'SELECT id, version, status, notes, tiers, updated_at FROM estimates WHERE company_id = ? ORDER BY id',
    ),
    estimateLinks: await q(
      'SELECT id, revoked_at FROM estimate_links WHERE company_id = ? ORDER BY id',
    ),
    estimateAnswers: await q('SELECT id FROM estimate_answers WHERE company_id = ? ORDER BY id'),
    invoices: await q(
      'SELECT id, number, status, paid_cents, credited_cents, voided_at, updated_at FROM invoices WHERE company_id = ? ORDER BY id',
    ),
    invoiceLinks: await q('SELECT id FROM invoice_links WHERE company_id = ? ORDER BY id'),
    payments: await q('SELECT id FROM payments WHERE company_id = ? ORDER BY id'),
    creditNotes: await q('SELECT id FROM credit_notes WHERE company_id = ? ORDER BY id'),
    refunds: await q('SELECT id FROM refunds WHERE company_id = ? ORDER BY id'),
    crews: await q('SELECT id, name, updated_at FROM crews WHERE company_id = ? ORDER BY id'),
    crewMembers: await q(
      'SELECT id, user_id, name FROM crew_members WHERE company_id = ? ORDER BY id',
    ),
    bookings: await q(
      'SELECT id, start_date, end_date, version FROM bookings WHERE company_id = ? ORDER BY id',
    ),
    estimating: await q(
      'SELECT markup_basis_points, takeoff_overrides, updated_at FROM estimating_settings WHERE company_id = ?',
    ),
    reminderSettings: await q(
      'SELECT enabled, offsets, sender_name, templates, updated_at FROM reminder_settings WHERE company_id = ?',
    ),
    invoiceReminders: await q('SELECT id FROM invoice_reminders WHERE company_id = ? ORDER BY id'),
    invoiceSchedule: await q(
      'SELECT id, next_reminder_on FROM invoices WHERE company_id = ? ORDER BY id',
    ),
  };
}

describe('tenant isolation', () => {
  let world: World;

  beforeAll(async () => {
    const { app } = testApp();
    const a = await signUpCompany(app, 'Alpha Turf Isolation');
    const b = await signUpCompany(app, 'Bravo Turf Isolation');
    const office = await addMember(app, a.client, 'office');
    const aCustomer = await createCustomer(a.client, {
      name: 'Alpha Customer',
      email: 'alpha@example.test',
    });
    const aSite = await createSite(a.client, aCustomer.id, { hazards: 'Alpha hazard' });
    const invitation = await a.client
      .post('/api/invitations', { email: uniqueEmail('alpha-pending'), role: 'bookkeeper' })
      .expect(201);
    const members = (await a.client.get('/api/members').expect(200)).body.data as {
      id: string;
      userId: string;
    }[];
    const aJob = await createJob(a.client, aCustomer.id, aSite.id, 'Alpha job');
    const bCustomer = await createCustomer(b.client, { name: 'Bravo Customer' });
    const bSite = await createSite(b.client, bCustomer.id);
    const bJob = await createJob(b.client, bCustomer.id, bSite.id, 'Bravo job');
    const aArea = await createArea(a.client, aJob.id, areaBody({ name: 'Alpha area' }));
    await uploadFile(a.client, `/api/areas/${aArea.id}/underlay`, pngImage(10, 10), 'a.png').expect(
      201,
    );
    const [aTurf] = await turfProducts(a.client);
    const aPriceItem = await a.client.post('/api/price-book', alphaPriceItem).expect(201);
    await a.client.patch('/api/estimating-settings', { markupBasisPoints: 1234 }).expect(200);
    const aRolls = await a.client
      .post('/api/rolls/deliveries', {
        turfProductId: aTurf!.id,
        dyeLot: 'ALPHA-1',
        rolls: [{ widthFt: 15, lengthFt: 100 }],
      })
      .expect(201);
    const aTicket = await a.client
      .post(`/api/jobs/${aJob.id}/locate-tickets`, {
        number: 'ALPHA-811',
        calledAt: new Date(Date.now() - 60_000).toISOString(),
      })
      .expect(201);
    const aEstimate = await a.client.post(`/api/jobs/${aJob.id}/estimates`, {}).expect(201);
    // A sent and partly paid invoice of A's, for the receivables probes (aging, exports).
    const aInvoice = await a.client
      .post('/api/invoices', {
        jobId: aJob.id,
        kind: 'progress',
        lines: [
          {
            label: 'Alpha work',
            quantity: 1,
            unit: 'each',
            unitPriceCents: 40_000,
            taxable: false,
          },
        ],
      })
      .expect(201);
    await a.client.post(`/api/invoices/${aInvoice.body.data.id}/send`, {}).expect(200);
    const aPaid = await a.client
      .post(`/api/invoices/${aInvoice.body.data.id}/payments`, {
        amountCents: 10_000,
        method: 'cheque',
        receivedOn: new Date().toISOString().slice(0, 10),
      })
      .expect(201);
    await a.client
      .put('/api/settings/reminders', {
        enabled: true,
        offsets: [-3, 0, 7],
        senderName: 'Alpha Accounts',
      })
      .expect(200);
    const aCrewId = await createCrew(a.client, {
      name: 'Alpha crew',
      members: [{ userId: a.me.user.id }, { name: 'Alpha helper' }],
    });
    const bCrewId = await createCrew(b.client, { name: 'Bravo crew' });
    const aBookedJobId = await acceptedJob(a.client, 'Alpha booked job');
    const aBooking = await a.client
      .post('/api/bookings', {
        crewId: aCrewId,
        jobId: aBookedJobId,
        startDate: '2031-06-02',
        endDate: '2031-06-03',
        phase: 'finishing',
      })
      .expect(201);
    world = {
      a,
      aCrewId,
      bCrewId,
      aBookedJobId,
      aBookingId: aBooking.body.data.id,
      b,
      aCustomerId: aCustomer.id,
      aSiteId: aSite.id,
      aJobId: aJob.id,
      bCustomerId: bCustomer.id,
      aInvitationId: invitation.body.data.id,
      aOwnerMemberId: members.find((m) => m.userId === a.me.user.id)!.id,
      aOfficeMemberId: members.find((m) => m.userId === office.me.user.id)!.id,
      aPriceItemId: aPriceItem.body.data.id,
      aAreaId: aArea.id,
      bJobId: bJob.id,
      aTurfProductId: aTurf!.id,
      aRollId: (aRolls.body as { data: { id: string }[] }).data[0]!.id,
      aLocateTicketId: (aTicket.body as { data: { id: string } }).data.id,
      aEstimateId: aEstimate.body.data.id,
      aInvoiceId: aInvoice.body.data.id,
      aPaymentId: (aPaid.body as { data: { payments: { id: string }[] } }).data.payments[0]!.id,
    };
  });

  it('has an isolation probe for every registered route, and no probe for a route that is gone', () => {
    const registered = testApp().app.locals.apiRoutes.map((r) => `${r.method} ${r.path}`);
    expect(registered.length).toBeGreaterThan(20);
    expect(registered.filter((key) => !(key in probes))).toEqual([]);
    expect(Object.keys(probes).filter((key) => !registered.includes(key))).toEqual([]);
  });

  it('routes marked public in the table are public in the app, and every other route needs a member (or, to choose a company, a signed-in person)', () => {
    for (const route of testApp().app.locals.apiRoutes) {
      const probe = probes[`${route.method} ${route.path}`];
      expect({ route: `${route.method} ${route.path}`, access: route.access }).toEqual({
        route: `${route.method} ${route.path}`,
        access: probe?.kind ?? 'tenant',
      });
    }
  });

  it("gives company B 404 (never A's data) on every tenant route, and leaves A's rows untouched", async () => {
    const before = await snapshotOfA(world);
    for (const [key, probe] of Object.entries(probes)) {
      if (probe.kind === 'public') continue;
      try {
        await probe.run(world.b.client, world);
      } catch (error) {
        throw new Error(`${key}: ${error instanceof Error ? error.message : String(error)}`);
      }
    }
    expect(await snapshotOfA(world)).toEqual(before);
    // A still sees its own data.
    await world.a.client.get(`/api/customers/${world.aCustomerId}`).expect(200);
    await world.a.client.get(`/api/sites/${world.aSiteId}`).expect(200);
    await world.a.client.get(`/api/jobs/${world.aJobId}`).expect(200);
    await world.a.client.get(`/api/areas/${world.aAreaId}`).expect(200);
    await world.a.client.get(`/api/areas/${world.aAreaId}/underlay`).expect(200);
    await world.a.client.get(`/api/estimates/${world.aEstimateId}`).expect(200);
    await world.a.client.get(`/api/invoices/${world.aInvoiceId}`).expect(200);
  });

  it("ignores a companyId sent in the body: rows land in the caller's own company", async () => {
    const { sequelize } = testApp();
    const res = await world.b.client
      .post('/api/customers', { name: 'Smuggled', companyId: world.a.me.company.id })
      .expect(201);
    const [row] = await selectRows(sequelize, 'SELECT company_id FROM customers WHERE id = ?', [
      res.body.data.id,
    ]);
    expect(row?.company_id).toBe(world.b.me.company.id);
  });
});
