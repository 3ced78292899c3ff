// A priced job for the sending tests: a customer with an e-mail, a site, one planned area and a
// draft estimate built from the starter price book.
import type { EstimateView } from '@seamwright/shared';
import type { Response } from 'supertest';
import { areaBody, createArea } from '../../fixtures/areas.js';
import type { Client } from '../../fixtures/client.js';
import { createEstimate } from '../../fixtures/estimates.js';
import { createCustomer, createJob, createSite, uniqueEmail } from '../../fixtures/factories.js';

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
