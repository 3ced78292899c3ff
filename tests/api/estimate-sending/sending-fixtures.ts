// A priced job for the sending tests: a customer with an e-mail, a site, one planned area and a
// draft estimate built from the starter price book.
import type { EstimateView } from '@seamwright/shared';
import type { Response } from 'supertest';
import { areaBody, createArea } from '../../fixtures/areas.js';
import type { Client } from '../../fixtures/client.js';
import { createEstimate } from '../../fixtures/estimates.js';
import { createCustomer, createJob, createSite, uniqueEmail } from '../../fixtures/factories.js';
import { waitForMail } from '../../fixtures/mail.js';
import { testAppUrl } from '../../fixtures/test-env.js';

export interface PricedJob {
  customerEmail: string;
  jobId: string;
  estimate: EstimateView;
}

export async function pricedJob(
  client: Client,
  options: { email?: string | null; estimate?: Record<string, unknown> } = {},
): Promise<PricedJob> {
  const customerEmail = options.email === undefined ? uniqueEmail('customer') : options.email;
  const customer = await createCustomer(client, {
    name: 'Wren Halloway',
    ...(customerEmail ? { email: customerEmail } : {}),
  });
  const site = await createSite(client, customer.id);
  const job = await createJob(client, customer.id, site.id, 'Back yard turf');
  await createArea(client, job.id, areaBody({ name: 'Back yard' }));
  const estimate = await createEstimate(client, job.id, options.estimate ?? {});
  return { customerEmail: customerEmail ?? '', jobId: job.id, estimate };
}

/** Collects a binary body (supertest buffers only text and JSON by itself). */
export function binary(
  res: Response & { on?: unknown },
  done: (error: Error | null, body: Buffer) => void,
): void {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (chunk: Buffer) => chunks.push(chunk));
  stream.on('end', () => done(null, Buffer.concat(chunks)));
}

interface MaildevAttachment {
  fileName?: string;
  contentType: string;
}

/** The newest message to `address`, with the attachments maildev lists for it. */
export async function waitForEstimateMail(address: string) {
  const message = (await waitForMail(address)) as Awaited<ReturnType<typeof waitForMail>> & {
    attachments?: MaildevAttachment[];
  };
  return message;
}

/** The token of the customer-page link (`${APP_URL}/e/<token>`) in the message text. */
export function customerToken(message: { text?: string; html?: string; subject: string }): string {
  const escaped = `${testAppUrl}/e/`.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');
  const match = new RegExp(`${escaped}([A-Za-z0-9_-]+)`).exec(message.text ?? message.html ?? '');
  if (!match?.[1]) throw new Error(`no customer link in "${message.subject}"`);
  return match[1];
}

/** Sends the estimate and returns the token from the e-mail. */
export async function sendAndReadToken(client: Client, job: PricedJob): Promise<string> {
  await client.post(`/api/estimates/${job.estimate.id}/send`, {}).expect(200);
  return customerToken(await waitForEstimateMail(job.customerEmail));
}
