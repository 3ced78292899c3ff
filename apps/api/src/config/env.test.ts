import { availableParallelism } from 'node:os';
import { describe, expect, it } from 'vitest';
import { loadEnv } from './env.js';

const production = {
  NODE_ENV: 'production',
  SESSION_SECRET: 'a-production-secret-of-our-own-0123',
  APP_URL: 'https://turf.example.test',
  TRUST_PROXY: '1',
  PROCESSOR_SECRET_KEY: 'sk_live_our_own_key_0123456789',
  PROCESSOR_WEBHOOK_SECRET: 'whsec_our_own_secret_0123456789',
  UPLOADS_DIR: '/srv/seamwright/uploads',
};

function without(name: keyof typeof production): Record<string, string> {
  const { [name]: _omitted, ...rest } = production;
  return rest;
}

describe('loadEnv in production', () => {
  it('starts with its own secret, an APP_URL and an explicit trust-proxy setting', () => {
    const env = loadEnv(production);
    expect(env.trustProxy).toBe(1);
    expect(env.cookieSecure).toBe(true);
    expect(env.trustedOrigins).toEqual(['https://turf.example.test']);
  });

  it.each([
    'SESSION_SECRET',
    'APP_URL',
    'TRUST_PROXY',
    'PROCESSOR_SECRET_KEY',
    'PROCESSOR_WEBHOOK_SECRET',
    'UPLOADS_DIR',
  ] as const)('refuses to start without %s and names it', (name) => {
    expect(() => loadEnv(without(name))).toThrow(
      new RegExp(`${name}: ${name} is required in production`),
    );
  });

  it('names every missing variable at once', () => {
    let message = '';
    try {
      loadEnv({ NODE_ENV: 'production' });
    } catch (error) {
      message = (error as Error).message;
    }
    expect(message).toMatch(/SESSION_SECRET is required/);
    expect(message).toMatch(/APP_URL is required/);
    expect(message).toMatch(/TRUST_PROXY is required/);
    expect(message).toMatch(/UPLOADS_DIR is required/);
  });

  it("accepts TRUST_PROXY 'false' and '0' as an explicit choice", () => {
    expect(loadEnv({ ...production, TRUST_PROXY: 'false' }).trustProxy).toBe(false);
    expect(loadEnv({ ...production, TRUST_PROXY: '0' }).trustProxy).toBe(false);
    expect(() => loadEnv({ ...production, TRUST_PROXY: '' })).toThrow(/TRUST_PROXY is required/);
  });

  it('refuses an unreadable TRUST_PROXY instead of quietly trusting nothing', () => {
    expect(() => loadEnv({ ...production, TRUST_PROXY: 'loopback' })).toThrow(
      /TRUST_PROXY must be true, false or a hop count/,
    );
  });

  it('refuses the development session secret and non-Secure cookies', () => {
    expect(() =>
      loadEnv({
        ...production,
        SESSION_SECRET: 'seamwright-dev-session-secret-not-for-production',
      }),
    ).toThrow(/SESSION_SECRET must be your own secret/);
    expect(() => loadEnv({ ...production, COOKIE_SECURE: 'false' })).toThrow(
      /COOKIE_SECURE cannot be false in production/,
    );
  });

  it('names cookies __Host-… on https and plainly on http', () => {
    expect(loadEnv(production).cookieNames).toEqual({
      session: '__Host-sw.sid',
      csrf: '__Host-sw.csrf',
    });
    const plain = loadEnv({ ...production, APP_URL: 'http://10.0.0.5:5170' });
    expect(plain.cookieSecure).toBe(true);
    expect(plain.cookieNames).toEqual({ session: 'sw.sid', csrf: 'sw.csrf' });
  });
});

describe('loadEnv outside production', () => {
  it('keeps its development defaults and trusts the Vite dev server origin', () => {
    const env = loadEnv({ NODE_ENV: 'development' });
    expect(env.cookieSecure).toBe(false);
    expect(env.cookieNames).toEqual({ session: 'sw.sid', csrf: 'sw.csrf' });
    expect(env.trustedOrigins).toEqual([
      'http://127.0.0.1:5170',
      'http://localhost:5170',
      'http://127.0.0.1:5173',
      'http://localhost:5173',
    ]);
    expect(loadEnv({ NODE_ENV: 'test' }).trustedOrigins).toEqual(['http://127.0.0.1:5170']);
    expect(
      loadEnv({ NODE_ENV: 'development', APP_URL: 'https://dev.example.test' }).trustedOrigins,
    ).toEqual(['https://dev.example.test', 'http://127.0.0.1:5173', 'http://localhost:5173']);
  });
});

describe('loadEnv planner settings', () => {
  it('defaults to one thread less than the cores, a 5 s budget and four waiting tasks per thread', () => {
    const threads = Math.max(1, availableParallelism() - 1);
    expect(loadEnv({}).planner).toEqual({ threads, budgetMs: 5000, maxQueue: threads * 4 });
  });

  it('reads PLANNER_THREADS, PLANNER_BUDGET_MS and PLANNER_MAX_QUEUE', () => {
    const env = loadEnv({ PLANNER_THREADS: '3', PLANNER_BUDGET_MS: '750', PLANNER_MAX_QUEUE: '0' });
    expect(env.planner).toEqual({ threads: 3, budgetMs: 750, maxQueue: 0 });
  });

  it('refuses a zero thread count or a budget too small to plan anything', () => {
    expect(() => loadEnv({ PLANNER_THREADS: '0' })).toThrow(/PLANNER_THREADS/);
    expect(() => loadEnv({ PLANNER_BUDGET_MS: '10' })).toThrow(/PLANNER_BUDGET_MS/);
  });
});

describe('loadEnv processor settings', () => {
  it('points development at the local fake with its keys, and reads PROCESSOR_URL', () => {
    const env = loadEnv({ NODE_ENV: 'development' });
    expect(env.processor.api).toEqual({ host: '127.0.0.1', port: 12111, protocol: 'http' });
    expect(env.processor.secretKey).toMatch(/^sk_test_/);
    expect(env.processor.webhookToleranceSeconds).toBe(300);
    const moved = loadEnv({ NODE_ENV: 'test', PROCESSOR_URL: 'http://127.0.0.1:12312' });
    expect(moved.processor.api).toEqual({ host: '127.0.0.1', port: 12312, protocol: 'http' });
  });

  it("uses the SDK's own host in production unless PROCESSOR_URL says otherwise", () => {
    expect(loadEnv(production).processor.api).toBeNull();
    expect(
      loadEnv({ ...production, PROCESSOR_URL: 'https://payments.example.test' }).processor.api,
    ).toEqual({ host: 'payments.example.test', port: 443, protocol: 'https' });
  });

  it("refuses the local fake's keys in production", () => {
    const local = loadEnv({ NODE_ENV: 'development' }).processor;
    expect(() => loadEnv({ ...production, PROCESSOR_SECRET_KEY: local.secretKey })).toThrow(
      /PROCESSOR_SECRET_KEY must be your own key/,
    );
    expect(() => loadEnv({ ...production, PROCESSOR_WEBHOOK_SECRET: local.webhookSecret })).toThrow(
      /PROCESSOR_WEBHOOK_SECRET must be your own secret/,
    );
  });
});

describe('loadEnv reminder worker settings', () => {
  it('runs the worker by default every minute, 20 invoices a pass, on the real clock', () => {
    expect(loadEnv({}).reminders).toEqual({
      worker: true,
      intervalMs: 60_000,
      batchSize: 20,
      fixedClock: null,
    });
  });

  it('reads the switch, interval, batch size and a test clock given as a day or an instant', () => {
    const env = loadEnv({
      REMINDER_WORKER: 'false',
      REMINDER_INTERVAL_MS: '250',
      REMINDER_BATCH_SIZE: '3',
      SW_REMINDER_CLOCK: '2027-01-01',
    });
    expect(env.reminders).toEqual({
      worker: false,
      intervalMs: 250,
      batchSize: 3,
      fixedClock: new Date('2027-01-01T00:00:00Z'),
    });
    const instant = loadEnv({ SW_REMINDER_CLOCK: '2027-01-01T19:00:00Z' }).reminders.fixedClock;
    expect(instant?.toISOString()).toBe('2027-01-01T19:00:00.000Z');
  });

  it('refuses a frozen clock in production and a date that is not one', () => {
    expect(() => loadEnv({ ...production, SW_REMINDER_CLOCK: '2027-01-01' })).toThrow(
      /SW_REMINDER_CLOCK/,
    );
    expect(() => loadEnv({ SW_REMINDER_CLOCK: 'tomorrow' })).toThrow(/SW_REMINDER_CLOCK/);
  });
});
