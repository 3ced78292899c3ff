/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
// Bookings through the API: the contract shapes, the rules' refusals (409 naming the field)
// and warnings, the job moving to scheduled, changes with versions, and the calendar list.
import { beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import { localDateOf } from '@seamwright/domain';
import type { BookingView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { acceptedJob, callInTicket, createCrew } from '../../fixtures/bookings.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { areaBody, createArea } from '../../fixtures/areas.js';

const timeZone = 'America/Chicago';
// Far from today, so no locate window or cancellation period is involved.
const later = { startDate: '2031-06-03', endDate: '2031-06-05' };

describe('bookings', () => {
  let team: Team;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    await team.owner.client.patch('/api/company', { region: 'US-TX', timeZone }).expect(200);
  });

  const book = (body: Record<string, unknown>) => team.office.client.post('/api/bookings', body);

  it('answers 201 { id, warnings }, moves the accepted job to scheduled and lists it for the calendar', async () => {
    const crewId = await createCrew(team.office.client, {
      name: 'Harbour crew',
      colour: 'harbour',
    });
    const jobId = await acceptedJob(team.office.client, 'Front lawn swap');
    const res = await book({ crewId, jobId, ...later, phase: 'finishing' }).expect(201);
    expect(res.body.data).toEqual({ id: expect.any(String), version: 1, warnings: [] });
    const job = await team.office.client.get(`/api/jobs/${jobId}`).expect(200);
    expect(job.body.data.status).toBe('scheduled');
    expect(job.body.data.activity.map((e: { action: string }) => e.action)).toEqual(
      expect.arrayContaining(['job.booking_added', 'job.status_changed']),
    );
    const list = await team.office.client
      .get(`/api/bookings?from=2031-06-01&to=2031-06-30&crewId=${crewId}`)
      .expect(200);
    expect(list.body.data).toEqual([
      expect.objectContaining({
        id: res.body.data.id,
        crewId,
        jobId,
        ...later,
        phase: 'finishing',
        phaseLabel: 'Finishing',
        crew: { id: crewId, name: 'Harbour crew', colour: 'harbour', colourHex: '#1F5F99' },
        job: { id: jobId, title: 'Front lawn swap', status: 'scheduled' },
        customerName: 'Juniper Vale',
        siteAddress: '7 Larkspur Row, Quillmere',
        warnings: [],
      }),
    ]);
    // Outside the range: nothing.
    const before = await team.office.client
      .get('/api/bookings?from=2031-05-01&to=2031-06-02')
      .expect(200);
    expect(before.body.data.map((b: BookingView) => b.id)).not.toContain(res.body.data.id);
  });

  it('refuses digging before the earliest dig date with the reason, and saves nothing', async () => {
    const crewId = await createCrew(team.office.client);
    const jobId = await acceptedJob(team.office.client);
    const { dayBefore, dayAfterOpening } = await callInTicket(team.office.client, jobId, timeZone);
    const res = await book({
      crewId,
      jobId,
      startDate: dayBefore,
      endDate: dayAfterOpening,
      phase: 'tear_out_base',
    });
    expect(res.status).toBe(409);
    expect(res.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(res.body.code).toBe('CONFLICT');
    expect(res.body.errors).toEqual([
      {
        path: 'startDate',
        message: expect.stringContaining('the earliest lawful start of the locate ticket'),
      },
    ]);
    const rows = await selectRows(testApp().sequelize, 'SELECT id FROM bookings WHERE job_id = ?', [
      jobId,
    ]);
    expect(rows).toEqual([]);
    const job = await team.office.client.get(`/api/jobs/${jobId}`).expect(200);
    expect(job.body.data.status).toBe('accepted');
    // The day after the window opens is fine; the ticket is not marked clear yet: a warning.
    const ok = await book({
      crewId,
      jobId,
      startDate: dayAfterOpening,
      endDate: dayAfterOpening,
      phase: 'tear_out_base',
    }).expect(201);
    expect(ok.body.data.warnings.map((w: { code: string }) => w.code)).toEqual([
      'locate-not-clear',
    ]);
  });

  it('refuses digging with no locate ticket', async () => {
    const crewId = await createCrew(team.office.client);
    const jobId = await acceptedJob(team.office.client);
    const res = await book({ crewId, jobId, ...later, phase: 'tear_out_base' }).expect(409);
    expect(res.body.errors[0].message).toContain('record the locate ticket');
  });

  it('refuses a second job on a one-job crew day, and warns on a day off', async () => {
    const crewId = await createCrew(team.office.client, { workingDays: [1, 2, 3, 4, 5] });
    const first = await acceptedJob(team.office.client);
    const second = await acceptedJob(team.office.client);
    await book({ crewId, jobId: first, ...later, phase: 'finishing' }).expect(201);
    const full = await book({
      crewId,
      jobId: second,
      startDate: '2031-06-05',
      endDate: '2031-06-06',
      phase: 'finishing',
    }).expect(409);
    expect(full.body.errors).toEqual([
      { path: 'startDate', message: expect.stringContaining('Thu 2031-06-05') },
    ]);
    // Sat 2031-06-07 is not one of the crew's working days.
    const weekend = await book({
      crewId,
      jobId: second,
      startDate: '2031-06-06',
      endDate: '2031-06-07',
      phase: 'finishing',
    }).expect(201);
    expect(weekend.body.data.warnings).toEqual([
      expect.objectContaining({
        code: 'not-a-working-day',
        message: expect.stringContaining('Sat 2031-06-07'),
      }),
    ]);
  });

  it('warns when turf is laid before it is reserved', async () => {
    const crewId = await createCrew(team.office.client);
    const jobId = await acceptedJob(team.office.client);
    // Areas are drawn while the job is a lead or estimated, so plan on a fresh job first.
    const planned = await acceptedJobWithArea();
    const res = await book({ crewId, jobId: planned, ...later, phase: 'turf_seams_infill' }).expect(
      201,
    );
    expect(res.body.data.warnings.map((w: { code: string }) => w.code)).toEqual([
      'turf-not-reserved',
    ]);
    // A job with no saved area has no turf to reserve: no warning.
    const bare = await book({
      crewId,
      jobId,
      startDate: '2031-07-01',
      endDate: '2031-07-01',
      phase: 'turf_seams_infill',
    }).expect(201);
    expect(bare.body.data.warnings).toEqual([]);
  });

  async function acceptedJobWithArea(): Promise<string> {
    const { createCustomer, createJob, createSite, moveJob } =
      await import('../../fixtures/factories.js');
    const customer = await createCustomer(team.office.client);
    const site = await createSite(team.office.client, customer.id);
    const job = await createJob(team.office.client, customer.id, site.id);
    await createArea(team.office.client, job.id, areaBody());
    await moveJob(team.office.client, job.id, ['estimated', 'accepted']);
    return job.id;
  }

  it('refuses a job that is not accepted yet, an unknown crew, and bad dates (400 naming the field)', async () => {
    const crewId = await createCrew(team.office.client);
    const { createCustomer, createJob, createSite } = await import('../../fixtures/factories.js');
    const customer = await createCustomer(team.office.client);
    const site = await createSite(team.office.client, customer.id);
    const lead = await createJob(team.office.client, customer.id, site.id);
    const res = await book({ crewId, jobId: lead.id, ...later, phase: 'finishing' }).expect(409);
    expect(res.body.errors).toEqual([
      { path: 'jobId', message: expect.stringContaining('accepted') },
    ]);
    const jobId = await acceptedJob(team.office.client);
    const noCrew = await book({
      crewId: '00000000-0000-4000-8000-000000000000',
      jobId,
      ...later,
      phase: 'finishing',
    }).expect(404);
    expect(noCrew.body.errors[0].path).toBe('crewId');
    const badDate = await book({
      crewId,
      jobId,
      startDate: '2031-02-30',
      endDate: '2031-03-01',
      phase: 'finishing',
    }).expect(400);
    expect(badDate.body.errors.map((e: { path: string }) => e.path)).toEqual(['startDate']);
    const backwards = await book({
      crewId,
      jobId,
      startDate: '2031-03-05',
      endDate: '2031-03-01',
      phase: 'finishing',
    }).expect(400);
    expect(backwards.body.errors.map((e: { path: string }) => e.path)).toEqual(['endDate']);
    const tooLong = await book({
      crewId,
      jobId,
      startDate: '2031-03-01',
      endDate: '2031-05-30',
      phase: 'finishing',
    }).expect(400);
    expect(tooLong.body.errors[0].message).toContain('at most 60 days');
    await book({ crewId, jobId, ...later, phase: 'mowing' }).expect(400);
  });

  it('moves, stretches and deletes a booking; a stale version is a 409; the job stays scheduled', async () => {
    const crewId = await createCrew(team.office.client);
    const otherCrew = await createCrew(team.office.client, { name: 'Second crew', colour: 'plum' });
    const jobId = await acceptedJob(team.office.client);
    const made = await book({ crewId, jobId, ...later, phase: 'finishing' }).expect(201);
    const id = made.body.data.id as string;
    const moved = await team.office.client
      .patch(`/api/bookings/${id}`, { startDate: '2031-06-10', endDate: '2031-06-13', version: 1 })
      .expect(200);
    expect(moved.body.data).toMatchObject({ id, version: 2, warnings: [] });
    const stale = await team.office.client
      .patch(`/api/bookings/${id}`, { startDate: '2031-06-11', version: 1 })
      .expect(409);
    expect(stale.body.errors[0].path).toBe('version');
    await team.office.client
      .patch(`/api/bookings/${id}`, { crewId: otherCrew, phase: 'turf_seams_infill' })
      .expect(200);
    const [row] = await selectRows(
      testApp().sequelize,
      'SELECT crew_id, start_date, end_date, phase, version FROM bookings WHERE id = ?',
      [id],
    );
    expect(row).toMatchObject({ crew_id: otherCrew, phase: 'turf_seams_infill', version: 3 });
    await team.office.client.patch(`/api/bookings/${id}`, { endDate: '2031-06-01' }).expect(400);
    await team.office.client.del(`/api/bookings/${id}`).expect(204);
    await team.office.client.del(`/api/bookings/${id}`).expect(404);
    const job = await team.office.client.get(`/api/jobs/${jobId}`).expect(200);
    expect(job.body.data.status).toBe('scheduled');
  });

  it("refuses work inside the buyer's cancellation period; a booking after it keeps the job accepted", async () => {
    const { pricedJob } = await import('../estimate-sending/sending-fixtures.js');
    const crewId = await createCrew(team.office.client);
    const priced = await pricedJob(team.owner.client);
    await team.owner.client.post(`/api/estimates/${priced.estimate.id}/send`, {}).expect(200);
    await team.office.client
      .post(`/api/estimates/${priced.estimate.id}/acceptances`, {
        name: 'Wren Halloway',
        signedAt: new Date().toISOString(),
        place: 'home',
      })
      .expect(201);
    const today = localDateOf(new Date(), timeZone);
    const inside = await book({
      crewId,
      jobId: priced.jobId,
      startDate: today,
      endDate: today,
      phase: 'finishing',
    }).expect(409);
    expect(inside.body.errors).toEqual([
      {
        path: 'startDate',
        message: expect.stringContaining('The buyer may cancel until the end of'),
      },
    ]);
    const after = await book({ crewId, jobId: priced.jobId, ...later, phase: 'finishing' }).expect(
      201,
    );
    expect(after.body.data.warnings.map((w: { code: string }) => w.code)).toEqual([
      'cancellation-period',
    ]);
    const job = await team.office.client.get(`/api/jobs/${priced.jobId}`).expect(200);
    expect(job.body.data.status).toBe('accepted');
  });

  it('lets two parallel requests fill a one-job crew day only once', async () => {
    const crewId = await createCrew(team.office.client, { name: 'Race crew' });
    const jobs = await Promise.all([1, 2, 3, 4].map(() => acceptedJob(team.office.client)));
    const results = await Promise.all(
      jobs.map((jobId) =>
        book({ crewId, jobId, startDate: '2031-08-04', endDate: '2031-08-05', phase: 'finishing' }),
      ),
    );
    expect(results.map((r) => r.status).sort()).toEqual([201, 409, 409, 409]);
    const rows = await selectRows(
      testApp().sequelize,
      'SELECT id FROM bookings WHERE crew_id = ?',
      [crewId],
    );
    expect(rows).toHaveLength(1);
  });
});
