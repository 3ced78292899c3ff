/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
import { beforeAll, describe, expect, it } from 'vitest';
import { allowedNextStatuses, jobStatuses } from '@seamwright/domain';
import type { JobStatus } from '@seamwright/domain';
import { selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import {
  createCustomer,
  createJob,
  createSite,
  moveJob,
  signUpCompany,
} from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';

// The shortest way to reach each status from a new lead, along the lifecycle.
const pathTo: Record<JobStatus, JobStatus[]> = {
  lead: [],
  estimated: ['estimated'],
  accepted: ['estimated', 'accepted'],
  scheduled: ['estimated', 'accepted', 'scheduled'],
  in_progress: ['estimated', 'accepted', 'scheduled', 'in_progress'],
  installed: ['estimated', 'accepted', 'scheduled', 'in_progress', 'installed'],
  invoiced: ['estimated', 'accepted', 'scheduled', 'in_progress', 'installed', 'invoiced'],
  paid: ['estimated', 'accepted', 'scheduled', 'in_progress', 'installed', 'invoiced', 'paid'],
  closed: [
    'estimated',
    'accepted',
    'scheduled',
    'in_progress',
    'installed',
    'invoiced',
    'paid',
    'closed',
  ],
  lost: ['lost'],
  cancelled: ['cancelled'],
};

const legalMoves = jobStatuses.flatMap((from) =>
  allowedNextStatuses(from).map((to) => [from, to] as const),
);

const illegalMoves: [JobStatus, JobStatus, RegExp][] = [
  ['lead', 'accepted', /lead to accepted; allowed from lead: estimated, lost, cancelled/],
  ['lead', 'closed', /lead to closed/],
  ['estimated', 'lead', /estimated to lead; allowed from estimated: accepted, lost, cancelled/],
  ['installed', 'cancelled', /installed to cancelled; allowed from installed: invoiced/],
  ['installed', 'lost', /installed to lost/],
  ['invoiced', 'installed', /invoiced to installed; allowed from invoiced: paid/],
  ['paid', 'lead', /paid to lead/],
  ['closed', 'lead', /closed to lead; closed is final/],
  ['lost', 'estimated', /lost to estimated; lost is final/],
  ['cancelled', 'lead', /cancelled to lead; cancelled is final/],
];

describe('job lifecycle over the API', () => {
  let office: SignedIn;
  let customerId: string;
  let siteId: string;

  beforeAll(async () => {
    const owner = await signUpCompany(testApp().app);
    office = owner;
    customerId = (await createCustomer(owner.client)).id;
    siteId = (await createSite(owner.client, customerId)).id;
  });

  async function jobAt(status: JobStatus) {
    const job = await createJob(office.client, customerId, siteId);
    await moveJob(office.client, job.id, pathTo[status]);
    return job.id;
  }

  it.each(legalMoves)('allows %s → %s and records it in the activity', async (from, to) => {
    const id = await jobAt(from);
    const res = await office.client.patch(`/api/jobs/${id}`, { status: to }).expect(200);
    expect(res.body.data.status).toBe(to);
    expect(res.body.data.allowedNextStatuses).toEqual(allowedNextStatuses(to));
    expect(res.body.data.activity[0]).toMatchObject({
      action: 'job.status_changed',
      data: { from, to },
    });
  });

  it.each(illegalMoves)(
    'refuses %s → %s with 409 saying why; nothing changes',
    async (from, to, reason) => {
      const { sequelize } = testApp();
      const id = await jobAt(from);
      const snapshot = () =>
        Promise.all([
          selectRows(sequelize, 'SELECT status, title, updated_at FROM jobs WHERE id = ?', [id]),
          selectRows(sequelize, 'SELECT COUNT(*) AS n FROM audit_events WHERE entity_id = ?', [id]),
        ]);
      const before = await snapshot();
      const res = await office.client
        .patch(`/api/jobs/${id}`, { status: to, title: 'Renamed alongside' })
        .expect(409);
      expect(res.body.code).toBe('CONFLICT');
      expect(res.body.detail).toMatch(reason);
      expect(await snapshot()).toEqual(before);
    },
  );

  it('treats sending the current status as no change', async () => {
    const id = await jobAt('estimated');
    const res = await office.client.patch(`/api/jobs/${id}`, { status: 'estimated' }).expect(200);
    expect(res.body.data.activity.map((a: { action: string }) => a.action)).toEqual([
      'job.status_changed',
      'job.created',
    ]);
  });
});
