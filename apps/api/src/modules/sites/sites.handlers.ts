import type { Request, Response } from 'express';
import { createSiteInputSchema, pageQuerySchema, updateSiteInputSchema } from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createSitesService } from './sites.service.js';

export function createSitesHandlers(sites: ReturnType<typeof createSitesService>) {
  return {
    listForCustomer: async (req: Request, res: Response): Promise<void> => {
      const customerId = parseId(req.params.id, 'Customer');
      const query = parseInput(pageQuerySchema, req.query);
      res.json(await sites.listForCustomer(contextOf(req), customerId, query));
    },
    create: async (req: Request, res: Response): Promise<void> => {
      const customerId = parseId(req.params.id, 'Customer');
      const input = parseInput(createSiteInputSchema, req.body);
      res.status(201).json({ data: await sites.create(contextOf(req), customerId, input) });
    },
    get: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await sites.get(contextOf(req), parseId(req.params.id, 'Site')) });
    },
    update: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Site');
      const input = parseInput(updateSiteInputSchema, req.body);
      res.json({ data: await sites.update(contextOf(req), id, input) });
    },
    remove: async (req: Request, res: Response): Promise<void> => {
      await sites.remove(contextOf(req), parseId(req.params.id, 'Site'));
      res.status(204).end();
    },
  };
}
