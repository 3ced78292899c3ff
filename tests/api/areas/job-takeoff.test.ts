import { beforeAll, describe, expect, it } from 'vitest';
import { getJobTakeoff, listJobTurfPieces } from '@seamwright/api';
import { computeTakeoff, defaultTakeoffSettings } from '@seamwright/takeoff';
import type { JobTakeoffLineView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { areaBody, createArea, lShape, planter, turfProducts } from '../../fixtures/areas.js';
import { createCustomer, createJob, createSite, signUpCompany } from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';

const lineOf = (lines: unknown, key: string) => {
  const line = (lines as JobTakeoffLineView[]).find((l) => l.key === key);
  if (!line) throw new Error(`no ${key} line`);
  return line;
};

describe('GET /api/jobs/:id/takeoff', () => {
  let owner: SignedIn;
  let jobId: string;
  let emptyJobId: string;

  beforeAll(async () => {
    owner = await signUpCompany(testApp().app);
    const customer = await createCustomer(owner.client);
    const site = await createSite(owner.client, customer.id);
    jobId = (await createJob(owner.client, customer.id, site.id, 'Two areas')).id;
    emptyJobId = (await createJob(owner.client, customer.id, site.id, 'No areas')).id;
  });

  it('has no lines for a job without areas, and 404 for a job that is not there', async () => {
    const res = await owner.client.get(`/api/jobs/${emptyJobId}/takeoff`).expect(200);
    expect(res.body.data).toEqual({ jobId: emptyJobId, lines: [], areas: [], cautions: [] });
    await owner.client.get('/api/jobs/0b5f1c1e-5d7e-4a39-9f55-3f9d2a1b0c4d/takeoff').expect(404);
  });

  it('adds up the takeoff of every area, each line naming its rule and every area’s share', async () => {
    const turf = (await turfProducts(owner.client)).find((p) => p.key === 'turf-landscape-175')!;
    const lawn = await createArea(owner.client, jobId, areaBody({ turfProductId: turf.id }));
    const play = await createArea(
      owner.client,
      jobId,
      areaBody({
        name: 'Play corner',
        usage: 'play',
        area: { outer: lShape, holes: [planter] },
        trafficPaths: [
          [
            [2, 25],
            [38, 2],
          ],
        ],
        baseDepthIn: 4,
        grain: 'cheapest',
      }),
    );
    const res = await owner.client.get(`/api/jobs/${jobId}/takeoff`).expect(200);
    const { lines, areas, cautions } = res.body.data as {
      lines: JobTakeoffLineView[];
      areas: { id: string; cautions: { key: string }[] }[];
      cautions: { key: string; deferral: string }[];
    };
    const turfLine = lineOf(lines, 'turf');
    expect(turfLine).toMatchObject({
      unit: 'sq ft',
      quantity: lawn.orderedSqFt + play.orderedSqFt,
    });
    expect(turfLine.rule).toMatch(/sum of 2 areas/);
    expect(turfLine.areas.map((a) => [a.areaId, a.turfProductId])).toEqual([
      [lawn.id, turf.id],
      [play.id, null],
    ]);
    // Each area's line is the takeoff package's own line for that area on the standard settings
    // (this company changed none); the job line adds them up.
    const mine = (area: typeof lawn, extra: Record<string, unknown>) =>
      computeTakeoff(
        {
          usage: area.usage,
          areaSqFt: area.plan.areaSqFt,
          perimeterFt: area.plan.perimeterFt,
          seams: area.plan.seams,
          turf: { orderedSqFt: area.plan.orderedSqFt, pieces: area.plan.pieces },
          ...extra,
        },
        defaultTakeoffSettings,
      );
    const lawnBase = mine(lawn, {}).find((l) => l.key === 'base-stone-tons')!;
    const playBase = mine(play, { baseDepthIn: 4 }).find((l) => l.key === 'base-stone-tons')!;
    const base = lineOf(lines, 'base-stone-tons');
    expect(base.areas.map((a) => a.quantity)).toEqual([lawnBase.quantity, playBase.quantity]);
    expect(base.quantity).toBeCloseTo(lawnBase.quantity + playBase.quantity, 9);
    expect(base.unit).toBe('tons');
    // Guidance is not an amount: the job shows the largest (compaction target, same for both).
    expect(lineOf(lines, 'compaction').quantity).toBe(
      lineOf(lines, 'compaction').areas[0]!.quantity,
    );
    for (const line of lines) {
      expect(line.rule.length).toBeGreaterThan(0);
      expect(Number.isFinite(line.quantity)).toBe(true);
    }
    // Digging and play equipment raise their cautions; every one defers to local codes.
    expect(areas.map((a) => a.id)).toEqual([lawn.id, play.id]);
    expect(areas[1]!.cautions.map((c) => c.key)).toContain('playground-fall-height');
    expect(areas[0]!.cautions.map((c) => c.key)).not.toContain('playground-fall-height');
    expect(cautions.map((c) => c.key)).toEqual(
      expect.arrayContaining(['utility-locate', 'playground-fall-height', 'turf-heat']),
    );
    for (const caution of cautions) expect(caution.deferral).toMatch(/local codes/);
  });

  it('uses the company’s own estimating settings', async () => {
    const before = lineOf(
      (await owner.client.get(`/api/jobs/${jobId}/takeoff`).expect(200)).body.data.lines,
      'base-stone-volume',
    );
    // 3 in → 5 in for the area that has no depth of its own (the lawn); the play area keeps 4 in.
    await owner.client
      .patch('/api/estimating-settings', { takeoff: { base: { depthIn: 5 } } })
      .expect(200);
    const after = lineOf(
      (await owner.client.get(`/api/jobs/${jobId}/takeoff`).expect(200)).body.data.lines,
      'base-stone-volume',
    );
    expect(after.areas[0]!.rawQuantity).toBeCloseTo((before.areas[0]!.rawQuantity * 5) / 3, 9);
    expect(after.areas[1]!.rawQuantity).toBeCloseTo(before.areas[1]!.rawQuantity, 9);
  });

  it('gives other modules the takeoff and the saved pieces per turf product', async () => {
    const ctx = {
      userId: owner.me.user.id,
      companyId: owner.me.company.id,
      role: 'owner' as const,
    };
    const areas = (await owner.client.get(`/api/jobs/${jobId}/areas`).expect(200)).body.data as {
      id: string;
      name: string;
      turfProductId: string | null;
      plan: { pieces: { widthFt: number; lengthFt: number }[] };
    }[];
    const groups = await listJobTurfPieces(ctx, jobId);
    expect(groups.map((g) => g.turfProductId)).toEqual(areas.map((a) => a.turfProductId));
    for (const [i, group] of groups.entries()) {
      const area = areas[i]!;
      expect(group.pieces).toEqual(
        area.plan.pieces.map((p, piece) => ({ areaId: area.id, areaName: area.name, piece, ...p })),
      );
      expect(group.orderedSqFt).toBe(
        area.plan.pieces.reduce((s, p) => s + p.widthFt * p.lengthFt, 0),
      );
    }
    expect(groups[0]!.turfProductName).toMatch(/Landscape turf/);
    const api = (await owner.client.get(`/api/jobs/${jobId}/takeoff`).expect(200)).body.data;
    expect(await getJobTakeoff(ctx, jobId)).toEqual(api);
    // Another company's context sees no such job.
    const other = await signUpCompany(testApp().app);
    const otherCtx = {
      userId: other.me.user.id,
      companyId: other.me.company.id,
      role: 'owner' as const,
    };
    await expect(listJobTurfPieces(otherCtx, jobId)).rejects.toMatchObject({ code: 'NOT_FOUND' });
    await expect(getJobTakeoff(otherCtx, jobId)).rejects.toMatchObject({ code: 'NOT_FOUND' });
  });
});
