// Payment reminders through the API and the worker with an injected clock: a month of the
// standard schedule (3 days before due, due day, 7, 14 and 30 days overdue; the issue's
// example schedule, no published source) in seconds, paid and void stopping them, a manual
// reminder logged with its message id, and templates with an unknown placeholder refused.
import { addCalendarDays } from '@seamwright/domain';
import type { InvoiceReminderView, ReminderSettingsView } from '@seamwright/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testApp } from '../../fixtures/app.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';
import {
  billedCustomer,
  denverNoon,
  drain,
  mailsTo,
  messageIdOf,
  sentInvoice,
  testWorker,
} from './reminder-fixtures.js';

const { app, sequelize } = testApp();
const clock = { now: new Date() };
const { worker, close } = testWorker(sequelize, clock);
let team: Team;

beforeAll(async () => {
  team = await signUpTeam(app);
});
afterAll(() => close());

async function logOf(invoiceId: string): Promise<InvoiceReminderView[]> {
  const res = await team.bookkeeper.client.get(`/api/invoices/${invoiceId}/reminders`).expect(200);
  return (res.body as { data: InvoiceReminderView[] }).data;
}

describe('the schedule, day by day', () => {
  it('sends exactly the scheduled steps on their days, each logged with its message id', async () => {
    const billed = await billedCustomer(team.owner.client);
    const invoice = await sentInvoice(team.bookkeeper.client, billed);
    const expected = new Map(
      [-3, 0, 7, 14, 30].map((offset) => [addCalendarDays(invoice.dueDate, offset), offset]),
    );
    const seen: { day: string; offset: number | null }[] = [];
    let known = 0;
    const last = addCalendarDays(invoice.dueDate, 35);
    for (let day = invoice.issuedOn; day <= last; day = addCalendarDays(day, 1)) {
      clock.now = denverNoon(day);
      await drain(worker);
      await drain(worker); // a second pass the same day sends nothing more
      const log = await logOf(invoice.id);
      for (const entry of log.slice(known)) seen.push({ day, offset: entry.offsetDays });
      known = log.length;
    }
    expect(seen).toEqual([...expected].map(([day, offset]) => ({ day, offset })));
    const log = await logOf(invoice.id);
    expect(log.every((r) => r.kind === 'scheduled' && r.sentAt && !r.error)).toBe(true);
    expect(log.map((r) => r.messageId)).toEqual(
      [-3, 0, 7, 14, 30].map((o) => `<reminder.${invoice.id}.${o}@127.0.0.1>`),
    );
    // Maildev holds the invoice itself and one message per step, with the logged ids.
    const mails = await mailsTo(billed.email);
    expect(mails).toHaveLength(6);
    const ids = mails.map(messageIdOf);
    for (const entry of log) expect(ids.filter((id) => id === entry.messageId)).toHaveLength(1);
    const overdue = mails.find((m) => messageIdOf(m) === log[4]?.messageId);
    expect(overdue?.subject).toBe(`Invoice ${invoice.reference} is overdue`);
    // A fresh pay link in each reminder, with the amount and the customer's name filled in.
    expect(overdue?.text).toMatch(/\/i\/[A-Za-z0-9_-]{20,}/);
    expect(overdue?.text).toContain('Hello Ada Quill');
    expect(overdue?.text).toContain('$1,250.00');
  });

  it('sends only the latest missed step when the worker was away', async () => {
    const billed = await billedCustomer(team.owner.client);
    const invoice = await sentInvoice(team.bookkeeper.client, billed);
    clock.now = denverNoon(addCalendarDays(invoice.dueDate, 10));
    await drain(worker);
    expect((await logOf(invoice.id)).map((r) => r.offsetDays)).toEqual([7]);
  });
});

describe('what stops reminders', () => {
  it('a payment of the whole balance stops them; a part payment does not', async () => {
    const billed = await billedCustomer(team.owner.client);
    const paid = await sentInvoice(team.bookkeeper.client, billed);
    const part = await sentInvoice(team.bookkeeper.client, billed);
    const pay = (id: string, amountCents: number) =>
      team.bookkeeper.client
        .post(`/api/invoices/${id}/payments`, {
          amountCents,
          method: 'cheque',
          receivedOn: paid.issuedOn,
        })
        .expect(201);
    await pay(paid.id, 125_000);
    await pay(part.id, 25_000);
    clock.now = denverNoon(addCalendarDays(paid.dueDate, 40));
    await drain(worker);
    expect(await logOf(paid.id)).toEqual([]);
    expect((await logOf(part.id)).map((r) => r.offsetDays)).toEqual([30]);
    const partMail = (await mailsTo(billed.email)).find(
      (m) => messageIdOf(m) === `<reminder.${part.id}.30@127.0.0.1>`,
    );
    expect(partMail?.text).toContain('$1,000.00');
  });

  it('voiding stops them', async () => {
    const billed = await billedCustomer(team.owner.client);
    const invoice = await sentInvoice(team.bookkeeper.client, billed);
    await team.bookkeeper.client
      .post(`/api/invoices/${invoice.id}/void`, { reason: 'Billed twice' })
      .expect(200);
    clock.now = denverNoon(addCalendarDays(invoice.dueDate, 40));
    await drain(worker);
    expect(await logOf(invoice.id)).toEqual([]);
    expect(await mailsTo(billed.email)).toHaveLength(1);
  });

  it('switching reminders off stops them, and on again picks up the next step', async () => {
    const billed = await billedCustomer(team.owner.client);
    const invoice = await sentInvoice(team.owner.client, billed);
    const settings = { enabled: false, offsets: [-3, 0, 7, 14, 30] };
    await team.owner.client.put('/api/settings/reminders', settings).expect(200);
    clock.now = denverNoon(addCalendarDays(invoice.dueDate, 8));
    await drain(worker);
    expect(await logOf(invoice.id)).toEqual([]);
    await team.owner.client
      .put('/api/settings/reminders', { ...settings, enabled: true })
      .expect(200);
    await drain(worker);
    expect((await logOf(invoice.id)).map((r) => r.offsetDays)).toEqual([7]);
  });
});

describe('a reminder sent by hand', () => {
  it('is logged as manual with its message id and leaves the schedule alone', async () => {
    const billed = await billedCustomer(team.owner.client);
    const invoice = await sentInvoice(team.bookkeeper.client, billed);
    const res = await team.bookkeeper.client
      .post(`/api/invoices/${invoice.id}/reminders`, {})
      .expect(201);
    const sent = (res.body as { data: InvoiceReminderView }).data;
    expect(sent).toMatchObject({ kind: 'manual', offsetDays: null, toAddress: billed.email });
    expect(sent.messageId).toMatch(new RegExp(`^<reminder\\.${invoice.id}\\.manual\\.`));
    expect((await mailsTo(billed.email)).map(messageIdOf)).toContain(sent.messageId);
    expect(await logOf(invoice.id)).toEqual([sent]);
    clock.now = denverNoon(addCalendarDays(invoice.dueDate, -3));
    await drain(worker);
    expect((await logOf(invoice.id)).map((r) => r.offsetDays)).toEqual([null, -3]);
  });

  it('is refused for a paid or void invoice, by office and crew leads', async () => {
    const billed = await billedCustomer(team.owner.client);
    const invoice = await sentInvoice(team.bookkeeper.client, billed);
    await team.office.client.post(`/api/invoices/${invoice.id}/reminders`, {}).expect(403);
    await team.crew.client.post(`/api/invoices/${invoice.id}/reminders`, {}).expect(403);
    await team.crew.client.get(`/api/invoices/${invoice.id}/reminders`).expect(403);
    await team.office.client.get(`/api/invoices/${invoice.id}/reminders`).expect(200);
    await team.bookkeeper.client
      .post(`/api/invoices/${invoice.id}/void`, { reason: 'Wrong customer' })
      .expect(200);
    const res = await team.bookkeeper.client
      .post(`/api/invoices/${invoice.id}/reminders`, {})
      .expect(409);
    expect(res.type).toBe('application/problem+json');
    expect(await logOf(invoice.id)).toEqual([]);
  });
});

describe('settings and templates', () => {
  const valid = { enabled: true, offsets: [0, 7, -3] };

  it('refuse an unknown placeholder, naming the field, and save nothing', async () => {
    const before = await team.owner.client.get('/api/settings/reminders').expect(200);
    const res = await team.owner.client
      .put('/api/settings/reminders', {
        ...valid,
        senderName: 'Never saved',
        templates: {
          overdue: { subject: 'Late: {invoiceNumber}', body: 'Hello {custmerName}, {payLink}' },
        },
      })
      .expect(400);
    expect(res.type).toBe('application/problem+json');
    const body = res.body as { errors: { path: string; message: string }[] };
    expect(body.errors).toEqual([
      { path: 'templates.overdue.body', message: expect.stringMatching(/\{custmerName\}/) },
    ]);
    const after = await team.owner.client.get('/api/settings/reminders').expect(200);
    expect(after.body).toEqual(before.body);
  });

  it('refuse a schedule with one day twice', async () => {
    const res = await team.owner.client
      .put('/api/settings/reminders', { enabled: true, offsets: [7, 7] })
      .expect(400);
    expect((res.body as { errors: { path: string }[] }).errors.map((e) => e.path)).toEqual([
      'offsets',
    ]);
  });

  it('save a schedule, a sender name and a template that the next reminder uses', async () => {
    const res = await team.bookkeeper.client
      .put('/api/settings/reminders', {
        ...valid,
        senderName: 'Accounts at Test Turf',
        templates: {
          before_due: {
            subject: 'Soon: {invoiceNumber} for {customerName}',
            body: 'Pay at {payLink}',
          },
        },
      })
      .expect(200);
    const saved = (res.body as { data: ReminderSettingsView }).data;
    expect(saved.offsets).toEqual([-3, 0, 7]);
    expect(saved.templates.before_due.subject).toBe('Soon: {invoiceNumber} for {customerName}');
    expect(saved.templates.overdue).toEqual(saved.defaults.templates.overdue);
    const billed = await billedCustomer(team.owner.client);
    const invoice = await sentInvoice(team.bookkeeper.client, billed);
    await team.bookkeeper.client.post(`/api/invoices/${invoice.id}/reminders`, {}).expect(201);
    const mail = (await mailsTo(billed.email)).at(-1);
    expect(mail?.subject).toBe(`Soon: ${invoice.reference} for Ada Quill`);
    // Back to the standard, so the other tests of this company see it.
    await team.owner.client
      .put('/api/settings/reminders', { enabled: true, offsets: [-3, 0, 7, 14, 30] })
      .expect(200);
  });

  it('belong to owners and bookkeepers only', async () => {
    await team.office.client.get('/api/settings/reminders').expect(403);
    await team.crew.client.get('/api/settings/reminders').expect(403);
    await team.office.client.put('/api/settings/reminders', valid).expect(403);
  });
});
