import type { Request, Response } from 'express';
import { createJobInputSchema, jobListQuerySchema, updateJobInputSchema } from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createJobsService } from './jobs.service.js';

export function createJobsHandlers(jobs: ReturnType<typeof createJobsService>) {
  return {
    list: async (req: Request, res: Response): Promise<void> => {
      res.json(await jobs.list(contextOf(req), parseInput(jobListQuerySchema, req.query)));
    },
    get: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await jobs.get(contextOf(req), parseId(req.params.id, 'Job')) });
    },
    create: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(createJobInputSchema, req.body);
      res.status(201).json({ data: await jobs.create(contextOf(req), input) });
    },
    update: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Job');
      const input = parseInput(updateJobInputSchema, req.body);
      res.json({ data: await jobs.update(contextOf(req), id, input) });
    },
  };
}
