/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
import { beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import type { PriceBookItemView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';

const turf = {
  kind: 'turf',
  key: 'turf-test-150',
  name: 'Test turf 1½ in',
  unit: 'sq ft',
  packSize: null,
  priceMillicents: 212_500,
  attributes: {
    pileHeightIn: 1.5,
    rollWidthsFt: [15, 12],
    maxRollLengthFt: 100,
    recommendedInfill: 'Silica sand',
    infillRateLbPerSqFt: 1.5,
  },
};

async function countItems(companyId: string): Promise<number> {
  const [row] = await selectRows<{ n: number }>(
    testApp().sequelize,
    'SELECT COUNT(*) AS n FROM price_book_items WHERE company_id = ?',
    [companyId],
  );
  return Number(row?.n);
}

describe('price book', () => {
  let owner: SignedIn;
  let office: SignedIn;
  let bookkeeper: SignedIn;
  let crew: SignedIn;

  beforeAll(async () => {
    const { app } = testApp();
    ({ owner, office, bookkeeper, crew } = await signUpTeam(app));
  });

  it('gives a freshly signed-up company the invented starter price book, marked as starter', async () => {
    const res = await owner.client.get('/api/price-book?pageSize=100').expect(200);
    const items = res.body.data as PriceBookItemView[];
    expect(res.body.meta.total).toBeGreaterThanOrEqual(10);
    expect(items.every((item) => item.isStarter)).toBe(true);
    const kinds = new Set(items.map((item) => item.kind));
    expect([...kinds].sort()).toEqual(['disposal', 'equipment', 'labour', 'material', 'turf']);
    const labourBases = items.filter((i) => i.kind === 'labour').map((i) => i.attributes);
    expect(labourBases).toEqual(
      expect.arrayContaining([
        { basis: 'per_sq_ft' },
        { basis: 'per_seam_ft' },
        { basis: 'per_hour' },
      ]),
    );
  });

  it('filters by kind, searches and pages', async () => {
    const labour = await owner.client.get('/api/price-book?kind=labour').expect(200);
    expect(labour.body.data.every((i: PriceBookItemView) => i.kind === 'labour')).toBe(true);
    const search = await owner.client.get('/api/price-book?q=compactor').expect(200);
    expect(search.body.data.map((i: PriceBookItemView) => i.key)).toEqual(['plate-compactor']);
    const page = await owner.client.get('/api/price-book?pageSize=2&page=2').expect(200);
    expect(page.body.data).toHaveLength(2);
    expect(page.body.meta).toMatchObject({ page: 2, pageSize: 2 });
    await owner.client.get('/api/price-book?kind=gold').expect(400);
  });

  it('creates, edits (a new price is no longer a starter price) and deletes an item', async () => {
    const created = await office.client.post('/api/price-book', turf).expect(201);
    const item = created.body.data as PriceBookItemView;
    expect(item).toMatchObject({ ...turf, isStarter: false });

    const [starter] = (await owner.client.get('/api/price-book?q=landscape-175').expect(200)).body
      .data as PriceBookItemView[];
    const edited = await owner.client
      .patch(`/api/price-book/${starter!.id}`, { priceMillicents: 255_000 })
      .expect(200);
    expect(edited.body.data).toMatchObject({ priceMillicents: 255_000, isStarter: false });

    const renamed = await owner.client
      .patch(`/api/price-book/${item.id}`, {
        name: 'Renamed turf',
        attributes: { ...turf.attributes, rollWidthsFt: [13] },
      })
      .expect(200);
    expect(renamed.body.data.attributes.rollWidthsFt).toEqual([13]);

    await owner.client.post('/api/price-book', turf).expect(409);
    await owner.client.del(`/api/price-book/${item.id}`).expect(204);
    await owner.client.del(`/api/price-book/${item.id}`).expect(404);
  });

  it('refuses bad input naming the field, and writes nothing', async () => {
    const before = await countItems(owner.me.company.id);
    const bad = await owner.client
      .post('/api/price-book', {
        ...turf,
        key: 'bad-one',
        attributes: { ...turf.attributes, rollWidthsFt: [] },
      })
      .expect(400);
    expect(bad.body.code).toBe('VALIDATION_FAILED');
    expect(bad.body.errors.map((e: { path: string }) => e.path)).toContain(
      'attributes.rollWidthsFt',
    );
    const money = await owner.client
      .post('/api/price-book', { ...turf, key: 'bad-two', priceMillicents: 1.5 })
      .expect(400);
    expect(money.body.detail).toContain('priceMillicents');
    const labour = await owner.client
      .post('/api/price-book', {
        kind: 'labour',
        key: 'l',
        name: 'L',
        unit: 'h',
        packSize: null,
        priceMillicents: 1,
        attributes: { basis: 'per_day' },
      })
      .expect(400);
    expect(labour.body.detail).toContain('attributes.basis');

    const [starter] = (await owner.client.get('/api/price-book?kind=turf').expect(200)).body
      .data as PriceBookItemView[];
    const patch = await owner.client
      .patch(`/api/price-book/${starter!.id}`, { attributes: { pileHeightIn: -1 } })
      .expect(400);
    expect(patch.body.detail).toContain('attributes.');
    const unchanged = await owner.client.get('/api/price-book?kind=turf').expect(200);
    expect(unchanged.body.data[0]).toEqual(starter);
    expect(await countItems(owner.me.company.id)).toBe(before);
  });

  it('lets bookkeepers read but not write, and gives crew leads 403 on every route', async () => {
    const [item] = (await owner.client.get('/api/price-book').expect(200)).body
      .data as PriceBookItemView[];
    await bookkeeper.client.get('/api/price-book').expect(200);
    await bookkeeper.client.get('/api/price-book/export.csv').expect(200);
    await bookkeeper.client.post('/api/price-book', { ...turf, key: 'bk' }).expect(403);
    await bookkeeper.client.patch(`/api/price-book/${item!.id}`, { name: 'No' }).expect(403);
    await bookkeeper.client.del(`/api/price-book/${item!.id}`).expect(403);
    await bookkeeper.client
      .post('/api/price-book/import', { csv: 'kind', dryRun: true })
      .expect(403);
    for (const res of [
      await crew.client.get('/api/price-book'),
      await crew.client.get('/api/price-book/export.csv'),
      await crew.client.post('/api/price-book', { ...turf, key: 'crew' }),
      await crew.client.patch(`/api/price-book/${item!.id}`, { name: 'No' }),
      await crew.client.del(`/api/price-book/${item!.id}`),
      await crew.client.post('/api/price-book/import', { csv: 'kind', dryRun: true }),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('FORBIDDEN');
    }
  });
});
