// A local stand-in for the hosted payment processor, so development and tests never reach the
// internet. For now it answers its health check and says clearly that payment endpoints are
// not built yet; the invoicing work fills in the endpoints the official SDK calls.
import type { Server } from 'node:http';
import express from 'express';

export interface FakeProcessor {
  url: string;
  stop(): Promise<void>;
}

/** The fake's HTTP app: form-encoded bodies, as the official SDK sends them. */
export function createFakeProcessorApp(): express.Express {
  const app = express();
  app.use(express.urlencoded({ extended: true }));
  app.get('/health', (_req, res) => {
    res.json({ status: 'ok', service: 'fake-processor' });
  });
  app.use((req, res) => {
    res.status(404).json({
      error: {
        type: 'invalid_request_error',
        message: `The local processor fake does not implement ${req.method} ${req.path} yet`,
      },
    });
  });
  return app;
}

/** Listens on 127.0.0.1:`port`. */
export async function startFakeProcessor(port: number): Promise<FakeProcessor> {
  const app = createFakeProcessorApp();
  const server = await new Promise<Server>((resolve, reject) => {
    const listening = app.listen(port, '127.0.0.1', (error?: Error) => {
      if (error) reject(error);
      else resolve(listening);
    });
  });
  return {
    url: `http://127.0.0.1:${port}`,
    stop: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
