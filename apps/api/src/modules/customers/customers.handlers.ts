import type { Request, Response } from 'express';
import {
  createCustomerInputSchema,
  customerListQuerySchema,
  updateCustomerInputSchema,
} from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createCustomersService } from './customers.service.js';

export function createCustomersHandlers(customers: ReturnType<typeof createCustomersService>) {
  return {
    list: async (req: Request, res: Response): Promise<void> => {
      const query = parseInput(customerListQuerySchema, req.query);
      res.json(await customers.list(contextOf(req), query));
    },
    get: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await customers.get(contextOf(req), parseId(req.params.id, 'Customer')) });
    },
    create: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(createCustomerInputSchema, req.body);
      res.status(201).json({ data: await customers.create(contextOf(req), input) });
    },
    update: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Customer');
      const input = parseInput(updateCustomerInputSchema, req.body);
      res.json({ data: await customers.update(contextOf(req), id, input) });
    },
    remove: async (req: Request, res: Response): Promise<void> => {
      await customers.remove(contextOf(req), parseId(req.params.id, 'Customer'));
      res.status(204).end();
    },
  };
}
