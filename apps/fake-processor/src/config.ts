// What the fake is started with. The defaults are the API's development and test values
// (apps/api/src/config/env.ts uses the same ones from @seamwright/shared), so `npm start`
// and the test runs need no extra configuration.
import { localProcessorDefaults } from '@seamwright/shared';

export interface FakeProcessorOptions {
  /** The secret key callers must send as `Authorization: Bearer …`. */
  apiKey?: string;
  /** Signs webhook deliveries (`whsec_…`). */
  webhookSecret?: string;
  /** Where events are delivered (the API's `POST /api/webhooks/processor`); none: not delivered. */
  webhookUrl?: string | null;
  /** Waits between delivery attempts, in ms (the hosted service waits hours; tests want ms). */
  retryDelaysMs?: number[];
  /** Public origin of the fake, for the hosted page's links (defaults to 127.0.0.1:<port>). */
  publicUrl?: string;
}

export interface FakeConfig {
  apiKey: string;
  webhookSecret: string;
  webhookUrl: string | null;
  retryDelaysMs: number[];
  publicUrl: string;
}

export function resolveConfig(options: FakeProcessorOptions, publicUrl: string): FakeConfig {
  return {
    apiKey: options.apiKey ?? localProcessorDefaults.secretKey,
    webhookSecret: options.webhookSecret ?? localProcessorDefaults.webhookSecret,
    webhookUrl: options.webhookUrl ?? null,
    retryDelaysMs: options.retryDelaysMs ?? [200, 1000, 5000],
    publicUrl: options.publicUrl ?? publicUrl,
  };
}
