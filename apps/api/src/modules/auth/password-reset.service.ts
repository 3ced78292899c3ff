// Password reset: asking for a link and choosing a new password with it. Only the newest link
// of a person works, and choosing a new password ends every session of that person.
import type { ServiceDeps } from '../../deps.js';
import { createBackgroundQueue } from '../../background-queue.js';
import { inTransaction } from '../../db/sequelize.js';
import { AppError } from '../../errors.js';
import { passwordResetMail } from '../../mail/templates.js';
import { hashPassword } from '../../passwords.js';
import { createOneTimeToken, hashToken } from '../../tokens.js';
import {
  createPasswordReset,
  destroySessionsOfUser,
  findUsablePasswordReset,
  invalidatePasswordResetsOfUser,
  unsafeFindUserByEmail,
  updateUserPassword,
} from './auth.repository.js';

const passwordResetLifetimeMs = 60 * 60 * 1000;

export function createPasswordResetService({ env, sequelize, mailer, logger }: ServiceDeps) {
  const queue = createBackgroundQueue(logger);

  /** Looks the address up, replaces any earlier link with a new one and e-mails it. */
  async function issueReset(email: string): Promise<void> {
    const user = await unsafeFindUserByEmail(email);
    if (!user) return;
    const { token, tokenHash } = createOneTimeToken();
    await inTransaction(sequelize, async (tx) => {
      const now = new Date();
      await invalidatePasswordResetsOfUser(user.id, now, tx);
      await createPasswordReset(
        user.id,
        tokenHash,
        new Date(now.getTime() + passwordResetLifetimeMs),
        tx,
      );
    });
    const link = `${env.appUrl}/reset-password/${token}`;
    // Not awaited: a slow or stuck mail server must not hold up the requests queued behind.
    mailer
      .send({ to: user.email, ...passwordResetMail({ name: user.name, link }) })
      .catch((error: unknown) => {
        logger.error({ err: error }, 'password reset e-mail could not be sent');
      });
  }

  /**
   * Returns at once, whether or not the address has an account: the lookup, the new link and
   * the e-mail happen after the answer, so its timing cannot tell which addresses exist.
   */
  function requestPasswordReset(email: string): void {
    queue.push('password-reset', () => issueReset(email));
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
      // This link and any other the person still holds.
      await invalidatePasswordResetsOfUser(reset.userId, now, tx);
      await destroySessionsOfUser(reset.userId, tx);
    });
  }

  return { requestPasswordReset, completePasswordReset };
}

export type PasswordResetService = ReturnType<typeof createPasswordResetService>;
