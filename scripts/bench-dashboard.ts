/**
 * bench-dashboard — times the owner's dashboard queries and the aging report on a big company.
 *
 * Starts (or reuses) the test MariaDB, recreates its own `seamwright_bench_dashboard` database
 * (never the dev, test or API-bench data), migrates it, seeds one company with 20,000 jobs and
 * 200,000 invoices with their payments (multi-row INSERTs, scripts/lib/bench-dashboard-seed.ts),
 * then runs each query ~20 times through the API's own functions and prints the median and the
 * slowest run per query. `--explain` also prints MariaDB's EXPLAIN of each statement.
 *
 * Usage: pnpm bench:dashboard [--runs 20] [--jobs 20000] [--invoices 200000] [--explain]
 *                             [--reuse]  (time the data seeded by the previous run again)
 * Safe anywhere: a database of its own on the local test instance.
 */
import { createSequelize, migrateDatabase, selectRows } from '@seamwright/api';
import {
  agingReport,
  collectedByMonth,
  dashboardRange,
  getDashboard,
  installedFigures,
  invoicedByMonth,
  pipelineByStatus,
  winRate,
} from '@seamwright/api';
import { createConnection } from 'mariadb';
import { seedDashboardCompany } from './lib/bench-dashboard-seed.js';
import { instances } from './lib/instances.js';
import { fail, say } from './lib/log.js';
import { recreateDatabase, startMariadb } from './lib/mariadb.js';

function flag(name: string, fallback: string): string {
  const inline = process.argv.find((arg) => arg.startsWith(`--${name}=`));
  if (inline) return inline.slice(name.length + 3);
  const index = process.argv.indexOf(`--${name}`);
  return index > 0 ? (process.argv[index + 1] ?? fallback) : fallback;
}
const runs = Number(flag('runs', '20'));
const jobCount = Number(flag('jobs', '20000'));
const invoiceCount = Number(flag('invoices', '200000'));
const explain = process.argv.includes('--explain');
const reuse = process.argv.includes('--reuse');
if (!(runs > 0) || !(jobCount > 0) || !(invoiceCount > 0))
  fail('bench', '--runs, --jobs and --invoices take positive numbers');

const { db } = instances.test;
const database = { database: 'seamwright_bench_dashboard', user: db.user, password: db.password };
const mariadb = await startMariadb('test', db.port);
if (!reuse) recreateDatabase(mariadb, database);
const sequelize = createSequelize({
  host: '127.0.0.1',
  port: db.port,
  name: database.database,
  ...database,
});
await migrateDatabase(sequelize);

let companyId: string;
let userId: string;
if (reuse) {
  const [row] = await selectRows<{ companyId: string; userId: string }>(
    sequelize,
    'SELECT company_id AS companyId, user_id AS userId FROM memberships LIMIT 1',
  );
  if (!row) fail('bench', 'nothing to reuse: run without --reuse first');
  ({ companyId, userId } = row);
} else {
  const seedStart = Date.now();
  const conn = await createConnection({ host: '127.0.0.1', port: db.port, ...database });
  ({ companyId, userId } = await seedDashboardCompany(conn, {
    customers: Math.max(1, Math.round(jobCount / 4)),
    jobs: jobCount,
    invoices: invoiceCount,
  }));
  await conn.end();
  const seconds = ((Date.now() - seedStart) / 1000).toFixed(1);
  say('bench', `seeded ${jobCount} jobs and ${invoiceCount} invoices in ${seconds} s`);
}

const ctx = { companyId, userId, role: 'owner' as const };
const range = dashboardRange('America/Los_Angeles', {});
const today = range.today;
const queries: { name: string; run: () => Promise<unknown> }[] = [
  { name: 'invoiced by month', run: () => invoicedByMonth(ctx, sequelize, range) },
  { name: 'collected by month', run: () => collectedByMonth(ctx, sequelize, range) },
  { name: 'pipeline by job status', run: () => pipelineByStatus(ctx, sequelize) },
  { name: 'win rate', run: () => winRate(ctx, sequelize, range) },
  { name: 'installed, price/sq ft, material', run: () => installedFigures(ctx, sequelize, range) },
  { name: 'aging report (SQL + ageReceivables)', run: () => agingReport(ctx, sequelize, today) },
  { name: 'whole dashboard (parallel)', run: () => getDashboard(ctx, sequelize, {}) },
];

/** The SQL a run sends, as Sequelize logs it with the values in place. */
async function capture(run: () => Promise<unknown>): Promise<string[]> {
  const seen: string[] = [];
  // Sequelize keeps its options on the instance; the type exported by the API hides them.
  const options = (sequelize as unknown as { options: { logging?: unknown } }).options;
  const before = options.logging;
  options.logging = (sql: string) => seen.push(sql.replace(/^Executing \([^)]*\): /, ''));
  try {
    await run();
  } finally {
    options.logging = before;
  }
  return seen;
}

const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2
    ? (sorted[mid] ?? NaN)
    : ((sorted[mid - 1] ?? 0) + (sorted[mid] ?? 0)) / 2;
};

const rows: { query: string; medianMs: string; maxMs: string; target: string }[] = [];
try {
  for (const query of queries) {
    await query.run();
    await query.run();
    const times: number[] = [];
    for (let r = 0; r < runs; r += 1) {
      const start = performance.now();
      await query.run();
      times.push(performance.now() - start);
    }
    const m = median(times);
    rows.push({
      query: query.name,
      medianMs: m.toFixed(1),
      maxMs: Math.max(...times).toFixed(1),
      target: m < 150 ? 'ok (< 150 ms)' : 'OVER 150 ms',
    });
    if (explain && !query.name.startsWith('whole'))
      for (const sql of await capture(query.run)) {
        console.log(`\n-- ${query.name}\n${sql}`);
        console.table(await sequelize.query(`EXPLAIN ${sql}`, { type: 'SELECT' }));
      }
  }
  console.log(
    `\nDashboard queries on ${invoiceCount} invoices and ${jobCount} jobs, ${runs} runs each:`,
  );
  console.table(rows);
} finally {
  await sequelize.close();
  if (mariadb.startedHere) mariadb.stop();
}
