// The only file that reads process.env. Everything else receives a typed `Env`.
import { availableParallelism } from 'node:os';
import { z } from 'zod';

const devSessionSecret = 'seamwright-dev-session-secret-not-for-production';

const booleanish = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'])
  .transform((value) => value === 'true' || value === '1' || value === 'yes');

const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
    PORT: z.coerce.number().int().min(1).max(65535).default(5170),
    DB_HOST: z.string().min(1).default('127.0.0.1'),
    DB_PORT: z.coerce.number().int().min(1).max(65535).default(3307),
    DB_NAME: z.string().min(1).default('seamwright'),
    DB_USER: z.string().min(1).default('seamwright'),
    DB_PASSWORD: z.string().default(''),
    SESSION_SECRET: z.string().min(16, 'SESSION_SECRET must be at least 16 characters').optional(),
    APP_URL: z.url().optional(),
    SMTP_HOST: z.string().min(1).default('127.0.0.1'),
    SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(1025),
    MAIL_FROM: z.string().min(3).default('Seamwright <no-reply@seamwright.test>'),
    WEB_DIST_DIR: z.string().min(1).optional(),
    LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
    /** Express `trust proxy`: a hop count, or true/false. */
    TRUST_PROXY: z.string().optional(),
    /** bcrypt cost; 12 in production, lower in tests so the suite stays fast. */
    BCRYPT_COST: z.coerce.number().int().min(4).max(15).optional(),
    /** Failed sign-ins allowed per IP + e-mail within the window before 429. */
    LOGIN_MAX_FAILURES: z.coerce.number().int().min(1).default(5),
    LOGIN_WINDOW_MS: z.coerce
      .number()
      .int()
      .min(1000)
      .default(15 * 60 * 1000),
    /** Serve sessions over https only (defaults to true in production). */
    COOKIE_SECURE: booleanish.optional(),
    /** Layout-planner worker threads (default: one less than the cores, at least 1). */
    PLANNER_THREADS: z.coerce.number().int().min(1).max(64).optional(),
    /** Longest a planner task may run before it is stopped and answered 422. */
    PLANNER_BUDGET_MS: z.coerce.number().int().min(50).max(600_000).default(5000),
    /** Planner tasks allowed to wait for a thread; past it the API answers 503. */
    PLANNER_MAX_QUEUE: z.coerce.number().int().min(0).max(10_000).optional(),
  })
  .superRefine((value, ctx) => {
    if (value.NODE_ENV === 'production' && !value.SESSION_SECRET) {
      ctx.addIssue({
        code: 'custom',
        path: ['SESSION_SECRET'],
        message: 'SESSION_SECRET is required in production',
      });
    }
  });

export interface Env {
  nodeEnv: 'development' | 'test' | 'production';
  port: number;
  db: { host: string; port: number; name: string; user: string; password: string };
  sessionSecret: string;
  appUrl: string;
  smtp: { host: string; port: number; from: string };
  webDistDir: string | null;
  logLevel: string;
  trustProxy: boolean | number;
  bcryptCost: number;
  login: { maxFailures: number; windowMs: number };
  cookieSecure: boolean;
  planner: { threads: number; budgetMs: number; maxQueue: number };
}

function parseTrustProxy(raw: string | undefined): boolean | number {
  if (raw === undefined || raw === '' || raw === 'false' || raw === '0') return false;
  if (raw === 'true') return true;
  const hops = Number(raw);
  return Number.isInteger(hops) && hops > 0 ? hops : false;
}

/** A queue of four tasks per thread keeps a burst waiting briefly instead of refused. */
function plannerConfig(
  threads: number | undefined,
  budgetMs: number,
  maxQueue: number | undefined,
): Env['planner'] {
  const count = threads ?? Math.max(1, availableParallelism() - 1);
  return { threads: count, budgetMs, maxQueue: maxQueue ?? count * 4 };
}

/**
 * Reads and validates the environment. Throws with every problem listed when it is invalid.
 * `source` defaults to `process.env`; tests and scripts may pass their own object.
 */
export function loadEnv(source: Record<string, string | undefined> = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
    throw new Error(`Invalid environment: ${problems}`);
  }
  const e = parsed.data;
  const isProduction = e.NODE_ENV === 'production';
  return {
    nodeEnv: e.NODE_ENV,
    port: e.PORT,
    db: {
      host: e.DB_HOST,
      port: e.DB_PORT,
      name: e.DB_NAME,
      user: e.DB_USER,
      password: e.DB_PASSWORD,
    },
    sessionSecret: e.SESSION_SECRET ?? devSessionSecret,
    appUrl: (e.APP_URL ?? `http://127.0.0.1:${e.PORT}`).replace(/\/+$/, ''),
    smtp: { host: e.SMTP_HOST, port: e.SMTP_PORT, from: e.MAIL_FROM },
    webDistDir: e.WEB_DIST_DIR ?? null,
    logLevel: e.LOG_LEVEL ?? (e.NODE_ENV === 'test' ? 'silent' : 'info'),
    trustProxy: parseTrustProxy(e.TRUST_PROXY),
    bcryptCost: e.BCRYPT_COST ?? (e.NODE_ENV === 'test' ? 4 : 12),
    login: { maxFailures: e.LOGIN_MAX_FAILURES, windowMs: e.LOGIN_WINDOW_MS },
    cookieSecure: e.COOKIE_SECURE ?? isProduction,
    planner: plannerConfig(e.PLANNER_THREADS, e.PLANNER_BUDGET_MS, e.PLANNER_MAX_QUEUE),
  };
}
