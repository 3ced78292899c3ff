// Sign-up and sign-in (password reset is in password-reset.service.ts). Knows nothing of HTTP;
// the handlers manage the session.
import { UniqueConstraintError } from 'sequelize';
import type { LoginInput, SignupInput } from '@seamwright/shared';
import type { ServiceDeps } from '../../deps.js';
import { inTransaction } from '../../db/sequelize.js';
import { AppError } from '../../errors.js';
import { decoyPasswordFor, hashPassword, verifyPassword } from '../../passwords.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { createStarterEstimating } from '../price-book/starter-price-book.js';
import { unsafeFindFirstMembershipOfUser } from '../me/me.repository.js';
import {
  addMembership,
  createCompany,
  createUser,
  isSlugTaken,
  unsafeFindUserByEmail,
} from './auth.repository.js';
import { slugify } from './slug.js';

export interface SignedInUser {
  userId: string;
  companyId: string;
}

export function createAuthService(deps: ServiceDeps) {
  const { env, sequelize } = deps;
  // Built now, at start-up, with the same cost as real hashes.
  const decoy = decoyPasswordFor(env.bcryptCost);

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
        // Invented starter prices and a 30 % deposit, so the first estimate has totals.
        await createStarterEstimating(ctx, tx);
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
      : await decoy.verify(input.password);
    if (!user || !isValid) throw new AppError('INVALID_CREDENTIALS', 'E-mail or password is wrong');
    const membership = await unsafeFindFirstMembershipOfUser(user.id);
    if (!membership)
      throw new AppError('FORBIDDEN', 'This account no longer belongs to any company');
    return { userId: user.id, companyId: membership.companyId };
  }

  return { signup, login };
}

export type AuthService = ReturnType<typeof createAuthService>;
