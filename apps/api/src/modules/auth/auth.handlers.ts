import type { Request, Response } from 'express';
import {
  loginInputSchema,
  passwordResetCompleteSchema,
  passwordResetRequestSchema,
  signupInputSchema,
} from '@seamwright/shared';
import type { Env } from '../../config/env.js';
import { signIn, signOut } from '../../http/session.js';
import { parseInput } from '../../http/validate.js';
import { buildMeView } from '../me/me.service.js';
import type { AuthService } from './auth.service.js';
import type { PasswordResetService } from './password-reset.service.js';

interface AuthHandlerDeps {
  env: Env;
  auth: AuthService;
  passwordReset: PasswordResetService;
  issueCsrfToken: (req: Request, res: Response) => string;
  onLoginSucceeded: (req: Request) => Promise<void> | void;
}

export function createAuthHandlers({
  env,
  auth,
  passwordReset,
  issueCsrfToken,
  onLoginSucceeded,
}: AuthHandlerDeps) {
  return {
    csrf: (req: Request, res: Response): void => {
      res.json({ data: { token: issueCsrfToken(req, res) } });
    },
    signup: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(signupInputSchema, req.body);
      const user = await auth.signup(input);
      await signIn(req, user.userId, user.companyId);
      res.status(201).json({ data: await buildMeView(user.userId, user.companyId) });
    },
    login: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(loginInputSchema, req.body);
      const user = await auth.login(input);
      await onLoginSucceeded(req);
      await signIn(req, user.userId, user.companyId);
      res.json({ data: await buildMeView(user.userId, user.companyId) });
    },
    logout: async (req: Request, res: Response): Promise<void> => {
      await signOut(req, res, env);
      res.status(204).end();
    },
    requestPasswordReset: (req: Request, res: Response): void => {
      const input = parseInput(passwordResetRequestSchema, req.body);
      passwordReset.requestPasswordReset(input.email);
      res.status(202).json({ data: { accepted: true } });
    },
    completePasswordReset: async (req: Request, res: Response): Promise<void> => {
      const input = parseInput(passwordResetCompleteSchema, req.body);
      await passwordReset.completePasswordReset(String(req.params.token), input.password);
      res.status(204).end();
    },
  };
}
