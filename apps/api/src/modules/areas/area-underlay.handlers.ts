import type { Request, Response } from 'express';
import { underlayScaleInputSchema } from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createAreaUnderlayService } from './area-underlay.service.js';

export function createAreaUnderlayHandlers(
  underlays: ReturnType<typeof createAreaUnderlayService>,
) {
  return {
    upload: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Area');
      res.status(201).json({ data: await underlays.upload(contextOf(req), id, req.file) });
    },
    setScale: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Area');
      const input = parseInput(underlayScaleInputSchema, req.body);
      res.json({ data: await underlays.setScale(contextOf(req), id, input) });
    },
    get: async (req: Request, res: Response): Promise<void> => {
      await underlays.send(contextOf(req), parseId(req.params.id, 'Area'), res);
    },
    remove: async (req: Request, res: Response): Promise<void> => {
      await underlays.remove(contextOf(req), parseId(req.params.id, 'Area'));
      res.status(204).end();
    },
  };
}
