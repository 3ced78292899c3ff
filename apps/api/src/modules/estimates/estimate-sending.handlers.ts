import type { Request, Response } from 'express';
import { sendEstimateInputSchema } from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createEstimateSendService } from './estimate-send.service.js';

export function createEstimateSendingHandlers(
  sending: ReturnType<typeof createEstimateSendService>,
) {
  return {
    send: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Estimate');
      const input = parseInput(sendEstimateInputSchema, req.body ?? {});
      res.json({ data: await sending.send(contextOf(req), id, input) });
    },
    revokeLinks: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Estimate');
      res.json({ data: await sending.revokeLinks(contextOf(req), id) });
    },
  };
}
