/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
import { beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import type { JobDetailView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import {
  createCustomer,
  createJob,
  createSite,
  signUpCompany,
  signUpTeam,
} from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';

describe('jobs', () => {
  let owner: SignedIn;
  let office: SignedIn;
  let bookkeeper: SignedIn;
  let crew: SignedIn;
  let customerId: string;
  let siteId: string;

  beforeAll(async () => {
    const { app } = testApp();
    ({ owner, office, bookkeeper, crew } = await signUpTeam(app));
    customerId = (await createCustomer(owner.client, { name: 'Marlow Fenwick' })).id;
    siteId = (await createSite(owner.client, customerId, { addressLine1: '8 Heron Row' })).id;
  });

  it('creates a lead with customer and site summaries, reads it and renames it', async () => {
    const res = await office.client
      .post('/api/jobs', { customerId, siteId, title: '  Back lawn and dog run ' })
      .expect(201);
    const job = res.body.data as JobDetailView;
    expect(job).toMatchObject({
      status: 'lead',
      title: 'Back lawn and dog run',
      customerId,
      siteId,
      customer: { id: customerId, name: 'Marlow Fenwick' },
      site: { id: siteId, addressLine1: '8 Heron Row', city: 'Quillmere' },
      allowedNextStatuses: ['estimated', 'lost', 'cancelled'],
    });
    expect(job.activity.map((a) => a.action)).toEqual(['job.created']);
    expect(job.activity[0]?.userName).toBe('Test office');

    const renamed = await office.client
      .patch(`/api/jobs/${job.id}`, { title: 'Back lawn, dog run and putting green' })
      .expect(200);
    expect(renamed.body.data.title).toBe('Back lawn, dog run and putting green');
    const read = await bookkeeper.client.get(`/api/jobs/${job.id}`).expect(200);
    expect(read.body.data.activity.map((a: { action: string }) => a.action)).toEqual([
      'job.renamed',
      'job.created',
    ]);
    expect(read.body.data.activity[0].data).toEqual({
      from: 'Back lawn and dog run',
      to: 'Back lawn, dog run and putting green',
    });
  });

  it('lets owner and office write, the bookkeeper read only, and crew leads nothing (403)', async () => {
    const job = await createJob(owner.client, customerId, siteId);
    await bookkeeper.client.get('/api/jobs').expect(200);
    await bookkeeper.client.get(`/api/jobs/${job.id}`).expect(200);
    await bookkeeper.client.post('/api/jobs', { customerId, siteId, title: 'No' }).expect(403);
    await bookkeeper.client.patch(`/api/jobs/${job.id}`, { status: 'estimated' }).expect(403);
    for (const res of [
      await crew.client.get('/api/jobs'),
      await crew.client.get(`/api/jobs/${job.id}`),
      await crew.client.post('/api/jobs', { customerId, siteId, title: 'No' }),
      await crew.client.patch(`/api/jobs/${job.id}`, { title: 'No' }),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('FORBIDDEN');
    }
    await owner.client.patch(`/api/jobs/${job.id}`, { status: 'estimated' }).expect(200);
  });

  it('answers 404 naming the field for an unknown customer or a site of another customer or company, and saves nothing', async () => {
    const { app, sequelize } = testApp();
    const otherCustomer = await createCustomer(owner.client);
    const otherSite = await createSite(owner.client, otherCustomer.id);
    const stranger = await signUpCompany(app);
    const strangerCustomer = await createCustomer(stranger.client);
    const strangerSite = await createSite(stranger.client, strangerCustomer.id);
    const count = async () =>
      Number(
        (
          await selectRows(sequelize, 'SELECT COUNT(*) AS n FROM jobs WHERE company_id = ?', [
            owner.me.company.id,
          ])
        )[0]?.n,
      );
    const before = await count();

    const cases = [
      [{ customerId: '00000000-0000-4000-8000-000000000000', siteId }, 'customerId'],
      [{ customerId, siteId: otherSite.id }, 'siteId'],
      [{ customerId, siteId: strangerSite.id }, 'siteId'],
      [{ customerId: strangerCustomer.id, siteId: strangerSite.id }, 'customerId'],
    ] as const;
    for (const [body, field] of cases) {
      const res = await office.client.post('/api/jobs', { ...body, title: 'Nope' }).expect(404);
      expect(res.body.code).toBe('NOT_FOUND');
      expect(res.body.errors.map((e: { path: string }) => e.path)).toEqual([field]);
    }
    expect(await count()).toEqual(before);
  });

  it('answers 400 naming each bad field and saves nothing', async () => {
    const { sequelize } = testApp();
    const count = async () =>
      Number((await selectRows(sequelize, 'SELECT COUNT(*) AS n FROM jobs'))[0]?.n);
    const before = await count();
    const missingTitle = await office.client.post('/api/jobs', { customerId, siteId }).expect(400);
    expect(missingTitle.body.errors).toEqual([{ path: 'title', message: 'Title is required' }]);
    const blank = await office.client
      .post('/api/jobs', { customerId: 'abc', siteId: 7, title: '   ' })
      .expect(400);
    expect(blank.body.errors.map((e: { path: string }) => e.path).sort()).toEqual([
      'customerId',
      'siteId',
      'title',
    ]);
    const job = await createJob(office.client, customerId, siteId);
    const badStatus = await office.client
      .patch(`/api/jobs/${job.id}`, { status: 'done' })
      .expect(400);
    expect(badStatus.body.errors.map((e: { path: string }) => e.path)).toEqual(['status']);
    await office.client.patch(`/api/jobs/${job.id}`, { title: '' }).expect(400);
    await office.client.patch(`/api/jobs/${job.id}`, {}).expect(400);
    await office.client.get('/api/jobs/not-a-uuid').expect(404);
    await office.client.get('/api/jobs/00000000-0000-4000-8000-000000000000').expect(404);
    // Only the one job made on purpose above.
    expect(await count()).toBe(before + 1);
  });

  it('refuses to delete a customer or site that has jobs (409), leaving both in place', async () => {
    const customer = await createCustomer(owner.client);
    const site = await createSite(owner.client, customer.id);
    await createJob(owner.client, customer.id, site.id);
    const res = await owner.client.del(`/api/customers/${customer.id}`).expect(409);
    expect(res.body.detail).toMatch(/has jobs/);
    await owner.client.del(`/api/sites/${site.id}`).expect(409);
    await owner.client.get(`/api/customers/${customer.id}`).expect(200);
    await owner.client.get(`/api/sites/${site.id}`).expect(200);
  });
});
