import type { CompanyView, MeView } from '@seamwright/shared';
import { AppError } from '../../errors.js';
import {
  findCompanyById,
  unsafeFindMembershipOfUser,
  findUserById,
  unsafeListCompaniesOfUser,
} from './me.repository.js';

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
  const [user, company, membership, companies] = await Promise.all([
    findUserById(userId),
    findCompanyById(companyId),
    unsafeFindMembershipOfUser(userId, companyId),
    unsafeListCompaniesOfUser(userId),
  ]);
  if (!user || !company || !membership)
    throw new AppError('UNAUTHENTICATED', 'Sign in to continue');
  return { user, company: toCompanyView(company), role: membership.role, companies };
}

/** Checks that the user belongs to `companyId`; another company is simply not found. */
export async function assertCanSwitchTo(userId: string, companyId: string): Promise<void> {
  if (!(await unsafeFindMembershipOfUser(userId, companyId)))
    throw new AppError('NOT_FOUND', 'Company not found');
}
