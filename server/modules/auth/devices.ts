import Bowser from 'bowser';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { Request } from 'express';
import { UNKEPT_SESSION_IDLE_HOURS, type SignedInDeviceDto } from '@shared/schemas/auth.schema.js';
import { NotFound, ValidationError } from '../../http/errors.js';

declare module 'express-session' {
  interface SessionData {
    /** When this device signed in (ISO instant). */
    signedInAt?: string;
    /** The device in a few words ("Chrome on an Android phone"), read off its User-Agent at sign-in; not the header. */
    device?: string;
    /** False: signed in without "Keep me signed in" (a cookie that ends with the browser); absent: kept. */
    staySignedIn?: false;
  }
}

/** A session lasts 14 days from its last request (a rolling cookie). */
export const SESSION_MAX_AGE_MS = 14 * 86_400_000;
/**
 * A session not kept signed in has a cookie without an expiry (the browser drops it when it closes); the server
 * cannot see the browser close, so it ends the session itself after this long without a request.
 */
export const UNKEPT_SESSION_IDLE_MS = UNKEPT_SESSION_IDLE_HOURS * 3_600_000;

const KIND: Record<string, string> = { mobile: 'phone', tablet: 'tablet', desktop: 'computer', tv: 'TV' };

/**
 * A device in a few words from its User-Agent header (parsed by bowser): "Chrome on an Android phone", "Safari on an
 * iOS tablet", "Firefox on a Windows computer". Only these words are kept with the session, not the header.
 */
export function describeDevice(userAgent: string | undefined): string {
  const ua = (userAgent ?? '').slice(0, 500);
  const parsed = ua ? Bowser.parse(ua) : null;
  const browser = parsed?.browser.name || 'A browser';
  const where = [parsed?.os.name, parsed?.platform.type ? KIND[parsed.platform.type] : undefined].filter(Boolean).join(' ');
  if (!where) return browser === 'A browser' ? 'A browser that did not say which' : browser;
  return `${browser} on ${/^[aeiou]/i.test(where) ? 'an' : 'a'} ${where}`;
}

/**
 * Notes on a session just signed in when and from what, and whether it stays signed in: one that does not gets a
 * cookie without an expiry, so the browser forgets it when it closes, and its answers are not kept by the browser.
 * Called by every sign-in (passport.ts `signIn`).
 */
export function noteSignIn(req: Request, staySignedIn: boolean): void {
  req.session.signedInAt = new Date().toISOString();
  req.session.device = describeDevice(req.get('user-agent'));
  if (staySignedIn) {
    delete req.session.staySignedIn;
  } else {
    req.session.staySignedIn = false;
    req.session.cookie.expires = null;
    req.res?.setHeader('cache-control', 'no-store');
  }
}

/**
 * A device's handle: the first 24 hex digits of the SHA-256 of its session id. The session id is the cookie's
 * secret and never leaves the server; the handle names a session only to its own person's requests.
 */
const HANDLE_SQL = `left(encode(sha256(convert_to(sid, 'UTF8')), 'hex'), 24)`;
const MINE_SQL = `(sess->'passport'->>'user') = ? and expire >= now()`;

interface DeviceRow {
  handle: string;
  current: boolean;
  device: string | null;
  signed_in_at: string | null;
  kept: boolean;
  expire_ms: string;
}

/** The devices signed in as this person (in any of their workspaces): this one first, then the latest active. */
export async function listDevices(em: EntityManager, userId: number, currentSid: string): Promise<SignedInDeviceDto[]> {
  const rows = await em.getConnection().execute<DeviceRow[]>(
    `select ${HANDLE_SQL} as handle, sid = ? as current, sess->>'device' as device, sess->>'signedInAt' as signed_in_at,
            (sess->>'staySignedIn') is distinct from 'false' as kept, (extract(epoch from expire) * 1000)::bigint::text as expire_ms
       from "session" where ${MINE_SQL}`,
    [currentSid, String(userId)],
    'all',
    em.getTransactionContext(),
  );
  const now = Date.now();
  return rows
    .map((r) => ({
      id: r.handle,
      current: r.current,
      device: r.device,
      signedInAt: r.signed_in_at && !Number.isNaN(Date.parse(r.signed_in_at)) ? new Date(r.signed_in_at).toISOString() : null,
      // The stored expiry is the last request's plus the session's life (rewritten when a minute behind).
      lastActiveAt: new Date(r.current ? now : Math.min(now, Number(r.expire_ms) - (r.kept ? SESSION_MAX_AGE_MS : UNKEPT_SESSION_IDLE_MS))).toISOString(),
      untilBrowserCloses: !r.kept,
    }))
    .sort((a, b) => Number(b.current) - Number(a.current) || b.lastActiveAt.localeCompare(a.lastActiveAt));
}

/** Signs out one other device of this person's; 404 for a handle that is not one of theirs (or has ended). */
export async function signOutDevice(em: EntityManager, userId: number, currentSid: string, handle: string): Promise<void> {
  const conn = em.getConnection();
  const [row] = await conn.execute<{ current: boolean }[]>(
    `select sid = ? as current from "session" where ${HANDLE_SQL} = ? and ${MINE_SQL}`,
    [currentSid, handle, String(userId)],
    'all',
    em.getTransactionContext(),
  );
  if (!row) throw new NotFound('Signed-in device');
  if (row.current) {
    throw new ValidationError('This is the device you are using', { id: ['To sign out this device, use Sign out in the menu'] });
  }
  await conn.execute(`delete from "session" where ${HANDLE_SQL} = ? and ${MINE_SQL}`, [handle, String(userId)], 'run', em.getTransactionContext());
}

/**
 * Ends the person's sessions, all of them or all but `except` (the device asking), in the caller's transaction; how
 * many were live (ended ones go too). Every way out goes through here: signing out elsewhere, a new password, a
 * reset link, the last access removed.
 */
export async function endSessions(em: EntityManager, userId: number, except: string | null = null): Promise<number> {
  const [row] = await em.getConnection().execute<{ n: number }[]>(
    `with gone as (delete from "session" where (sess->'passport'->>'user') = ? and sid is distinct from ? returning expire)
     select count(*) filter (where expire >= now())::int as n from gone`,
    [String(userId), except],
    'all',
    em.getTransactionContext(),
  );
  return row.n;
}
