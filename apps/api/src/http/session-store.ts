// The express-session store: connect-session-sequelize (the mandated store, on its `Session`
// model and `sessions` table), with the two methods the request-path profile showed as hot
// replaced (docs/PERFORMANCE.md):
// - `get` reads the session and, in the same indexed statement, the member's role in the
//   session's company, so a removed member loses access on their next request, on every process,
//   without a second query; a row past its expiry is refused even before the sweep deletes it.
// - `touch` writes nothing: the package would UPDATE the row on every request, serialising a
//   user's concurrent requests on its row lock; session.ts refreshes the expiry now and then.
// `set` keeps the package's insert for a new session; for one read from the table it only
// updates, so a save racing a sign-out or password reset cannot bring the row back. `destroy`,
// the expiry sweep and the user_id column (`extendDefaultFields`) are the package's own.
import type { Request } from 'express';
import session from 'express-session';
import type { SessionData } from 'express-session';
import connectSessionSequelize from 'connect-session-sequelize';
import { QueryTypes } from 'sequelize';
import type { ModelStatic, Sequelize } from 'sequelize';
import type { Role } from '@seamwright/shared';
import type { SessionModel } from '../db/models/session.model.js';

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

interface SessionColumns {
  data: string;
  expires: Date;
  userId: string | null;
}

/** The package's columns plus the user id, so a password reset can end that user's sessions. */
function withUserId(defaults: { data: string; expires: Date }, data: SessionData): SessionColumns {
  return { ...defaults, userId: data.userId ?? null };
}

const SequelizeStore = connectSessionSequelize(session.Store);

export class LeanSessionStore extends SequelizeStore {
  // Set by the package's constructor from `table: 'Session'`; not in its type declarations.
  declare readonly sessionModel: ModelStatic<SessionModel>;
  declare readonly expiration: (data: SessionData) => Date;

  /** Sessions read from the table in this process; saving one never re-creates its row. */
  private readonly loaded = new WeakSet<object>();

  constructor(
    private readonly sequelize: Sequelize,
    maxAgeMs: number,
    sweepIntervalMs: number,
  ) {
    super({
      db: sequelize,
      table: 'Session',
      checkExpirationInterval: sweepIntervalMs,
      expiration: maxAgeMs,
      extendDefaultFields: withUserId,
    });
  }

  override get(sid: string, callback: Callback<SessionData | null>): void {
    run(this.unsafeReadSessionWithMembership(sid), callback);
  }

  // Unscoped: the membership join builds the tenant context itself, for the user and company
  // stored in the session row (one statement on the primary key and the unique membership key).
  private async unsafeReadSessionWithMembership(sid: string): Promise<LoadedData | null> {
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
    if (!this.loaded.has(data)) {
      super.set(sid, data, callback);
      return;
    }
    // An existing session: update only. If a sign-out or password reset deleted the row while
    // this request ran, it stays deleted (the package's find-or-create would insert it again).
    const columns = withUserId(
      { data: JSON.stringify(data), expires: this.expiration(data) },
      data,
    );
    run(
      this.sessionModel.update(columns, { where: { sid } }).then(() => undefined),
      callback,
    );
  }

  /** No write: the expiry moves forward through session.ts's periodic refresh instead. */
  override touch = (_sid: string, _data: unknown, callback?: (err?: unknown) => void): void => {
    callback?.();
  };
}
