import type { Request, Response } from 'express';
import {
  createCrewInputSchema,
  crewListQuerySchema,
  updateCrewInputSchema,
} from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createCrewsService } from './crews.service.js';

export function createCrewsHandlers(service: ReturnType<typeof createCrewsService>) {
  return {
    list: async (req: Request, res: Response): Promise<void> => {
      const query = parseInput(crewListQuerySchema, req.query);
      res.json({ data: await service.list(contextOf(req), query.includeArchived) });
    },
    get: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await service.get(contextOf(req), parseId(req.params.id, 'Crew')) });
    },
    create: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(createCrewInputSchema, req.body);
      res.status(201).json({ data: await service.create(contextOf(req), input) });
    },
    update: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Crew');
      const input = parseInput(updateCrewInputSchema, req.body);
      res.json({ data: await service.update(contextOf(req), id, input) });
    },
    /** 200 with what happened: deleted, or archived because it has bookings. */
    remove: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await service.remove(contextOf(req), parseId(req.params.id, 'Crew')) });
    },
  };
}
