import type { Request, Response } from 'express';
import { switchCompanyInputSchema } from '@seamwright/shared';
import { saveSession } from '../../http/session.js';
import { contextOf, signedInUserOf } from '../../http/tenant-context.js';
import { parseInput } from '../../http/validate.js';
import { listCompaniesOfUser } from './me.repository.js';
import { assertCanSwitchTo, buildMeView } from './me.service.js';

export async function getMeHandler(req: Request, res: Response): Promise<void> {
  const ctx = contextOf(req);
  res.json({ data: await buildMeView(ctx.userId, ctx.companyId) });
}

/** The companies the signed-in person belongs to; works without an active company. */
export async function listMyCompaniesHandler(req: Request, res: Response): Promise<void> {
  const data = await listCompaniesOfUser(signedInUserOf(req));
  res.json({ data, meta: { page: 1, pageSize: data.length, total: data.length } });
}

/** Makes one of the person's companies the active one, also after access to the last one ended. */
export async function switchCompanyHandler(req: Request, res: Response): Promise<void> {
  const userId = signedInUserOf(req);
  const input = parseInput(switchCompanyInputSchema, req.body);
  await assertCanSwitchTo(userId, input.companyId);
  req.session.companyId = input.companyId;
  await saveSession(req);
  res.json({ data: await buildMeView(userId, input.companyId) });
}
