/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
import { beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { priceItemOfKind } from '../../fixtures/areas.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { landscapeTurfId, receiveRolls } from '../../fixtures/stock.js';

const rollCount = async (productId: string) =>
  Number(
    (
      await selectRows<{ n: number }>(
        testApp().sequelize,
        'SELECT COUNT(*) AS n FROM rolls WHERE turf_product_id = ?',
        [productId],
      )
    )[0]?.n,
  );

describe('roll stock', () => {
  let team: Team;
  let turfId: string;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    turfId = await landscapeTurfId(team.owner.client);
  });

  it('receives a delivery of one dye lot and lists each roll with its free length', async () => {
    const made = await receiveRolls(team.office.client, turfId, 'LOT-2291', [100, 100, 75]);
    expect(made).toHaveLength(3);
    expect(made[0]).toMatchObject({
      dyeLot: 'LOT-2291',
      widthFt: 15,
      lengthFt: 100,
      remainingFt: 100,
      heldFt: 0,
      availableFt: 100,
      isRemnant: false,
      location: 'Yard rack A',
      turfProductName: expect.any(String),
    });
    const list = await team.bookkeeper.client
      .get(`/api/rolls?turfProductId=${turfId}&dyeLot=LOT-2291`)
      .expect(200);
    expect(list.body.meta.total).toBe(3);
    // Longest first within a lot.
    expect(list.body.data.map((r: { lengthFt: number }) => r.lengthFt)).toEqual([100, 100, 75]);
    const remnants = await team.owner.client.get('/api/rolls?kind=remnant').expect(200);
    expect(remnants.body.data).toEqual([]);
  });

  it('refuses a delivery with a width the product does not come in, and saves none of it', async () => {
    const before = await rollCount(turfId);
    const res = await team.office.client
      .post('/api/rolls/deliveries', {
        turfProductId: turfId,
        dyeLot: 'LOT-9',
        rolls: [
          { widthFt: 15, lengthFt: 100 },
          { widthFt: 13, lengthFt: 100 },
        ],
      })
      .expect(400);
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(res.body.errors[0].path).toBe('rolls.1.widthFt');
    expect(res.body.detail).toMatch(/15 ft or 12 ft widths/);
    expect(await rollCount(turfId)).toBe(before);
  });

  it.each([
    [{ dyeLot: '', widthFt: 15, lengthFt: 10 }, 'dyeLot'],
    [{ dyeLot: 'L', widthFt: 15, lengthFt: -4 }, 'lengthFt'],
    [{ dyeLot: 'L', widthFt: 'wide', lengthFt: 10 }, 'widthFt'],
    [{ dyeLot: 'L', widthFt: 15, lengthFt: 10, receivedOn: '14/03/2026' }, 'receivedOn'],
  ])('names the bad field of a new roll: %j → %s', async (body, path) => {
    const res = await team.office.client
      .post('/api/rolls', { turfProductId: turfId, ...body })
      .expect(400);
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(path);
  });

  it('refuses a price-book item that is not turf', async () => {
    const material = await priceItemOfKind(team.owner.client, 'material');
    const res = await team.office.client
      .post('/api/rolls', { turfProductId: material, dyeLot: 'L', widthFt: 15, lengthFt: 10 })
      .expect(400);
    expect(res.body.errors[0].path).toBe('turfProductId');
  });

  it('corrects a roll, and hides an archived or used-up roll unless asked', async () => {
    const [roll] = await receiveRolls(team.office.client, turfId, 'LOT-CORR', [60]);
    const patched = await team.office.client
      .patch(`/api/rolls/${roll!.id}`, { remainingFt: 42.5, location: 'Truck 2' })
      .expect(200);
    expect(patched.body.data).toMatchObject({
      remainingFt: 42.5,
      availableFt: 42.5,
      location: 'Truck 2',
    });
    await team.office.client.patch(`/api/rolls/${roll!.id}`, { archived: true }).expect(200);
    const hidden = await team.owner.client.get('/api/rolls?dyeLot=LOT-CORR').expect(200);
    expect(hidden.body.data).toEqual([]);
    const shown = await team.owner.client
      .get('/api/rolls?dyeLot=LOT-CORR&includeEmpty=true')
      .expect(200);
    expect(shown.body.data[0]).toMatchObject({ id: roll!.id, archived: true });
    const empty = await team.office.client.patch(`/api/rolls/${roll!.id}`, {}).expect(400);
    expect(empty.body.detail).toMatch(/Nothing to change/);
  });

  it('lets every role read stock; only owners and office change it', async () => {
    await team.crew.client.get('/api/rolls').expect(200);
    await team.bookkeeper.client.get('/api/rolls').expect(200);
    const body = { turfProductId: turfId, dyeLot: 'L', widthFt: 15, lengthFt: 10 };
    await team.crew.client.post('/api/rolls', body).expect(403);
    await team.bookkeeper.client.post('/api/rolls', body).expect(403);
    await team.crew.client
      .post('/api/rolls/deliveries', { ...body, rolls: [{ widthFt: 15, lengthFt: 10 }] })
      .expect(403);
  });
});
