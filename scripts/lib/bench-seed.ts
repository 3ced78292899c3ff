// Data for the API benchmark: a large company (20,000 customers by default, most with one or two
// sites, a few archived) and a small one (30 customers), each with an owner who can sign in, and
// a handful of members in the large one, and a job at the first site of every customer (so the
// jobs list has as many rows as the customers list). Bulk multi-row inserts, so seeding takes
// seconds. Estimates are not seeded yet (their lines and options need the price book).
// Every name is invented from the syllables below.
import { randomUUID } from 'node:crypto';
import { executeSql, unsafeInsertSearchWords } from '@seamwright/api';
import type { createSequelize } from '@seamwright/api';

type Sequelize = ReturnType<typeof createSequelize>;

export const benchPassword = 'bench-turf-password-2026';

export interface BenchCompany {
  companyId: string;
  ownerEmail: string;
  /** A customer in the middle of the list (for the detail route). */
  sampleCustomerId: string;
  /** That customer's job (for the job detail route). */
  sampleJobId: string;
  customers: number;
}

const firstNames = ['Odalys', 'Brannock', 'Ysolde', 'Tamsin', 'Corvin', 'Liesel', 'Oren', 'Pell'];
const lastStems = ['Ash', 'Fen', 'Marl', 'Quill', 'Thorn', 'Wick', 'Bram', 'Hollin', 'Sedge'];
const lastEnds = ['wright', 'grove', 'ridge', 'more', 'stead', 'field', 'brook', 'hart'];
const jobStatuses = ['lead', 'estimated', 'accepted', 'scheduled', 'installed', 'paid', 'lost'];
const jobTitles = ['Front lawn', 'Back yard putting green', 'Dog run', 'Side strip', 'Play area'];
const streets = ['Larkspur Bend', 'Foundry Lane', 'Cinder Row', 'Tansy Court', 'Millrace Way'];
const batchSize = 1000;

function pick<T>(list: readonly T[], index: number): T {
  // Lists are non-empty constants; the modulo keeps the index in range.
  return list[index % list.length] as T;
}

function customerName(i: number): string {
  const last = `${pick(lastStems, Math.floor(i / 8))}${pick(lastEnds, Math.floor(i / 72))}`;
  return `${pick(firstNames, i)} ${last} ${String(i).padStart(5, '0')}`;
}

async function insertInBatches(
  sequelize: Sequelize,
  table: string,
  rows: Record<string, unknown>[],
): Promise<void> {
  const qi = sequelize.getQueryInterface();
  for (let start = 0; start < rows.length; start += batchSize) {
    await qi.bulkInsert(table, rows.slice(start, start + batchSize));
  }
}

async function insertUser(sequelize: Sequelize, email: string, passwordHash: string) {
  const id = randomUUID();
  const now = new Date();
  await sequelize.getQueryInterface().bulkInsert('users', [
    {
      id,
      name: `Bench ${email.split('@')[0] ?? 'user'}`,
      email,
      password_hash: passwordHash,
      created_at: now,
      updated_at: now,
    },
  ]);
  return id;
}

/** Creates one company with `customerCount` customers, an owner and `extraMembers` members. */
export async function seedBenchCompany(
  sequelize: Sequelize,
  options: { slug: string; customerCount: number; extraMembers: number; passwordHash: string },
): Promise<BenchCompany> {
  const companyId = randomUUID();
  const now = new Date();
  const stamp = { created_at: now, updated_at: now };
  await sequelize.getQueryInterface().bulkInsert('companies', [
    {
      id: companyId,
      name: `Bench ${options.slug}`,
      slug: options.slug,
      address: '1 Foundry Lane, Quillmere',
      time_zone: 'America/Denver',
      region: null,
      currency: 'USD',
      measurement_system: 'imperial',
      settings: '{}',
      ...stamp,
    },
  ]);
  const ownerEmail = `owner@${options.slug}.bench.test`;
  const members = [{ email: ownerEmail, role: 'owner' }];
  for (let m = 0; m < options.extraMembers; m += 1)
    members.push({ email: `member${m}@${options.slug}.bench.test`, role: 'office' });
  const memberships: Record<string, unknown>[] = [];
  for (const member of members) {
    const userId = await insertUser(sequelize, member.email, options.passwordHash);
    memberships.push({
      id: randomUUID(),
      company_id: companyId,
      user_id: userId,
      role: member.role,
      ...stamp,
    });
  }
  await insertInBatches(sequelize, 'memberships', memberships);

  const customers: Record<string, unknown>[] = [];
  const sites: Record<string, unknown>[] = [];
  const jobs: Record<string, unknown>[] = [];
  for (let i = 0; i < options.customerCount; i += 1) {
    const id = randomUUID();
    // Spread creation times over the past so created-at sorting has something to sort.
    const created = new Date(now.getTime() - (options.customerCount - i) * 60_000);
    const name = customerName(i);
    customers.push({
      id,
      company_id: companyId,
      name,
      email: `${name.toLowerCase().replace(/ /g, '.')}@example.test`,
      phone: `(555) 01${String(i % 100).padStart(2, '0')}-${String(i % 10000).padStart(4, '0')}`,
      billing_address: `${(i % 400) + 1} ${pick(streets, i)}, Quillmere 80999`,
      notes: i % 5 === 0 ? 'Prefers a call before the crew arrives.' : null,
      archived_at: i % 20 === 19 ? now : null,
      created_at: created,
      updated_at: created,
    });
    for (let s = 0; s < (i % 3 === 0 ? 2 : 1); s += 1) {
      const siteId = randomUUID();
      if (s === 0)
        jobs.push({
          id: randomUUID(),
          company_id: companyId,
          customer_id: id,
          site_id: siteId,
          title: `${pick(jobTitles, i)} ${String(i).padStart(5, '0')}`,
          status: pick(jobStatuses, i),
          created_at: created,
          updated_at: created,
        });
      sites.push({
        id: siteId,
        company_id: companyId,
        customer_id: id,
        label: s === 0 ? 'Front yard' : 'Back yard',
        address_line1: `${(i % 400) + 1} ${pick(streets, i + s)}`,
        address_line2: null,
        city: 'Quillmere',
        region: null,
        postal_code: '80999',
        access_notes: 'Side gate; latch sticks.',
        pets: i % 4 === 0 ? 'One dog, kept inside on install days.' : null,
        hazards: null,
        sprinkler_heads: (i % 12) + 1,
        created_at: created,
        updated_at: created,
      });
    }
  }
  await insertInBatches(sequelize, 'customers', customers);
  await insertInBatches(sequelize, 'sites', sites);
  await insertInBatches(sequelize, 'jobs', jobs);
  await unsafeInsertSearchWords(
    sequelize,
    customers.map((c) => ({
      id: String(c.id),
      companyId,
      name: String(c.name),
      email: String(c.email),
      phone: String(c.phone),
    })),
  );
  // The totals the service keeps on every change (migration 0006), for these bulk-loaded rows.
  await executeSql(
    sequelize,
    `INSERT INTO customer_counts (company_id, active, archived)
     SELECT company_id, SUM(archived_at IS NULL), SUM(archived_at IS NOT NULL)
     FROM customers WHERE company_id = ? GROUP BY company_id`,
    [companyId],
  );
  const middle = Math.floor(customers.length / 2);
  return {
    companyId,
    ownerEmail,
    sampleCustomerId: String(customers[middle]?.id),
    sampleJobId: String(jobs.find((job) => job.customer_id === customers[middle]?.id)?.id),
    customers: options.customerCount,
  };
}
