/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
// Who may see and change bookings: owners and office write; crew leads read only the bookings
// of crews they are on, with no money in the answer; bookkeepers get 403.
import { beforeAll, describe, expect, it } from 'vitest';
import type { BookingView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { acceptedJob, createCrew } from '../../fixtures/bookings.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';

describe('booking permissions', () => {
  let team: Team;
  let ownBooking: string;
  let otherBooking: string;
  let otherCrew: string;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    const own = await createCrew(team.office.client, {
      name: 'Lead crew',
      members: [{ userId: team.crew.me.user.id }],
    });
    otherCrew = await createCrew(team.office.client, { name: 'Other crew', colour: 'brick' });
    const body = { startDate: '2031-09-01', endDate: '2031-09-02', phase: 'finishing' };
    const a = await team.owner.client
      .post('/api/bookings', { ...body, crewId: own, jobId: await acceptedJob(team.owner.client) })
      .expect(201);
    const b = await team.owner.client
      .post('/api/bookings', {
        ...body,
        crewId: otherCrew,
        jobId: await acceptedJob(team.owner.client),
      })
      .expect(201);
    ownBooking = a.body.data.id;
    otherBooking = b.body.data.id;
  });

  it("shows a crew lead only their own crews' bookings, without money", async () => {
    const res = await team.crew.client
      .get('/api/bookings?from=2031-08-01&to=2031-09-30')
      .expect(200);
    expect(res.body.data.map((b: BookingView) => b.id)).toEqual([ownBooking]);
    expect(JSON.stringify(res.body)).not.toMatch(/cents|price|total|deposit|amount/i);
    const filtered = await team.crew.client
      .get(`/api/bookings?from=2031-08-01&to=2031-09-30&crewId=${otherCrew}`)
      .expect(200);
    expect(filtered.body.data).toEqual([]);
    const office = await team.office.client
      .get('/api/bookings?from=2031-08-01&to=2031-09-30')
      .expect(200);
    expect(office.body.data.map((b: BookingView) => b.id).sort()).toEqual(
      [ownBooking, otherBooking].sort(),
    );
  });

  it('refuses writes from crew leads and bookkeepers, and reads from bookkeepers', async () => {
    const jobId = await acceptedJob(team.owner.client);
    const body = {
      crewId: otherCrew,
      jobId,
      startDate: '2031-10-01',
      endDate: '2031-10-01',
      phase: 'finishing',
    };
    for (const who of [team.crew, team.bookkeeper]) {
      for (const res of [
        await who.client.post('/api/bookings', body),
        await who.client.patch(`/api/bookings/${ownBooking}`, { startDate: '2031-09-03' }),
        await who.client.del(`/api/bookings/${ownBooking}`),
      ]) {
        expect(res.status).toBe(403);
        expect(res.body.code).toBe('FORBIDDEN');
      }
    }
    expect(
      (await team.bookkeeper.client.get('/api/bookings?from=2031-08-01&to=2031-09-30')).status,
    ).toBe(403);
  });

  it('asks for a from and to range of at most 120 days', async () => {
    const res = await team.office.client.get('/api/bookings').expect(400);
    expect(res.body.errors.map((e: { path: string }) => e.path).sort()).toEqual(['from', 'to']);
    await team.office.client.get('/api/bookings?from=2031-01-01&to=2031-12-31').expect(400);
  });
});
