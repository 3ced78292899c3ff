// Sign-up, sign-in and password reset. Knows nothing of HTTP; the handlers manage the session.
import { UniqueConstraintError } from 'sequelize';
import type { LoginInput, SignupInput } from '@seamwright/shared';
import type { ServiceDeps } from '../../deps.js';
import { inTransaction } from '../../db/sequelize.js';
import { AppError } from '../../errors.js';
import { passwordResetMail } from '../../mail/templates.js';
import { hashPassword, verifyAgainstDecoy, verifyPassword } from '../../passwords.js';
import { createOneTimeToken, hashToken } from '../../tokens.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { unsafeFindFirstMembershipOfUser } from '../me/me.repository.js';
import {
  addMembership,
  createCompany,
  createPasswordReset,
  createUser,
  destroySessionsOfUser,
  findUsablePasswordReset,
  isSlugTaken,
  markPasswordResetUsed,
  unsafeFindUserByEmail,
  updateUserPassword,
} from './auth.repository.js';
import { slugify } from './slug.js';

const passwordResetLifetimeMs = 60 * 60 * 1000;

export interface SignedInUser {
  userId: string;
  companyId: string;
}

export function createAuthService(deps: ServiceDeps) {
  const { env, sequelize, mailer, logger } = deps;

  async function signup(input: SignupInput): Promise<SignedInUser> {
    const passwordHash = await hashPassword(input.password, env.bcryptCost);
    try {
      return await inTransaction(sequelize, async (tx) => {
        if (await unsafeFindUserByEmail(input.email, tx))
          throw new AppError('EMAIL_TAKEN', 'That e-mail already has an account; sign in instead');
        const user = await createUser({ name: input.name, email: input.email, passwordHash }, tx);
        let slug = slugify(input.companyName);
        if (await isSlugTaken(slug, tx)) slug = `${slug}-${user.id.slice(0, 6)}`;
        const company = await createCompany(
          { name: input.companyName, slug, timeZone: 'America/Denver' },
          tx,
        );
        const ctx = { userId: user.id, companyId: company.id, role: 'owner' as const };
        await addMembership(ctx, 'owner', tx);
        await recordAuditEvent(
          ctx,
          {
            action: 'company.created',
            entity: 'company',
            entityId: company.id,
            data: { name: input.companyName },
          },
          tx,
        );
        return { userId: user.id, companyId: company.id };
      });
    } catch (error) {
      // Two sign-ups racing for one address: the unique index decides.
      if (error instanceof UniqueConstraintError)
        throw new AppError('EMAIL_TAKEN', 'That e-mail already has an account; sign in instead');
      throw error;
    }
  }

  /** Same answer for an unknown e-mail and a wrong password. */
  async function login(input: LoginInput): Promise<SignedInUser> {
    const user = await unsafeFindUserByEmail(input.email);
    const isValid = user
      ? await verifyPassword(input.password, user.passwordHash)
      : await verifyAgainstDecoy(input.password);
    if (!user || !isValid) throw new AppError('INVALID_CREDENTIALS', 'E-mail or password is wrong');
    const membership = await unsafeFindFirstMembershipOfUser(user.id);
    if (!membership)
      throw new AppError('FORBIDDEN', 'This account no longer belongs to any company');
    return { userId: user.id, companyId: membership.companyId };
  }

  /** Always succeeds from the caller's view, so the answer never reveals whether an account exists. */
  async function requestPasswordReset(email: string): Promise<void> {
    const user = await unsafeFindUserByEmail(email);
    if (!user) return;
    const { token, tokenHash } = createOneTimeToken();
    await createPasswordReset(user.id, tokenHash, new Date(Date.now() + passwordResetLifetimeMs));
    const link = `${env.appUrl}/reset-password/${token}`;
    try {
      await mailer.send({ to: user.email, ...passwordResetMail({ name: user.name, link }) });
    } catch (error) {
      logger.error({ err: error }, 'password reset e-mail could not be sent');
    }
  }

  async function completePasswordReset(token: string, password: string): Promise<void> {
    const passwordHash = await hashPassword(password, env.bcryptCost);
    await inTransaction(sequelize, async (tx) => {
      const now = new Date();
      const reset = await findUsablePasswordReset(hashToken(token), now, tx);
      if (!reset)
        throw new AppError(
          'TOKEN_INVALID',
          'This reset link has expired or was already used; ask for a new one',
        );
      await updateUserPassword(reset.userId, passwordHash, tx);
      await markPasswordResetUsed(reset.id, now, tx);
      await destroySessionsOfUser(reset.userId, tx);
    });
  }

  return { signup, login, requestPasswordReset, completePasswordReset };
}

export type AuthService = ReturnType<typeof createAuthService>;
