import { beforeAll, describe, expect, it } from 'vitest';
import { permissionTable } from '@seamwright/shared';
import { selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { areaBody } from '../../fixtures/areas.js';
import { createCustomer, createJob, createSite, signUpTeam } from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';

describe('permissions per role', () => {
  let owner: SignedIn;
  let office: SignedIn;
  let bookkeeper: SignedIn;
  let crew: SignedIn;
  let customerId: string;
  let siteId: string;

  beforeAll(async () => {
    const { app } = testApp();
    ({ owner, office, bookkeeper, crew } = await signUpTeam(app));
    const customer = await createCustomer(owner.client, {
      email: 'billing@example.test',
      phone: '555 014 1234',
    });
    customerId = customer.id;
    siteId = (await createSite(owner.client, customerId)).id;
  });

  it('crew leads get 403 FORBIDDEN on every customer and site route', async () => {
    for (const res of [
      await crew.client.get('/api/customers'),
      await crew.client.get(`/api/customers/${customerId}`),
      await crew.client.post('/api/customers', { name: 'Nope' }),
      await crew.client.patch(`/api/customers/${customerId}`, { name: 'Nope' }),
      await crew.client.del(`/api/customers/${customerId}`),
      await crew.client.get(`/api/customers/${customerId}/sites`),
      await crew.client.get(`/api/sites/${siteId}`),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('FORBIDDEN');
    }
    await crew.client.get('/api/me').expect(200);
    await crew.client.get('/api/company').expect(200);
  });

  it('bookkeepers read customers with billing details but cannot write', async () => {
    const read = await bookkeeper.client.get(`/api/customers/${customerId}`).expect(200);
    expect(read.body.data.email).toBe('billing@example.test');
    await bookkeeper.client.post('/api/customers', { name: 'Nope' }).expect(403);
    await bookkeeper.client.patch(`/api/customers/${customerId}`, { name: 'Nope' }).expect(403);
    await bookkeeper.client.del(`/api/customers/${customerId}`).expect(403);
    await bookkeeper.client
      .post(`/api/customers/${customerId}/sites`, { addressLine1: '1 A', city: 'B' })
      .expect(403);
    await bookkeeper.client.patch(`/api/sites/${siteId}`, { label: 'x' }).expect(403);
  });

  it('office staff write customers and sites but cannot manage members, invitations, company or audit', async () => {
    await office.client
      .patch(`/api/customers/${customerId}`, { notes: 'Office was here' })
      .expect(200);
    await office.client.patch(`/api/sites/${siteId}`, { label: 'Front' }).expect(200);
    await office.client.get('/api/members').expect(403);
    await office.client
      .post('/api/invitations', { email: 'x@example.test', role: 'office' })
      .expect(403);
    await office.client.patch('/api/company', { name: 'Taken over' }).expect(403);
    await office.client.get('/api/audit-events').expect(403);
  });

  it('owners update the company settings', async () => {
    const res = await owner.client
      .patch('/api/company', {
        name: 'Renamed Turf',
        timeZone: 'America/Chicago',
        measurementSystem: 'metric',
      })
      .expect(200);
    expect(res.body.data).toMatchObject({
      name: 'Renamed Turf',
      timeZone: 'America/Chicago',
      measurementSystem: 'metric',
      currency: 'USD',
    });
    const bad = await owner.client.patch('/api/company', { timeZone: 'Mars/Olympus' }).expect(400);
    expect(bad.body.errors[0].path).toBe('timeZone');
  });

  it('areas and takeoff: owners and office write, bookkeepers read, crew leads get 403', async () => {
    const jobId = (await createJob(owner.client, customerId, siteId)).id;
    const made = await office.client.post(`/api/jobs/${jobId}/areas`, areaBody()).expect(201);
    const areaId = (made.body as { data: { id: string } }).data.id;
    await owner.client.patch(`/api/areas/${areaId}`, { name: 'Owner edit' }).expect(200);
    for (const url of [
      `/api/areas/${areaId}`,
      `/api/jobs/${jobId}/areas`,
      `/api/jobs/${jobId}/takeoff`,
    ]) {
      await bookkeeper.client.get(url).expect(200);
      expect((await crew.client.get(url)).status).toBe(403);
    }
    await bookkeeper.client.post(`/api/jobs/${jobId}/areas`, areaBody()).expect(403);
    await bookkeeper.client.del(`/api/areas/${areaId}`).expect(403);
    await crew.client.post(`/api/jobs/${jobId}/areas`, areaBody()).expect(403);
    await office.client.del(`/api/areas/${areaId}`).expect(204);
  });

  it('locate tickets: owners and office record them, crew leads read them on site, bookkeepers get 403', async () => {
    expect(permissionTable['locate.read']).toEqual(['owner', 'office', 'crew_lead']);
    expect(permissionTable['locate.write']).toEqual(['owner', 'office']);
    const jobId = (await createJob(owner.client, customerId, siteId)).id;
    const ticket = { number: 'PERM-811', calledAt: new Date(Date.now() - 60_000).toISOString() };
    const made = await office.client.post(`/api/jobs/${jobId}/locate-tickets`, ticket).expect(201);
    const ticketId = (made.body as { data: { id: string } }).data.id;
    await owner.client.post(`/api/jobs/${jobId}/locate-tickets`, ticket).expect(201);
    const read = await crew.client.get(`/api/jobs/${jobId}/locate-tickets`).expect(200);
    expect(read.body.data).toHaveLength(2);
    await owner.client.get(`/api/jobs/${jobId}/locate-tickets`).expect(200);
    for (const res of [
      await crew.client.post(`/api/jobs/${jobId}/locate-tickets`, ticket),
      await crew.client.patch(`/api/locate-tickets/${ticketId}`, { status: 'clear' }),
      await bookkeeper.client.get(`/api/jobs/${jobId}/locate-tickets`),
      await bookkeeper.client.post(`/api/jobs/${jobId}/locate-tickets`, ticket),
      await bookkeeper.client.patch(`/api/locate-tickets/${ticketId}`, { status: 'clear' }),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('FORBIDDEN');
    }
    await office.client.patch(`/api/locate-tickets/${ticketId}`, { status: 'clear' }).expect(200);
  });

  it('estimates: owners and office write, bookkeepers read, crew leads get 403 everywhere', async () => {
    const { sequelize } = testApp();
    const jobId = (await createJob(owner.client, customerId, siteId)).id;
    await office.client.post(`/api/jobs/${jobId}/areas`, areaBody()).expect(201);
    const forbidden = async (pending: PromiseLike<{ status: number; body: { code?: string } }>) => {
      const res = await pending;
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('FORBIDDEN');
    };
    await forbidden(crew.client.post(`/api/jobs/${jobId}/estimates`, {}));
    await forbidden(bookkeeper.client.post(`/api/jobs/${jobId}/estimates`, {}));
    const made = await office.client.post(`/api/jobs/${jobId}/estimates`, {}).expect(201);
    const estimateId = (made.body as { data: { id: string } }).data.id;
    await owner.client.patch(`/api/estimates/${estimateId}`, { notes: 'Owner note' }).expect(200);
    await office.client.patch(`/api/estimates/${estimateId}`, { notes: 'Office note' }).expect(200);
    for (const url of [`/api/estimates/${estimateId}`, `/api/jobs/${jobId}/estimates`]) {
      await bookkeeper.client.get(url).expect(200);
      await forbidden(crew.client.get(url));
    }
    await forbidden(bookkeeper.client.patch(`/api/estimates/${estimateId}`, { notes: 'x' }));
    await forbidden(crew.client.patch(`/api/estimates/${estimateId}`, { notes: 'x' }));
    await forbidden(bookkeeper.client.post(`/api/estimates/${estimateId}/revisions`, {}));
    await forbidden(crew.client.post(`/api/estimates/${estimateId}/revisions`, {}));
    const rows = await selectRows(sequelize, 'SELECT notes FROM estimates WHERE job_id = ?', [
      jobId,
    ]);
    expect(rows).toEqual([{ notes: 'Office note' }]);
  });

  it('sending, revoking links and recording a paper signature: owners and office only', async () => {
    const { sequelize } = testApp();
    expect(permissionTable['estimates.send']).toEqual(['owner', 'office']);
    const jobId = (await createJob(owner.client, customerId, siteId)).id;
    await office.client.post(`/api/jobs/${jobId}/areas`, areaBody()).expect(201);
    const made = await office.client.post(`/api/jobs/${jobId}/estimates`, {}).expect(201);
    const estimateId = (made.body as { data: { id: string } }).data.id;
    const paper = { name: 'Buyer', signedAt: new Date().toISOString(), place: 'office' };
    for (const who of [bookkeeper, crew]) {
      for (const res of [
        await who.client.post(`/api/estimates/${estimateId}/send`, {}),
        await who.client.post(`/api/estimates/${estimateId}/links/revoke`, {}),
        await who.client.post(`/api/estimates/${estimateId}/acceptances`, paper),
      ]) {
        expect(res.status).toBe(403);
        expect(res.body.code).toBe('FORBIDDEN');
      }
    }
    // The PDF is read access: bookkeepers yes, crew leads no.
    expect((await crew.client.get(`/api/estimates/${estimateId}/pdf`)).status).toBe(403);
    await office.client.post(`/api/estimates/${estimateId}/send`, {}).expect(200);
    await owner.client.post(`/api/estimates/${estimateId}/links/revoke`, {}).expect(200);
    await office.client.post(`/api/estimates/${estimateId}/acceptances`, paper).expect(201);
    const rows = await selectRows(
      sequelize,
      'SELECT kind, place FROM estimate_answers WHERE estimate_id = ?',
      [estimateId],
    );
    expect(rows).toEqual([{ kind: 'accepted', place: 'office' }]);
  });
  it('invoices: owner and bookkeeper bill and record payments, office reads, crew leads nothing', async () => {
    const { sequelize } = testApp();
    expect(permissionTable['invoices.read']).toEqual(['owner', 'bookkeeper', 'office']);
    expect(permissionTable['invoices.write']).toEqual(['owner', 'bookkeeper']);
    expect(permissionTable['payments.write']).toEqual(['owner', 'bookkeeper']);
    expect(permissionTable['payments.refund']).toEqual(['owner']);
    const jobId = (await createJob(owner.client, customerId, siteId)).id;
    const body = {
      jobId,
      kind: 'progress',
      lines: [{ label: 'Base', quantity: 1, unitPriceCents: 10_000 }],
    };
    for (const who of [office, crew]) {
      const res = await who.client.post('/api/invoices', body);
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('FORBIDDEN');
    }
    const made = await bookkeeper.client.post('/api/invoices', body).expect(201);
    const invoiceId = (made.body as { data: { id: string } }).data.id;
    // Reads: owner, bookkeeper and office; crew leads 403 on every invoice route.
    for (const who of [owner, bookkeeper, office]) {
      await who.client.get('/api/invoices').expect(200);
      await who.client.get(`/api/invoices/${invoiceId}`).expect(200);
    }
    const payment = { amountCents: 100, method: 'cash', receivedOn: '2026-01-05' };
    for (const res of [
      await crew.client.get('/api/invoices'),
      await crew.client.get(`/api/invoices/${invoiceId}`),
      await crew.client.get(`/api/invoices/${invoiceId}/pdf`),
      await crew.client.post(`/api/invoices/${invoiceId}/send`, {}),
      await crew.client.post(`/api/invoices/${invoiceId}/payments`, payment),
      await crew.client.post(`/api/invoices/${invoiceId}/void`, { reason: 'x' }),
      await crew.client.post(`/api/invoices/${invoiceId}/credit-notes`, {
        amountCents: 1,
        reason: 'x',
      }),
      await office.client.post(`/api/invoices/${invoiceId}/send`, {}),
      await office.client.post(`/api/invoices/${invoiceId}/payments`, payment),
      await office.client.post(`/api/invoices/${invoiceId}/void`, { reason: 'x' }),
      await office.client.post(`/api/invoices/${invoiceId}/credit-notes`, {
        amountCents: 1,
        reason: 'x',
      }),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('FORBIDDEN');
    }
    await owner.client.post(`/api/invoices/${invoiceId}/send`, {}).expect(200);
    await bookkeeper.client.post(`/api/invoices/${invoiceId}/payments`, payment).expect(201);
    const rows = await selectRows<{ status: string; paid_cents: unknown }>(
      sequelize,
      'SELECT status, paid_cents FROM invoices WHERE id = ?',
      [invoiceId],
    );
    expect(rows.map((r) => [r.status, Number(r.paid_cents)])).toEqual([['partly_paid', 100]]);
  });

  it('payment reminders: owners and bookkeepers manage them, office reads the log, crew leads nothing', async () => {
    expect(permissionTable['reminders.manage']).toEqual(['owner', 'bookkeeper']);
    const email = 'reminded@example.test';
    const payer = await createCustomer(owner.client, { name: 'Reminded payer', email });
    const site = await createSite(owner.client, payer.id);
    const jobId = (await createJob(owner.client, payer.id, site.id)).id;
    const made = await bookkeeper.client
      .post('/api/invoices', {
        jobId,
        kind: 'progress',
        lines: [{ label: 'Work', quantity: 1, unitPriceCents: 5_000 }],
      })
      .expect(201);
    const invoiceId = (made.body as { data: { id: string } }).data.id;
    await bookkeeper.client.post(`/api/invoices/${invoiceId}/send`, {}).expect(200);
    const settings = { enabled: true, offsets: [-3, 0, 7, 14, 30] };
    for (const who of [office, crew]) {
      for (const res of [
        await who.client.get('/api/settings/reminders'),
        await who.client.put('/api/settings/reminders', settings),
        await who.client.post(`/api/invoices/${invoiceId}/reminders`, {}),
      ]) {
        expect(res.status).toBe(403);
        expect(res.body.code).toBe('FORBIDDEN');
      }
    }
    expect((await crew.client.get(`/api/invoices/${invoiceId}/reminders`)).status).toBe(403);
    await office.client.get(`/api/invoices/${invoiceId}/reminders`).expect(200);
    for (const who of [owner, bookkeeper]) {
      await who.client.get('/api/settings/reminders').expect(200);
      await who.client.put('/api/settings/reminders', settings).expect(200);
      await who.client.post(`/api/invoices/${invoiceId}/reminders`, {}).expect(201);
    }
  });
});
