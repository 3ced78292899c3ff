/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
// Expected assignments are worked by hand from the ranking in packages/takeoff/README.md
// ("Reservation search": least short, then most from remnants, then least scrap, then fewest
// rolls cut; one dye lot per product because lots differ in colour, TRADE.md §1).
import { beforeEach, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { moveJob, signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import {
  acceptedJobNeedingTwentyFootPieces,
  addRemnant,
  landscapeTurfId,
  receiveRolls,
  reserve,
} from '../../fixtures/stock.js';

const rollRow = async (id: string) =>
  (
    await selectRows<{ remaining_ft: number; held_ft: number }>(
      testApp().sequelize,
      'SELECT remaining_ft, held_ft FROM rolls WHERE id = ?',
      [id],
    )
  )[0];

const reservationRows = (jobId: string) =>
  selectRows<{ status: string; dye_lot: string }>(
    testApp().sequelize,
    'SELECT status, dye_lot FROM turf_reservations WHERE job_id = ?',
    [jobId],
  );

describe('reserving a job’s turf on one dye lot', () => {
  let team: Team;
  let turfId: string;

  beforeEach(async () => {
    // A company of its own per test: the stock is exactly what the test receives.
    team = await signUpTeam(testApp().app);
    turfId = await landscapeTurfId(team.owner.client);
  });

  it('takes the lot whose remnant fits, and holds the pieces on its rolls', async () => {
    const [lotA] = await receiveRolls(team.office.client, turfId, 'A', [100]);
    const [lotB] = await receiveRolls(team.office.client, turfId, 'B', [30]);
    const remnant = await addRemnant(team.office.client, turfId, 'B', 22);
    const jobId = await acceptedJobNeedingTwentyFootPieces(team.office.client, turfId);

    const res = await team.office.client.post(`/api/jobs/${jobId}/reservations`, {}).expect(201);
    const data = res.body.data;
    // Both lots hold 2 × 20 ft; lot B cuts 20 ft from its remnant (remnants first).
    expect(data).toMatchObject({ dyeLot: 'B', shortFt: 0, status: 'held' });
    expect(data.allocations).toHaveLength(2);
    expect(
      data.allocations
        .map((a: { rollId: string; lengthFt: number }) => [a.rollId, a.lengthFt])
        .sort(),
    ).toEqual(
      [
        [lotB!.id, 20],
        [remnant.id, 20],
      ].sort(),
    );
    expect(await rollRow(lotB!.id)).toMatchObject({ remaining_ft: 30, held_ft: 20 });
    expect(await rollRow(remnant.id)).toMatchObject({ held_ft: 20 });
    expect(await rollRow(lotA!.id)).toMatchObject({ held_ft: 0 });
    const listed = await team.owner.client.get(`/api/rolls?dyeLot=B`).expect(200);
    const roll = listed.body.data.find((r: { id: string }) => r.id === lotB!.id);
    expect(roll).toMatchObject({ heldFt: 20, availableFt: 10 });
    const read = await team.bookkeeper.client.get(`/api/jobs/${jobId}/reservations`).expect(200);
    expect(read.body.data.allocations).toHaveLength(2);
  });

  it('never mixes lots: two lots that only hold the job together are refused with what to order', async () => {
    await receiveRolls(team.office.client, turfId, 'A', [25]);
    await receiveRolls(team.office.client, turfId, 'B', [25]);
    const jobId = await acceptedJobNeedingTwentyFootPieces(team.office.client, turfId);
    const res = await team.office.client.post(`/api/jobs/${jobId}/reservations`, {}).expect(409);
    expect(res.body.detail).toMatch(/no single dye lot/);
    expect(res.body.errors[0].path).toBe('stock');
    expect(res.body.detail).toMatch(/order 20 ft of 15 ft wide/);
    expect(await reservationRows(jobId)).toEqual([]);

    // Asked to hold what there is: one lot's roll takes one piece, the other is to order.
    const held = await reserve(team.office.client, jobId, { allowShort: true });
    expect(held.shortFt).toBe(20);
    expect(held.allocations).toHaveLength(1);
    expect(held.products[0]?.toOrder).toEqual([{ widthFt: 15, lengthFt: 20 }]);
  });

  it('answers 409 when the product has no stock at all, naming it', async () => {
    const jobId = await acceptedJobNeedingTwentyFootPieces(team.office.client, turfId);
    const res = await team.office.client.post(`/api/jobs/${jobId}/reservations`, {}).expect(409);
    expect(res.body.detail).toMatch(/has no rolls in stock: order 40 ft of 15 ft wide/);
  });

  it('refuses a job that is not sold yet, naming its status', async () => {
    await receiveRolls(team.office.client, turfId, 'A', [100]);
    const jobId = await acceptedJobNeedingTwentyFootPieces(team.office.client, turfId);
    await moveJob(team.office.client, jobId, ['cancelled']);
    const res = await team.office.client.post(`/api/jobs/${jobId}/reservations`, {}).expect(409);
    expect(res.body.errors[0].path).toBe('status');
    expect(res.body.detail).toMatch(/cancelled/i);
  });

  it('replaces the job’s reservation when asked again, without holding twice', async () => {
    const [roll] = await receiveRolls(team.office.client, turfId, 'A', [100]);
    const jobId = await acceptedJobNeedingTwentyFootPieces(team.office.client, turfId);
    await reserve(team.office.client, jobId);
    await reserve(team.office.client, jobId);
    expect(await rollRow(roll!.id)).toMatchObject({ held_ft: 40 });
    expect(await reservationRows(jobId)).toHaveLength(1);
  });

  it('gives the turf back when the job is cancelled, or released by the office', async () => {
    const [roll] = await receiveRolls(team.office.client, turfId, 'A', [100]);
    const first = await acceptedJobNeedingTwentyFootPieces(team.office.client, turfId);
    const second = await acceptedJobNeedingTwentyFootPieces(team.office.client, turfId);
    await reserve(team.office.client, first);
    await reserve(team.office.client, second);
    expect(await rollRow(roll!.id)).toMatchObject({ held_ft: 80 });
    await moveJob(team.office.client, first, ['cancelled']);
    expect(await rollRow(roll!.id)).toMatchObject({ held_ft: 40 });
    expect(await reservationRows(first)).toEqual([]);
    await team.office.client.del(`/api/jobs/${second}/reservations`).expect(204);
    expect(await rollRow(roll!.id)).toMatchObject({ held_ft: 0, remaining_ft: 100 });
  });

  it('cuts the held pieces when the crew starts, and takes remnants back in the same lot', async () => {
    const [roll] = await receiveRolls(team.office.client, turfId, 'A', [100]);
    const jobId = await acceptedJobNeedingTwentyFootPieces(team.office.client, turfId);
    await reserve(team.office.client, jobId);
    await moveJob(team.office.client, jobId, ['scheduled', 'in_progress']);
    expect(await rollRow(roll!.id)).toMatchObject({ held_ft: 0, remaining_ft: 60 });
    expect(await reservationRows(jobId)).toEqual([{ status: 'cut', dye_lot: 'A' }]);
    const again = await team.office.client.post(`/api/jobs/${jobId}/reservations`, {}).expect(409);
    expect(again.body.errors[0].path).toBe('status');

    const bad = await team.office.client
      .post(`/api/jobs/${jobId}/remnants`, {
        remnants: [
          { rollId: roll!.id, lengthFt: 6 },
          { rollId: '00000000-0000-4000-8000-000000000000', lengthFt: 3 },
        ],
      })
      .expect(400);
    expect(bad.body.errors[0].path).toBe('remnants.1.rollId');
    const before = await team.owner.client.get('/api/rolls?kind=remnant').expect(200);
    expect(before.body.data).toEqual([]);

    const res = await team.office.client
      .post(`/api/jobs/${jobId}/remnants`, { remnants: [{ rollId: roll!.id, lengthFt: 6 }] })
      .expect(201);
    expect(res.body.data[0]).toMatchObject({
      dyeLot: 'A',
      widthFt: 15,
      lengthFt: 6,
      isRemnant: true,
      sourceJobId: jobId,
    });
  });

  it('never holds the same length twice when two jobs reserve at the same moment', async () => {
    const [roll] = await receiveRolls(team.office.client, turfId, 'A', [50]);
    const jobs = await Promise.all([
      acceptedJobNeedingTwentyFootPieces(team.office.client, turfId),
      acceptedJobNeedingTwentyFootPieces(team.owner.client, turfId),
    ]);
    // 50 ft holds one job's 2 × 20 ft, not both: one is held, the other told to order.
    const answers = await Promise.all([
      team.office.client.post(`/api/jobs/${jobs[0]}/reservations`, {}),
      team.owner.client.post(`/api/jobs/${jobs[1]}/reservations`, {}),
    ]);
    expect(answers.map((a) => a.status).sort()).toEqual([201, 409]);
    expect(await rollRow(roll!.id)).toMatchObject({ held_ft: 40, remaining_ft: 50 });
  });

  it('keeps reservations from crew leads and bookkeepers’ writes', async () => {
    const jobId = await acceptedJobNeedingTwentyFootPieces(team.office.client, turfId);
    await team.crew.client.get(`/api/jobs/${jobId}/reservations`).expect(403);
    await team.crew.client.post(`/api/jobs/${jobId}/reservations`, {}).expect(403);
    await team.bookkeeper.client.post(`/api/jobs/${jobId}/reservations`, {}).expect(403);
    await team.bookkeeper.client.del(`/api/jobs/${jobId}/reservations`).expect(403);
    const none = await team.bookkeeper.client.get(`/api/jobs/${jobId}/reservations`).expect(200);
    expect(none.body.data).toMatchObject({ status: null, allocations: [], shortFt: 0 });
  });
});
