/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
import { beforeAll, describe, expect, it } from 'vitest';
import { executeSql } from '@seamwright/api';
import type { JobView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import {
  createCustomer,
  createJob,
  createSite,
  moveJob,
  signUpCompany,
} from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';

const titles = (body: unknown) => (body as { data: JobView[] }).data.map((j) => j.title);

describe('jobs list', () => {
  let owner: SignedIn;

  beforeAll(async () => {
    const { app, sequelize } = testApp();
    owner = await signUpCompany(app);
    const fenwick = await createCustomer(owner.client, { name: 'Marlow Fenwick' });
    const fenwickSite = await createSite(owner.client, fenwick.id, {
      addressLine1: '8 Heron Row',
      city: 'Ashgrove',
    });
    const quill = await createCustomer(owner.client, { name: 'Ida Quill' });
    const quillSite = await createSite(owner.client, quill.id, {
      addressLine1: '41 Kestrel Close',
      city: 'Brindle',
      label: 'Rental cottage',
    });
    const front = await createJob(owner.client, fenwick.id, fenwickSite.id, 'Front lawn');
    const dogRun = await createJob(owner.client, fenwick.id, fenwickSite.id, 'Dog run 100%_');
    const green = await createJob(owner.client, quill.id, quillSite.id, 'Putting green');
    await moveJob(owner.client, dogRun.id, ['estimated']);
    await moveJob(owner.client, green.id, ['estimated', 'accepted']);
    // Fixed created dates so the date range is testable.
    for (const [id, at] of [
      [front.id, '2026-03-01 10:00:00'],
      [dogRun.id, '2026-03-15 23:30:00'],
      [green.id, '2026-04-02 08:00:00'],
    ] as const)
      await executeSql(sequelize, 'UPDATE jobs SET created_at = ? WHERE id = ?', [at, id]);
  });

  it('lists newest first with customer and site summaries and paging meta', async () => {
    const res = await owner.client.get('/api/jobs').expect(200);
    expect(titles(res.body)).toEqual(['Putting green', 'Dog run 100%_', 'Front lawn']);
    expect(res.body.meta).toEqual({ page: 1, pageSize: 25, total: 3 });
    expect(res.body.data[0]).toMatchObject({
      status: 'accepted',
      customer: { name: 'Ida Quill' },
      site: { addressLine1: '41 Kestrel Close', label: 'Rental cottage' },
    });
  });

  it.each([
    ['status=estimated', ['Dog run 100%_']],
    ['status=lead&status=accepted', ['Putting green', 'Front lawn']],
    ['status=lead,estimated', ['Dog run 100%_', 'Front lawn']],
    ['status=paid', []],
    ['q=front', ['Front lawn']],
    ['q=fenwick', ['Dog run 100%_', 'Front lawn']],
    ['q=kestrel', ['Putting green']],
    ['q=brindle', ['Putting green']],
    ['q=cottage', ['Putting green']],
    ['q=100%25_', ['Dog run 100%_']],
    ['q=%25', ['Dog run 100%_']],
    ['from=2026-03-15', ['Putting green', 'Dog run 100%_']],
    ['to=2026-03-15', ['Dog run 100%_', 'Front lawn']],
    ['from=2026-03-02&to=2026-04-01', ['Dog run 100%_']],
    ['q=fenwick&status=lead', ['Front lawn']],
    ['sort=title', ['Dog run 100%_', 'Front lawn', 'Putting green']],
    ['sort=-title', ['Putting green', 'Front lawn', 'Dog run 100%_']],
    ['sort=createdAt', ['Front lawn', 'Dog run 100%_', 'Putting green']],
  ])('?%s → %j', async (query, expected) => {
    const res = await owner.client.get(`/api/jobs?${query}`).expect(200);
    expect(titles(res.body)).toEqual(expected);
    expect(res.body.meta.total).toBe(expected.length);
  });

  it('pages with a total that ignores the page', async () => {
    const first = await owner.client.get('/api/jobs?pageSize=2&page=1').expect(200);
    const second = await owner.client.get('/api/jobs?pageSize=2&page=2').expect(200);
    expect(titles(first.body)).toEqual(['Putting green', 'Dog run 100%_']);
    expect(titles(second.body)).toEqual(['Front lawn']);
    expect(second.body.meta).toEqual({ page: 2, pageSize: 2, total: 3 });
    // Past the end there is no row to carry the total, so it is counted on its own.
    const past = await owner.client.get('/api/jobs?pageSize=2&page=5').expect(200);
    expect(past.body).toEqual({ data: [], meta: { page: 5, pageSize: 2, total: 3 } });
    const search = await owner.client.get('/api/jobs?q=fenwick&pageSize=1').expect(200);
    expect(search.body.meta.total).toBe(2);
  });

  it.each([
    ['status=done', 'status'],
    ['from=yesterday', 'from'],
    ['to=2026-13-01', 'to'],
    ['from=2026-04-02&to=2026-04-01', 'to'],
    ['sort=price', 'sort'],
    ['pageSize=500', 'pageSize'],
  ])('?%s is a 400 naming %s', async (query, field) => {
    const res = await owner.client.get(`/api/jobs?${query}`).expect(400);
    expect(res.body.errors.map((e: { path: string }) => e.path.split('.')[0])).toEqual([field]);
  });

  it('reads a list page in 2 and a job page in 3 statements, the session with its membership included', async () => {
    const { sequelize } = testApp();
    const jobId = ((await owner.client.get('/api/jobs').expect(200)).body.data[0] as JobView).id;
    const statements: string[] = [];
    // Sequelize reads `options.logging` for every statement it sends (session store included);
    // the property is not in its public types.
    const options = (sequelize as unknown as { options: { logging: unknown } }).options;
    const previous = options.logging;
    options.logging = (sql: string) => statements.push(sql);
    const selects = () => statements.filter((sql) => /^Executing \(\w+\): SELECT/.test(sql));
    try {
      await owner.client.get('/api/jobs?q=fenwick&status=lead').expect(200);
      const list = selects().length;
      statements.length = 0;
      await owner.client.get(`/api/jobs/${jobId}`).expect(200);
      const detail = selects().length;
      // The session joined with the membership (one), then the page with its total (one) or
      // the job and its activity (two); a plain read writes nothing.
      expect({ list, detail }).toEqual({ list: 2, detail: 3 });
      expect(statements.length).toBe(3);
    } finally {
      options.logging = previous;
    }
  });
});
