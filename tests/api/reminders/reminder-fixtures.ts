// Sent invoices for the reminder tests: a customer with an e-mail, a job, and progress invoices
// (free lines, so no estimate is needed), sent through the API as the bookkeeper would.
import type { InvoiceView } from '@seamwright/shared';
import { createMailer, createReminderWorker, createLogger, loadEnv } from '@seamwright/api';
import type { Client } from '../../fixtures/client.js';
import { createCustomer, createJob, createSite, uniqueEmail } from '../../fixtures/factories.js';
import { testMail } from '../../fixtures/test-env.js';
import type { TestSequelize } from '../../fixtures/app.js';

export interface BilledCustomer {
  email: string;
  jobId: string;
}

export async function billedCustomer(client: Client): Promise<BilledCustomer> {
  const email = uniqueEmail('payer');
  const customer = await createCustomer(client, { name: 'Ada Quill', email });
  const site = await createSite(client, customer.id);
  const job = await createJob(client, customer.id, site.id, 'Front lawn turf');
  return { email, jobId: job.id };
}

/** A progress invoice of $1,250.00, sent; its due day is today + the company's terms. */
export async function sentInvoice(client: Client, billed: BilledCustomer): Promise<InvoiceView> {
  const created = await client
    .post('/api/invoices', {
      jobId: billed.jobId,
      kind: 'progress',
      lines: [{ label: 'Turf laid', quantity: 1, unitPriceCents: 125_000, taxable: false }],
    })
    .expect(201);
  const id = (created.body as { data: { id: string } }).data.id;
  const sent = await client.post(`/api/invoices/${id}/send`, {}).expect(200);
  return (sent.body as { data: InvoiceView }).data;
}

export interface MaildevMessage {
  id: string;
  subject: string;
  text?: string;
  messageId?: string;
  headers?: Record<string, string>;
  to: { address: string }[];
}

export async function mailsTo(address: string): Promise<MaildevMessage[]> {
  const res = await fetch(`${testMail.webUrl}/api/email`);
  const messages = (await res.json()) as MaildevMessage[];
  return messages.filter((m) =>
    m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()),
  );
}

/** The Message-ID header as maildev reports it. */
export function messageIdOf(message: MaildevMessage): string | undefined {
  const raw = message.messageId ?? message.headers?.['message-id'];
  if (!raw) return undefined;
  return raw.startsWith('<') ? raw : `<${raw}>`;
}

/** Noon in Denver (the test companies' zone) on `day`, as the worker's clock. */
export function denverNoon(day: string): Date {
  return new Date(`${day}T19:00:00Z`);
}

/** A worker on the test database whose clock the test moves. */
export function testWorker(sequelize: TestSequelize, clock: { now: Date }) {
  const env = loadEnv(process.env);
  const mailer = createMailer(env.smtp);
  const worker = createReminderWorker(
    { env, sequelize, mailer, logger: createLogger('silent') },
    { now: () => clock.now, batchSize: 500 },
  );
  return { worker, close: () => mailer.close() };
}

/** Runs passes until one finds nothing more to do. */
export async function drain(worker: ReturnType<typeof testWorker>['worker']): Promise<number> {
  let sent = 0;
  for (;;) {
    const result = await worker.runOnce();
    sent += result.sent;
    if (result.handled === 0) return sent;
  }
}
