// Users, companies and password resets. Users are global identities (not tenant rows), so
// looking them up by e-mail is deliberately unscoped.
import { Op } from 'sequelize';
import type { Role } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import {
  CompanyModel,
  MembershipModel,
  PasswordResetModel,
  SessionModel,
  UserModel,
} from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

export interface UserRecord {
  id: string;
  name: string;
  email: string;
  passwordHash: string;
}

/** Unscoped on purpose: sign-in, sign-up and invitations must find a person by e-mail across companies. */
export async function unsafeFindUserByEmail(email: string, tx?: Tx): Promise<UserRecord | null> {
  const row = await UserModel.findOne({ where: { email }, ...(tx ? { transaction: tx } : {}) });
  return row
    ? { id: row.id, name: row.name, email: row.email, passwordHash: row.passwordHash }
    : null;
}

export async function createUser(
  values: { name: string; email: string; passwordHash: string },
  tx: Tx,
): Promise<UserRecord> {
  const row = await UserModel.create(values, { transaction: tx });
  return { id: row.id, name: row.name, email: row.email, passwordHash: row.passwordHash };
}

export async function updateUserPassword(
  userId: string,
  passwordHash: string,
  tx: Tx,
): Promise<void> {
  await UserModel.update({ passwordHash }, { where: { id: userId }, transaction: tx });
}

export async function isSlugTaken(slug: string, tx: Tx): Promise<boolean> {
  return (await CompanyModel.count({ where: { slug }, transaction: tx })) > 0;
}

export async function createCompany(
  values: { name: string; slug: string; timeZone: string },
  tx: Tx,
): Promise<{ id: string }> {
  const row = await CompanyModel.create(
    { ...values, address: null, region: null, settings: {} },
    { transaction: tx },
  );
  return { id: row.id };
}

/** Adds the context's user to the context's company with `role`. */
export async function addMembership(ctx: RequestContext, role: Role, tx: Tx): Promise<void> {
  await scoped(ctx, MembershipModel).create({ userId: ctx.userId, role }, tx);
}

export async function createPasswordReset(
  userId: string,
  tokenHash: string,
  expiresAt: Date,
  tx: Tx,
): Promise<void> {
  await PasswordResetModel.create(
    { userId, tokenHash, expiresAt, usedAt: null },
    { transaction: tx },
  );
}

/** Marks every still-unused reset of the user as used, so none of those links works any more. */
export async function invalidatePasswordResetsOfUser(
  userId: string,
  now: Date,
  tx: Tx,
): Promise<void> {
  await PasswordResetModel.update(
    { usedAt: now },
    { where: { userId, usedAt: null }, transaction: tx },
  );
}

/** An unused, unexpired reset with this hash, locked for the rest of `tx`. */
export async function findUsablePasswordReset(tokenHash: string, now: Date, tx: Tx) {
  const row = await PasswordResetModel.findOne({
    where: { tokenHash, usedAt: null, expiresAt: { [Op.gt]: now } },
    transaction: tx,
    lock: tx.LOCK.UPDATE,
  });
  return row ? { id: row.id, userId: row.userId } : null;
}

/** Ends every stored session of the user (after a password change). */
export async function destroySessionsOfUser(userId: string, tx: Tx): Promise<number> {
  return SessionModel.destroy({ where: { userId }, transaction: tx });
}
