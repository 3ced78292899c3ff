import type { Request, Response } from 'express';
import { refundInputSchema } from '@seamwright/shared';
import type { ServiceDeps } from '../../deps.js';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import { refundCardPayment } from './invoice-refunds.service.js';

/** `POST /api/invoices/:id/payments/:paymentId/refunds` `{ amountCents?, reason }` → 201. */
export function createRefundHandler(deps: ServiceDeps) {
  return async (req: Request, res: Response): Promise<void> => {
    const invoiceId = parseId(req.params.id, 'Invoice');
    const paymentId = parseId(req.params.paymentId, 'Payment');
    const input = parseInput(refundInputSchema, req.body);
    res.status(201).json({
      data: await refundCardPayment(contextOf(req), deps, invoiceId, paymentId, input),
    });
  };
}
