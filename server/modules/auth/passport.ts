import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { Request, Response, NextFunction } from 'express';
import { RequestContext } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { Actor } from '../../http/authz.js';
import { checkCredentials, loadActor } from './auth.service.js';
import { preloadedActor } from './session-store.js';
import { noteSignIn } from './devices.js';

declare module 'express-session' {
  interface SessionData {
    /** The workspace this session works in, for someone who belongs to several (else their first). */
    workspaceId?: number;
  }
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends Actor {}
  }
}

/** Sign-in refusal for right credentials without any workspace (removed from their team, say). */
export const NO_WORKSPACE = 'This account has no access to a workspace any more: ask your coach for a new invitation';

let configured = false;

/**
 * passport-local checks credentials; the session stores only the user id; each request reloads the actor (read with
 * the session by the session store, so a role or membership change applies on the next request).
 */
export function configurePassport() {
  if (configured) return passport;
  configured = true;
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password', session: true }, (email, password, done) => {
      const em = RequestContext.getEntityManager() as EntityManager;
      checkCredentials(em, email, password)
        .then(async (userId) => {
          const actor = await loadActor(em, userId);
          done(null, actor ?? false, actor ? undefined : { message: NO_WORKSPACE });
        })
        .catch((err) => (err?.code === 'bad_credentials' ? done(null, false, { message: err.message }) : done(err)));
    }),
  );
  passport.serializeUser((user, done) => done(null, user.userId));
  passport.deserializeUser((req: Request, id: unknown, done: (err: unknown, user?: Actor | false) => void) => {
    const userId = Number(id);
    const preloaded = preloadedActor(req, userId);
    if (preloaded) return done(null, preloaded);
    loadActor(req.em!, userId, req.session?.workspaceId)
      .then((actor) => done(null, actor ?? false))
      .catch(done);
  });
  return passport;
}

/** Runs passport-local and resolves to the actor or null (wrong credentials). */
export function authenticateLocal(req: Request, res: Response, next: NextFunction): Promise<{ actor: Actor | null; message?: string }> {
  return new Promise((resolve, reject) => {
    passport.authenticate('local', (err: unknown, user: Actor | false, info?: { message?: string }) => {
      if (err) return reject(err);
      resolve({ actor: user || null, message: info?.message });
    })(req, res, next);
  });
}

/**
 * Signs the actor in; passport regenerates the session id (no session fixation). The new session notes when and
 * from what device (Settings lists the devices signed in), and whether it stays signed in (`staySignedIn`, the
 * default) or ends with the browser (a shared computer).
 */
export function signIn(req: Request, actor: Actor, staySignedIn = true): Promise<void> {
  return new Promise((resolve, reject) =>
    req.login(actor, (err) => {
      if (err) return reject(err);
      noteSignIn(req, staySignedIn);
      resolve();
    }),
  );
}

export function signOut(req: Request): Promise<void> {
  return new Promise((resolve, reject) =>
    req.logout((err) => {
      if (err) return reject(err);
      req.session.destroy((e) => (e ? reject(e) : resolve()));
    }),
  );
}
