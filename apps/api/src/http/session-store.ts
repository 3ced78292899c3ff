// The express-session store on MariaDB's `sessions` table, written for the request path: every
// signed-in request costs one indexed statement here, which also reads the member's role in the
// session's company (so a removed member loses access on their next request, on every process,
// without a second query). Writes are single statements; nothing is rewritten per request (see
// the refresh throttle in session.ts). Replaces connect-session-sequelize, whose read built
// model instances and whose per-request touch made every request also an UPDATE of one hot row.
import type { Request } from 'express';
import session from 'express-session';
import type { SessionData } from 'express-session';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize';
import type { Role } from '@seamwright/shared';

/** The membership read together with the session, for the session's user and company. */
export interface SessionMembership {
  userId: string;
  companyId: string;
  /** Null when the user is no longer a member of that company. */
  role: Role | null;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- Express's own augmentation point
  namespace Express {
    interface Request {
      sessionMembership?: SessionMembership;
    }
  }
}

interface SessionRow {
  data: string;
  role: Role | null;
}

// Carries the membership from get() to createSession() on the loaded object; removed there, so
// it is never hashed, saved or seen by routes as session data.
const membershipKey = '__membership';
type LoadedData = SessionData & { [membershipKey]?: SessionMembership };

const selectSession = `
  SELECT s.data, m.role
  FROM sessions s
  LEFT JOIN memberships m
    ON m.user_id = s.user_id AND m.company_id = JSON_VALUE(s.data, '$.companyId')
  WHERE s.sid = ? AND s.expires > ?`;

type Callback<T = void> = (err?: unknown, value?: T) => void;

function run<T>(work: Promise<T>, callback: Callback<T> | undefined): void {
  work.then(
    (value) => callback?.(null, value),
    (error: unknown) => callback?.(error),
  );
}

export class MariaDbSessionStore extends session.Store {
  /** Sessions read from the table in this process; saving one never re-creates its row. */
  private readonly loaded = new WeakSet<object>();
  private sweep: NodeJS.Timeout | undefined;

  constructor(
    private readonly sequelize: Sequelize,
    private readonly maxAgeMs: number,
    sweepIntervalMs: number,
  ) {
    super();
    if (sweepIntervalMs > 0) {
      this.sweep = setInterval(() => void this.clearExpiredSessions(), sweepIntervalMs);
      this.sweep.unref();
    }
  }

  override get(sid: string, callback: Callback<SessionData | null>): void {
    run(this.read(sid), callback);
  }

  private async read(sid: string): Promise<LoadedData | null> {
    const [row] = await this.sequelize.query<SessionRow>(selectSession, {
      replacements: [sid, new Date()],
      type: QueryTypes.SELECT,
    });
    if (!row) return null;
    const data = JSON.parse(row.data) as LoadedData;
    if (data.userId && data.companyId)
      data[membershipKey] = { userId: data.userId, companyId: data.companyId, role: row.role };
    return data;
  }

  override createSession(req: Request, data: SessionData): session.Session & SessionData {
    const loaded = data as LoadedData;
    const membership = loaded[membershipKey];
    delete loaded[membershipKey];
    const created = super.createSession(req, loaded);
    if (membership) req.sessionMembership = membership;
    this.loaded.add(created);
    return created;
  }

  override set(sid: string, data: SessionData, callback?: Callback): void {
    run(this.write(sid, data), callback);
  }

  private async write(sid: string, data: SessionData): Promise<void> {
    const expires = data.cookie.expires ?? new Date(Date.now() + this.maxAgeMs);
    const values = [JSON.stringify(data), expires, data.userId ?? null, new Date()];
    if (this.loaded.has(data)) {
      // An existing session: update only. If a sign-out or password reset deleted the row while
      // this request ran, it stays deleted.
      await this.sequelize.query(
        'UPDATE sessions SET data = ?, expires = ?, user_id = ?, updated_at = ? WHERE sid = ?',
        { replacements: [...values, sid], type: QueryTypes.UPDATE },
      );
      return;
    }
    await this.sequelize.query(
      `INSERT INTO sessions (data, expires, user_id, updated_at, sid, created_at)
       VALUES (?, ?, ?, ?, ?, ?)
       ON DUPLICATE KEY UPDATE data = VALUES(data), expires = VALUES(expires),
         user_id = VALUES(user_id), updated_at = VALUES(updated_at)`,
      { replacements: [...values, sid, new Date()], type: QueryTypes.INSERT },
    );
  }

  override destroy(sid: string, callback?: Callback): void {
    run(
      this.sequelize
        .query('DELETE FROM sessions WHERE sid = ?', {
          replacements: [sid],
          type: QueryTypes.DELETE,
        })
        .then(() => undefined),
      callback,
    );
  }

  /** Deletes expired rows (the `sessions_expires` index serves it). */
  async clearExpiredSessions(): Promise<void> {
    try {
      await this.sequelize.query('DELETE FROM sessions WHERE expires < ?', {
        replacements: [new Date()],
        type: QueryTypes.DELETE,
      });
    } catch {
      // A failed sweep is retried at the next interval; expired rows are never read (see get).
    }
  }

  stopExpiringSessions(): void {
    clearInterval(this.sweep);
    this.sweep = undefined;
  }
}
