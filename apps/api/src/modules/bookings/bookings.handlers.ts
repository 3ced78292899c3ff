import type { Request, Response } from 'express';
import {
  bookingListQuerySchema,
  createBookingInputSchema,
  updateBookingInputSchema,
} from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createBookingsService } from './bookings.service.js';

export function createBookingsHandlers(service: ReturnType<typeof createBookingsService>) {
  return {
    list: async (req: Request, res: Response): Promise<void> => {
      const query = parseInput(bookingListQuerySchema, req.query);
      res.json({ data: await service.list(contextOf(req), query) });
    },
    create: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(createBookingInputSchema, req.body);
      res.status(201).json({ data: await service.create(contextOf(req), input) });
    },
    update: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Booking');
      const input = parseInput(updateBookingInputSchema, req.body);
      res.json({ data: await service.update(contextOf(req), id, input) });
    },
    remove: async (req: Request, res: Response): Promise<void> => {
      await service.remove(contextOf(req), parseId(req.params.id, 'Booking'));
      res.status(204).end();
    },
  };
}
