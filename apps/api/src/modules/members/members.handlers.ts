import type { Request, Response } from 'express';
import { pageQuerySchema, updateMemberInputSchema } from '@seamwright/shared';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import type { createMembersService } from './members.service.js';

export function createMembersHandlers(members: ReturnType<typeof createMembersService>) {
  return {
    list: async (req: Request, res: Response): Promise<void> => {
      const query = parseInput(pageQuerySchema, req.query);
      res.json(await members.list(contextOf(req), query));
    },
    update: async (req: Request, res: Response): Promise<void> => {
      const id = parseId(req.params.id, 'Member');
      const input = parseInput(updateMemberInputSchema, req.body);
      res.json({ data: await members.changeRole(contextOf(req), id, input.role) });
    },
    remove: async (req: Request, res: Response): Promise<void> => {
      await members.remove(contextOf(req), parseId(req.params.id, 'Member'));
      res.status(204).end();
    },
  };
}
