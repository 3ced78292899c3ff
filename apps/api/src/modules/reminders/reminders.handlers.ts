import type { Request, Response } from 'express';
import { reminderSettingsInputSchema, sendReminderInputSchema } from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createRemindersService } from './reminders.service.js';

export function createRemindersHandlers(service: ReturnType<typeof createRemindersService>) {
  const id = (req: Request) => parseId(req.params.id, 'Invoice');
  return {
    getSettings: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await service.getSettings(contextOf(req)) });
    },
    putSettings: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(reminderSettingsInputSchema, req.body);
      res.json({ data: await service.putSettings(contextOf(req), input) });
    },
    listLog: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await service.listLog(contextOf(req), id(req)) });
    },
    sendNow: async (req: Request, res: Response): Promise<void> => {
      const invoiceId = id(req);
      const input = parseInput(sendReminderInputSchema, req.body ?? {});
      res.status(201).json({ data: await service.sendNow(contextOf(req), invoiceId, input) });
    },
  };
}
