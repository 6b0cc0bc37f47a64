import connectSessionSequelize from 'connect-session-sequelize';
import session, { type SessionData } from 'express-session';
import { Op, type Sequelize } from 'sequelize';
import { Session } from '../models/index.js';

const SequelizeStore = connectSessionSequelize(session.Store);

type Callback<T> = (err: unknown, value?: T) => void;

/** Purge expired sessions this often (each app server does; deleting twice is harmless). */
export const SESSION_PURGE_INTERVAL_MS = 15 * 60 * 1000;

/**
 * Sessions in MariaDB through connect-session-sequelize and the project's Session model, so
 * every app server honours every session and keeps none of its own (OWASP Session Management
 * Cheat Sheet, "Session Expiration"). Two things the library leaves out are added here:
 * - the `user_id` column is filled from the session, so one member's sessions can all be ended;
 * - a row whose `expires` has passed is not served even before the purge removes it, which makes
 *   the idle timeout hold on the server and not only in the browser's cookie jar.
 */
export class KnitwrightSessionStore extends SequelizeStore {
  constructor(sequelize: Sequelize, idleMs: number) {
    if (!sequelize.models.Session) throw new Error('Session model not registered: call modelsInit(sequelize) before appCreate');
    super({
      db: sequelize,
      table: 'Session',
      expiration: idleMs,
      checkExpirationInterval: SESSION_PURGE_INTERVAL_MS,
      extendDefaultFields: (defaults, data: SessionData) => ({
        data: defaults.data,
        expires: defaults.expires,
        userId: typeof data.passport?.user === 'number' ? data.passport.user : null,
      }),
    });
  }

  override get(sid: string, callback: Callback<SessionData | null>): void {
    Session.findOne({ where: { sid, expires: { [Op.gt]: new Date() } } })
      .then((row) => callback(null, row?.data ? (JSON.parse(row.data) as SessionData) : null))
      .catch((err: unknown) => callback(err));
  }

  /** Called by the library's timer; also callable directly. Returns the number of rows removed. */
  clearExpiredSessions(callback?: Callback<number>): Promise<number> {
    const done = Session.destroy({ where: { expires: { [Op.lt]: new Date() } } });
    if (callback) done.then((n) => callback(null, n), (err: unknown) => callback(err));
    return done;
  }
}
