// The customer's page and answers (no account; the e-mailed token is the credential):
// the view hides internal figures; accept, decline, twice, tampered, revoked and expired links;
// nothing changes on any refusal (the rows are read back).
import { beforeAll, describe, expect, it } from 'vitest';
import type { PublicEstimateView } from '@seamwright/shared';
import { executeSql, selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { newClient } from '../../fixtures/client.js';
import type { Client } from '../../fixtures/client.js';
import { errorPaths } from '../../fixtures/estimates.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { countMailsTo, waitForMail } from '../../fixtures/mail.js';
import { turfProducts } from '../../fixtures/areas.js';
import { pricedJob, sendAndReadToken } from './sending-fixtures.js';
import type { PricedJob } from './sending-fixtures.js';

async function stateOf(job: PricedJob) {
  const q = (sql: string, id: string) => selectRows(testApp().sequelize, sql, [id]);
  return {
    estimate: await q(
      'SELECT status, chosen_tier_id, updated_at FROM estimates WHERE id = ?',
      job.estimate.id,
    ),
    job: await q('SELECT status, updated_at FROM jobs WHERE id = ?', job.jobId),
    answers: await q(
      'SELECT kind, name FROM estimate_answers WHERE estimate_id = ?',
      job.estimate.id,
    ),
    audit: await q('SELECT COUNT(*) AS n FROM audit_events WHERE entity_id = ?', job.jobId),
  };
}

describe('the customer’s estimate page', () => {
  let team: Team;
  let customer: Client;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    customer = await newClient(testApp().app);
    // 10 % markup (invented test rate): the view must not show it or the cost behind a price.
    await team.owner.client
      .patch('/api/estimating-settings', { markupBasisPoints: 1000 })
      .expect(200);
  });

  it('shows the estimate without internal figures', async () => {
    const job = await pricedJob(team.owner.client);
    const token = await sendAndReadToken(team.owner.client, job);
    const res = await customer.get(`/api/public/estimates/${token}`).expect(200);
    const view = res.body.data as PublicEstimateView;
    expect(view).toMatchObject({
      customer: { name: 'Wren Halloway' },
      jobTitle: 'Back yard turf',
      status: 'sent',
      version: 1,
      answer: null,
    });
    expect(view.tiers).toHaveLength(1);
    expect(view.tiers[0]!.totalCents).toBe(job.estimate.totalCents);
    expect(view.tiers[0]!.depositCents).toBe(job.estimate.depositCents);
    expect(Object.keys(view.tiers[0]!.lines[0]!).sort()).toEqual(
      ['amountCents', 'label', 'quantity', 'unit', 'unitPriceCents'].sort(),
    );
    expect(view.areas[0]!.outline!.outer.length).toBeGreaterThan(2);
    expect(view.areas[0]!.plan.pieces).toEqual(expect.arrayContaining([expect.anything()]));
    expect(view.roundingRule).toBe(job.estimate.roundingRule);
    // An online acceptance is not covered by the cancellation rules (TRADE.md §8.2).
    expect(view.cancellation).toMatchObject({ applies: false, notice: null });
    const text = JSON.stringify(view);
    // No internal field anywhere (as a JSON key), and no ids or e-mails of the office's records.
    for (const key of [
      'markupBasisPoints',
      'taxRateBasisPoints',
      'priceBookItemId',
      'computed',
      'warnings',
      'taxable',
      'rule',
      'source',
      'createdBy',
      'costMillicents',
    ])
      expect(text).not.toContain(`"${key}":`);
    for (const value of [job.jobId, job.estimate.id, job.customerEmail])
      expect(text).not.toContain(value);
  });

  it('accepts once: records name, IP and browser, moves the job, and tells the company', async () => {
    const job = await pricedJob(team.owner.client);
    const token = await sendAndReadToken(team.owner.client, job);
    const before = await countMailsTo(team.office.email);
    const res = await customer.agent
      .post(`/api/public/estimates/${token}/accept`)
      .set('x-csrf-token', customer.csrf)
      .set('user-agent', 'TestBrowser/1.0')
      .send({ name: 'Wren Halloway' })
      .expect(200);
    expect(res.body.data).toEqual({ acceptedAt: expect.any(String), cancellationEndsAt: null });
    const [answer] = await selectRows(
      testApp().sequelize,
      'SELECT kind, name, tier_id, place, ip, user_agent, cancellation_ends_at FROM estimate_answers WHERE estimate_id = ?',
      [job.estimate.id],
    );
    expect(answer).toMatchObject({
      kind: 'accepted',
      name: 'Wren Halloway',
      tier_id: job.estimate.tiers[0]!.id,
      place: 'online',
      user_agent: 'TestBrowser/1.0',
      cancellation_ends_at: null,
    });
    expect(String(answer?.ip)).toMatch(/127\.0\.0\.1/);
    const estimate = await team.owner.client.get(`/api/estimates/${job.estimate.id}`).expect(200);
    expect(estimate.body.data).toMatchObject({
      status: 'accepted',
      chosenTierId: job.estimate.tiers[0]!.id,
    });
    const jobRes = await team.owner.client.get(`/api/jobs/${job.jobId}`).expect(200);
    expect(jobRes.body.data.status).toBe('accepted');
    const actions = jobRes.body.data.activity as { action: string; userName: string | null }[];
    expect(actions.map((a) => a.action)).toContain('job.estimate_accepted');
    expect(actions.find((a) => a.action === 'job.status_changed')?.userName).toBeNull();
    const mail = await waitForMail(team.office.email);
    expect(mail.subject).toContain('accepted');
    expect(await countMailsTo(team.office.email)).toBe(before + 1);

    // Twice: 409, nothing changes.
    const state = await stateOf(job);
    await customer.post(`/api/public/estimates/${token}/accept`, { name: 'Wren' }).expect(409);
    await customer.post(`/api/public/estimates/${token}/decline`, {}).expect(409);
    expect(await stateOf(job)).toEqual(state);
    const after = await customer.get(`/api/public/estimates/${token}`).expect(200);
    expect(after.body.data.answer).toMatchObject({ kind: 'accepted', cancellationEndsAt: null });
  });

  it('declines with a reason', async () => {
    const job = await pricedJob(team.owner.client);
    const token = await sendAndReadToken(team.owner.client, job);
    await customer
      .post(`/api/public/estimates/${token}/decline`, { reason: 'Too dear for us this year' })
      .expect(200);
    const [row] = await selectRows(
      testApp().sequelize,
      'SELECT kind, reason FROM estimate_answers WHERE estimate_id = ?',
      [job.estimate.id],
    );
    expect(row).toEqual({ kind: 'declined', reason: 'Too dear for us this year' });
    const estimate = await team.owner.client.get(`/api/estimates/${job.estimate.id}`).expect(200);
    expect(estimate.body.data.status).toBe('declined');
    await customer.post(`/api/public/estimates/${token}/accept`, { name: 'Wren' }).expect(409);
  });

  it('refuses unknown, tampered, revoked and expired links, and changes nothing', async () => {
    const job = await pricedJob(team.owner.client);
    const token = await sendAndReadToken(team.owner.client, job);
    const state = await stateOf(job);
    const flipped = `${token.slice(0, -1)}${token.endsWith('A') ? 'B' : 'A'}`;
    for (const bad of [flipped, 'short', `${token}x`, 'A'.repeat(43)]) {
      await customer.get(`/api/public/estimates/${bad}`).expect(404);
      await customer.post(`/api/public/estimates/${bad}/accept`, { name: 'Mallory' }).expect(404);
      await customer.post(`/api/public/estimates/${bad}/decline`, {}).expect(404);
    }
    expect(await stateOf(job)).toEqual(state);

    await executeSql(
      testApp().sequelize,
      'UPDATE estimate_links SET expires_at = ? WHERE estimate_id = ?',
      [new Date(Date.now() - 1000), job.estimate.id],
    );
    const expired = await customer.get(`/api/public/estimates/${token}`).expect(410);
    expect(expired.body.code).toBe('TOKEN_INVALID');
    await customer.post(`/api/public/estimates/${token}/accept`, { name: 'Wren' }).expect(410);
    expect(await stateOf(job)).toEqual(state);

    const fresh = await sendAndReadToken(team.owner.client, job);
    await customer.get(`/api/public/estimates/${fresh}`).expect(200);
    await team.owner.client.post(`/api/estimates/${job.estimate.id}/links/revoke`, {}).expect(200);
    const revokedState = await stateOf(job);
    await customer.get(`/api/public/estimates/${fresh}`).expect(404);
    await customer.post(`/api/public/estimates/${fresh}/accept`, { name: 'Wren' }).expect(404);
    expect(await stateOf(job)).toEqual(revokedState);
  });

  it('asks for `tierId` on a multi-tier estimate, and takes the chosen tier', async () => {
    const products = await turfProducts(team.owner.client);
    const job = await pricedJob(team.owner.client, {
      estimate: {
        tiers: [
          { name: 'Good', turfProductId: products[0]!.id },
          { name: 'Better', turfProductId: products[1]!.id },
        ],
      },
    });
    const token = await sendAndReadToken(team.owner.client, job);
    const state = await stateOf(job);
    const missing = await customer
      .post(`/api/public/estimates/${token}/accept`, { name: 'Wren' })
      .expect(400);
    expect(errorPaths(missing.body)).toEqual(['tierId']);
    const unknown = await customer
      .post(`/api/public/estimates/${token}/accept`, { name: 'Wren', tierId: 'nope' })
      .expect(400);
    expect(errorPaths(unknown.body)).toEqual(['tierId']);
    const noName = await customer
      .post(`/api/public/estimates/${token}/accept`, { name: ' ' })
      .expect(400);
    expect(errorPaths(noName.body)).toEqual(['name']);
    expect(await stateOf(job)).toEqual(state);

    const better = job.estimate.tiers[1]!;
    await customer
      .post(`/api/public/estimates/${token}/accept`, { name: 'Wren', tierId: better.id })
      .expect(200);
    const estimate = await team.owner.client.get(`/api/estimates/${job.estimate.id}`).expect(200);
    expect(estimate.body.data).toMatchObject({
      status: 'accepted',
      chosenTierId: better.id,
      totalCents: better.totalCents,
    });
  });
});
