// GET /api/estimates/:id/pdf: the saved estimate as the customer's PDF, parsed back with
// pdf-parse and compared with the API's own figures.
import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../fixtures/app.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { dollars, fold, pdfText } from '../estimate-document/pdf-text.js';
import { binary, pricedJob } from './sending-fixtures.js';
import type { PricedJob } from './sending-fixtures.js';

describe('GET /api/estimates/:id/pdf', () => {
  let team: Team;
  let job: PricedJob;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    job = await pricedJob(team.owner.client);
  });

  it('answers a PDF attachment whose totals are the API’s', async () => {
    const res = await team.office.client
      .get(`/api/estimates/${job.estimate.id}/pdf`)
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="estimate-E-[A-Z0-9-]+-v1\.pdf"$/,
    );
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const { text } = await pdfText(pdf);
    // The API's total, formatted by an independent formatter (Intl via toLocaleString).
    expect(text).toContain(`Total ${dollars(job.estimate.totalCents)}`);
    expect(text).toContain(dollars(job.estimate.depositCents));
    for (const line of job.estimate.lines) expect(text).toContain(line.label);
    expect(text).toContain(fold(job.estimate.roundingRule));
    expect(text).toContain('Wren Halloway');
    expect(text).toContain('Plan: Back yard');
    // The company has no region set, so it is taken to be in the US, where a home sale of this
    // size is covered (TRADE.md §8.2, FTC rule: $25 or more at the buyer's home).
    expect(text).toContain('Notice of cancellation');
  });

  it('is for the office: the bookkeeper reads it, the crew lead gets 403', async () => {
    await team.bookkeeper.client
      .get(`/api/estimates/${job.estimate.id}/pdf`)
      .buffer(true)
      .parse(binary)
      .expect(200);
    const crew = await team.crew.client.get(`/api/estimates/${job.estimate.id}/pdf`);
    expect(crew.status).toBe(403);
  });
});
