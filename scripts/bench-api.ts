/**
 * bench-api — load-tests the signed-in API against two yardsticks on the same database.
 *
 * Starts (or reuses) the test MariaDB, recreates its own `seamwright_bench` database (never the
 * dev or test data), migrates it, seeds a company with 20,000 customers, their sites and a job
 * each, plus a small one with 30, starts the API (`apps/api/src/server.ts`, production settings) and a bare
 * Express process as separate processes, signs in, and drives autocannon at each route in turn.
 * Prints requests/s, p50 and p99 per route, the ratio to the one-query route, and the API's
 * peak resident memory. Stops everything it started.
 *
 * Usage: pnpm bench:api [--duration 10] [--connections 50] [--customers 20000]
 *                       [--only name,name] [--cpu-prof] [--api-flags "--max-semi-space-size=4"]
 * `--cpu-prof` writes the API's V8 CPU profile to .tmp/bench/ (open it in Chrome DevTools).
 * `--api-flags` sets NODE_OPTIONS for the API process instead of the shipped `apiNodeOptions`
 * (memory experiments; NODE_OPTIONS, because worker threads refuse V8 flags in execArgv). The API's
 * process.memoryUsage() at start and at its resident peak is printed after the table.
 * Safe anywhere: local processes on loopback only.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync, readFileSync } from 'node:fs';
import { cpus } from 'node:os';
import { join } from 'node:path';
import { createSequelize, hashPassword, migrateDatabase, selectRows } from '@seamwright/api';
import { createConnection } from 'mariadb';
import {
  behindTlsProxy,
  measureRoute,
  sampleResidentMemory,
  signInOverHttp,
} from './lib/bench-load.js';
import type { RouteResult } from './lib/bench-load.js';
import { apiNodeOptions } from './lib/api-env.js';
import { benchPassword, seedBenchCompany } from './lib/bench-seed.js';
import { instances } from './lib/instances.js';
import { fail, say } from './lib/log.js';
import { recreateDatabase, startMariadb } from './lib/mariadb.js';
import { dataRoot, projectRoot } from './lib/paths.js';
import { stopService, waitForHttp } from './lib/processes.js';

function flag(name: string, fallback: string): string {
  const index = process.argv.indexOf(`--${name}`);
  const inline = process.argv.find((arg) => arg.startsWith(`--${name}=`));
  if (inline) return inline.slice(name.length + 3);
  return index > 0 ? (process.argv[index + 1] ?? fallback) : fallback;
}
const durationSeconds = Number(flag('duration', '10'));
const connections = Number(flag('connections', '50'));
const customerCount = Number(flag('customers', '20000'));
const only = flag('only', '').split(',').filter(Boolean);
const cpuProfile = process.argv.includes('--cpu-prof');
const apiFlags = flag('api-flags', '').trim();
if (!(durationSeconds > 0) || !(connections > 0) || !(customerCount > 0))
  fail('bench', '--duration, --connections and --customers take positive numbers');

const { db, benchApiPort, benchBaselinePort } = instances.test;
const database = { database: 'seamwright_bench', user: db.user, password: db.password };
const dbEnv = {
  DB_HOST: '127.0.0.1',
  DB_PORT: String(db.port),
  DB_NAME: database.database,
  DB_USER: db.user,
  DB_PASSWORD: db.password,
};
const profileDir = join(projectRoot, '.tmp', 'bench');
const memoryFile = join(profileDir, 'api-memory.json');
mkdirSync(profileDir, { recursive: true });

const mariadb = await startMariadb('test', db.port);
recreateDatabase(mariadb, database);
const sequelize = createSequelize({
  host: '127.0.0.1',
  port: db.port,
  name: database.database,
  ...database,
});
const seedStart = Date.now();
await migrateDatabase(sequelize);
const passwordHash = await hashPassword(benchPassword, 10);
const large = await seedBenchCompany(sequelize, {
  slug: 'large',
  customerCount,
  extraMembers: 5,
  passwordHash,
});
const small = await seedBenchCompany(sequelize, {
  slug: 'small',
  customerCount: 30,
  extraMembers: 3,
  passwordHash,
});
await selectRows(
  sequelize,
  'ANALYZE TABLE customers, customer_search_words, sites, jobs, memberships, sessions',
);
await sequelize.close();
say(
  'bench',
  `seeded ${customerCount} + 30 customers in ${((Date.now() - seedStart) / 1000).toFixed(1)} s`,
);

function startNode(
  script: string,
  port: number,
  extraEnv: Record<string, string>,
  nodeFlags: string[] = [],
  imports: string[] = [],
) {
  const preload = ['tsx', ...imports].flatMap((name) => ['--import', name]);
  return spawn(process.execPath, [...nodeFlags, ...preload, script], {
    cwd: projectRoot,
    env: { ...process.env, ...dbEnv, PORT: String(port), ...extraEnv },
    stdio: ['ignore', 'ignore', 'inherit'],
    detached: true,
  });
}

const api = startNode(
  'apps/api/src/server.ts',
  benchApiPort,
  {
    NODE_ENV: 'production',
    SESSION_SECRET: 'bench-session-secret-0123456789abcdef',
    // Production settings as behind a TLS proxy (they refuse COOKIE_SECURE=false): the bench
    // speaks plain HTTP and says `x-forwarded-proto: https`, as the proxy would.
    APP_URL: `https://127.0.0.1:${benchApiPort}`,
    TRUST_PROXY: '1',
    // Production needs processor keys; the bench never pays, and a closed loopback port makes
    // sure nothing could leave the machine if it did.
    PROCESSOR_URL: 'http://127.0.0.1:9',
    PROCESSOR_SECRET_KEY: 'sk_test_bench_never_used_0123',
    PROCESSOR_WEBHOOK_SECRET: 'whsec_bench_never_used_0123',
    UPLOADS_DIR: join(dataRoot, 'uploads', 'bench'),
    LOG_LEVEL: process.env.LOG_LEVEL ?? 'info',
    BENCH_MEMORY_FILE: memoryFile,
    // As `npm start` runs it (scripts/lib/api-env.ts), unless an experiment says otherwise.
    NODE_OPTIONS: apiFlags || apiNodeOptions,
  },
  cpuProfile ? ['--cpu-prof', `--cpu-prof-dir=${profileDir}`] : [],
  ['./scripts/lib/bench-memory-probe.mjs'],
);
const baseline = startNode('scripts/lib/bench-baseline-server.ts', benchBaselinePort, {
  BENCH_COMPANY_ID: large.companyId,
});
const children: ChildProcess[] = [api, baseline];
async function stopAll(): Promise<void> {
  for (const child of children) await stopService(child, 10_000);
  if (mariadb.startedHere) mariadb.stop();
}

const apiUrl = `http://127.0.0.1:${benchApiPort}`;
const baselineUrl = `http://127.0.0.1:${benchBaselinePort}`;
const results: RouteResult[] = [];
let peakMb = NaN;
let idleMb = NaN;
try {
  await waitForHttp(`${apiUrl}/api/health`, 60_000, api);
  await waitForHttp(`${baselineUrl}/bare`, 60_000, baseline);
  const largeCookie = await signInOverHttp(apiUrl, large.ownerEmail, benchPassword);
  const smallCookie = await signInOverHttp(apiUrl, small.ownerEmail, benchPassword);
  // Near the end of the active customers (one in twenty is archived), ordered by name.
  const latePage = Math.max(1, Math.floor((customerCount * 0.95) / 25) - 5);
  const routes: { name: string; url: string; cookie?: string }[] = [
    { name: 'bare Express', url: `${baselineUrl}/bare` },
    { name: 'bare Express + 1 query', url: `${baselineUrl}/one-query` },
    { name: 'GET /api/me', url: `${apiUrl}/api/me`, cookie: largeCookie },
    {
      name: 'customers p1',
      url: `${apiUrl}/api/customers?page=1&pageSize=25`,
      cookie: largeCookie,
    },
    {
      name: 'customers search',
      url: `${apiUrl}/api/customers?q=thornmore&pageSize=25`,
      cookie: largeCookie,
    },
    {
      name: 'customers late page',
      url: `${apiUrl}/api/customers?page=${latePage}&pageSize=25`,
      cookie: largeCookie,
    },
    {
      name: 'customer detail',
      url: `${apiUrl}/api/customers/${large.sampleCustomerId}`,
      cookie: largeCookie,
    },
    {
      name: 'customer sites',
      url: `${apiUrl}/api/customers/${large.sampleCustomerId}/sites`,
      cookie: largeCookie,
    },
    { name: 'members', url: `${apiUrl}/api/members`, cookie: largeCookie },
    { name: 'jobs p1', url: `${apiUrl}/api/jobs?page=1&pageSize=25`, cookie: largeCookie },
    {
      name: 'job detail',
      url: `${apiUrl}/api/jobs/${large.sampleJobId}`,
      cookie: largeCookie,
    },
    {
      name: 'customers p1 (30)',
      url: `${apiUrl}/api/customers?page=1&pageSize=25`,
      cookie: smallCookie,
    },
    { name: 'GET /api/health', url: `${apiUrl}/api/health` },
  ];
  const memory = sampleResidentMemory(api.pid ?? 0);
  idleMb = memory.currentMb();
  const status = await createConnection({ host: '127.0.0.1', port: db.port, ...database });
  const dbPid = Number(readFileSync(join(dataRoot, 'test', 'mariadb', 'mariadb.pid'), 'utf8'));
  const questions = async () => {
    const rows: { Value: string }[] = await status.query("SHOW GLOBAL STATUS LIKE 'Questions'");
    return Number(rows[0]?.Value);
  };
  const load = { connections, durationSeconds, warmupSeconds: Math.min(2, durationSeconds / 5) };
  for (const route of routes) {
    if (only.length && !only.includes(route.name)) continue;
    const server = route.url.startsWith(baselineUrl) ? baseline : api;
    const probe = { questions, apiPid: server.pid ?? 0, dbPid };
    const headers: Record<string, string> = {
      ...behindTlsProxy,
      ...(route.cookie ? { cookie: route.cookie } : {}),
    };
    const result = await measureRoute(route.name, route.url, headers, load, probe);
    say('bench', `${route.name}: ${result.requestsPerSecond.toFixed(0)} req/s`);
    results.push(result);
  }
  peakMb = memory.stop();
  await status.end();
} finally {
  await stopAll();
}

const yardstick = results.find((r) => r.name === 'bare Express + 1 query');
console.log(
  `\nAPI benchmark — ${new Date().toISOString().slice(0, 10)}, ${cpus().length} cores, Node ${process.version}, ` +
    `${connections} connections, ${durationSeconds} s per route, ${customerCount} customers`,
);
console.log(
  '| route | req/s | p50 ms | p99 ms | vs 1 query | SQL/req | API CPU ms/req | DB CPU ms/req | non-2xx |',
);
console.log('|---|---:|---:|---:|---:|---:|---:|---:|---:|');
for (const r of results) {
  const ratio = yardstick ? (r.requestsPerSecond / yardstick.requestsPerSecond).toFixed(2) : '–';
  console.log(
    `| ${r.name} | ${r.requestsPerSecond.toFixed(0)} | ${r.p50Ms} | ${r.p99Ms} | ${ratio} | ` +
      `${r.statementsPerRequest.toFixed(1)} | ${r.apiCpuMs.toFixed(2)} | ${r.dbCpuMs.toFixed(2)} | ${r.non2xx + r.errors} |`,
  );
}
console.log(
  `\nAPI resident memory: ${idleMb.toFixed(0)} MB signed in and idle, ${peakMb.toFixed(0)} MB at its peak`,
);
try {
  // MB, from the probe inside the API (scripts/lib/bench-memory-probe.mjs).
  const usage = JSON.parse(readFileSync(memoryFile, 'utf8')) as Record<string, unknown>;
  console.log(
    `API process.memoryUsage() in MB, at start and at its peak: ${JSON.stringify(usage)}`,
  );
} catch {
  console.log('API process.memoryUsage(): no sample written');
}
if (cpuProfile) console.log(`CPU profile written to ${profileDir}`);
if (results.some((r) => r.non2xx + r.errors > 0 || r.requests === 0))
  fail('bench', 'some requests failed or none completed');
