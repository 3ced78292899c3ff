// `POST /api/webhooks/processor`: the processor's deliveries. Mounted before the JSON body
// parser, session and CSRF (app.ts), because the signature covers the exact raw bytes and the
// caller is the processor, not a signed-in person: the signature is the credential.
import express from 'express';
import type { Request, Response } from 'express';
import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { verifyProcessorEvent } from './webhook-verification.js';
import { handleProcessorEvent } from './webhook.service.js';

export const processorWebhookPath = '/webhooks/processor';

export function registerProcessorWebhookRoutes(routes: RouteTable, deps: ServiceDeps): void {
  routes.add(
    'post',
    processorWebhookPath,
    { access: 'public' },
    // Any content type: the bytes are verified as they came, never re-serialised.
    express.raw({ type: () => true, limit: '1mb' }),
    async (req: Request, res: Response) => {
      const raw: Buffer = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
      const event = verifyProcessorEvent(deps.env.processor, raw, req.get('stripe-signature'));
      const outcome = await handleProcessorEvent(deps, event);
      res.status(200).json({ data: { received: true, eventId: event.id, outcome } });
    },
  );
}
