// The customer statement: GET …/statement.pdf parsed back with pdf-parse and compared with the
// aging report; POST …/statement e-mails it (maildev).
import type { AgingReportView } from '@seamwright/shared';
import { beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../fixtures/app.js';
import { errorPaths } from '../../fixtures/estimates.js';
import { createCustomer, signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import { waitForMail } from '../../fixtures/mail.js';
import { dollars, pdfText } from '../estimate-document/pdf-text.js';
import { binary } from '../estimate-sending/sending-fixtures.js';
import { credit, customerWithJob, pay, sentInvoice } from './receivables-fixtures.js';
import type { CustomerJob } from './receivables-fixtures.js';

describe('customer statements', () => {
  let team: Team;
  let customer: CustomerJob;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    const owner = team.owner.client;
    const companyId = team.owner.me.company.id;
    customer = await customerWithJob(owner, 'Quillmere Greens');
    const first = await sentInvoice(owner, companyId, customer.jobId, 40_000, 14);
    await pay(owner, first.id, 15_000, first.issuedOn);
    const second = await sentInvoice(owner, companyId, customer.jobId, 12_550, 0);
    await credit(owner, second.id, 2_550);
  });

  it('prints the owing invoices, payments and credits with the aging total as the balance', async () => {
    const aging = await team.bookkeeper.client.get('/api/reports/aging').expect(200);
    const report = aging.body.data as AgingReportView;
    const mine = report.customers.find((c) => c.customerId === customer.customerId);
    expect(mine?.totalCents).toBe(35_000);
    const res = await team.bookkeeper.client
      .get(`/api/customers/${customer.customerId}/statement.pdf`)
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['content-disposition']).toMatch(
      /^attachment; filename="statement-quillmere-greens-\d{4}-\d{2}-\d{2}\.pdf"$/,
    );
    const { text } = await pdfText(res.body as Buffer);
    expect(text).toContain('Statement');
    expect(text).toContain('Quillmere Greens');
    expect(text).toContain(`Balance due: ${dollars(mine?.totalCents ?? NaN)}`);
    for (const amount of [40_000, 15_000, 12_550, 2_550]) expect(text).toContain(dollars(amount));
    expect(text).toContain(`Current: ${dollars(35_000)}`);
    expect(text).toContain('Over 90 days: $0.00');
  });

  it('“send statement now” e-mails the PDF to the customer', async () => {
    const res = await team.owner.client
      .post(`/api/customers/${customer.customerId}/statement`, {})
      .expect(200);
    expect(res.body.data).toMatchObject({ to: customer.email, balanceCents: 35_000 });
    const mail = (await waitForMail(customer.email)) as { subject: string; text?: string } & {
      attachments?: { contentType: string }[];
    };
    expect(mail.subject).toMatch(/^Statement from /);
    expect(mail.text).toContain(dollars(35_000));
    expect(mail.attachments?.map((a) => a.contentType)).toEqual(['application/pdf']);
  });

  it('without an e-mail address: 400 naming `to`', async () => {
    const silent = await createCustomer(team.owner.client, { name: 'No Mail Yard' });
    const res = await team.owner.client
      .post(`/api/customers/${silent.id}/statement`, {})
      .expect(400);
    expect(errorPaths(res.body)).toEqual(['to']);
  });

  it('is for the bookkeeper and the owner: office and crew lead get 403', async () => {
    for (const client of [team.office.client, team.crew.client]) {
      expect((await client.get(`/api/customers/${customer.customerId}/statement.pdf`)).status).toBe(
        403,
      );
      expect(
        (await client.post(`/api/customers/${customer.customerId}/statement`, {})).status,
      ).toBe(403);
    }
  });
});
