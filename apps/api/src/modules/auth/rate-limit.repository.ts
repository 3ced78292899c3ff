// An express-rate-limit store on MariaDB, so every API process counts the same failed sign-ins
// (the API keeps no state of its own). One upsert per hit; times are computed here, not by the
// database clock, so reads and writes agree on the time zone Sequelize uses.
import { createHash } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';
import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';

const table = 'rate_limit_hits';
/** Expired rows are swept once every this many hits, in the same request. */
const sweepEvery = 50;

function hashKey(key: string): string {
  return createHash('sha256').update(key).digest('hex');
}

export class DatabaseRateLimitStore implements Store {
  /** Counts live in the shared database, not in this process. */
  localKeys = false;
  private windowMs = 60_000;
  private hitsSinceSweep = 0;

  constructor(private readonly sequelize: Sequelize) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const [row] = await this.sequelize.query<{ hits: number; reset_at: Date }>(
      `SELECT hits, reset_at FROM ${table} WHERE key_hash = ? AND reset_at > ?`,
      { replacements: [hashKey(key), new Date()], type: QueryTypes.SELECT },
    );
    return row ? { totalHits: row.hits, resetTime: new Date(row.reset_at) } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const now = new Date();
    const freshReset = new Date(now.getTime() + this.windowMs);
    const hash = hashKey(key);
    const info = await this.sequelize.transaction(async (transaction) => {
      // A window that has ended starts again at one hit.
      await this.sequelize.query(
        `INSERT INTO ${table} (key_hash, hits, reset_at) VALUES (?, 1, ?)
         ON DUPLICATE KEY UPDATE
           hits = IF(reset_at <= ?, 1, hits + 1),
           reset_at = IF(reset_at <= ?, VALUES(reset_at), reset_at)`,
        { replacements: [hash, freshReset, now, now], type: QueryTypes.INSERT, transaction },
      );
      const [row] = await this.sequelize.query<{ hits: number; reset_at: Date }>(
        `SELECT hits, reset_at FROM ${table} WHERE key_hash = ?`,
        { replacements: [hash], type: QueryTypes.SELECT, transaction },
      );
      return { totalHits: row?.hits ?? 1, resetTime: new Date(row?.reset_at ?? freshReset) };
    });
    await this.sweepNowAndThen(now);
    return info;
  }

  async decrement(key: string): Promise<void> {
    await this.sequelize.query(
      `UPDATE ${table} SET hits = GREATEST(CAST(hits AS SIGNED) - 1, 0) WHERE key_hash = ? AND reset_at > ?`,
      { replacements: [hashKey(key), new Date()], type: QueryTypes.UPDATE },
    );
  }

  async resetKey(key: string): Promise<void> {
    await this.sequelize.query(`DELETE FROM ${table} WHERE key_hash = ?`, {
      replacements: [hashKey(key)],
      type: QueryTypes.DELETE,
    });
  }

  private async sweepNowAndThen(now: Date): Promise<void> {
    this.hitsSinceSweep += 1;
    if (this.hitsSinceSweep < sweepEvery) return;
    this.hitsSinceSweep = 0;
    await this.sequelize.query(`DELETE FROM ${table} WHERE reset_at <= ? LIMIT 1000`, {
      replacements: [now],
      type: QueryTypes.DELETE,
    });
  }
}
