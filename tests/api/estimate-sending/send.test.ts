// POST /api/estimates/:id/send: a private link stored only as its hash, the estimate frozen as
// sent (a lead job moves to estimated), and the e-mail (read from maildev's API) with the PDF
// attached and the customer-page link carrying the token.
import { createHash } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { signUpTeam, uniqueEmail } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { errorPaths } from '../../fixtures/estimates.js';
import { countMailsTo } from '../../fixtures/mail.js';
import { customerToken, pricedJob, waitForEstimateMail } from './sending-fixtures.js';

const linkRows = (estimateId: string) =>
  selectRows(
    testApp().sequelize,
    'SELECT token_hash, expires_at, revoked_at FROM estimate_links WHERE estimate_id = ? ORDER BY created_at',
    [estimateId],
  );

describe('POST /api/estimates/:id/send', () => {
  let team: Team;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
  });

  it('sends the PDF and a private link, keeps only the hash, and marks the estimate sent', async () => {
    const job = await pricedJob(team.owner.client);
    const res = await team.office.client
      .post(`/api/estimates/${job.estimate.id}/send`, {})
      .expect(200);
    expect(res.body.data).toMatchObject({ id: job.estimate.id, status: 'sent' });
    expect(res.body.data.sentAt).toEqual(expect.any(String));

    const mail = await waitForEstimateMail(job.customerEmail);
    expect(mail.subject).toContain('Your estimate from');
    const pdfs = (mail.attachments ?? []).filter((a) => a.contentType === 'application/pdf');
    expect(pdfs).toHaveLength(1);
    const token = customerToken(mail);
    // 32 random bytes in base64url: 256 bits, far above the 128 the link needs.
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);

    const rows = await linkRows(job.estimate.id);
    expect(rows).toHaveLength(1);
    expect(rows[0]?.token_hash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(JSON.stringify(rows)).not.toContain(token);
    // No validity date: the link lasts 30 days (to local midnight after the 30th day).
    const expiresAt = new Date(String(rows[0]?.expires_at)).getTime();
    const days = (expiresAt - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(29.9);
    expect(days).toBeLessThan(31.1);

    const jobRes = await team.owner.client.get(`/api/jobs/${job.jobId}`).expect(200);
    expect(jobRes.body.data.status).toBe('estimated');
  });

  it('sends to `to` when given, and a resend makes a new link', async () => {
    const job = await pricedJob(team.owner.client);
    const other = uniqueEmail('other');
    await team.owner.client
      .post(`/api/estimates/${job.estimate.id}/send`, { to: other })
      .expect(200);
    await waitForEstimateMail(other);
    expect(await countMailsTo(job.customerEmail)).toBe(0);
    await team.owner.client.post(`/api/estimates/${job.estimate.id}/send`, {}).expect(200);
    await waitForEstimateMail(job.customerEmail);
    expect(await linkRows(job.estimate.id)).toHaveLength(2);
  });

  it('answers 400 naming `to` when the customer has no e-mail, and changes nothing', async () => {
    const job = await pricedJob(team.owner.client, { email: null });
    const res = await team.owner.client
      .post(`/api/estimates/${job.estimate.id}/send`, {})
      .expect(400);
    expect(errorPaths(res.body)).toEqual(['to']);
    const bad = await team.owner.client
      .post(`/api/estimates/${job.estimate.id}/send`, { to: 'not-an-address' })
      .expect(400);
    expect(errorPaths(bad.body)).toEqual(['to']);
    expect(await linkRows(job.estimate.id)).toHaveLength(0);
    const estimate = await team.owner.client.get(`/api/estimates/${job.estimate.id}`).expect(200);
    expect(estimate.body.data.status).toBe('draft');
  });

  it('revokes the links', async () => {
    const job = await pricedJob(team.owner.client);
    await team.owner.client.post(`/api/estimates/${job.estimate.id}/send`, {}).expect(200);
    const res = await team.office.client
      .post(`/api/estimates/${job.estimate.id}/links/revoke`, {})
      .expect(200);
    expect(res.body.data).toEqual({ revoked: 1 });
    const rows = await linkRows(job.estimate.id);
    expect(rows[0]?.revoked_at).not.toBeNull();
  });

  it('is for owners and office: bookkeepers and crew leads get 403', async () => {
    const job = await pricedJob(team.owner.client);
    for (const who of [team.bookkeeper, team.crew]) {
      await who.client.post(`/api/estimates/${job.estimate.id}/send`, {}).expect(403);
      await who.client.post(`/api/estimates/${job.estimate.id}/links/revoke`, {}).expect(403);
    }
    expect(await linkRows(job.estimate.id)).toHaveLength(0);
  });
});
