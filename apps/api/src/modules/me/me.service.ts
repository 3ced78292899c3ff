import type { CompanyView, MeView } from '@seamwright/shared';
import { AppError } from '../../errors.js';
import { unsafeFindMembershipOfUser, unsafeFindUserWithCompanies } from './me.repository.js';

export function toCompanyView(company: {
  id: string;
  name: string;
  slug: string;
  timeZone: string;
  region: string | null;
  currency: string;
  measurementSystem: 'imperial' | 'metric';
}): CompanyView {
  return {
    id: company.id,
    name: company.name,
    slug: company.slug,
    timeZone: company.timeZone,
    region: company.region,
    currency: company.currency,
    measurementSystem: company.measurementSystem,
  };
}

/** The signed-in user, their active company and role, and every company they belong to. */
export async function buildMeView(userId: string, companyId: string): Promise<MeView> {
  const found = await unsafeFindUserWithCompanies(userId);
  const active = found?.memberships.find((m) => m.id === companyId);
  if (!found || !active) throw new AppError('UNAUTHENTICATED', 'Sign in to continue');
  const companies = found.memberships
    .map((m) => ({ companyId: m.id, companyName: m.name, role: m.role }))
    .sort((a, b) => a.companyName.localeCompare(b.companyName));
  return { user: found.user, company: toCompanyView(active), role: active.role, companies };
}

/** Checks that the user belongs to `companyId`; another company is simply not found. */
export async function assertCanSwitchTo(userId: string, companyId: string): Promise<void> {
  if (!(await unsafeFindMembershipOfUser(userId, companyId)))
    throw new AppError('NOT_FOUND', 'Company not found');
}
