import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { testApp } from '../../fixtures/app.js';
import { addMember, signUpCompany } from '../../fixtures/factories.js';
import { contractExampleRequest } from '@seamwright/takeoff';

// The request and plan shapes are the planner contract in DOMAIN.md.
const rectangle = contractExampleRequest();

describe('POST /api/plans/preview', () => {
  it('returns the plan for a 30 × 20 ft rectangle to any signed-in role, crew leads included', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const crew = await addMember(app, owner.client, 'crew_lead');
    const res = await crew.client.post('/api/plans/preview', rectangle).expect(200);
    // arithmetic: 30 ft × 20 ft = 600 sq ft; two 15 ft strips of 20 ft cover it exactly.
    expect(res.body.data.areaSqFt).toBeCloseTo(600, 6);
    expect(res.body.data.orderedSqFt).toBe(600);
    expect(res.body.data.seams.count).toBe(1);
  });

  it("answers 422 with the planner's message and a field path for an impossible area", async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const res = await owner.client
      .post('/api/plans/preview', {
        ...rectangle,
        area: {
          outer: [
            [0, 0],
            [10, 0],
          ],
          holes: [],
        },
      })
      .expect(422);
    expect(res.body.code).toBe('UNPROCESSABLE');
    expect(res.body.detail).toContain('area.outer');
    expect(res.body.errors[0].path).toBe('area.outer');
  });

  it('answers 400 for invalid JSON and 401 when signed out', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    await owner.client.agent
      .post('/api/plans/preview')
      .set('x-csrf-token', owner.client.csrf)
      .set('content-type', 'application/json')
      .send('{"area":')
      .expect(400);
    const anonymous = request.agent(app);
    const token = (await anonymous.get('/api/auth/csrf')).body.data.token as string;
    await anonymous
      .post('/api/plans/preview')
      .set('x-csrf-token', token)
      .send(rectangle)
      .expect(401);
  });
});
