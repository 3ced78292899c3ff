import type { Request, Response } from 'express';
import { updateCompanyInputSchema } from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseInput } from '../../http/validate.js';
import type { createCompanyService } from './company.service.js';

export function createCompanyHandlers(company: ReturnType<typeof createCompanyService>) {
  return {
    get: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await company.get(contextOf(req)) });
    },
    update: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(updateCompanyInputSchema, req.body);
      res.json({ data: await company.update(contextOf(req), input) });
    },
  };
}
