import type { Request, Response } from 'express';
import { updateEstimatingSettingsInputSchema } from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseInput } from '../../http/validate.js';
import type { createEstimatingSettingsService } from './estimating-settings.service.js';

export function createEstimatingSettingsHandlers(
  settings: ReturnType<typeof createEstimatingSettingsService>,
) {
  return {
    get: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await settings.get(contextOf(req)) });
    },
    update: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(updateEstimatingSettingsInputSchema, req.body);
      res.json({ data: await settings.update(contextOf(req), input) });
    },
  };
}
