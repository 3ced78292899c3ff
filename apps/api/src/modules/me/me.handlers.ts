import type { Request, Response } from 'express';
import { switchCompanyInputSchema } from '@seamwright/shared';
import { saveSession } from '../../http/session.js';
import { contextOf } from '../../http/tenant-context.js';
import { parseInput } from '../../http/validate.js';
import { assertCanSwitchTo, buildMeView } from './me.service.js';

export async function getMeHandler(req: Request, res: Response): Promise<void> {
  const ctx = contextOf(req);
  res.json({ data: await buildMeView(ctx.userId, ctx.companyId) });
}

export async function switchCompanyHandler(req: Request, res: Response): Promise<void> {
  const ctx = contextOf(req);
  const input = parseInput(switchCompanyInputSchema, req.body);
  await assertCanSwitchTo(ctx.userId, input.companyId);
  req.session.companyId = input.companyId;
  await saveSession(req);
  res.json({ data: await buildMeView(ctx.userId, input.companyId) });
}
