/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import type { PriceBookImportPreview, PriceBookItemView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { signUpCompany } from '../../fixtures/factories.js';
import type { Client } from '../../fixtures/client.js';

const header =
  'kind,key,name,unit,packSize,price,pileHeightIn,rollWidthsFt,maxRollLengthFt,recommendedInfill,infillRateLbPerSqFt,labourBasis,isStarter';

async function allItems(client: Client): Promise<PriceBookItemView[]> {
  const res = await client.get('/api/price-book?pageSize=100').expect(200);
  return (res.body as { data: PriceBookItemView[] }).data;
}

const withoutTimes = (items: PriceBookItemView[]) =>
  items.map(({ createdAt: _c, updatedAt: _u, ...rest }) => rest);

async function snapshot(companyId: string) {
  return selectRows(
    testApp().sequelize,
    'SELECT item_key, name, price_millicents, attributes, is_starter FROM price_book_items WHERE company_id = ? ORDER BY item_key',
    [companyId],
  );
}

describe('price book CSV', () => {
  it('exports an attachment that parses back with papaparse and re-imports unchanged', async () => {
    const owner = await signUpCompany(testApp().app);
    const res = await owner.client.get('/api/price-book/export.csv').expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="?price-book\.csv"?$/,
    );
    const parsed = Papa.parse<Record<string, string>>(res.text, {
      header: true,
      skipEmptyLines: true,
    });
    const items = await allItems(owner.client);
    expect(parsed.data).toHaveLength(items.length);
    const turf = parsed.data.find((row) => row.key === 'turf-landscape-175');
    expect(turf).toMatchObject({
      kind: 'turf',
      price: '2.40',
      rollWidthsFt: '15;12',
      isStarter: 'yes',
    });

    const before = await snapshot(owner.me.company.id);
    const preview = await owner.client
      .post('/api/price-book/import', { csv: res.text, dryRun: true })
      .expect(200);
    const body = preview.body.data as PriceBookImportPreview;
    expect(body.summary).toEqual({
      total: items.length,
      create: 0,
      update: items.length,
      withErrors: 0,
    });
    expect(body.imported).toBe(false);
    const done = await owner.client
      .post('/api/price-book/import', { csv: res.text, dryRun: false })
      .expect(200);
    expect(done.body.data.imported).toBe(true);
    expect(withoutTimes(await allItems(owner.client))).toEqual(withoutTimes(items));
    expect(await snapshot(owner.me.company.id)).toEqual(before);
  });

  it('previews per-row errors by column, and refuses the whole file with nothing written', async () => {
    const owner = await signUpCompany(testApp().app);
    const csv = [
      header,
      'turf,turf-new-200,New turf 2 in,sq ft,,3.10,2,15;12,100,Silica sand,1.5,,no',
      'material,base-stone,Crushed base stone,ton,,41.5,,,,,,,no',
      'labour,labour-day,Day rate,day,,abc,,,,,,per_day,no',
      'turf,turf-bad,Bad turf,sq ft,,2,,,100,,,,no',
      'material,turf-new-200,Duplicate,bag,50,1,,,,,,,no',
    ].join('\n');
    const before = await snapshot(owner.me.company.id);
    const preview = await owner.client
      .post('/api/price-book/import', { csv, dryRun: true })
      .expect(200);
    const rows = (preview.body.data as PriceBookImportPreview).rows;
    expect(rows.map((r) => [r.line, r.action])).toEqual([
      [2, 'create'],
      [3, 'update'],
      [4, 'create'],
      [5, 'create'],
      [6, 'create'],
    ]);
    expect(rows[0]!.errors).toEqual([]);
    expect(rows[0]!.item).toMatchObject({
      priceMillicents: 310_000,
      attributes: { rollWidthsFt: [15, 12] },
    });
    expect(rows[1]!.item?.priceMillicents).toBe(4_150_000);
    expect(rows[2]!.errors.map((e) => e.field).sort()).toEqual(['labourBasis', 'price']);
    expect(rows[3]!.errors.map((e) => e.field).sort()).toEqual(['pileHeightIn', 'rollWidthsFt']);
    expect(rows[4]!.errors).toEqual([
      { field: 'key', message: '"turf-new-200" is already on line 2' },
    ]);
    expect(preview.body.data.summary).toMatchObject({
      total: 5,
      create: 4,
      update: 1,
      withErrors: 3,
    });

    const refused = await owner.client
      .post('/api/price-book/import', { csv, dryRun: false })
      .expect(422);
    expect(refused.body.code).toBe('UNPROCESSABLE');
    expect(refused.body.errors.map((e: { path: string }) => e.path)).toContain('line 4: price');
    expect(await snapshot(owner.me.company.id)).toEqual(before);
  });

  it('writes a clean file in one go, updating by key and creating the rest', async () => {
    const owner = await signUpCompany(testApp().app);
    const csv = [
      header,
      'turf,turf-new-200,New turf 2 in,sq ft,,3.12345,2,15,100,,,,no',
      'material,base-stone,Crushed base stone,ton,,41.5,,,,,,,no',
    ].join('\r\n');
    const count = (await allItems(owner.client)).length;
    await owner.client.post('/api/price-book/import', { csv, dryRun: false }).expect(200);
    const items = await allItems(owner.client);
    expect(items).toHaveLength(count + 1);
    expect(items.find((i) => i.key === 'turf-new-200')?.priceMillicents).toBe(312_345);
    expect(items.find((i) => i.key === 'base-stone')).toMatchObject({
      priceMillicents: 4_150_000,
      isStarter: false,
    });
  });

  it('refuses a file without the needed columns (422 naming them) and a bad body (400)', async () => {
    const owner = await signUpCompany(testApp().app);
    const res = await owner.client
      .post('/api/price-book/import', { csv: 'name,unit\nA,B', dryRun: true })
      .expect(422);
    expect(res.body.detail).toContain('"kind"');
    const bad = await owner.client.post('/api/price-book/import', { csv: 'x' }).expect(400);
    expect(bad.body.detail).toContain('dryRun');
  });
});
