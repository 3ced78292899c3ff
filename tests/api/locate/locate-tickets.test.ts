/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
// Locate tickets through the API: the contract shape, the region rule in the company's zone
// (TRADE.md §6 check values), the default when a region has no rule, bad input and other
// companies' jobs.
import { beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import {
  createCustomer,
  createJob,
  createSite,
  moveJob,
  signUpTeam,
} from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import type { Client } from '../../fixtures/client.js';

const minutesAgo = (minutes: number) => new Date(Date.now() - minutes * 60_000).toISOString();

const ticketRows = async (jobId: string) =>
  selectRows<{ id: string; status: string }>(
    testApp().sequelize,
    'SELECT id, status FROM locate_tickets WHERE job_id = ?',
    [jobId],
  );

async function newJob(client: Client): Promise<string> {
  const customer = await createCustomer(client);
  const site = await createSite(client, customer.id);
  return (await createJob(client, customer.id, site.id)).id;
}

describe('locate tickets', () => {
  let team: Team;
  let jobId: string;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    await team.owner.client
      .patch('/api/company', { region: 'US-TX', timeZone: 'America/Chicago' })
      .expect(200);
    jobId = await newJob(team.owner.client);
  });

  it('answers 201 with the contract shape, lists the ticket and audits it on the job', async () => {
    const calledAt = minutesAgo(5);
    const res = await team.office.client
      .post(`/api/jobs/${jobId}/locate-tickets`, { number: 'TX-2501', calledAt })
      .expect(201);
    const data = res.body.data as { id: string; earliestDigAt: string; expiresAt: string };
    expect(data).toMatchObject({
      id: expect.any(String),
      number: 'TX-2501',
      calledAt: new Date(calledAt).toISOString(),
      earliestDigAt: expect.stringMatching(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/),
      expiresAt: expect.stringMatching(/Z$/),
      status: 'requested',
      rule: { region: 'US-TX', isDefault: false, explanation: expect.stringContaining('Notice') },
    });
    expect(new Date(data.earliestDigAt) > new Date(calledAt)).toBe(true);
    expect(new Date(data.expiresAt) > new Date(data.earliestDigAt)).toBe(true);

    const list = await team.crew.client.get(`/api/jobs/${jobId}/locate-tickets`).expect(200);
    expect(list.body.data.map((t: { id: string }) => t.id)).toContain(data.id);

    const job = await team.owner.client.get(`/api/jobs/${jobId}`).expect(200);
    const added = job.body.data.activity.find(
      (event: { action: string }) => event.action === 'job.locate_ticket_added',
    );
    expect(added?.data).toMatchObject({ ticketId: data.id, number: 'TX-2501' });
  });

  it('gives Tuesday 11:59 Chicago time for a Saturday notice in Texas', async () => {
    // TRADE.md check 21, Tex. Util. Code §251.151(b): notice Sat 2025-09-06 → Tue 2025-09-09
    // 11:59 a.m.; 11:59 CDT is 16:59 UTC.
    const res = await team.office.client
      .post(`/api/jobs/${jobId}/locate-tickets`, {
        number: 'TX-SAT',
        calledAt: '2025-09-06T10:00:00-05:00',
      })
      .expect(201);
    expect(res.body.data.earliestDigAt).toBe('2025-09-09T16:59:00.000Z');
    expect(res.body.data.rule.explanation).toContain('earliest dig Tue 2025-09-09 11:59');
    // 14-day life (TRADE.md §6, 16 TAC §18.3(f)) has passed long since: shown as expired.
    expect(res.body.data.status).toBe('expired');
  });

  it('falls back to the default rule for a region without one, and says so', async () => {
    const other = await signUpTeam(testApp().app);
    await other.owner.client
      .patch('/api/company', { region: 'US-OR', timeZone: 'America/Los_Angeles' })
      .expect(200);
    const otherJob = await newJob(other.owner.client);
    // Default: 2 full business days (TRADE.md §6; Indiana counting example [S111]):
    // Tue 2025-06-03 → Wed, Thu count → Fri 2025-06-06 00:00 PDT.
    const res = await other.owner.client
      .post(`/api/jobs/${otherJob}/locate-tickets`, {
        number: 'OR-1',
        calledAt: '2025-06-03T10:00:00-07:00',
      })
      .expect(201);
    expect(res.body.data.rule).toMatchObject({ region: 'US-OR', isDefault: true });
    expect(res.body.data.rule.explanation).toMatch(/^No locate rule on file for US-OR/);
    expect(res.body.data.earliestDigAt).toBe('2025-06-06T07:00:00.000Z');
  });

  it.each([
    ['a date-time in the future', { number: 'F-1', calledAt: '2999-01-01T00:00:00Z' }, 'calledAt'],
    ['an unparsable date-time', { number: 'F-2', calledAt: 'next Tuesday' }, 'calledAt'],
    ['a date without a time', { number: 'F-3', calledAt: '2025-06-03' }, 'calledAt'],
    ['a day that does not exist', { number: 'F-4', calledAt: '2025-02-30T10:00:00Z' }, 'calledAt'],
    ['no number', { calledAt: minutesAgo(1) }, 'number'],
  ])('refuses %s with 400 naming the field and saves nothing', async (_what, body, path) => {
    const before = (await ticketRows(jobId)).length;
    const res = await team.office.client
      .post(`/api/jobs/${jobId}/locate-tickets`, body)
      .expect(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
    expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(path);
    expect(res.body.detail).toContain(path);
    expect(await ticketRows(jobId)).toHaveLength(before);
  });

  it("answers 404 for another company's job and writes nothing", async () => {
    const other = await signUpTeam(testApp().app);
    const otherJob = await newJob(other.owner.client);
    const res = await team.office.client
      .post(`/api/jobs/${otherJob}/locate-tickets`, { number: 'X-1', calledAt: minutesAgo(1) })
      .expect(404);
    expect(res.body.code).toBe('NOT_FOUND');
    await team.office.client.get(`/api/jobs/${otherJob}/locate-tickets`).expect(404);
    expect(await ticketRows(otherJob)).toHaveLength(0);
  });

  it('records the operators’ answer: requested → clear → conflict; never back to requested', async () => {
    const made = await team.office.client
      .post(`/api/jobs/${jobId}/locate-tickets`, { number: 'TX-ST', calledAt: minutesAgo(2) })
      .expect(201);
    const id = made.body.data.id;
    const clear = await team.office.client
      .patch(`/api/locate-tickets/${id}`, { status: 'clear' })
      .expect(200);
    expect(clear.body.data.status).toBe('clear');
    await team.owner.client.patch(`/api/locate-tickets/${id}`, { status: 'conflict' }).expect(200);
    for (const status of ['requested', 'expired', 'done']) {
      const bad = await team.office.client
        .patch(`/api/locate-tickets/${id}`, { status })
        .expect(400);
      expect(bad.body.errors[0].path).toBe('status');
    }
    expect((await ticketRows(jobId)).find((row) => row.id === id)?.status).toBe('conflict');
  });

  it('refuses to change an expired ticket (409)', async () => {
    const made = await team.office.client
      .post(`/api/jobs/${jobId}/locate-tickets`, {
        number: 'TX-OLD',
        calledAt: '2025-06-06T14:00:00-05:00',
      })
      .expect(201);
    expect(made.body.data.status).toBe('expired');
    const res = await team.office.client
      .patch(`/api/locate-tickets/${made.body.data.id}`, { status: 'clear' })
      .expect(409);
    expect(res.body.detail).toMatch(/expired/);
  });

  it('answers 409 for a job that is lost, and saves nothing', async () => {
    const lostJob = await newJob(team.owner.client);
    await moveJob(team.owner.client, lostJob, ['lost']);
    const res = await team.office.client
      .post(`/api/jobs/${lostJob}/locate-tickets`, { number: 'L-1', calledAt: minutesAgo(1) })
      .expect(409);
    expect(res.body.code).toBe('CONFLICT');
    expect(res.body.detail).toMatch(/lost/i);
    expect(await ticketRows(lostJob)).toHaveLength(0);
  });
});
