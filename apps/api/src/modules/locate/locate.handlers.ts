import type { Request, Response } from 'express';
import { createLocateTicketInputSchema, updateLocateTicketInputSchema } from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createLocateService } from './locate.service.js';

export function createLocateHandlers(service: ReturnType<typeof createLocateService>) {
  return {
    listForJob: async (req: Request, res: Response): Promise<void> => {
      const jobId = parseId(req.params.id, 'Job');
      res.json({ data: await service.listForJob(contextOf(req), jobId) });
    },
    create: async (req: Request, res: Response): Promise<void> => {
      const jobId = parseId(req.params.id, 'Job');
      const input = parseInput(createLocateTicketInputSchema, req.body);
      res.status(201).json({ data: await service.create(contextOf(req), jobId, input) });
    },
    updateStatus: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Locate ticket');
      const input = parseInput(updateLocateTicketInputSchema, req.body);
      res.json({ data: await service.updateStatus(contextOf(req), id, input) });
    },
  };
}
