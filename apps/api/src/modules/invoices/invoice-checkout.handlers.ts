import type { Request, Response } from 'express';
import type { ServiceDeps } from '../../deps.js';
import { startInvoiceCheckout } from './invoice-checkout.service.js';

/** `POST /api/public/invoices/:token/checkout` → `{ data: { url } }`, the processor's page. */
export function createInvoiceCheckoutHandler(deps: ServiceDeps) {
  return async (req: Request, res: Response): Promise<void> => {
    res.json({ data: await startInvoiceCheckout(deps, String(req.params.token)) });
  };
}
