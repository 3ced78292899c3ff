import type { Request, Response } from 'express';
import { createEstimateInputSchema, updateEstimateInputSchema } from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import { renderEstimatePdfOf } from './estimate-pdf.service.js';
import type { createEstimatesService } from './estimates.service.js';

export function createEstimatesHandlers(estimates: ReturnType<typeof createEstimatesService>) {
  return {
    listForJob: async (req: Request, res: Response): Promise<void> => {
      const jobId = parseId(req.params.id, 'Job');
      res.json({ data: await estimates.listForJob(contextOf(req), jobId) });
    },
    create: async (req: Request, res: Response): Promise<void> => {
      const jobId = parseId(req.params.id, 'Job');
      const input = parseInput(createEstimateInputSchema, req.body);
      res.status(201).json({ data: await estimates.create(contextOf(req), jobId, input) });
    },
    get: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await estimates.get(contextOf(req), parseId(req.params.id, 'Estimate')) });
    },
    update: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Estimate');
      const input = parseInput(updateEstimateInputSchema, req.body);
      res.json({ data: await estimates.update(contextOf(req), id, input) });
    },
    revise: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Estimate');
      res.status(201).json({ data: await estimates.revise(contextOf(req), id) });
    },
    pdf: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Estimate');
      const { pdf, filename } = await renderEstimatePdfOf(contextOf(req), id);
      res
        .status(200)
        .set({
          'Content-Type': 'application/pdf',
          'Content-Disposition': `attachment; filename="${filename}"`,
          'X-Content-Type-Options': 'nosniff',
          'Cache-Control': 'private, no-store',
        })
        .send(pdf);
    },
  };
}
