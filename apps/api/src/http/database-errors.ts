// A database that is down, restarting or unreachable is not a bug: the request answers 503
// DATABASE_UNAVAILABLE problem+json with Retry-After (nothing was changed: a transaction cut off
// by a lost connection is rolled back by the server), and the pool reconnects by itself once
// the database is back. tests/api/guard/database-faults.test.ts stops and kills a scratch
// MariaDB under a running API to prove it.
import { ConnectionError } from 'sequelize';
import { AppError } from '../errors.js';

/** Seconds a client should wait before trying again (a restart takes a few seconds). */
export const databaseRetryAfterSeconds = 5;

/** Driver and socket codes that mean "no usable connection", not "this statement failed". */
const connectionCodes = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'EPIPE',
  'ETIMEDOUT',
  'EHOSTUNREACH',
  'ENOTFOUND',
  'ER_SOCKET_UNEXPECTED_CLOSE',
  'ER_CONNECTION_ALREADY_CLOSED',
  'ER_GET_CONNECTION_TIMEOUT',
  'ER_CONNECTION_TIMEOUT',
  'ER_CMD_CONNECTION_CLOSED',
  'ER_SERVER_SHUTDOWN',
  'ER_CONNECTION_KILLED',
  'ER_SERVER_GONE_ERROR',
  'PROTOCOL_CONNECTION_LOST',
]);

interface DriverError {
  code?: unknown;
  fatal?: unknown;
  errno?: unknown;
}

/** MariaDB's "server shutdown in progress" and "connection was killed". */
const connectionErrnos = new Set([1053, 1927, 2006, 2013]);

function isConnectionFailure(error: unknown): boolean {
  if (error instanceof ConnectionError) return true;
  for (let e: unknown = error, depth = 0; e && typeof e === 'object' && depth < 4; depth += 1) {
    const d = e as DriverError;
    if (typeof d.code === 'string' && connectionCodes.has(d.code)) return true;
    if (typeof d.errno === 'number' && connectionErrnos.has(d.errno)) return true;
    // The mariadb driver marks errors after which the connection is unusable as fatal.
    if (d.fatal === true) return true;
    e =
      (e as { parent?: unknown; original?: unknown; cause?: unknown }).parent ??
      (e as { original?: unknown }).original ??
      (e as { cause?: unknown }).cause;
  }
  return false;
}

/** The 503 for a lost database, or undefined when `error` is something else. */
export function databaseUnavailableFrom(error: unknown): AppError | undefined {
  if (!isConnectionFailure(error)) return undefined;
  return new AppError(
    'DATABASE_UNAVAILABLE',
    'The database cannot be reached right now; nothing was changed. Try again shortly.',
    { headers: { 'Retry-After': String(databaseRetryAfterSeconds) } },
  );
}
