// Signs and delivers events the way the hosted processor does: the header
// `Stripe-Signature: t=<unix seconds>,v1=<hex HMAC-SHA256(secret, "<t>.<raw body>")>` over the
// exact bytes sent, and retries a delivery that did not get a 2xx, waiting longer each time.
import { createHmac } from 'node:crypto';
import type { FakeConfig } from './config.js';
import type { EventRecord } from './objects.js';

export function signaturePayload(timestamp: number, payload: string): string {
  return `${timestamp}.${payload}`;
}

export function signatureHeader(payload: string, secret: string, timestamp: number): string {
  const v1 = createHmac('sha256', secret)
    .update(signaturePayload(timestamp, payload))
    .digest('hex');
  return `t=${timestamp},v1=${v1}`;
}

const wait = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** One POST of the event; its status, or the network error in words. */
async function attempt(record: EventRecord, url: string, secret: string): Promise<void> {
  const at = new Date();
  const header = signatureHeader(record.payload, secret, Math.floor(at.getTime() / 1000));
  try {
    const res = await fetch(url, {
      method: 'POST',
      headers: {
        'content-type': 'application/json; charset=utf-8',
        'stripe-signature': header,
        'user-agent': 'Seamwright-FakeProcessor/1.0 (+local webhooks)',
      },
      body: record.payload,
      signal: AbortSignal.timeout(10_000),
    });
    // The body is read so the connection is released; its content does not matter.
    await res.arrayBuffer().catch(() => undefined);
    record.attempts.push({ at: at.toISOString(), url, status: res.status, error: null });
    if (res.ok) record.delivered = true;
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    record.attempts.push({ at: at.toISOString(), url, status: null, error: message });
  }
}

/**
 * Delivers `record` to the configured URL: one try, then one more after each of
 * `retryDelaysMs`, until a 2xx. Resolves when it is delivered or the tries are spent.
 */
export async function deliver(record: EventRecord, config: FakeConfig): Promise<void> {
  const url = config.webhookUrl;
  if (!url) return;
  await attempt(record, url, config.webhookSecret);
  for (const delay of config.retryDelaysMs) {
    if (record.delivered) return;
    await wait(delay);
    await attempt(record, url, config.webhookSecret);
  }
}
