import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import type { Request } from 'express';
import type { Pool } from 'pg';
import type { Actor } from '../../http/authz.js';
import { ACTOR_SQL, actorFromRow, type ActorRow } from './auth.service.js';
import { UNKEPT_SESSION_IDLE_MS } from './devices.js';

/** How far the stored session expiry may lag the cookie's before a request rewrites it (seconds). */
export const TOUCH_SLACK_S = 60;

/** What the store read beside the session, kept on the request (never in the stored session). */
interface SessionPreload {
  /** The signed-in user's actor, read in the same query as the session (null when the session has no user). */
  actor: Actor | null;
  /** The stored expiry, epoch seconds. */
  expireS: number;
}

/**
 * The session and its user's actor in one statement, prepared once per connection (a named statement: every
 * signed-in request runs it, and planning the join cost more than running it).
 */
const SESSION_GET_SQL = `select s.sess, extract(epoch from s.expire)::float8 as expire_s, a.*
   from session s
   left join lateral (${ACTOR_SQL(
     `case when (s.sess->'passport'->>'user') ~ '^[0-9]{1,15}$' then (s.sess->'passport'->>'user')::bigint end`,
     `case when (s.sess->>'workspaceId') ~ '^[0-9]{1,9}$' then (s.sess->>'workspaceId')::int end`,
   )}) a on true
  where s.sid = $1 and s.expire >= now()`;

const PRELOAD = Symbol('trayline.sessionPreload');
type PreloadCarrier = { [PRELOAD]?: SessionPreload };

/** The actor the session store read with this request's session, when it is the one for this user id. */
export function preloadedActor(req: Request, userId: number): Actor | null {
  const p = (req as unknown as PreloadCarrier)[PRELOAD];
  return p?.actor && p.actor.userId === userId ? p.actor : null;
}

/** When a session ends, epoch seconds: its cookie's expiry, or for a cookie without one the unkept session's idle limit. */
function expireSecondsOf(sess: session.SessionData, maxAgeMs: number): number {
  const expires = sess.cookie?.expires;
  const ms = expires ? new Date(expires).getTime() : Date.now() + (sess.staySignedIn === false ? UNKEPT_SESSION_IDLE_MS : maxAgeMs);
  return Math.ceil(ms / 1000);
}

/**
 * Sessions in PostgreSQL (connect-pg-simple), with two changes that keep a signed-in request to one session query:
 *
 * - `get` reads the session and its user's actor (membership, role, workspace) in one statement; the actor rides on
 *   the request for passport's deserializeUser (passport.ts), which falls back to its own query when it is absent.
 * - Sessions slide (rolling cookie), but the stored expiry is only rewritten when it lags the new one by more than
 *   TOUCH_SLACK_S, and that is decided from the expiry read with the session: a burst of requests costs no write at
 *   all, and the stored expiry stays within a minute of the cookie's.
 *
 * Nothing is kept in process memory between requests: any instance can serve any session.
 */
export function createSessionStore(pool: Pool, maxAgeMs: number): session.Store {
  const PgStore = connectPgSimple(session);
  class TraylineSessionStore extends PgStore {
    override get(sid: string, done: (err: unknown, sess?: session.SessionData | null) => void): void {
      pool
        .query<{ sess: session.SessionData | string; expire_s: string } & Partial<ActorRow>>({ name: 'trayline_session_get', text: SESSION_GET_SQL, values: [sid] })
        .then(({ rows: [row] }) => {
          if (!row) return done(null, null);
          let sess: session.SessionData;
          try {
            sess = typeof row.sess === 'string' ? JSON.parse(row.sess) : row.sess;
          } catch {
            return this.destroy(sid, (err) => done(err, null));
          }
          const preload: SessionPreload = {
            actor: row.user_id == null ? null : actorFromRow(row as ActorRow),
            expireS: Number(row.expire_s),
          };
          Object.defineProperty(sess, PRELOAD, { value: preload, enumerable: false, configurable: true });
          done(null, sess);
        }, (err: unknown) => done(err));
    }

    /** express-session builds the request's session here: the preload moves onto the request. */
    override createSession(req: Request, sess: session.SessionData): session.Session & Partial<session.SessionData> {
      const preload = (sess as unknown as PreloadCarrier)[PRELOAD];
      if (preload) {
        delete (sess as unknown as PreloadCarrier)[PRELOAD];
        Object.defineProperty(req, PRELOAD, { value: preload, enumerable: false, configurable: true });
      }
      return super.createSession(req, sess);
    }

    /**
     * Stores the session until its cookie expires; a cookie without an expiry (not kept signed in: the browser drops it
     * when it closes) until UNKEPT_SESSION_IDLE_MS after this request.
     */
    override set(sid: string, sess: session.SessionData, done?: (err?: unknown) => void): void {
      pool
        .query(
          'insert into session (sess, expire, sid) values ($1, to_timestamp($2), $3) on conflict (sid) do update set sess = $1, expire = to_timestamp($2)',
          [sess, expireSecondsOf(sess, maxAgeMs), sid],
        )
        .then(() => done?.(), (err: unknown) => done?.(err));
    }

    override touch(sid: string, sess: session.SessionData, done?: (err?: unknown) => void): void {
      const expireS = expireSecondsOf(sess, maxAgeMs);
      const req = (sess as unknown as { req?: Request }).req;
      const stored = req ? (req as unknown as PreloadCarrier)[PRELOAD]?.expireS : undefined;
      if (stored !== undefined && stored >= expireS - TOUCH_SLACK_S) {
        done?.();
        return;
      }
      pool
        .query('update session set expire = to_timestamp($1) where sid = $2 and expire < to_timestamp($1) - make_interval(secs => $3)', [
          expireS,
          sid,
          TOUCH_SLACK_S,
        ])
        .then(() => done?.(), (err: unknown) => done?.(err));
    }
  }
  return new TraylineSessionStore({ pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: false });
}
