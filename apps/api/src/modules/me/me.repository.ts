// Lookups keyed by the signed-in user rather than by a company: they build the tenant context
// itself, so they cannot be company-scoped. The user id always comes from the session.
import type { Role } from '@seamwright/shared';
import { QueryTypes } from 'sequelize';
import { CompanyModel, MembershipModel, UserModel } from '../../db/models/index.js';

export interface UserMembership {
  companyId: string;
  role: Role;
}

export async function findMembershipOfUser(
  userId: string,
  companyId: string,
): Promise<UserMembership | null> {
  const row = await MembershipModel.findOne({
    where: { userId, companyId },
    attributes: ['companyId', 'role'],
  });
  return row ? { companyId: row.companyId, role: row.role } : null;
}

export async function findFirstMembershipOfUser(userId: string): Promise<UserMembership | null> {
  const row = await MembershipModel.findOne({
    where: { userId },
    attributes: ['companyId', 'role'],
    order: [['createdAt', 'ASC']],
  });
  return row ? { companyId: row.companyId, role: row.role } : null;
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
 * load; see docs/PERFORMANCE.md). Plain SQL: the join is by primary and unique keys.
 */
export async function findUserWithCompanies(userId: string): Promise<UserWithCompanies | null> {
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
