import session from 'express-session';
import type { MikroORM } from '@mikro-orm/sqlite';
import { SessionSchema } from './session.entity.js';

type Callback = (err?: unknown) => void;

/**
 * express-session store kept in the app's SQLite database. A session row carries its expiry
 * (from the cookie's expiry, else `ttlMs`) and is ignored and deleted once past it.
 * @example
 * app.use(session({ store: new SqliteSessionStore(orm, 7 * 24 * 3600_000), secret, resave: false, saveUninitialized: false }));
 */
export class SqliteSessionStore extends session.Store {
  private readonly orm: MikroORM;
  private readonly ttlMs: number;

  constructor(orm: MikroORM, ttlMs: number) {
    super();
    this.orm = orm;
    this.ttlMs = ttlMs;
  }

  override get(sid: string, callback: (err: unknown, session?: session.SessionData | null) => void): void {
    const em = this.orm.em.fork();
    em.findOne(SessionSchema, { sid })
      .then(async (row) => {
        if (!row) return callback(null, null);
        if (row.expiresAt.getTime() <= Date.now()) {
          await em.nativeDelete(SessionSchema, { sid });
          return callback(null, null);
        }
        callback(null, JSON.parse(row.data) as session.SessionData);
      })
      .catch((err) => callback(err));
  }

  override set(sid: string, data: session.SessionData, callback?: Callback): void {
    const em = this.orm.em.fork();
    const expiresAt = this.expiryOf(data);
    const userId = (data as { passport?: { user?: string } }).passport?.user ?? null;
    em.upsert(SessionSchema, { sid, data: JSON.stringify(data), userId, expiresAt })
      .then(() => callback?.())
      .catch((err) => callback?.(err));
  }

  override touch(sid: string, data: session.SessionData, callback?: Callback): void {
    const em = this.orm.em.fork();
    em.nativeUpdate(SessionSchema, { sid }, { expiresAt: this.expiryOf(data) })
      .then(() => callback?.())
      .catch((err) => callback?.(err));
  }

  override destroy(sid: string, callback?: Callback): void {
    const em = this.orm.em.fork();
    em.nativeDelete(SessionSchema, { sid })
      .then(() => callback?.())
      .catch((err) => callback?.(err));
  }

  /**
   * Signs a user out everywhere (after a password reset or change), optionally keeping one session.
   * @param userId - whose sessions to delete
   * @param exceptSid - the session to keep (the one making the change)
   * @returns the number of sessions deleted
   */
  async destroyForUser(userId: string, exceptSid?: string): Promise<number> {
    const em = this.orm.em.fork();
    return em.nativeDelete(SessionSchema, exceptSid ? { userId, sid: { $ne: exceptSid } } : { userId });
  }

  /**
   * Deletes expired sessions.
   * @returns the number deleted
   */
  async prune(): Promise<number> {
    const em = this.orm.em.fork();
    return em.nativeDelete(SessionSchema, { expiresAt: { $lte: new Date() } });
  }

  private expiryOf(data: session.SessionData): Date {
    const expires = data.cookie?.expires;
    return expires ? new Date(expires) : new Date(Date.now() + this.ttlMs);
  }
}
