// The planner runs in worker threads with limits and a time budget: one request can no
// longer stall the API (issue 6, item 1).
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { MAX_HOLES, MAX_TOTAL_VERTICES, contractExampleRequest } from '@seamwright/takeoff';
import { testAppWith } from '../../fixtures/app.js';
import type { App } from '../../fixtures/app.js';
import type { PlannerPool } from '@seamwright/api';
import { signUpCompany } from '../../fixtures/factories.js';
import { incidentRequest, worstCaseWithinLimits } from './heavy-requests.js';

/** Milliseconds one request takes to answer. */
async function timed(run: () => Promise<unknown>): Promise<number> {
  const start = Date.now();
  await run();
  return Date.now() - start;
}

/** Waits (at most 10 s) until the pool holds `count` plans, running or queued. */
async function untilInFlight(pool: PlannerPool, count: number): Promise<void> {
  const deadline = Date.now() + 10_000;
  while (pool.tasksInFlight < count) {
    if (Date.now() > deadline) throw new Error(`the pool never held ${count} plans`);
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

async function warmedOwner(app: App) {
  const owner = await signUpCompany(app);
  // The first plan starts the worker thread (about 2 s under tsx); later ones find it ready.
  await owner.client.post('/api/plans/preview', contractExampleRequest()).expect(200);
  return owner;
}

describe('POST /api/plans/preview limits and budget', () => {
  it('refuses the incident request (12,900 points) with 422 naming the vertex limit', async () => {
    const { app } = testAppWith({});
    const owner = await signUpCompany(app);
    let res: request.Response | undefined;
    const ms = await timed(async () => {
      res = await owner.client.post('/api/plans/preview', incidentRequest()).expect(422);
    });
    expect(res?.body.code).toBe('UNPROCESSABLE');
    expect(res?.body.detail).toBe(
      `area must have at most ${MAX_TOTAL_VERTICES} points across the outer ring and holes (it has 12900)`,
    );
    expect(res?.body.errors).toEqual([
      {
        path: 'area',
        message: `must have at most ${MAX_TOTAL_VERTICES} points across the outer ring and holes (it has 12900)`,
      },
    ]);
    // The size check reads array lengths only: no thread, no ring check.
    expect(ms).toBeLessThan(2000);
  });

  it('names the holes limit and the length-step limit with their fields', async () => {
    const { app } = testAppWith({});
    const owner = await signUpCompany(app);
    const rectangle = contractExampleRequest();
    const holes = await owner.client
      .post('/api/plans/preview', {
        ...rectangle,
        area: { ...rectangle.area, holes: Array.from({ length: MAX_HOLES + 1 }, () => []) },
      })
      .expect(422);
    expect(holes.body.errors[0].path).toBe('area.holes');
    expect(holes.body.detail).toContain(`at most ${MAX_HOLES} holes`);
    const step = await owner.client
      .post('/api/plans/preview', { ...rectangle, lengthStepFt: 0.01 })
      .expect(422);
    expect(step.body.errors).toEqual([
      { path: 'lengthStepFt', message: 'must be at least 1 in (1/12 ft)' },
    ]);
  });

  it('keeps field paths for input errors found inside the worker', async () => {
    const { app } = testAppWith({});
    const owner = await signUpCompany(app);
    const rectangle = contractExampleRequest();
    const res = await owner.client
      .post('/api/plans/preview', {
        ...rectangle,
        area: {
          outer: rectangle.area.outer,
          holes: [
            [
              [2, 2],
              [8, 2],
              [8, 8],
              [2, 8],
            ],
            [
              [3, 3],
              [5, 3],
              [5, 5],
            ],
          ],
        },
      })
      .expect(422);
    expect(res.body.detail).toBe('area.holes[1]: hole overlaps area.holes[0] at (3, 3)');
    expect(res.body.errors[0].path).toBe('area.holes.1');
  });

  it('stops a plan past its time budget and answers 422 saying so', async () => {
    const { app } = testAppWith({ PLANNER_BUDGET_MS: '800' });
    const owner = await warmedOwner(app);
    let res: request.Response | undefined;
    const ms = await timed(async () => {
      res = await owner.client.post('/api/plans/preview', worstCaseWithinLimits()).expect(422);
    });
    expect(res?.body.code).toBe('UNPROCESSABLE');
    expect(res?.body.detail).toMatch(/^Planning this layout took longer than the 0\.8 s limit/);
    // The budget plus the body's parse and transfer, never the minutes the plan would take.
    expect(ms).toBeLessThan(5000);
    // The stopped thread is replaced: the next plan is answered.
    await owner.client.post('/api/plans/preview', contractExampleRequest()).expect(200);
  });

  it('answers health and the customers list within 200 ms while a worst-case plan runs', async () => {
    const { app, plannerPool } = testAppWith({ PLANNER_BUDGET_MS: '6000' });
    const owner = await warmedOwner(app);
    let settled = false;
    const slow = owner.client.post('/api/plans/preview', worstCaseWithinLimits()).then((res) => {
      settled = true;
      return res;
    });
    // The body has arrived and the task is in the pool; give the worker a moment to take it.
    await untilInFlight(plannerPool, 1);
    await new Promise((resolve) => setTimeout(resolve, 200));
    const health: number[] = [];
    const customers: number[] = [];
    for (let i = 0; i < 7; i += 1) {
      health.push(await timed(() => request(app).get('/api/health').expect(200)));
      customers.push(await timed(() => owner.client.get('/api/customers').expect(200)));
    }
    // Every answer came while the plan was still running.
    expect(settled).toBe(false);
    // The median, so one scheduling hiccup on a shared test machine does not decide; before
    // the pool every call waited for the whole plan (minutes).
    const median = (values: number[]) => [...values].sort((x, y) => x - y)[3] as number;
    expect(median(health)).toBeLessThan(200);
    expect(median(customers)).toBeLessThan(200);
    expect(Math.max(...health, ...customers)).toBeLessThan(1000);
    const res = await slow;
    expect(res.status).toBe(422);
    expect(res.body.detail).toContain('took longer than the 6 s limit');
  });

  it('answers 503 with Retry-After when the planner queue is full', async () => {
    const { app, plannerPool } = testAppWith({
      PLANNER_THREADS: '1',
      PLANNER_MAX_QUEUE: '1',
      PLANNER_BUDGET_MS: '5000',
    });
    const owner = await warmedOwner(app);
    const post = () =>
      owner.client.post('/api/plans/preview', worstCaseWithinLimits()).then((res) => res);
    // One plan on the only thread and one waiting fill the pool (1 thread + queue of 1).
    const running = post();
    const queued = post();
    await untilInFlight(plannerPool, 2);
    const refused = await post();
    expect(refused.status).toBe(503);
    expect(refused.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(refused.body.code).toBe('SERVICE_BUSY');
    expect(refused.headers['retry-after']).toBe('5');
    // Shutting the pool down answers what it still holds with 503 too, never a hang.
    await plannerPool.close();
    expect((await running).status).toBe(503);
    expect((await queued).status).toBe(503);
  });
});
