// The only file that reads process.env. Everything else receives a typed `Env`.
import { availableParallelism, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { z } from 'zod';
import { localProcessorDefaults } from '@seamwright/shared';

const devSessionSecret = 'seamwright-dev-session-secret-not-for-production';

const booleanish = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'])
  .transform((value) => value === 'true' || value === '1' || value === 'yes');

/** A request count allowed within a rate-limit window. */
const allowance = (fallback: number) => z.coerce.number().int().min(1).default(fallback);

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
    /** Express `trust proxy`: a hop count, or true/false (required in production). */
    TRUST_PROXY: z
      .string()
      .trim()
      .regex(/^(|true|false|\d{1,2})$/, 'TRUST_PROXY must be true, false or a hop count')
      .optional(),
    /** bcrypt cost; 12 in production, lower in tests so the suite stays fast. */
    BCRYPT_COST: z.coerce.number().int().min(4).max(15).optional(),
    /** Failed sign-ins allowed per IP + e-mail within the window before 429. */
    LOGIN_MAX_FAILURES: z.coerce.number().int().min(1).default(5),
    LOGIN_WINDOW_MS: z.coerce
      .number()
      .int()
      .min(1000)
      .default(15 * 60 * 1000),
    /**
     * Rate limits of the other sign-in flows, each per IP and per account (e-mail, link token or
     * user), within one window. Per-IP allowances are generous because an office shares one IP.
     */
    RATE_LIMIT_WINDOW_MS: z.coerce
      .number()
      .int()
      .min(1000)
      .default(15 * 60 * 1000),
    /** Failed sign-ins from one IP across all e-mails (LOGIN_MAX_FAILURES is per IP + e-mail). */
    RATE_LIMIT_LOGIN_FAILURES_PER_IP: allowance(50),
    RATE_LIMIT_SIGNUP_PER_IP: allowance(10),
    RATE_LIMIT_SIGNUP_PER_EMAIL: allowance(3),
    RATE_LIMIT_RESET_REQUEST_PER_IP: allowance(10),
    RATE_LIMIT_RESET_REQUEST_PER_EMAIL: allowance(3),
    RATE_LIMIT_RESET_PER_IP: allowance(20),
    RATE_LIMIT_RESET_PER_TOKEN: allowance(5),
    RATE_LIMIT_ACCEPT_PER_IP: allowance(20),
    RATE_LIMIT_ACCEPT_PER_TOKEN: allowance(5),
    /** The customer's estimate page and answers (no account: the link's token is the key). */
    RATE_LIMIT_ESTIMATE_PER_IP: allowance(120),
    RATE_LIMIT_ESTIMATE_PER_TOKEN: allowance(60),
    RATE_LIMIT_INVITE_PER_IP: allowance(60),
    RATE_LIMIT_INVITE_PER_USER: allowance(30),
    /** Invitation e-mails one company may send per 24 hours. */
    INVITATION_MAILS_PER_COMPANY_PER_DAY: allowance(100),
    /** Serve sessions over https only (defaults to true in production). */
    COOKIE_SECURE: booleanish.optional(),
    /** Layout-planner worker threads (default: one less than the cores, at least 1). */
    PLANNER_THREADS: z.coerce.number().int().min(1).max(64).optional(),
    /** Longest a planner task may run before it is stopped and answered 422. */
    PLANNER_BUDGET_MS: z.coerce.number().int().min(50).max(600_000).default(5000),
    /** Planner tasks allowed to wait for a thread; past it the API answers 503. */
    PLANNER_MAX_QUEUE: z.coerce.number().int().min(0).max(10_000).optional(),
    /**
     * The payment processor's API origin. Development and tests point it at the local fake
     * (apps/fake-processor); in production leave it unset to use the SDK's own host.
     */
    PROCESSOR_URL: z.url().optional(),
    /** The processor's secret key (`sk_…`); required in production. */
    PROCESSOR_SECRET_KEY: z.string().min(8).optional(),
    /** The webhook endpoint's signing secret (`whsec_…`); required in production. */
    PROCESSOR_WEBHOOK_SECRET: z.string().min(8).optional(),
    /** Short, so an unreachable processor is answered 503 quickly instead of hanging the page. */
    PROCESSOR_TIMEOUT_MS: z.coerce.number().int().min(100).max(60_000).default(4000),
    PROCESSOR_MAX_RETRIES: z.coerce.number().int().min(0).max(5).default(1),
    /** How old a webhook's signed timestamp may be; the processor's libraries use 300 s. */
    PROCESSOR_WEBHOOK_TOLERANCE_S: z.coerce.number().int().min(1).max(3600).default(300),
    /** Folder of the local-disk upload storage (required in production). */
    UPLOADS_DIR: z.string().min(1).optional(),
    /** The payment-reminder worker in this API process (on unless switched off). */
    REMINDER_WORKER: booleanish.default(true),
    /** Pause between the worker's passes. */
    REMINDER_INTERVAL_MS: z.coerce.number().int().min(50).max(86_400_000).default(60_000),
    /** Invoices one worker transaction claims at most. */
    REMINDER_BATCH_SIZE: z.coerce.number().int().min(1).max(500).default(20),
    /**
     * Tests only: the worker's clock, fixed at this instant (`2027-01-01` or a full ISO time),
     * so a test can run reminders weeks ahead. Refused in production.
     */
    SW_REMINDER_CLOCK: z.iso.datetime({ offset: true }).or(z.iso.date()).optional(),
  })
  .superRefine((value, ctx) => {
    if (value.NODE_ENV !== 'production') return;
    // Fail closed: a production server never falls back to a development default.
    const missing = (name: keyof typeof value, why: string) =>
      ctx.addIssue({
        code: 'custom',
        path: [name],
        message: `${name} is required in production (${why})`,
      });
    if (!value.SESSION_SECRET) missing('SESSION_SECRET', 'it signs session and CSRF cookies');
    else if (value.SESSION_SECRET === devSessionSecret)
      ctx.addIssue({
        code: 'custom',
        path: ['SESSION_SECRET'],
        message:
          'SESSION_SECRET must be your own secret in production, not the development default',
      });
    if (!value.APP_URL) missing('APP_URL', 'the origin state-changing requests must come from');
    if (value.TRUST_PROXY === undefined || value.TRUST_PROXY === '')
      missing('TRUST_PROXY', "set it explicitly, 'false' when no proxy is in front");
    if (!value.PROCESSOR_SECRET_KEY)
      missing('PROCESSOR_SECRET_KEY', 'the payment processor refuses calls without it');
    else if (value.PROCESSOR_SECRET_KEY === localProcessorDefaults.secretKey)
      ctx.addIssue({
        code: 'custom',
        path: ['PROCESSOR_SECRET_KEY'],
        message: "PROCESSOR_SECRET_KEY must be your own key in production, not the local fake's",
      });
    if (!value.PROCESSOR_WEBHOOK_SECRET)
      missing('PROCESSOR_WEBHOOK_SECRET', 'it proves webhooks come from the processor');
    else if (value.PROCESSOR_WEBHOOK_SECRET === localProcessorDefaults.webhookSecret)
      ctx.addIssue({
        code: 'custom',
        path: ['PROCESSOR_WEBHOOK_SECRET'],
        message:
          "PROCESSOR_WEBHOOK_SECRET must be your own secret in production, not the local fake's",
      });
    if (!value.UPLOADS_DIR) missing('UPLOADS_DIR', 'where uploaded photos and sketches are kept');
    if (value.SW_REMINDER_CLOCK)
      ctx.addIssue({
        code: 'custom',
        path: ['SW_REMINDER_CLOCK'],
        message: 'SW_REMINDER_CLOCK is for tests and cannot be set in production',
      });
    if (value.COOKIE_SECURE === false)
      ctx.addIssue({
        code: 'custom',
        path: ['COOKIE_SECURE'],
        message: 'COOKIE_SECURE cannot be false in production',
      });
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
  rateLimits: RateLimits;
  /** Secure cookies and HSTS. */
  cookieSecure: boolean;
  /** `__Host-` names when served over https with Secure cookies: bound to this exact host. */
  cookieNames: { session: string; csrf: string };
  /** Origins a state-changing request may come from (APP_URL's, plus Vite's in development). */
  trustedOrigins: string[];
  planner: { threads: number; budgetMs: number; maxQueue: number };
  processor: ProcessorConfig;
  /** Absolute folder of the local-disk upload storage. */
  uploadsDir: string;
  /** The payment-reminder worker; `fixedClock` is a test's frozen "now". */
  reminders: { worker: boolean; intervalMs: number; batchSize: number; fixedClock: Date | null };
}

/** How the API reaches the payment processor (modules/processor builds the SDK client from it). */
export interface ProcessorConfig {
  /** Null: the SDK's own host (production). */
  api: { host: string; port: number; protocol: 'http' | 'https' } | null;
  secretKey: string;
  webhookSecret: string;
  timeoutMs: number;
  maxNetworkRetries: number;
  webhookToleranceSeconds: number;
}

/** Allowed requests per window, per IP and per account (e-mail, token or user). */
export interface FlowLimit {
  perIp: number;
  perAccount: number;
}

export interface RateLimits {
  windowMs: number;
  loginFailuresPerIp: number;
  signup: FlowLimit;
  passwordResetRequest: FlowLimit;
  passwordReset: FlowLimit;
  invitationAccept: FlowLimit;
  invitationSend: FlowLimit;
  estimateLink: FlowLimit;
  invitationMailsPerCompanyPerDay: number;
}

/** The Vite dev server (apps/web/vite.config.ts) proxies /api from its own origin. */
const viteDevOrigins = ['http://127.0.0.1:5173', 'http://localhost:5173'];

function parseTrustProxy(raw: string | undefined): boolean | number {
  if (raw === undefined || raw === '' || raw === 'false' || raw === '0') return false;
  if (raw === 'true') return true;
  return Number(raw);
}

/**
 * APP_URL's origin. In development also the Vite dev server and the other spelling of a
 * loopback APP_URL (`localhost` for `127.0.0.1`), since developers type either.
 */
function trustedOriginsFor(appUrl: string, nodeEnv: Env['nodeEnv']): string[] {
  const url = new URL(appUrl);
  if (nodeEnv !== 'development') return [url.origin];
  const loopbackAlias: Record<string, string> = {
    '127.0.0.1': 'localhost',
    localhost: '127.0.0.1',
  };
  const origins = [url.origin];
  const alias = loopbackAlias[url.hostname];
  if (alias) {
    url.hostname = alias;
    origins.push(url.origin);
  }
  return [...origins, ...viteDevOrigins];
}

function cookieNamesFor(appUrl: string, secure: boolean): Env['cookieNames'] {
  const prefix = secure && appUrl.startsWith('https:') ? '__Host-' : '';
  return { session: `${prefix}sw.sid`, csrf: `${prefix}sw.csrf` };
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

/** The local fake's default port (scripts/lib/instances.ts, dev instance). */
const localProcessorUrl = 'http://127.0.0.1:12111';

function processorApiOf(raw: string | undefined, nodeEnv: Env['nodeEnv']): ProcessorConfig['api'] {
  const text = raw ?? (nodeEnv === 'production' ? undefined : localProcessorUrl);
  if (!text) return null;
  const url = new URL(text);
  const protocol = url.protocol === 'https:' ? 'https' : 'http';
  const port = url.port ? Number(url.port) : protocol === 'https' ? 443 : 80;
  return { host: url.hostname, port, protocol };
}

/**
 * The scripts pass each instance's own git-ignored folder (`.data/uploads/<instance>`). Without
 * one, tests keep files in a temporary folder of their process and development in `.data/uploads`
 * under the working directory; production must say (checked above).
 */
function uploadsDirFor(raw: string | undefined, nodeEnv: Env['nodeEnv']): string {
  if (raw) return resolve(raw);
  if (nodeEnv === 'test') return join(tmpdir(), `seamwright-uploads-${process.pid}`);
  return resolve('.data', 'uploads');
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
  const appUrl = (e.APP_URL ?? `http://127.0.0.1:${e.PORT}`).replace(/\/+$/, '');
  const cookieSecure = e.COOKIE_SECURE ?? isProduction;
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
    appUrl,
    smtp: { host: e.SMTP_HOST, port: e.SMTP_PORT, from: e.MAIL_FROM },
    webDistDir: e.WEB_DIST_DIR ?? null,
    logLevel: e.LOG_LEVEL ?? (e.NODE_ENV === 'test' ? 'silent' : 'info'),
    trustProxy: parseTrustProxy(e.TRUST_PROXY),
    bcryptCost: e.BCRYPT_COST ?? (e.NODE_ENV === 'test' ? 4 : 12),
    login: { maxFailures: e.LOGIN_MAX_FAILURES, windowMs: e.LOGIN_WINDOW_MS },
    rateLimits: {
      windowMs: e.RATE_LIMIT_WINDOW_MS,
      loginFailuresPerIp: e.RATE_LIMIT_LOGIN_FAILURES_PER_IP,
      signup: { perIp: e.RATE_LIMIT_SIGNUP_PER_IP, perAccount: e.RATE_LIMIT_SIGNUP_PER_EMAIL },
      passwordResetRequest: {
        perIp: e.RATE_LIMIT_RESET_REQUEST_PER_IP,
        perAccount: e.RATE_LIMIT_RESET_REQUEST_PER_EMAIL,
      },
      passwordReset: { perIp: e.RATE_LIMIT_RESET_PER_IP, perAccount: e.RATE_LIMIT_RESET_PER_TOKEN },
      invitationAccept: {
        perIp: e.RATE_LIMIT_ACCEPT_PER_IP,
        perAccount: e.RATE_LIMIT_ACCEPT_PER_TOKEN,
      },
      invitationSend: {
        perIp: e.RATE_LIMIT_INVITE_PER_IP,
        perAccount: e.RATE_LIMIT_INVITE_PER_USER,
      },
      estimateLink: {
        perIp: e.RATE_LIMIT_ESTIMATE_PER_IP,
        perAccount: e.RATE_LIMIT_ESTIMATE_PER_TOKEN,
      },
      invitationMailsPerCompanyPerDay: e.INVITATION_MAILS_PER_COMPANY_PER_DAY,
    },
    cookieSecure,
    cookieNames: cookieNamesFor(appUrl, cookieSecure),
    trustedOrigins: trustedOriginsFor(appUrl, e.NODE_ENV),
    planner: plannerConfig(e.PLANNER_THREADS, e.PLANNER_BUDGET_MS, e.PLANNER_MAX_QUEUE),
    processor: {
      api: processorApiOf(e.PROCESSOR_URL, e.NODE_ENV),
      secretKey: e.PROCESSOR_SECRET_KEY ?? localProcessorDefaults.secretKey,
      webhookSecret: e.PROCESSOR_WEBHOOK_SECRET ?? localProcessorDefaults.webhookSecret,
      timeoutMs: e.PROCESSOR_TIMEOUT_MS,
      maxNetworkRetries: e.PROCESSOR_MAX_RETRIES,
      webhookToleranceSeconds: e.PROCESSOR_WEBHOOK_TOLERANCE_S,
    },
    uploadsDir: uploadsDirFor(e.UPLOADS_DIR, e.NODE_ENV),
    reminders: {
      worker: e.REMINDER_WORKER,
      intervalMs: e.REMINDER_INTERVAL_MS,
      batchSize: e.REMINDER_BATCH_SIZE,
      fixedClock: e.SW_REMINDER_CLOCK ? new Date(e.SW_REMINDER_CLOCK) : null,
    },
  };
}
