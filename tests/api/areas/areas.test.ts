/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
import { beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import { LAYOUT_ENGINE_VERSION, planLayout } from '@seamwright/takeoff';
import type { LayoutPlan, LayoutRequestInput } from '@seamwright/takeoff';
import { testApp } from '../../fixtures/app.js';
import {
  areaBody,
  createArea,
  lShape,
  planter,
  priceItemOfKind,
  turfProducts,
} from '../../fixtures/areas.js';
import { createCustomer, createJob, createSite, signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';

const areaRows = (jobId: string) =>
  selectRows(
    testApp().sequelize,
    'SELECT id, company_id, name, area_usage, engine_version, request, plan, ordered_sq_ft FROM job_areas WHERE job_id = ? ORDER BY created_at',
    [jobId],
  );

const json = (value: unknown): unknown => (typeof value === 'string' ? JSON.parse(value) : value);

describe('job areas and saved plans', () => {
  let team: Team;
  let jobId: string;
  let landscapeTurfId: string;
  let petTurfId: string;
  let siteId: string;
  let customerId: string;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    const customer = await createCustomer(team.owner.client);
    customerId = customer.id;
    siteId = (await createSite(team.owner.client, customer.id)).id;
    jobId = (await createJob(team.owner.client, customerId, siteId, 'Areas job')).id;
    const products = await turfProducts(team.owner.client);
    landscapeTurfId = products.find((p) => p.key === 'turf-landscape-175')!.id;
    petTurfId = products.find((p) => p.key === 'turf-pet-125')!.id;
  });

  it('saves an area with its plan, request and engine version, audited on the job', async () => {
    const res = await team.office.client
      .post(
        `/api/jobs/${jobId}/areas`,
        areaBody({ turfProductId: landscapeTurfId, baseDepthIn: 4 }),
      )
      .expect(201);
    const area = res.body.data;
    // 30 × 20 ft with a 15 ft roll along y: two 15 × 20 ft pieces, one 20 ft side seam (DOMAIN.md example).
    expect(area).toMatchObject({
      name: 'Back lawn',
      usage: 'landscape',
      areaSqFt: 600,
      orderedSqFt: 600,
      baseDepthIn: 4,
      turfProductId: landscapeTurfId,
      turfProduct: { rollWidthsFt: [15, 12], pileHeightIn: 1.75 },
      grainChoice: { kind: 'angle', angleDeg: 90 },
      plan: {
        orderedSqFt: 600,
        grainAngleDeg: 90,
        seams: { count: 1, sideFt: 20, buttFt: 0 },
        engineVersion: LAYOUT_ENGINE_VERSION,
      },
    });
    expect(area.plan.pieces).toHaveLength(2);
    expect(area.plan.cuts).toHaveLength(2);
    const [row] = await areaRows(jobId);
    expect(row).toMatchObject({
      id: area.id,
      company_id: team.owner.me.company.id,
      name: 'Back lawn',
      engine_version: LAYOUT_ENGINE_VERSION,
      ordered_sq_ft: 600,
    });
    // The product's longest roll is filled into the saved request.
    expect(json(row?.request)).toMatchObject({ roll: { widthFt: 15, maxLengthFt: 100 } });
    const job = await team.owner.client.get(`/api/jobs/${jobId}`).expect(200);
    expect(job.body.data.activity[0]).toMatchObject({
      action: 'job.area_added',
      data: { areaId: area.id, name: 'Back lawn' },
    });
  });

  it('reproduces the saved plan exactly by planning its saved request again', async () => {
    const area = await createArea(
      team.owner.client,
      jobId,
      areaBody({
        name: 'Side yard',
        area: { outer: lShape, holes: [planter] },
        trafficPaths: [
          {
            points: [
              [2, 25],
              [38, 2],
            ],
            widthFt: 3,
          },
        ],
        grain: 'cheapest',
      }),
    );
    const [, row] = await areaRows(jobId);
    const request = json(row?.request) as LayoutRequestInput;
    const { engineVersion, ...saved } = json(row?.plan) as LayoutPlan & { engineVersion: string };
    expect(engineVersion).toBe(LAYOUT_ENGINE_VERSION);
    expect(planLayout(request)).toEqual(saved);
    const read = await team.bookkeeper.client.get(`/api/areas/${area.id}`).expect(200);
    expect(read.body.data.plan).toEqual({ ...saved, engineVersion });
    expect(read.body.data.request).toEqual(request);
  });

  it('computes the alternatives: chosen, cheapest direction and the other roll width', async () => {
    const area = await createArea(
      team.owner.client,
      jobId,
      areaBody({ name: 'Front', area: { outer: lShape }, turfProductId: landscapeTurfId }),
    );
    const kinds = area.alternatives.map((a) => [a.kind, a.rollWidthFt]);
    expect(kinds).toEqual([
      ['chosen', 15],
      ['cheapest', 15],
      ['other-width', 12],
    ]);
    const [chosen, cheapest, other] = area.alternatives;
    expect(chosen?.orderedSqFt).toBe(area.orderedSqFt);
    expect(cheapest!.orderedSqFt).toBeLessThanOrEqual(chosen!.orderedSqFt);
    // Each alternative is the planner's own plan of the same area with that change.
    const { engineVersion: _v, ...request } = { ...area.request, engineVersion: null };
    expect(other?.plan).toEqual(
      planLayout({
        ...(request as unknown as LayoutRequestInput),
        roll: { widthFt: 12, maxLengthFt: 100 },
      }),
    );
    expect(other?.wastePct).toBe(other?.plan.wastePct);
    expect(chosen?.seamFt).toBe(chosen!.plan.seams.sideFt + chosen!.plan.seams.buttFt);
    // A product in one width has no other-width alternative; the cheapest choice shows a turn.
    const pet = await createArea(
      team.owner.client,
      jobId,
      areaBody({ name: 'Dog run', usage: 'pet', turfProductId: petTurfId, grain: 'cheapest' }),
    );
    expect(pet.alternatives.map((a) => a.kind)).toEqual(['chosen', 'turned']);
    expect(pet.grainChoice).toEqual({ kind: 'cheapest' });
  });

  it('plans a grain facing a compass side (the street to the south)', async () => {
    const area = await createArea(
      team.owner.client,
      jobId,
      areaBody({ name: 'Street side', grain: { facing: 'S', toward: 'street' } }),
    );
    // Facing S = 270° counter-clockwise from east (packages/takeoff grain-facing.ts).
    expect(area.plan.grainAngleDeg).toBe(270);
    expect(area.grainChoice).toEqual({
      kind: 'facing',
      facing: 'S',
      toleranceDeg: 0,
      toward: 'street',
    });
    const turned = await createArea(
      team.owner.client,
      jobId,
      areaBody({ name: 'Turned', grain: { facing: 'E', toleranceDeg: 90 } }),
    );
    expect(turned.grainChoice).toMatchObject({ kind: 'facing', facing: 'E', toleranceDeg: 90 });
    expect(turned.plan.orderedSqFt).toBe(600);
  });

  it('refuses bad input with a 4xx naming the field and saves nothing', async () => {
    const materialId = await priceItemOfKind(team.owner.client, 'material');
    const cases: [Record<string, unknown>, number, string][] = [
      [areaBody({ name: '' }), 400, 'name'],
      [areaBody({ usage: 'golf' }), 400, 'usage'],
      [areaBody({ grain: { angleDeg: 'north' } }), 400, 'grain'],
      [areaBody({ baseDepthIn: -1 }), 400, 'baseDepthIn'],
      [
        areaBody({
          area: {
            outer: [
              [0, 0],
              [1, 1],
            ],
          },
        }),
        422,
        'area.outer',
      ],
      [areaBody({ roll: { widthFt: -3 } }), 422, 'roll.widthFt'],
      [areaBody({ edges: ['hard'] }), 422, 'edges'],
      [areaBody({ turfProductId: materialId }), 400, 'turfProductId'],
      [areaBody({ turfProductId: '0b5f1c1e-5d7e-4a39-9f55-3f9d2a1b0c4d' }), 404, 'turfProductId'],
      [areaBody({ turfProductId: landscapeTurfId, roll: { widthFt: 13 } }), 400, 'roll.widthFt'],
    ];
    const before = (await areaRows(jobId)).length;
    for (const [body, status, field] of cases) {
      const res = await team.owner.client.post(`/api/jobs/${jobId}/areas`, body);
      expect({ field, status: res.status }).toEqual({ field, status });
      expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(field);
    }
    expect(await areaRows(jobId)).toHaveLength(before);
    await team.owner.client.post('/api/jobs/not-a-uuid/areas', areaBody()).expect(404);
  });

  it('changes names without planning again, plans again when the shape changes, and deletes', async () => {
    const area = await createArea(team.owner.client, jobId, areaBody({ name: 'Patch me' }));
    const renamed = await team.office.client
      .patch(`/api/areas/${area.id}`, { name: 'Renamed', usage: 'play' })
      .expect(200);
    expect(renamed.body.data).toMatchObject({ name: 'Renamed', usage: 'play' });
    expect(renamed.body.data.plan).toEqual(area.plan);
    const reshaped = await team.office.client
      .patch(`/api/areas/${area.id}`, { area: { outer: lShape }, grain: { angleDeg: 0 } })
      .expect(200);
    expect(reshaped.body.data.areaSqFt).toBe(1020);
    expect(reshaped.body.data.plan.grainAngleDeg).toBe(0);
    expect(reshaped.body.data.request).toMatchObject({
      roll: { widthFt: 15 },
      grain: { angleDeg: 0 },
    });
    const bad = await team.office.client
      .patch(`/api/areas/${area.id}`, { area: { outer: [[0, 0]] } })
      .expect(422);
    expect(bad.body.errors[0].path).toBe('area.outer');
    const [row] = await selectRows(
      testApp().sequelize,
      'SELECT area_sq_ft FROM job_areas WHERE id = ?',
      [area.id],
    );
    expect(row?.area_sq_ft).toBe(1020);
    await team.office.client.patch(`/api/areas/${area.id}`, {}).expect(400);
    await team.office.client.del(`/api/areas/${area.id}`).expect(204);
    await team.office.client.get(`/api/areas/${area.id}`).expect(404);
    expect(
      await selectRows(testApp().sequelize, 'SELECT id FROM job_areas WHERE id = ?', [area.id]),
    ).toEqual([]);
    const job = await team.owner.client.get(`/api/jobs/${jobId}`).expect(200);
    expect(job.body.data.activity.map((e: { action: string }) => e.action).slice(0, 3)).toEqual([
      'job.area_removed',
      'job.area_changed',
      'job.area_changed',
    ]);
  });

  it('lists a job’s areas oldest first', async () => {
    const res = await team.bookkeeper.client.get(`/api/jobs/${jobId}/areas`).expect(200);
    const names = res.body.data.map((a: { name: string }) => a.name);
    expect(names.slice(0, 3)).toEqual(['Back lawn', 'Side yard', 'Front']);
    await team.owner.client.get('/api/jobs/0b5f1c1e-5d7e-4a39-9f55-3f9d2a1b0c4d/areas').expect(404);
  });

  it('lets areas change only while the job is a lead or estimated (409 naming the status)', async () => {
    const other = (await createJob(team.owner.client, customerId, siteId, 'Lifecycle')).id;
    await team.owner.client.patch(`/api/jobs/${other}`, { status: 'estimated' }).expect(200);
    const area = await createArea(team.owner.client, other);
    await team.owner.client.patch(`/api/jobs/${other}`, { status: 'accepted' }).expect(200);
    for (const res of [
      await team.owner.client.post(`/api/jobs/${other}/areas`, areaBody()),
      await team.owner.client.patch(`/api/areas/${area.id}`, { name: 'Late' }),
      await team.owner.client.del(`/api/areas/${area.id}`),
    ]) {
      expect(res.status).toBe(409);
      expect(res.body.detail).toMatch(/job is accepted/);
      expect(res.body.errors[0].path).toBe('status');
    }
    const rows = await areaRows(other);
    expect(rows.map((r) => r.name)).toEqual(['Back lawn']);
  });

  it('lets owners and office write, bookkeepers read, and crew leads nothing', async () => {
    const area = await createArea(team.office.client, jobId, areaBody({ name: 'Roles' }));
    const { bookkeeper, crew } = team;
    await bookkeeper.client.get(`/api/areas/${area.id}`).expect(200);
    await bookkeeper.client.get(`/api/jobs/${jobId}/areas`).expect(200);
    await bookkeeper.client.get(`/api/jobs/${jobId}/takeoff`).expect(200);
    for (const res of [
      await bookkeeper.client.post(`/api/jobs/${jobId}/areas`, areaBody()),
      await bookkeeper.client.patch(`/api/areas/${area.id}`, { name: 'No' }),
      await bookkeeper.client.del(`/api/areas/${area.id}`),
      await crew.client.get(`/api/areas/${area.id}`),
      await crew.client.get(`/api/jobs/${jobId}/areas`),
      await crew.client.get(`/api/jobs/${jobId}/takeoff`),
      await crew.client.post(`/api/jobs/${jobId}/areas`, areaBody()),
      await crew.client.patch(`/api/areas/${area.id}`, { name: 'No' }),
      await crew.client.del(`/api/areas/${area.id}`),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('FORBIDDEN');
    }
    const [row] = await selectRows(testApp().sequelize, 'SELECT name FROM job_areas WHERE id = ?', [
      area.id,
    ]);
    expect(row?.name).toBe('Roles');
  });
});
