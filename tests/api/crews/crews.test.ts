/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
// Crews through the API: the contract routes, members (crew-lead accounts and named helpers),
// the palette, who may manage them, and delete that archives a crew with bookings.
import { beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import type { CrewView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import {
  createCustomer,
  createJob,
  createSite,
  moveJob,
  signUpTeam,
} from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';

describe('crews', () => {
  let team: Team;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
  });

  it('creates a crew with a lead and a helper, lists and reads it', async () => {
    const res = await team.office.client
      .post('/api/crews', {
        name: 'North crew',
        colour: 'harbour',
        workingDays: [5, 1, 2, 3, 4, 1],
        jobsPerDay: 1,
        members: [{ userId: team.crew.me.user.id }, { name: 'Dale Helper' }],
      })
      .expect(201);
    const crew = res.body.data as CrewView;
    expect(crew).toMatchObject({
      name: 'North crew',
      colour: 'harbour',
      colourHex: '#1F5F99',
      workingDays: [1, 2, 3, 4, 5],
      jobsPerDay: 1,
      archived: false,
      members: [
        { userId: team.crew.me.user.id, name: team.crew.me.user.name, kind: 'lead' },
        { userId: null, name: 'Dale Helper', kind: 'helper' },
      ],
    });
    // Everyone reads crews (no money in them), crew leads included.
    const list = await team.crew.client.get('/api/crews').expect(200);
    expect(list.body.data.map((c: CrewView) => c.id)).toContain(crew.id);
    await team.bookkeeper.client.get(`/api/crews/${crew.id}`).expect(200);
  });

  it('defaults to Monday–Friday and one job a day', async () => {
    const res = await team.owner.client
      .post('/api/crews', { name: 'Default crew', colour: 'pine' })
      .expect(201);
    expect(res.body.data).toMatchObject({
      workingDays: [1, 2, 3, 4, 5],
      jobsPerDay: 1,
      members: [],
    });
  });

  it('refuses a colour outside the palette, no working days and a stranger as member, naming the field', async () => {
    const bad = await team.office.client
      .post('/api/crews', { name: 'Bad', colour: '#ff0000', workingDays: [] })
      .expect(400);
    expect(bad.headers['content-type']).toMatch(/problem\+json/);
    expect(bad.body.errors.map((e: { path: string }) => e.path).sort()).toEqual([
      'colour',
      'workingDays',
    ]);
    const stranger = await team.office.client
      .post('/api/crews', {
        name: 'Stranger crew',
        colour: 'plum',
        members: [{ userId: '00000000-0000-4000-8000-000000000000' }],
      })
      .expect(400);
    expect(stranger.body.errors).toEqual([
      { path: 'members.0.userId', message: 'No such member in this company' },
    ]);
    const rows = await selectRows(testApp().sequelize, 'SELECT id FROM crews WHERE name = ?', [
      'Stranger crew',
    ]);
    expect(rows).toEqual([]);
  });

  it('changes name, colour, capacity and replaces the members', async () => {
    const made = await team.office.client
      .post('/api/crews', { name: 'Change me', colour: 'umber' })
      .expect(201);
    const id = made.body.data.id as string;
    const res = await team.office.client
      .patch(`/api/crews/${id}`, {
        name: 'South crew',
        colour: 'berry',
        jobsPerDay: 2,
        members: [{ name: 'Kit' }],
      })
      .expect(200);
    expect(res.body.data).toMatchObject({
      name: 'South crew',
      colour: 'berry',
      jobsPerDay: 2,
      members: [{ name: 'Kit', kind: 'helper' }],
    });
    await team.office.client.patch(`/api/crews/${id}`, {}).expect(400);
  });

  it('lets only owners and office manage crews', async () => {
    const made = await team.owner.client
      .post('/api/crews', { name: 'Guarded', colour: 'slate' })
      .expect(201);
    const id = made.body.data.id as string;
    for (const who of [team.crew, team.bookkeeper]) {
      for (const res of [
        await who.client.post('/api/crews', { name: 'Nope', colour: 'slate' }),
        await who.client.patch(`/api/crews/${id}`, { name: 'Nope' }),
        await who.client.del(`/api/crews/${id}`),
      ]) {
        expect(res.status).toBe(403);
        expect(res.body.code).toBe('FORBIDDEN');
      }
    }
  });

  it('deletes a crew without bookings, and archives one with bookings, saying so', async () => {
    const empty = await team.office.client
      .post('/api/crews', { name: 'Gone soon', colour: 'lagoon' })
      .expect(201);
    const gone = await team.office.client.del(`/api/crews/${empty.body.data.id}`).expect(200);
    expect(gone.body.data).toMatchObject({ outcome: 'deleted' });
    await team.office.client.get(`/api/crews/${empty.body.data.id}`).expect(404);

    const busy = await team.office.client
      .post('/api/crews', {
        name: 'Busy crew',
        colour: 'brick',
        workingDays: [0, 1, 2, 3, 4, 5, 6],
      })
      .expect(201);
    const customer = await createCustomer(team.office.client);
    const site = await createSite(team.office.client, customer.id);
    const job = await createJob(team.office.client, customer.id, site.id);
    await moveJob(team.office.client, job.id, ['estimated', 'accepted']);
    await team.office.client
      .post('/api/bookings', {
        crewId: busy.body.data.id,
        jobId: job.id,
        startDate: '2031-06-02',
        endDate: '2031-06-02',
        phase: 'finishing',
      })
      .expect(201);
    const archived = await team.office.client.del(`/api/crews/${busy.body.data.id}`).expect(200);
    expect(archived.body.data).toMatchObject({
      outcome: 'archived',
      message: expect.stringContaining('archived instead of deleted'),
    });
    const list = await team.office.client.get('/api/crews').expect(200);
    expect(list.body.data.map((c: CrewView) => c.id)).not.toContain(busy.body.data.id);
    const all = await team.office.client.get('/api/crews?includeArchived=true').expect(200);
    expect(all.body.data.find((c: CrewView) => c.id === busy.body.data.id)).toMatchObject({
      archived: true,
    });
    const restored = await team.office.client
      .patch(`/api/crews/${busy.body.data.id}`, { archived: false })
      .expect(200);
    expect(restored.body.data.archived).toBe(false);
  });
});
