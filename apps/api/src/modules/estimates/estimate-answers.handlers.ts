import type { Request, Response } from 'express';
import {
  acceptEstimateInputSchema,
  declineEstimateInputSchema,
  recordAcceptanceInputSchema,
} from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createEstimateAnswersService } from './estimate-answers.service.js';

/** What the acceptance keeps of the request: the address and the browser, as evidence. */
function requestMeta(req: Request) {
  return { ip: req.ip ?? null, userAgent: req.get('user-agent')?.slice(0, 500) ?? null };
}

const tokenOf = (req: Request): string => String(req.params.token ?? '');

export function createEstimateAnswersHandlers(
  answers: ReturnType<typeof createEstimateAnswersService>,
) {
  return {
    view: async (req: Request, res: Response): Promise<void> => {
      res.set('Cache-Control', 'private, no-store');
      res.json({ data: await answers.view(tokenOf(req)) });
    },
    accept: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(acceptEstimateInputSchema, req.body);
      res.json({ data: await answers.acceptOnline(tokenOf(req), input, requestMeta(req)) });
    },
    decline: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(declineEstimateInputSchema, req.body ?? {});
      res.json({ data: await answers.declineOnline(tokenOf(req), input, requestMeta(req)) });
    },
    recordInPerson: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Estimate');
      const input = parseInput(recordAcceptanceInputSchema, req.body);
      res.status(201).json({ data: await answers.recordInPerson(contextOf(req), id, input) });
    },
  };
}
