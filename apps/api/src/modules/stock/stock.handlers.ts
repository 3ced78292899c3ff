import type { Request, Response } from 'express';
import {
  createReservationInputSchema,
  createRollInputSchema,
  receiveDeliveryInputSchema,
  returnRemnantsInputSchema,
  rollListQuerySchema,
  updateRollInputSchema,
} from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createReservationsService } from './reservations.service.js';
import type { createRollsService } from './rolls.service.js';

export function createStockHandlers(
  rolls: ReturnType<typeof createRollsService>,
  reservations: ReturnType<typeof createReservationsService>,
) {
  return {
    listRolls: async (req: Request, res: Response): Promise<void> => {
      res.json(await rolls.list(contextOf(req), parseInput(rollListQuerySchema, req.query)));
    },
    getRoll: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await rolls.get(contextOf(req), parseId(req.params.id, 'Roll')) });
    },
    createRoll: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(createRollInputSchema, req.body);
      res.status(201).json({ data: await rolls.create(contextOf(req), input) });
    },
    receiveDelivery: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(receiveDeliveryInputSchema, req.body);
      res.status(201).json({ data: await rolls.receiveDelivery(contextOf(req), input) });
    },
    updateRoll: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Roll');
      const input = parseInput(updateRollInputSchema, req.body);
      res.json({ data: await rolls.update(contextOf(req), id, input) });
    },
    getReservation: async (req: Request, res: Response): Promise<void> => {
      const jobId = parseId(req.params.id, 'Job');
      res.json({ data: await reservations.get(contextOf(req), jobId) });
    },
    reserve: async (req: Request, res: Response): Promise<void> => {
      const jobId = parseId(req.params.id, 'Job');
      const input = parseInput(createReservationInputSchema, req.body);
      res.status(201).json({ data: await reservations.reserve(contextOf(req), jobId, input) });
    },
    release: async (req: Request, res: Response): Promise<void> => {
      await reservations.release(contextOf(req), parseId(req.params.id, 'Job'));
      res.status(204).end();
    },
    returnRemnants: async (req: Request, res: Response): Promise<void> => {
      const jobId = parseId(req.params.id, 'Job');
      const input = parseInput(returnRemnantsInputSchema, req.body);
      res.status(201).json({ data: await rolls.returnRemnants(contextOf(req), jobId, input) });
    },
  };
}
