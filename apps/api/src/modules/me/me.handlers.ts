import type { Request, Response } from 'express';
import {
  changePasswordInputSchema,
  switchCompanyInputSchema,
  updateProfileInputSchema,
} from '@seamwright/shared';
import { saveSession } from '../../http/session.js';
import { contextOf, signedInUserOf } from '../../http/tenant-context.js';
import { parseInput } from '../../http/validate.js';
import { unsafeListCompaniesOfUser } from './me.repository.js';
import { markWrongCurrentPassword } from './password-change-limiter.js';
import { assertCanSwitchTo, buildMeView } from './me.service.js';
import { WrongCurrentPasswordError, type ProfileService } from './profile.service.js';

export async function getMeHandler(req: Request, res: Response): Promise<void> {
  const ctx = contextOf(req);
  res.json({ data: await buildMeView(ctx.userId, ctx.companyId) });
}

/** The companies the signed-in person belongs to; works without an active company. */
export async function listMyCompaniesHandler(req: Request, res: Response): Promise<void> {
  const data = await unsafeListCompaniesOfUser(signedInUserOf(req));
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

export function createProfileHandlers(profile: ProfileService) {
  return {
    /** `PATCH /api/me`: answers the MeView with the new name. */
    updateProfile: async (req: Request, res: Response): Promise<void> => {
      const ctx = contextOf(req);
      const input = parseInput(updateProfileInputSchema, req.body);
      await profile.updateName(ctx, input);
      res.json({ data: await buildMeView(ctx.userId, ctx.companyId) });
    },
    /** `POST /api/me/password`: 204; this session stays signed in, the others end. */
    changePassword: async (req: Request, res: Response): Promise<void> => {
      const ctx = contextOf(req);
      const input = parseInput(changePasswordInputSchema, req.body);
      try {
        await profile.changePassword(ctx, req.sessionID, input);
      } catch (error) {
        if (error instanceof WrongCurrentPasswordError) markWrongCurrentPassword(res);
        throw error;
      }
      res.status(204).end();
    },
  };
}
