import { describe, expect, it } from 'vitest';
import { testApp } from '../../fixtures/app.js';
import { addMember, signUpCompany } from '../../fixtures/factories.js';

// The job request of the job contract (issue text): a 20 × 10 ft front and a 20 × 5 ft side.
const twoAreas = {
  areas: [
    {
      id: 'front',
      area: {
        outer: [
          [0, 0],
          [20, 0],
          [20, 10],
          [0, 10],
        ],
        holes: [],
      },
      grain: { angleDeg: 0 },
    },
    {
      id: 'side',
      area: {
        outer: [
          [30, 0],
          [50, 0],
          [50, 5],
          [30, 5],
        ],
        holes: [],
      },
      grain: { facing: 'E', toleranceDeg: 0 },
    },
  ],
  rolls: [
    { widthFt: 15, maxLengthFt: 100 },
    { widthFt: 12, maxLengthFt: 100 },
  ],
  lengthStepFt: 1,
  costs: { turfCentsPerSqFt: 300, sideSeamCentsPerFt: 150, buttSeamCentsPerFt: 250 },
};

describe('POST /api/plans/job-preview', () => {
  it('plans both areas from one shared 15 × 20 ft piece for any signed-in role', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const crew = await addMember(app, owner.client, 'crew_lead');
    const res = await crew.client.post('/api/plans/job-preview', twoAreas).expect(200);
    // computed by hand: the 10 ft and 5 ft wide cuts sit side by side across one 15 ft roll
    // width, both 20 ft long, so one 15 × 20 piece (300 sq ft) serves the job; planned one by
    // one each area would buy its own 15 × 20 piece (600 sq ft).
    expect(res.body.data.orderedSqFt).toBe(300);
    expect(res.body.data.pieces).toHaveLength(1);
    const areas = res.body.data.areas as { id: string }[];
    expect(areas.map((a) => a.id)).toEqual(['front', 'side']);
    // computed by hand: 300 sq ft × 300 cents, no seams.
    expect(res.body.data.cost).toMatchObject({ turfCents: 90000, seamCents: 0, totalCents: 90000 });
  });

  it('orders nothing when a 15 × 20 ft remnant holds both cuts', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const res = await owner.client
      .post('/api/plans/job-preview', {
        ...twoAreas,
        remnants: [{ id: 'R-7', widthFt: 15, lengthFt: 20 }],
      })
      .expect(200);
    expect(res.body.data.orderedSqFt).toBe(0);
    expect(res.body.data.pieces[0]).toMatchObject({ source: 'remnant', remnantId: 'R-7' });
  });

  it('answers 422 naming the job field at fault, as the plan-job command does', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const res = await owner.client
      .post('/api/plans/job-preview', { ...twoAreas, rolls: [] })
      .expect(422);
    expect(res.body.code).toBe('UNPROCESSABLE');
    expect(res.body.errors[0].path).toBe('rolls');
  });

  it('refuses an oversize job on the API thread with the limit named', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const ring = Array.from({ length: 3000 }, (_, i) => {
      const t = (2 * Math.PI * i) / 3000;
      return [50 + 40 * Math.cos(t), 50 + 40 * Math.sin(t)];
    });
    const res = await owner.client
      .post('/api/plans/job-preview', {
        rolls: [{ widthFt: 15 }],
        areas: [
          { id: 'a', area: { outer: ring } },
          { id: 'b', area: { outer: ring } },
        ],
      })
      .expect(422);
    expect(res.body.detail).toBe('areas must have at most 5000 points in all (they have 6000)');
    expect(res.body.errors[0].path).toBe('areas');
  });
});
