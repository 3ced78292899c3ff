// The signed-in person changing their own name and password. Knows nothing of HTTP; the user
// and the session to keep come from the handler, which reads them from the session only.
import type { ChangePasswordInput, UpdateProfileInput } from '@seamwright/shared';
import type { ServiceDeps } from '../../deps.js';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import { AppError } from '../../errors.js';
import { hashPassword, verifyPassword } from '../../passwords.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import {
  destroyOtherSessionsOfUser,
  findPasswordHashOfUser,
  updateNameOfUser,
  updatePasswordHashOfUser,
} from './me.repository.js';

/**
 * A wrong current password: a 400 naming the field, so the form shows it beside the box. Its
 * own class so the handler can count it against the change limit.
 */
export class WrongCurrentPasswordError extends AppError {
  constructor() {
    super('VALIDATION_FAILED', 'currentPassword: That is not your current password', {
      errors: [{ path: 'currentPassword', message: 'That is not your current password' }],
    });
  }
}

export function createProfileService(deps: Pick<ServiceDeps, 'env' | 'sequelize'>) {
  const { env, sequelize } = deps;

  async function updateName(ctx: RequestContext, input: UpdateProfileInput): Promise<void> {
    await inTransaction(sequelize, async (tx) => {
      await updateNameOfUser(ctx.userId, input.name, tx);
      await recordAuditEvent(
        ctx,
        { action: 'user.name_changed', entity: 'user', entityId: ctx.userId },
        tx,
      );
    });
  }

  /**
   * Checks the current password, stores the new one and ends the user's other sessions (a
   * device left signed in elsewhere must sign in again); the session making the change stays.
   * Returns how many sessions were ended.
   */
  async function changePassword(
    ctx: RequestContext,
    keepSessionId: string,
    input: ChangePasswordInput,
  ): Promise<number> {
    // Hashing is slow on purpose; do it before the transaction so no row stays locked for it.
    const newHash = await hashPassword(input.newPassword, env.bcryptCost);
    return inTransaction(sequelize, async (tx) => {
      const currentHash = await findPasswordHashOfUser(ctx.userId, tx);
      if (!currentHash) throw new AppError('UNAUTHENTICATED', 'Sign in to continue');
      if (!(await verifyPassword(input.currentPassword, currentHash)))
        throw new WrongCurrentPasswordError();
      await updatePasswordHashOfUser(ctx.userId, newHash, tx);
      const ended = await destroyOtherSessionsOfUser(ctx.userId, keepSessionId, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'user.password_changed',
          entity: 'user',
          entityId: ctx.userId,
          data: { otherSessionsEnded: ended },
        },
        tx,
      );
      return ended;
    });
  }

  return { updateName, changePassword };
}

export type ProfileService = ReturnType<typeof createProfileService>;
