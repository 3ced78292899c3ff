// Faults: a scratch MariaDB of its own (.data/fault, instances.test.faultDb) is stopped and
// killed under a running API. While it is down every request answers 503 problem+json
// DATABASE_UNAVAILABLE within 2 s and /api/health says so; the API reconnects by itself when it
// is back; no write it acknowledged is lost; and a SIGKILL in the middle of multi-row
// transactions leaves each of them whole or absent.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  createApp,
  createSequelize,
  loadEnv,
  migrateDatabase,
  PlannerPool,
  selectRows,
} from '@seamwright/api';
import { instances } from '../../../scripts/lib/instances.js';
import { recreateDatabase, startMariadb, stopMariadb } from '../../../scripts/lib/mariadb.js';
import { dataRoot } from '../../../scripts/lib/paths.js';
import type { App, TestSequelize } from '../../fixtures/app.js';
import { signUpCompany } from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';
import { landscapeTurfId } from '../../fixtures/stock.js';

const instanceName = 'fault';
const { faultDb } = instances.test;

let app: App;
let sequelize: TestSequelize;
let plannerPool: PlannerPool;
let owner: SignedIn;

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** The pid of the scratch mariadbd, from the pid file scripts/lib/mariadb.ts configures. */
function mariadbPid(): number {
  return Number(
    readFileSync(join(dataRoot, instanceName, 'mariadb', 'mariadb.pid'), 'utf8').trim(),
  );
}

async function startDatabase() {
  return startMariadb(instanceName, faultDb.port);
}

async function waitForHealthy(timeoutMs: number): Promise<number> {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    const res = await owner.client.get('/api/health');
    if (res.status === 200) return Date.now() - started;
    await sleep(100);
  }
  throw new Error(`the API did not reconnect within ${timeoutMs} ms`);
}

/** Whether one answer is a proper outage answer: 503 problem+json with Retry-After. */
function expectOutageAnswer(res: {
  status: number;
  headers: Record<string, string>;
  body: { code?: string };
}) {
  expect(res.status).toBe(503);
  expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
  expect(res.body.code).toBe('DATABASE_UNAVAILABLE');
  expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
}

describe('database faults', () => {
  beforeAll(async () => {
    const instance = await startDatabase();
    recreateDatabase(instance, faultDb);
    const env = loadEnv({
      ...process.env,
      DB_PORT: String(faultDb.port),
      DB_NAME: faultDb.database,
      DB_USER: faultDb.user,
      DB_PASSWORD: faultDb.password,
    });
    sequelize = createSequelize(env.db);
    await migrateDatabase(sequelize);
    plannerPool = new PlannerPool(env.planner);
    app = createApp({ env, sequelize, plannerPool });
    owner = await signUpCompany(app, 'Fault Turf');
  }, 90_000);

  afterAll(async () => {
    await plannerPool?.close();
    await sequelize?.close();
    stopMariadb(instanceName);
  });

  it('answers 503 within 2 s while the database is stopped, recovers by itself, and loses no acknowledged write', async () => {
    const acknowledged: string[] = [];
    const statuses = new Set<number>();
    let writing = true;
    let n = 0;
    const writer = (async () => {
      while (writing) {
        const res = await owner.client.post('/api/customers', {
          name: `Fault customer ${(n += 1)}`,
        });
        statuses.add(res.status);
        if (res.status === 201) acknowledged.push((res.body as { data: { id: string } }).data.id);
        await sleep(10);
      }
    })();
    while (acknowledged.length < 5) await sleep(20);

    stopMariadb(instanceName);
    for (const send of [
      () => owner.client.get('/api/customers'),
      () => owner.client.post('/api/customers', { name: 'While down' }),
      () => owner.client.get('/api/me'),
    ]) {
      const started = Date.now();
      const res = await send();
      expect(Date.now() - started).toBeLessThan(2000);
      expectOutageAnswer(res);
    }
    const health = await owner.client.get('/api/health');
    expect(health.status).toBe(503);
    expect(health.body.data).toMatchObject({ api: 'ok', database: 'down' });
    const ackedWhileUp = acknowledged.length;

    await startDatabase();
    await waitForHealthy(20_000);
    while (acknowledged.length < ackedWhileUp + 5) await sleep(20);
    writing = false;
    await writer;

    // Only created (201) or refused for the outage (503): never a 500.
    expect([...statuses].sort()).toEqual([201, 503]);
    const rows = await selectRows<{ id: string }>(
      sequelize,
      'SELECT id FROM customers WHERE company_id = ?',
      [owner.me.company.id],
    );
    const stored = new Set(rows.map((r) => r.id));
    expect(acknowledged.filter((id) => !stored.has(id))).toEqual([]);
  }, 60_000);

  it('leaves no half-written delivery after MariaDB is killed (SIGKILL) in the middle of them', async () => {
    const turfProductId = await landscapeTurfId(owner.client);
    const rollsPerDelivery = 50;
    const deliveries = Array.from({ length: 40 }, (_, i) => `KILL-${i + 1}`);
    let firstAnswer!: () => void;
    const answered = new Promise<void>((resolve) => (firstAnswer = resolve));
    const results = deliveries.map(async (dyeLot) => {
      const res = await owner.client.post('/api/rolls/deliveries', {
        turfProductId,
        dyeLot,
        rolls: Array.from({ length: rollsPerDelivery }, () => ({ widthFt: 15, lengthFt: 100 })),
      });
      firstAnswer();
      return { dyeLot, status: res.status };
    });
    await Promise.race([answered, sleep(1500)]);
    process.kill(mariadbPid(), 'SIGKILL');
    const answers = await Promise.all(results);

    expect(answers.filter((a) => a.status !== 201 && a.status !== 503)).toEqual([]);
    // The kill really landed in the middle: some deliveries were cut off.
    expect(answers.some((a) => a.status === 503)).toBe(true);

    await startDatabase();
    await waitForHealthy(30_000);
    const counts = await selectRows<{ dye_lot: string; n: number | string }>(
      sequelize,
      "SELECT dye_lot, COUNT(*) AS n FROM rolls WHERE company_id = ? AND dye_lot LIKE 'KILL-%' GROUP BY dye_lot",
      [owner.me.company.id],
    );
    const byLot = new Map(counts.map((c) => [c.dye_lot, Number(c.n)]));
    // Each delivery is all 50 rolls or none; every acknowledged one is there whole.
    expect([...byLot.values()].filter((count) => count !== rollsPerDelivery)).toEqual([]);
    const lost = answers.filter(
      (a) => a.status === 201 && byLot.get(a.dyeLot) !== rollsPerDelivery,
    );
    expect(lost).toEqual([]);
  }, 90_000);
});
