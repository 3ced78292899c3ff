// A local stand-in for the hosted payment processor, so development and tests never reach the
// internet. It answers the part of the processor's REST API that the official SDK calls for
// Seamwright (Checkout Sessions, their PaymentIntents, Refunds), serves a hosted payment page
// with test cards, and delivers signed webhooks. State lives in memory. See README.md.
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import express from 'express';
import { apiRouter } from './api-routes.js';
import { resolveConfig } from './config.js';
import type { FakeConfig, FakeProcessorOptions } from './config.js';
import { hostedRouter } from './hosted-routes.js';
import { FakeStore } from './store.js';
import { testRouter } from './test-hooks.js';

export type { FakeProcessorOptions } from './config.js';

export interface FakeProcessor {
  url: string;
  port: number;
  /** Live configuration (the webhook URL may be changed at run time). */
  config: FakeConfig;
  store: FakeStore;
  stop(): Promise<void>;
}

/** The fake's HTTP app: form-encoded bodies, as the official SDK sends them. */
export function createFakeProcessorApp(store: FakeStore): express.Express {
  const app = express();
  app.disable('x-powered-by');
  // The SDK sends `expand[0]=payment_intent` on GETs too; Express 5's default parser keeps that flat.
  app.set('query parser', 'extended');
  // Extended (qs) parsing turns `line_items[0][price_data][unit_amount]` into nested objects.
  app.use(express.urlencoded({ extended: true, limit: '1mb' }));
  app.get('/health', (_req, res) => {
    res.json({ status: 'ok', service: 'fake-processor' });
  });
  app.use('/v1', apiRouter(store));
  app.use('/pay', hostedRouter(store));
  app.use('/_test', testRouter(store));
  app.use((req, res) => {
    res.status(404).json({
      error: {
        type: 'invalid_request_error',
        message: `The local processor fake does not implement ${req.method} ${req.path}`,
      },
    });
  });
  return app;
}

/** Listens on 127.0.0.1:`port` (0: any free port; `url` tells which). */
export async function startFakeProcessor(
  port: number,
  options: FakeProcessorOptions = {},
): Promise<FakeProcessor> {
  // The store needs the public URL for session links, known once listening.
  const config = resolveConfig(options, `http://127.0.0.1:${port}`);
  const store = new FakeStore(config);
  const app = createFakeProcessorApp(store);
  const server = await new Promise<Server>((resolve, reject) => {
    const listening = app.listen(port, '127.0.0.1', (error?: Error) => {
      if (error) reject(error);
      else resolve(listening);
    });
  });
  const actual = (server.address() as AddressInfo).port;
  const url = `http://127.0.0.1:${actual}`;
  if (!options.publicUrl) config.publicUrl = url;
  return {
    url,
    port: actual,
    config,
    store,
    stop: () =>
      new Promise((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
