// Versions: sending freezes a version (markEstimateSent, used by the sending step), a revision
// copies it into the next draft and supersedes it, and a job has one draft at a time.
import { beforeAll, describe, expect, it } from 'vitest';
import { getEstimateForDocument, markEstimateSent } from '@seamwright/api';
import type { EstimateView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { areaBody, createArea, turfProducts } from '../../fixtures/areas.js';
import { activityActions, createEstimate, estimateRows, listOf } from '../../fixtures/estimates.js';
import { createCustomer, createJob, createSite, signUpCompany } from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';

describe('estimate versions', () => {
  let owner: SignedIn;
  let customerId: string;
  let siteId: string;
  let landscape: string;
  const ctx = () => ({
    userId: owner.me.user.id,
    companyId: owner.me.company.id,
    role: 'owner' as const,
  });

  const newJobWithArea = async () => {
    const jobId = (await createJob(owner.client, customerId, siteId, 'Versions')).id;
    await createArea(owner.client, jobId, areaBody({ turfProductId: landscape }));
    return jobId;
  };

  beforeAll(async () => {
    owner = await signUpCompany(testApp().app);
    customerId = (await createCustomer(owner.client, { name: 'Wren Halloway' })).id;
    siteId = (await createSite(owner.client, customerId)).id;
    landscape = (await turfProducts(owner.client)).find((p) => p.key === 'turf-landscape-175')!.id;
  });

  it('freezes a sent version, moves a lead to estimated, and answers 409 to any change', async () => {
    const jobId = await newJobWithArea();
    const estimate = await createEstimate(owner.client, jobId, { notes: 'First' });
    const sentAt = new Date('2026-12-01T15:00:00.000Z');
    const sent = await markEstimateSent(ctx(), estimate.id, { sentAt });
    expect(sent).toMatchObject({ status: 'sent', sentAt: sentAt.toISOString() });
    const job = await owner.client.get(`/api/jobs/${jobId}`).expect(200);
    expect(job.body.data.status).toBe('estimated');
    expect(activityActions(job.body)).toEqual(
      expect.arrayContaining(['job.estimate_sent', 'job.status_changed']),
    );
    // Sending the same version again changes nothing.
    await markEstimateSent(ctx(), estimate.id, { sentAt: new Date() });
    const [before] = await estimateRows(jobId);
    for (const body of [
      { notes: 'Changed' },
      { validUntil: '2027-01-01' },
      { lines: { remove: [estimate.lines[0]!.id] } },
      { tiers: { rename: [{ id: estimate.tiers[0]!.id, name: 'x' }] } },
    ]) {
      const res = await owner.client.patch(`/api/estimates/${estimate.id}`, body).expect(409);
      expect(res.body.detail).toMatch(/Version 1 is sent/);
    }
    expect((await estimateRows(jobId))[0]).toEqual(before);
    expect(before).toMatchObject({ status: 'sent', notes: 'First' });
  });

  it('revises a sent version into the next draft and supersedes it', async () => {
    const jobId = await newJobWithArea();
    const v1 = await createEstimate(owner.client, jobId, { notes: 'Original' });
    // Only a sent version can be revised.
    const early = await owner.client.post(`/api/estimates/${v1.id}/revisions`, {}).expect(409);
    expect(early.body.detail).toMatch(/draft/);
    await markEstimateSent(ctx(), v1.id, { sentAt: new Date() });
    const res = await owner.client.post(`/api/estimates/${v1.id}/revisions`, {}).expect(201);
    const v2 = res.body.data as EstimateView;
    expect(v2).toMatchObject({ version: 2, status: 'draft', notes: 'Original', sentAt: null });
    expect(v2.totalCents).toBe(v1.totalCents);
    expect(v2.lines.map((l) => l.amountCents)).toEqual(v1.lines.map((l) => l.amountCents));
    const rows = await estimateRows(jobId);
    expect(rows.map((r) => [r.version, r.status])).toEqual([
      [1, 'superseded'],
      [2, 'draft'],
    ]);
    // The superseded one cannot be revised or changed; the new draft can.
    await owner.client.post(`/api/estimates/${v1.id}/revisions`, {}).expect(409);
    await owner.client.patch(`/api/estimates/${v1.id}`, { notes: 'x' }).expect(409);
    await owner.client.patch(`/api/estimates/${v2.id}`, { notes: 'Revised' }).expect(200);
    const list = await owner.client.get(`/api/jobs/${jobId}/estimates`).expect(200);
    expect(listOf(list.body).map((e) => e.version)).toEqual([2, 1]);
  });

  it('keeps one draft per job: a revision while a draft exists is a 409', async () => {
    const jobId = await newJobWithArea();
    const v1 = await createEstimate(owner.client, jobId);
    await markEstimateSent(ctx(), v1.id, { sentAt: new Date() });
    const v2 = await createEstimate(owner.client, jobId);
    expect(v2.version).toBe(2);
    const res = await owner.client.post(`/api/estimates/${v1.id}/revisions`, {}).expect(409);
    expect(res.body.detail).toMatch(/Version 2 .* still a draft/);
    expect((await estimateRows(jobId)).map((r) => [r.version, r.status])).toEqual([
      [1, 'sent'],
      [2, 'draft'],
    ]);
  });

  it('reads everything the estimate document needs, and 404s another company', async () => {
    const jobId = await newJobWithArea();
    const estimate = await createEstimate(owner.client, jobId);
    const doc = await getEstimateForDocument(ctx(), estimate.id);
    expect(doc.company.name).toBe(owner.me.company.name);
    expect(doc.customer.name).toBe('Wren Halloway');
    expect(doc.site.id).toBe(siteId);
    expect(doc.job).toMatchObject({ id: jobId, title: 'Versions' });
    expect(doc.estimate.id).toBe(estimate.id);
    expect(doc.estimate.tiers[0]!.lines.length).toBeGreaterThan(0);
    expect(doc.areas).toHaveLength(1);
    expect(doc.areas[0]!.plan.pieces.length).toBeGreaterThan(0);
    expect(doc.roundingRule).toMatch(/half-up/);
    const other = await signUpCompany(testApp().app);
    const otherCtx = {
      userId: other.me.user.id,
      companyId: other.me.company.id,
      role: 'owner' as const,
    };
    await expect(getEstimateForDocument(otherCtx, estimate.id)).rejects.toMatchObject({
      code: 'NOT_FOUND',
    });
    await expect(
      markEstimateSent(otherCtx, estimate.id, { sentAt: new Date() }),
    ).rejects.toMatchObject({ code: 'NOT_FOUND' });
  });
});
