import type { Request, Response } from 'express';
import {
  createCreditNoteInputSchema,
  createInvoiceInputSchema,
  invoiceListQuerySchema,
  recordPaymentInputSchema,
  sendInvoiceInputSchema,
  voidInvoiceInputSchema,
} from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createInvoicesService } from './invoices.service.js';

export function createInvoicesHandlers(service: ReturnType<typeof createInvoicesService>) {
  const id = (req: Request) => parseId(req.params.id, 'Invoice');
  return {
    create: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(createInvoiceInputSchema, req.body);
      res.status(201).json({ data: await service.create(contextOf(req), input) });
    },
    list: async (req: Request, res: Response): Promise<void> => {
      res.json(await service.list(contextOf(req), parseInput(invoiceListQuerySchema, req.query)));
    },
    get: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await service.get(contextOf(req), id(req)) });
    },
    send: async (req: Request, res: Response): Promise<void> => {
      const invoiceId = id(req);
      const input = parseInput(sendInvoiceInputSchema, req.body ?? {});
      res.json({ data: await service.send(contextOf(req), invoiceId, input) });
    },
    pdf: async (req: Request, res: Response): Promise<void> => {
      const { pdf, filename } = await service.pdf(contextOf(req), id(req));
      res
        .status(200)
        .set({
          'Content-Type': 'application/pdf',
          'Content-Disposition': `attachment; filename="${filename.replace(/[^A-Za-z0-9.-]/g, '-')}"`,
          'X-Content-Type-Options': 'nosniff',
          'Cache-Control': 'private, no-store',
        })
        .send(pdf);
    },
    recordPayment: async (req: Request, res: Response): Promise<void> => {
      const invoiceId = id(req);
      const input = parseInput(recordPaymentInputSchema, req.body);
      res.status(201).json({ data: await service.recordPayment(contextOf(req), invoiceId, input) });
    },
    void: async (req: Request, res: Response): Promise<void> => {
      const invoiceId = id(req);
      const input = parseInput(voidInvoiceInputSchema, req.body);
      res.json({ data: await service.void(contextOf(req), invoiceId, input.reason) });
    },
    creditNote: async (req: Request, res: Response): Promise<void> => {
      const invoiceId = id(req);
      const input = parseInput(createCreditNoteInputSchema, req.body);
      res.status(201).json({ data: await service.creditNote(contextOf(req), invoiceId, input) });
    },
    publicView: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await service.publicView(String(req.params.token)) });
    },
  };
}
