/* eslint-disable max-lines -- one long literal row builder per table; splitting it would only scatter the seed */
// Data for the dashboard benchmark: one company with 5,000 customers, 20,000 jobs (statuses
// spread along the lifecycle), their estimates, areas and history, 200,000 invoices over two
// years with their payments, and the turf cut and returned for the installed jobs. Multi-row
// INSERTs on one connection with foreign-key checks off (the rows are made consistent here),
// so seeding takes minutes, not the hours the API would. Every name is invented.
import { randomUUID } from 'node:crypto';
import type { Connection } from 'mariadb';

export interface DashboardSeedCounts {
  customers: number;
  jobs: number;
  invoices: number;
}

import { day, insert, isoDay } from './bench-dashboard-insert.js';
import { seedDashboardInvoices } from './bench-dashboard-invoices.js';

/** Job statuses in proportion: most jobs of a two-year-old company are done. */
const statusCycle = [
  ...Array<string>(2).fill('lead'),
  ...Array<string>(3).fill('estimated'),
  'accepted',
  'scheduled',
  'in_progress',
  'installed',
  ...Array<string>(2).fill('invoiced'),
  ...Array<string>(6).fill('paid'),
  'closed',
  'lost',
  'cancelled',
];
const installedOrLater = new Set(['installed', 'invoiced', 'paid', 'closed']);

export async function seedDashboardCompany(
  conn: Connection,
  counts: DashboardSeedCounts,
  now = Date.now(),
): Promise<{ companyId: string; userId: string }> {
  await conn.query('SET foreign_key_checks = 0, unique_checks = 0');
  const companyId = randomUUID();
  const userId = randomUUID();
  const at = new Date(now);
  await conn.query(
    `INSERT INTO companies (id, name, slug, address, time_zone, region, currency,
       measurement_system, settings, created_at, updated_at)
     VALUES (?, 'Bench Dashboard Turf', 'bench-dashboard', '1 Cinder Row, Quillmere',
       'America/Los_Angeles', 'US-NV', 'USD', 'imperial', '{}', ?, ?)`,
    [companyId, at, at],
  );
  await conn.query(
    `INSERT INTO users (id, name, email, password_hash, created_at, updated_at)
     VALUES (?, 'Bench Owner', 'owner@dashboard.bench.test', 'x', ?, ?)`,
    [userId, at, at],
  );
  await conn.query(
    `INSERT INTO memberships (id, company_id, user_id, role, created_at, updated_at)
     VALUES (?, ?, ?, 'owner', ?, ?)`,
    [randomUUID(), companyId, userId, at, at],
  );

  const customers: unknown[][] = [];
  const sites: unknown[][] = [];
  for (let c = 0; c < counts.customers; c += 1) {
    const id = randomUUID();
    customers.push([id, companyId, `Tansy Marlwick ${String(c).padStart(5, '0')}`, at, at]);
    sites.push([
      randomUUID(),
      companyId,
      id,
      'Back yard',
      `${c + 1} Millrace Way`,
      'Quillmere',
      at,
      at,
    ]);
  }
  await insert(
    conn,
    'customers',
    ['id', 'company_id', 'name', 'created_at', 'updated_at'],
    customers,
  );
  await insert(
    conn,
    'sites',
    [
      'id',
      'company_id',
      'customer_id',
      'label',
      'address_line1',
      'city',
      'created_at',
      'updated_at',
    ],
    sites,
  );
  await conn.query(`INSERT INTO customer_counts (company_id, active, archived) VALUES (?, ?, 0)`, [
    companyId,
    counts.customers,
  ]);

  const span = 730 * day;
  const jobs: unknown[][] = [];
  const estimates: unknown[][] = [];
  const areas: unknown[][] = [];
  const events: unknown[][] = [];
  const reservations: unknown[][] = [];
  const allocations: unknown[][] = [];
  const remnants: unknown[][] = [];
  const jobOf: { id: string; customerId: string; created: number }[] = [];
  const rollIds = Array.from({ length: 200 }, () => randomUUID());
  const rolls = rollIds.map((id, r) => [
    id,
    companyId,
    randomUUID(),
    'Bench turf',
    `LOT-${r}`,
    15,
    100,
    0,
    0,
    false,
    null,
    at,
    at,
  ]);
  for (let j = 0; j < counts.jobs; j += 1) {
    const id = randomUUID();
    const customer = customers[j % counts.customers] as [string];
    const created = now - span + Math.floor((j / counts.jobs) * span);
    const status = statusCycle[j % statusCycle.length] ?? 'lead';
    const createdAt = new Date(created);
    jobs.push([
      id,
      companyId,
      customer[0],
      sites[j % counts.customers]?.[0],
      `Lawn ${j}`,
      status,
      createdAt,
      createdAt,
    ]);
    jobOf.push({ id, customerId: customer[0], created });
    const sqFt = 300 + (j % 17) * 60;
    areas.push([
      randomUUID(),
      companyId,
      id,
      'Back yard',
      'landscape',
      '{}',
      '{}',
      '{}',
      '{}',
      '[]',
      'bench',
      sqFt,
      sqFt * 1.12,
      createdAt,
      createdAt,
    ]);
    if (status !== 'lead') {
      const total = sqFt * 1_100 + (j % 7) * 1_000;
      const versions = j % 5 === 0 ? 2 : 1;
      for (let v = 1; v <= versions; v += 1) {
        const latest = v === versions;
        const answered =
          status === 'estimated'
            ? j % 4 === 0
              ? 'declined'
              : 'sent'
            : status === 'lost'
              ? 'declined'
              : 'accepted';
        const sentAt = new Date(created + v * day);
        estimates.push([
          randomUUID(),
          companyId,
          id,
          v,
          latest ? answered : 'superseded',
          '[]',
          '[]',
          0,
          825,
          '{}',
          total,
          Math.round(total * 0.0825),
          total + Math.round(total * 0.0825),
          Math.round(total * 0.3),
          sentAt,
          isoDay(created + (v + 30) * day),
          sentAt,
          sentAt,
        ]);
      }
    }
    if (installedOrLater.has(status)) {
      const installedAt = new Date(created + 20 * day);
      events.push([
        randomUUID(),
        companyId,
        userId,
        'job.status_changed',
        'job',
        id,
        JSON.stringify({ from: 'in_progress', to: 'installed' }),
        installedAt,
      ]);
      const reservation = randomUUID();
      reservations.push([
        reservation,
        companyId,
        id,
        randomUUID(),
        'Bench turf',
        'LOT-1',
        'cut',
        0,
        '[]',
        true,
        installedAt,
        installedAt,
      ]);
      for (let p = 0; p < 2; p += 1)
        allocations.push([
          randomUUID(),
          companyId,
          reservation,
          rollIds[j % rollIds.length],
          randomUUID(),
          'Back yard',
          p + 1,
          false,
          15,
          (sqFt * 0.56) / 15,
          installedAt,
          installedAt,
        ]);
      if (j % 3 === 0)
        remnants.push([
          randomUUID(),
          companyId,
          randomUUID(),
          'Bench turf',
          'LOT-1',
          15,
          4,
          4,
          0,
          true,
          id,
          installedAt,
          installedAt,
        ]);
    }
    // Noise in the history: created and renamed events for every job.
    events.push([randomUUID(), companyId, userId, 'job.created', 'job', id, '{}', createdAt]);
    events.push([
      randomUUID(),
      companyId,
      userId,
      'job.status_changed',
      'job',
      id,
      JSON.stringify({ from: 'lead', to: 'estimated' }),
      new Date(created + day),
    ]);
  }
  await insert(
    conn,
    'jobs',
    ['id', 'company_id', 'customer_id', 'site_id', 'title', 'status', 'created_at', 'updated_at'],
    jobs,
  );
  await insert(
    conn,
    'job_areas',
    [
      'id',
      'company_id',
      'job_id',
      'name',
      'area_usage',
      'grain_choice',
      'input',
      'request',
      'plan',
      'alternatives',
      'engine_version',
      'area_sq_ft',
      'ordered_sq_ft',
      'created_at',
      'updated_at',
    ],
    areas,
  );
  await insert(
    conn,
    'estimates',
    [
      'id',
      'company_id',
      'job_id',
      'version',
      'status',
      'tiers',
      'warnings',
      'markup_basis_points',
      'tax_rate_basis_points',
      'deposit_rule',
      'subtotal_cents',
      'tax_cents',
      'total_cents',
      'deposit_cents',
      'sent_at',
      'valid_until',
      'created_at',
      'updated_at',
    ],
    estimates,
  );
  await insert(
    conn,
    'audit_events',
    ['id', 'company_id', 'user_id', 'action', 'entity', 'entity_id', 'data', 'created_at'],
    events,
  );
  const rollColumns = [
    'id',
    'company_id',
    'turf_product_id',
    'turf_product_name',
    'dye_lot',
    'width_ft',
    'length_ft',
    'remaining_ft',
    'held_ft',
    'is_remnant',
    'source_job_id',
    'created_at',
    'updated_at',
  ];
  await insert(conn, 'rolls', rollColumns, [...rolls, ...remnants]);
  await insert(
    conn,
    'turf_reservations',
    [
      'id',
      'company_id',
      'job_id',
      'turf_product_id',
      'turf_product_name',
      'dye_lot',
      'status',
      'short_ft',
      'to_order',
      'is_exhaustive',
      'created_at',
      'updated_at',
    ],
    reservations,
  );
  await insert(
    conn,
    'roll_allocations',
    [
      'id',
      'company_id',
      'reservation_id',
      'roll_id',
      'area_id',
      'area_name',
      'piece',
      'is_remnant',
      'width_ft',
      'length_ft',
      'created_at',
      'updated_at',
    ],
    allocations,
  );

  await seedDashboardInvoices(conn, companyId, jobOf, counts, now, span);
  await conn.query(`INSERT INTO invoice_counters (company_id, next_number) VALUES (?, ?)`, [
    companyId,
    counts.invoices + 1,
  ]);
  await conn.query('SET foreign_key_checks = 1, unique_checks = 1');
  await conn.query(
    'ANALYZE TABLE invoices, payments, jobs, estimates, job_areas, audit_events, rolls, turf_reservations, roll_allocations, customers',
  );
  return { companyId, userId };
}
