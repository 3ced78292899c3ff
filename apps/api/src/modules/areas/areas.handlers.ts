import type { Request, Response } from 'express';
import { createAreaInputSchema, updateAreaInputSchema } from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createAreasService } from './areas.service.js';
import { getJobTakeoff } from './job-takeoff.service.js';

export function createAreasHandlers(areas: ReturnType<typeof createAreasService>) {
  return {
    listForJob: async (req: Request, res: Response): Promise<void> => {
      const jobId = parseId(req.params.id, 'Job');
      res.json({ data: await areas.listForJob(contextOf(req), jobId) });
    },
    create: async (req: Request, res: Response): Promise<void> => {
      const jobId = parseId(req.params.id, 'Job');
      const input = parseInput(createAreaInputSchema, req.body);
      res.status(201).json({ data: await areas.create(contextOf(req), jobId, input) });
    },
    get: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await areas.get(contextOf(req), parseId(req.params.id, 'Area')) });
    },
    update: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Area');
      const input = parseInput(updateAreaInputSchema, req.body);
      res.json({ data: await areas.update(contextOf(req), id, input) });
    },
    remove: async (req: Request, res: Response): Promise<void> => {
      await areas.remove(contextOf(req), parseId(req.params.id, 'Area'));
      res.status(204).end();
    },
    takeoff: async (req: Request, res: Response): Promise<void> => {
      const jobId = parseId(req.params.id, 'Job');
      res.json({ data: await getJobTakeoff(contextOf(req), jobId) });
    },
  };
}
