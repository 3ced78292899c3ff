// Loads the invented demo company once: skipped when its slug already exists.
import { createAreaInputSchema } from '@seamwright/shared';
import type { Role } from '@seamwright/shared';
import type { Sequelize } from 'sequelize';
import type { Env } from '../config/env.js';
import type { RequestContext } from '../context.js';
import {
  CompanyModel,
  CustomerModel,
  JobModel,
  MembershipModel,
  SiteModel,
  UserModel,
} from '../db/models/index.js';
import { scoped } from '../db/tenant-scope.js';
import type { Tx } from '../db/sequelize.js';
import { planNewArea } from '../modules/areas/area-values.js';
import { createArea } from '../modules/areas/areas.repository.js';
import {
  unsafeIndexCustomerSearch,
  unsafeRecountCustomers,
} from '../modules/customers/customers.repository.js';
import { findPriceBookItemByKey } from '../modules/price-book/price-book.repository.js';
import { createStarterEstimating } from '../modules/price-book/starter-price-book.js';
import type { PlannerPool } from '../planner/planner-pool.js';
import { hashPassword } from '../passwords.js';
import { demoAreas } from './demo-areas.js';
import { demoCustomers, demoTown } from './demo-customers.js';
import { demoJobs } from './demo-jobs.js';
import { seedDemoInvoices } from './demo-invoices.js';
import { seedDemoEstimates } from './demo-estimates.js';
import type { DemoCustomerLink } from './demo-estimates.js';
import { seedDemoStock } from './demo-stock-seed.js';
import { seedDemoCrews } from './demo-crews-seed.js';

/** Demo sign-in password for every demo user (local data only). */
export const demoPassword = 'turf-demo-2026';

export const demoCompany = {
  name: 'Bramblewick Turf Works',
  slug: 'bramblewick-turf-works',
  address: '120 Foundry Lane, Quillmere 80999',
  timeZone: 'America/Denver',
};

export const demoUsers: { name: string; email: string; role: Role }[] = [
  { name: 'Rowan Bramblewick', email: 'owner@demo.seamwright.test', role: 'owner' },
  { name: 'Delphine Ashgrove', email: 'office@demo.seamwright.test', role: 'office' },
  { name: 'Corwin Tallis', email: 'books@demo.seamwright.test', role: 'bookkeeper' },
  { name: 'Mateo Quarrington', email: 'crew@demo.seamwright.test', role: 'crew_lead' },
];

export interface SeedResult {
  created: boolean;
  companyName: string;
  users: { email: string; role: Role }[];
  password: string;
  /** Customer pages of demo estimates sent on this run (the token exists only here). */
  customerLinks: DemoCustomerLink[];
  /** The pay page of the demo deposit invoice sent on this run (the token exists only here). */
  payLinks: DemoCustomerLink[];
}

/**
 * Loads the demo company in one transaction (all or nothing). Its areas are planned through
 * `plannerPool`, like a request's.
 */
export async function seedDemoData(
  sequelize: Sequelize,
  env: Pick<Env, 'bcryptCost'>,
  plannerPool: PlannerPool,
): Promise<SeedResult> {
  const result = {
    companyName: demoCompany.name,
    users: demoUsers.map(({ email, role }) => ({ email, role })),
    password: demoPassword,
  };
  const existing = await CompanyModel.findOne({ where: { slug: demoCompany.slug } });
  const owner = existing
    ? await demoOwnerOf(existing.id)
    : await createDemoCompany(sequelize, env, plannerPool);
  // Filled in after the company commits, each part only when missing (so a rerun completes a
  // demo that an older version of this seed made).
  await seedDemoStock(owner, { sequelize, plannerPool });
  await seedDemoCrews(owner, { sequelize });
  const customerLinks = await seedDemoEstimates(owner, { sequelize });
  const payLinks = await seedDemoInvoices(owner, { sequelize });
  return { created: !existing, ...result, customerLinks, payLinks };
}

/** The demo owner's context, to act as them on an existing demo company. */
async function demoOwnerOf(companyId: string): Promise<RequestContext> {
  const lookup = { companyId, userId: '', role: 'owner' as const };
  const [membership] = await scoped(lookup, MembershipModel).findAll({ where: { role: 'owner' } });
  if (!membership) throw new Error('The demo company has no owner.');
  return { companyId, userId: membership.userId, role: 'owner' };
}

/** Company, people, customers, jobs, price book and planned areas: one transaction. */
async function createDemoCompany(
  sequelize: Sequelize,
  env: Pick<Env, 'bcryptCost'>,
  plannerPool: PlannerPool,
): Promise<RequestContext> {
  const passwordHash = await hashPassword(demoPassword, env.bcryptCost);
  return sequelize.transaction(async (transaction) => {
    const company = await CompanyModel.create(
      { ...demoCompany, region: null, settings: {} },
      { transaction },
    );
    // The seed acts as each demo user in turn, so its rows go through the same scoping as a
    // request's; the owner (listed first) adds the customers and sites.
    const contexts: RequestContext[] = [];
    for (const demoUser of demoUsers) {
      const [user] = await UserModel.findOrCreate({
        where: { email: demoUser.email },
        defaults: { name: demoUser.name, email: demoUser.email, passwordHash },
        transaction,
      });
      const ctx = { companyId: company.id, userId: user.id, role: demoUser.role };
      await scoped(ctx, MembershipModel).create(
        { userId: user.id, role: demoUser.role },
        transaction,
      );
      contexts.push(ctx);
    }
    const [owner] = contexts;
    if (!owner) throw new Error('The demo needs at least one user.');
    // Each demo customer's id and site ids by name, for the demo jobs.
    const made = new Map<string, { customerId: string; siteIds: string[] }>();
    for (const demo of demoCustomers) {
      const customer = await scoped(owner, CustomerModel).create(
        {
          name: demo.name,
          email: demo.email,
          phone: demo.phone,
          billingAddress: demo.sites[0]
            ? `${demo.sites[0].addressLine1}, ${demoTown.city} ${demoTown.postalCode}`
            : null,
          notes: demo.notes,
          archivedAt: demo.archived ? new Date() : null,
        },
        transaction,
      );
      const ids: string[] = [];
      made.set(demo.name, { customerId: customer.id, siteIds: ids });
      for (const site of demo.sites) {
        const created = await scoped(owner, SiteModel).create(
          {
            ...site,
            customerId: customer.id,
            addressLine2: null,
            city: demoTown.city,
            region: null,
            postalCode: demoTown.postalCode,
          },
          transaction,
        );
        ids.push(created.id);
      }
    }
    // The same invented starter price book a new company gets at sign-up.
    await createStarterEstimating(owner, transaction);
    const jobIds = new Map<string, string>();
    for (const job of demoJobs) {
      const parent = made.get(job.customer);
      const siteId = parent?.siteIds[job.site];
      if (!parent || !siteId) throw new Error(`Demo job "${job.title}" has no site.`);
      const created = await scoped(owner, JobModel).create(
        { customerId: parent.customerId, siteId, title: job.title, status: job.status },
        transaction,
      );
      jobIds.set(job.title, created.id);
    }
    await seedDemoAreas(owner, jobIds, plannerPool, transaction);
    await unsafeRecountCustomers(company.id, transaction);
    await unsafeIndexCustomerSearch(company.id, transaction);
    return owner;
  });
}

/** Draws and plans each demo area on its job, checked by the same schema as a request body. */
async function seedDemoAreas(
  ctx: RequestContext,
  jobIds: Map<string, string>,
  plannerPool: PlannerPool,
  tx: Tx,
): Promise<void> {
  for (const demo of demoAreas) {
    const jobId = jobIds.get(demo.jobTitle);
    const product = await findPriceBookItemByKey(ctx, demo.turfKey, tx);
    if (!jobId || !product) throw new Error(`Demo area "${demo.body.name}" has no job or turf.`);
    const input = createAreaInputSchema.parse({ ...demo.body, turfProductId: product.id });
    await createArea(ctx, jobId, await planNewArea(ctx, plannerPool, input, tx), tx);
  }
}
