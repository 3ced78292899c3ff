// POST /api/estimates/:id/acceptances (a signature on paper, recorded by the office) and the
// job guard: while the buyer may still cancel, the job cannot be scheduled or started.
import { beforeAll, describe, expect, it } from 'vitest';
import { executeSql, selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { errorPaths } from '../../fixtures/estimates.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { pricedJob } from './sending-fixtures.js';

describe('POST /api/estimates/:id/acceptances', () => {
  let team: Team;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    // Central time: days and midnight are counted in the company's zone.
    await team.owner.client
      .patch('/api/company', { region: 'US-TX', timeZone: 'America/Chicago' })
      .expect(200);
  });

  const sign = async (signedAt: string, place: 'home' | 'office', send = true) => {
    const job = await pricedJob(team.owner.client);
    if (send)
      await team.owner.client.post(`/api/estimates/${job.estimate.id}/send`, {}).expect(200);
    const res = await team.office.client
      .post(`/api/estimates/${job.estimate.id}/acceptances`, {
        name: 'Wren Halloway',
        signedAt,
        place,
      })
      .expect(201);
    return {
      job,
      data: res.body.data as { acceptedAt: string; cancellationEndsAt: string | null },
    };
  };

  it.each([
    // TRADE.md check value 34 [S128][S130]: signed Fri 2025-06-06 at the home; Sat 06-07 (1),
    // Mon 06-09 (2), Tue 06-10 (3) → midnight Tue 2025-06-10, Central daylight time (UTC−5).
    ['2025-06-06T15:00:00-05:00', '2025-06-11T05:00:00.000Z'],
    // TRADE.md check value 35 [S128][S130]: signed Thu 2025-07-03, Fri 07-04 a holiday;
    // Sat 07-05, Mon 07-07, Tue 07-08 → midnight Tue 2025-07-08.
    ['2025-07-03T10:00:00-05:00', '2025-07-09T05:00:00.000Z'],
    // TRADE.md check value 36 [S128][S130]: signed Sat 2025-10-11, Mon 10-13 Columbus Day;
    // Tue 10-14, Wed 10-15, Thu 10-16 → midnight Thu 2025-10-16.
    ['2025-10-11T11:00:00-05:00', '2025-10-17T05:00:00.000Z'],
  ])('a home sale signed %s may be cancelled until %s', async (signedAt, endsAt) => {
    const { job, data } = await sign(signedAt, 'home');
    expect(data).toEqual({
      acceptedAt: new Date(signedAt).toISOString(),
      cancellationEndsAt: endsAt,
    });
    const [row] = await selectRows(
      testApp().sequelize,
      'SELECT kind, place, name, ip, cancellation_ends_at FROM estimate_answers WHERE estimate_id = ?',
      [job.estimate.id],
    );
    expect(row).toMatchObject({ kind: 'accepted', place: 'home', name: 'Wren Halloway', ip: null });
    expect(new Date(String(row?.cancellation_ends_at)).toISOString()).toBe(endsAt);
    const jobRes = await team.owner.client.get(`/api/jobs/${job.jobId}`).expect(200);
    expect(jobRes.body.data.status).toBe('accepted');
  });

  it('a sale signed at the office is not covered (TRADE.md §8.2: only away from the seller)', async () => {
    // A draft signed on paper is frozen as sent first, then accepted.
    const { job, data } = await sign('2025-06-06T15:00:00-05:00', 'office', false);
    expect(data.cancellationEndsAt).toBeNull();
    const estimate = await team.owner.client.get(`/api/estimates/${job.estimate.id}`).expect(200);
    expect(estimate.body.data.status).toBe('accepted');
  });

  it('refuses bad input, a second acceptance and other roles, changing nothing', async () => {
    const job = await pricedJob(team.owner.client);
    const url = `/api/estimates/${job.estimate.id}/acceptances`;
    const future = new Date(Date.now() + 3_600_000).toISOString();
    const cases: [Record<string, unknown>, string][] = [
      [{ name: 'W', signedAt: future, place: 'home' }, 'signedAt'],
      [{ name: 'W', signedAt: 'yesterday', place: 'home' }, 'signedAt'],
      [{ name: 'W', signedAt: '2025-06-06T15:00:00Z', place: 'garden' }, 'place'],
      [{ name: '', signedAt: '2025-06-06T15:00:00Z', place: 'home' }, 'name'],
    ];
    for (const [body, path] of cases) {
      const res = await team.office.client.post(url, body).expect(400);
      expect(errorPaths(res.body)).toEqual([path]);
    }
    const body = { name: 'W', signedAt: '2025-06-06T15:00:00Z', place: 'home' };
    await team.bookkeeper.client.post(url, body).expect(403);
    await team.crew.client.post(url, body).expect(403);
    const rows = () =>
      selectRows(testApp().sequelize, 'SELECT id FROM estimate_answers WHERE estimate_id = ?', [
        job.estimate.id,
      ]);
    expect(await rows()).toHaveLength(0);
    const estimate = await team.owner.client.get(`/api/estimates/${job.estimate.id}`).expect(200);
    expect(estimate.body.data.status).toBe('draft');
    await team.office.client.post(url, body).expect(201);
    await team.office.client.post(url, body).expect(409);
    expect(await rows()).toHaveLength(1);
  });

  it('keeps the job from being scheduled or started until the period ends (409 naming the date)', async () => {
    const { job, data } = await sign(new Date().toISOString(), 'home');
    expect(data.cancellationEndsAt).not.toBeNull();
    const refused = async (status: string) => {
      const res = await team.owner.client.patch(`/api/jobs/${job.jobId}`, { status });
      expect(res.status).toBe(409);
      expect(res.body.detail).toContain(data.cancellationEndsAt);
      expect(res.body.detail).toMatch(/until midnight at the end of \w+day, \w+ \d+, \d{4}/);
    };
    await refused('scheduled');
    const jobRes = await team.owner.client.get(`/api/jobs/${job.jobId}`).expect(200);
    expect(jobRes.body.data.status).toBe('accepted');
    const endAt = (at: Date) =>
      executeSql(
        testApp().sequelize,
        'UPDATE estimate_answers SET cancellation_ends_at = ? WHERE estimate_id = ?',
        [at, job.estimate.id],
      );
    // Once the period is over, the job moves on.
    await endAt(new Date(Date.now() - 1000));
    await team.owner.client.patch(`/api/jobs/${job.jobId}`, { status: 'scheduled' }).expect(200);
    // Starting is guarded the same way (a period running again stands in for a late record).
    await endAt(new Date(String(data.cancellationEndsAt)));
    await refused('in_progress');
  });
});
