// Lookups keyed by the signed-in user rather than by a company: they build the tenant context
// itself, so they cannot be company-scoped, and are named unsafe… for the tenant-scope lint rule.
// The user id always comes from the session.
import { Op, QueryTypes } from 'sequelize';
import type { Role } from '@seamwright/shared';
import { CompanyModel, MembershipModel, SessionModel, UserModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';

export interface UserMembership {
  companyId: string;
  role: Role;
}

/** Unscoped: checks the session's company against the user's memberships, before a context exists. */
export async function unsafeFindMembershipOfUser(
  userId: string,
  companyId: string,
): Promise<UserMembership | null> {
  const row = await MembershipModel.findOne({
    where: { userId, companyId },
    attributes: ['companyId', 'role'],
  });
  return row ? { companyId: row.companyId, role: row.role } : null;
}

/** Unscoped: picks a company for a user whose session has none (or lost it) yet. */
export async function unsafeFindFirstMembershipOfUser(
  userId: string,
): Promise<UserMembership | null> {
  const row = await MembershipModel.findOne({
    where: { userId },
    attributes: ['companyId', 'role'],
    order: [['createdAt', 'ASC']],
    unscopedReason: 'chooses the company of a new tenant context',
  });
  return row ? { companyId: row.companyId, role: row.role } : null;
}

export interface UserCompany {
  companyId: string;
  companyName: string;
  role: Role;
}

/** Every company the user belongs to, by company name. Unscoped: it spans the user's companies. */
export async function unsafeListCompaniesOfUser(userId: string): Promise<UserCompany[]> {
  const memberships = await MembershipModel.findAll({
    where: { userId },
    attributes: ['companyId', 'role'],
    unscopedReason: "lists the signed-in user's own companies",
  });
  if (memberships.length === 0) return [];
  const companies = await CompanyModel.findAll({
    where: { id: memberships.map((m) => m.companyId) },
    attributes: ['id', 'name'],
  });
  const names = new Map(companies.map((c) => [c.id, c.name]));
  return memberships
    .map((m) => ({
      companyId: m.companyId,
      companyName: names.get(m.companyId) ?? '',
      role: m.role,
    }))
    .sort((a, b) => a.companyName.localeCompare(b.companyName));
}

export interface CompanyRow {
  id: string;
  name: string;
  slug: string;
  timeZone: string;
  region: string | null;
  currency: string;
  measurementSystem: 'imperial' | 'metric';
}

export interface UserWithCompanies {
  user: { id: string; name: string; email: string };
  /** Every company the user belongs to, with their role there (in no particular order). */
  memberships: (CompanyRow & { role: Role })[];
}

interface UserCompanyRow extends Partial<CompanyRow> {
  userName: string;
  userEmail: string;
  role: Role | null;
}

/**
 * The user and every company they belong to, in one statement (GET /api/me runs on every page
 * load; see docs/PERFORMANCE.md). Plain SQL: the join is by primary and unique keys. Unscoped:
 * it spans the user's own companies, keyed by the user id from the session.
 */
export async function unsafeFindUserWithCompanies(
  userId: string,
): Promise<UserWithCompanies | null> {
  // The models share one Sequelize instance, set when they were registered.
  const rows = await UserModel.sequelize!.query<UserCompanyRow>(
    `SELECT u.name AS userName, u.email AS userEmail, m.role,
       c.id, c.name, c.slug, c.time_zone AS timeZone, c.region, c.currency,
       c.measurement_system AS measurementSystem
     FROM users u
     LEFT JOIN memberships m ON m.user_id = u.id
     LEFT JOIN companies c ON c.id = m.company_id
     WHERE u.id = ?`,
    { replacements: [userId], type: QueryTypes.SELECT },
  );
  const [first] = rows;
  if (!first) return null;
  const memberships: UserWithCompanies['memberships'] = [];
  for (const { userName: _n, userEmail: _e, role, ...company } of rows) {
    if (role && company.id) memberships.push({ ...(company as CompanyRow), role });
  }
  return { user: { id: userId, name: first.userName, email: first.userEmail }, memberships };
}

export async function findUserById(userId: string) {
  const row = await UserModel.findByPk(userId, { attributes: ['id', 'name', 'email'] });
  return row ? { id: row.id, name: row.name, email: row.email } : null;
}

export async function findCompanyById(companyId: string) {
  const row = await CompanyModel.findByPk(companyId);
  return row ? row.get({ plain: true }) : null;
}

/** The user's password hash, locked for the rest of `tx` so two changes cannot interleave. */
export async function findPasswordHashOfUser(userId: string, tx: Tx): Promise<string | null> {
  const row = await UserModel.findByPk(userId, {
    attributes: ['passwordHash'],
    transaction: tx,
    lock: tx.LOCK.UPDATE,
  });
  return row ? row.passwordHash : null;
}

export async function updateNameOfUser(userId: string, name: string, tx: Tx): Promise<void> {
  await UserModel.update({ name }, { where: { id: userId }, transaction: tx });
}

export async function updatePasswordHashOfUser(
  userId: string,
  passwordHash: string,
  tx: Tx,
): Promise<void> {
  await UserModel.update({ passwordHash }, { where: { id: userId }, transaction: tx });
}

/** Ends every stored session of the user except `keepSessionId` (the one making the change). */
export async function destroyOtherSessionsOfUser(
  userId: string,
  keepSessionId: string,
  tx: Tx,
): Promise<number> {
  return SessionModel.destroy({
    where: { userId, sid: { [Op.ne]: keepSessionId } },
    transaction: tx,
  });
}
