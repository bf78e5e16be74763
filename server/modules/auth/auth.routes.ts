import { createHash } from 'node:crypto';
import { Router, type Request } from 'express';
import rateLimit, { ipKeyGenerator } from 'express-rate-limit';
import type { Pool } from 'pg';
import { z } from 'zod';
import {
  acceptInvitationSchema,
  changePasswordSchema,
  chooseWorkspaceSchema,
  requestPasswordResetSchema,
  resetPasswordSchema,
  createInvitationSchema,
  inviteClientsSchema,
  deviceIdSchema,
  type DevicesSignedOutDto,
  loginSchema,
  registerSchema,
  updatePreferencesSchema,
  type InvitationDto,
} from '@shared/schemas/auth.schema.js';
import { actorOf, allow, type Actor } from '../../http/authz.js';
import { BadCredentials, Forbidden, TooMany } from '../../http/errors.js';
import { PgRateLimitStore } from '../../http/rate-limit-store.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import * as auth from './auth.service.js';
import * as devices from './devices.js';
import { NO_WORKSPACE, authenticateLocal, signIn, signOut } from './passport.js';
import type { IInvitation } from './user.entity.js';
import type { MailQueue } from '../mail/mail.service.js';
import { PG_INT_MAX, TOO_LARGE } from '@shared/schemas/ids.js';

const FIFTEEN_MIN = 15 * 60_000;

/** The signed-in person, with whether this session was kept signed in at sign-in. */
const meOf = (req: Request, actor: Actor) => auth.me(emOf(req), actor, req.session.staySignedIn !== false);

function presentInvitation(inv: IInvitation, link?: string): InvitationDto {
  return {
    id: inv.id,
    email: inv.email,
    role: inv.role as InvitationDto['role'],
    expiresAt: inv.expiresAt.toISOString(),
    acceptedAt: inv.acceptedAt ? inv.acceptedAt.toISOString() : null,
    ...(link ? { link } : {}),
  };
}

/**
 * The per-e-mail rate-limit key: a SHA-256 of the address as sign-in normalises it. Short whatever was typed (a
 * key of thousands of characters cannot outgrow the table's column), and the table holds no e-mail addresses.
 */
export function emailLimitKey(req: Request): string {
  const typed = String(req.body?.email ?? '').trim().toLowerCase();
  return typed ? createHash('sha256').update(typed).digest('hex') : 'none';
}

export function authRoutes(opts: { pool: Pool; loginLimit: number; publicUrl: string; mail: MailQueue; resetLimit?: number }) {
  const r = Router();

  // Login: 429 after `loginLimit` failures in 15 minutes, counted per e-mail and per IP, in PostgreSQL.
  const limiter = (prefix: string, limit: number, key: (req: Request) => string) =>
    rateLimit({
      windowMs: FIFTEEN_MIN,
      limit,
      skipSuccessfulRequests: true,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      store: new PgRateLimitStore(opts.pool, prefix),
      keyGenerator: key,
      handler: (_req, _res, next) => next(new TooMany('Too many failed sign-ins; wait 15 minutes and try again')),
    });
  const byEmail = limiter('login-email', opts.loginLimit, emailLimitKey);
  // Per IP a wider limit (ten times the per-e-mail one): it stops spraying many e-mails from one address.
  const byIp = limiter('login-ip', opts.loginLimit * 10, (req) => ipKeyGenerator(req.ip ?? '0.0.0.0'));

  r.post(
    '/auth/login',
    allow('public'),
    byIp,
    byEmail,
    validated({ body: loginSchema }, async ({ body }, req, res) => {
      req.body = body; // normalised e-mail for passport-local
      const { actor, message } = await authenticateLocal(req, res, () => undefined);
      if (!actor) throw message === NO_WORKSPACE ? new Forbidden(message) : new BadCredentials();
      await signIn(req, actor, body.staySignedIn !== false);
      return meOf(req, actor);
    }),
  );

  r.post(
    '/auth/register',
    allow('public'),
    validated({ body: registerSchema }, async ({ body }, req, res) => {
      const em = emOf(req);
      const userId = await auth.register(em, body);
      const actor = (await auth.loadActor(em, userId))!;
      await signIn(req, actor);
      res.status(201);
      return meOf(req, actor);
    }),
  );

  r.post(
    '/auth/logout',
    allow('public'),
    validated({}, async (_input, req) => {
      if (req.isAuthenticated?.()) await signOut(req);
    }),
  );

  r.get(
    '/auth/me',
    allow('signed-in'),
    validated({}, (_i, req) => meOf(req, actorOf(req))),
  );

  r.patch(
    '/auth/me',
    allow('signed-in'),
    validated({ body: updatePreferencesSchema }, async ({ body }, req) => {
      await auth.updatePreferences(emOf(req), actorOf(req), body);
      return meOf(req, actorOf(req));
    }),
  );

  // Someone who belongs to several workspaces (an assistant working for two coaches) chooses the one to work in.
  r.get(
    '/auth/workspaces',
    allow('signed-in'),
    validated({}, (_i, req) => auth.listMyWorkspaces(emOf(req), actorOf(req))),
  );
  r.put(
    '/auth/workspace',
    allow('signed-in'),
    validated({ body: chooseWorkspaceSchema }, async ({ body }, req) => {
      const actor = await auth.actorIn(emOf(req), actorOf(req), body.workspaceId);
      req.session.workspaceId = actor.workspaceId;
      req.user = actor;
      req.actor = actor;
      return meOf(req, actor);
    }),
  );

  r.post(
    '/auth/password',
    allow('signed-in'),
    validated({ body: changePasswordSchema }, ({ body }, req) =>
      auth.changePassword(emOf(req), actorOf(req), body, { sid: req.sessionID, device: req.session.device ?? devices.describeDevice(req.get('user-agent')) }, opts),
    ),
  );

  // The devices signed in as this person (Settings): list them, sign one out, or all but this one.
  r.get(
    '/auth/devices',
    allow('signed-in'),
    validated({}, (_i, req) => devices.listDevices(emOf(req), actorOf(req).userId, req.sessionID)),
  );
  r.delete(
    '/auth/devices/:id',
    allow('signed-in'),
    validated({ params: z.object({ id: deviceIdSchema }) }, async ({ params }, req) => {
      await devices.signOutDevice(emOf(req), actorOf(req).userId, req.sessionID, params.id);
    }),
  );
  r.post(
    '/auth/devices/sign-out-others',
    allow('signed-in'),
    validated({}, async (_i, req): Promise<DevicesSignedOutDto> => ({
      signedOut: await devices.endSessions(emOf(req), actorOf(req).userId, req.sessionID),
    })),
  );

  r.get(
    '/invitations',
    allow('coach'),
    validated({}, async (_i, req) => (await auth.listInvitations(emOf(req), actorOf(req))).map((i) => presentInvitation(i))),
  );

  r.post(
    '/invitations',
    allow('coach'),
    validated({ body: createInvitationSchema }, async ({ body }, req, res) => {
      const { invitation, link } = await auth.createInvitation(emOf(req), actorOf(req), body, opts.publicUrl, opts.mail);
      res.status(201);
      return presentInvitation(invitation, link);
    }),
  );

  // Client profiles invited at once, each at the e-mail on their profile; those who cannot be are skipped and said why.
  r.post(
    '/invitations/clients',
    allow('coach'),
    validated({ body: inviteClientsSchema }, async ({ body }, req, res) => {
      const result = await auth.inviteClients(emOf(req), actorOf(req), body.clientIds, opts.publicUrl, opts.mail);
      res.status(result.invited.length ? 201 : 200);
      return result;
    }),
  );

  // Password reset requests: every request counts (not only failures), per e-mail and per IP, in PostgreSQL.
  const resetLimit = opts.resetLimit ?? 5;
  const resetLimiter = (prefix: string, limit: number, key: (req: Request) => string) =>
    rateLimit({
      windowMs: FIFTEEN_MIN,
      limit,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      store: new PgRateLimitStore(opts.pool, prefix),
      keyGenerator: key,
      handler: (_req, _res, next) => next(new TooMany('Too many password reset requests; wait 15 minutes and try again')),
    });
  const resetByEmail = resetLimiter('reset-email', resetLimit, emailLimitKey);
  const resetByIp = resetLimiter('reset-ip', resetLimit * 10, (req) => ipKeyGenerator(req.ip ?? '0.0.0.0'));

  r.post(
    '/auth/password-reset',
    allow('public'),
    resetByIp,
    resetByEmail,
    validated({ body: requestPasswordResetSchema }, async ({ body }) => {
      // Always 204 after the same work: the answer does not tell whether the e-mail has an account.
      await auth.requestPasswordReset(body.email, opts.mail);
    }),
  );

  r.post(
    '/auth/password-reset/confirm',
    allow('public'),
    resetByIp,
    validated({ body: resetPasswordSchema }, async ({ body }, req) => {
      await auth.confirmPasswordReset(emOf(req), body.token, body.newPassword, opts);
    }),
  );

  const idParams = z.object({ id: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE) });
  r.delete(
    '/invitations/:id',
    allow('coach'),
    validated({ params: idParams }, async ({ params }, req) => {
      await auth.revokeInvitation(emOf(req), actorOf(req), params.id);
    }),
  );

  const tokenParams = z.object({ token: z.string().min(20).max(200) });
  r.get(
    '/invitations/:token',
    allow('public'),
    validated({ params: tokenParams }, ({ params }, req) => auth.peekInvitation(emOf(req), params.token)),
  );

  r.post(
    '/invitations/:token/accept',
    allow('public'),
    validated({ params: tokenParams, body: acceptInvitationSchema }, async ({ params, body }, req) => {
      const em = emOf(req);
      const { userId, workspaceId } = await auth.acceptInvitation(em, params.token, body);
      // Someone who already works elsewhere lands in the workspace that invited them.
      const actor = (await auth.loadActor(em, userId, workspaceId))!;
      await signIn(req, actor, body.staySignedIn !== false);
      req.session.workspaceId = workspaceId;
      return meOf(req, actor);
    }),
  );

  return r;
}
