import type { Request, Response } from 'express';
import {
  priceBookImportInputSchema,
  priceBookItemInputSchema,
  priceBookListQuerySchema,
  updatePriceBookItemInputSchema,
} from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createPriceBookImportService } from './price-book-import.service.js';
import type { createPriceBookService } from './price-book.service.js';

export function createPriceBookHandlers(
  priceBook: ReturnType<typeof createPriceBookService>,
  importCsv: ReturnType<typeof createPriceBookImportService>,
) {
  return {
    list: async (req: Request, res: Response): Promise<void> => {
      res.json(
        await priceBook.list(contextOf(req), parseInput(priceBookListQuerySchema, req.query)),
      );
    },
    create: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(priceBookItemInputSchema, req.body);
      res.status(201).json({ data: await priceBook.create(contextOf(req), input) });
    },
    update: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Price book item');
      const input = parseInput(updatePriceBookItemInputSchema, req.body);
      res.json({ data: await priceBook.update(contextOf(req), id, input) });
    },
    remove: async (req: Request, res: Response): Promise<void> => {
      await priceBook.remove(contextOf(req), parseId(req.params.id, 'Price book item'));
      res.status(204).end();
    },
    exportCsv: async (req: Request, res: Response): Promise<void> => {
      const csv = await priceBook.exportCsv(contextOf(req));
      res
        .type('text/csv; charset=utf-8')
        .attachment('price-book.csv')
        .set('Cache-Control', 'no-store')
        .send(csv);
    },
    importCsv: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(priceBookImportInputSchema, req.body);
      res.json({ data: await importCsv(contextOf(req), input) });
    },
  };
}
