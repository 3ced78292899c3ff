import type { Request, Response } from 'express';
import { acceptInvitationInputSchema, createInvitationInputSchema } from '@seamwright/shared';
import { signIn } from '../../http/session.js';
import { contextOf } from '../../http/tenant-context.js';
import { parseId, parseInput } from '../../http/validate.js';
import { buildMeView } from '../me/me.service.js';
import type { createInvitationsService } from './invitations.service.js';

export function createInvitationsHandlers(
  invitations: ReturnType<typeof createInvitationsService>,
) {
  return {
    create: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(createInvitationInputSchema, req.body);
      res.status(201).json({ data: await invitations.invite(contextOf(req), input) });
    },
    list: async (req: Request, res: Response): Promise<void> => {
      const data = await invitations.list(contextOf(req));
      res.json({ data, meta: { page: 1, pageSize: data.length, total: data.length } });
    },
    revoke: async (req: Request, res: Response): Promise<void> => {
      await invitations.revoke(contextOf(req), parseId(req.params.id, 'Invitation'));
      res.status(204).end();
    },
    preview: async (req: Request, res: Response): Promise<void> => {
      res.json({ data: await invitations.preview(String(req.params.token)) });
    },
    accept: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(acceptInvitationInputSchema, req.body);
      const user = await invitations.accept(String(req.params.token), input);
      await signIn(req, user.userId, user.companyId);
      res.json({ data: await buildMeView(user.userId, user.companyId) });
    },
  };
}
