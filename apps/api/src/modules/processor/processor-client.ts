// The one place the payment processor's SDK client is made. Only host, port, protocol and keys
// come from configuration, so the calls are exactly those that would go to the hosted service;
// development and tests point them at the local fake (apps/fake-processor).
import Stripe from 'stripe';
import type { ProcessorConfig } from '../../config/env.js';

const clients = new WeakMap<ProcessorConfig, Stripe>();

/** The client for `config`, made once per configuration object. */
export function processorClient(config: ProcessorConfig): Stripe {
  let client = clients.get(config);
  if (!client) {
    client = new Stripe(config.secretKey, {
      ...(config.api ?? {}),
      // Short, with few retries: "the processor is down" must reach the page in seconds.
      timeout: config.timeoutMs,
      maxNetworkRetries: config.maxNetworkRetries,
      telemetry: false,
      appInfo: { name: 'Seamwright' },
    });
    clients.set(config, client);
  }
  return client;
}
