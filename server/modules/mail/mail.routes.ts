import { Router } from 'express';
import type { Env } from '../../config/env.js';
import { actorOf, allow } from '../../http/authz.js';
import { NotFound } from '../../http/errors.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import {
  devMailAttachmentParamsSchema,
  devMailIdParamsSchema,
  devMailListQuerySchema,
  outboxIdParamsSchema,
  outboxListQuerySchema,
} from '@shared/schemas/mail.schema.js';
import type { MailQueue } from './mail.service.js';
import { isLoopback } from './mail-transport.js';
import { listOutbox, retryOutbox } from './outbox.service.js';
import { caughtAttachment, getCaughtMail, listCaughtMail } from './dev-mail.service.js';

/**
 * The dev mail view (what the local catcher caught) is on when DEV_MAIL_VIEW=1 (the default) and mail goes to
 * the local catcher (SMTP_HOST on loopback). With a real provider, or DEV_MAIL_VIEW=0, its routes answer 404.
 */
export function devMailEnabled(env: Pick<Env, 'DEV_MAIL_VIEW' | 'SMTP_HOST'>): boolean {
  return env.DEV_MAIL_VIEW === '1' && isLoopback(env.SMTP_HOST);
}

export function mailRoutes(deps: { mail: MailQueue; env: Env }) {
  const r = Router();
  const devOn = devMailEnabled(deps.env);
  const requireDev = () => {
    if (!devOn) throw new NotFound('The dev mail view is off here (set DEV_MAIL_VIEW=1 with the local catcher); page');
  };

  r.get(
    '/outbox',
    allow('coach'),
    validated({ query: outboxListQuerySchema }, async ({ query }, req) => ({
      ...(await listOutbox(emOf(req), actorOf(req), query)),
      devMailView: devOn,
    })),
  );

  r.post(
    '/outbox/:id/retry',
    allow('coach'),
    validated({ params: outboxIdParamsSchema }, ({ params }, req) => retryOutbox(emOf(req), deps.mail, actorOf(req), params.id)),
  );

  r.get(
    '/dev/mail',
    allow('coach'),
    validated({ query: devMailListQuerySchema }, ({ query }, req) => {
      requireDev();
      return listCaughtMail(emOf(req), actorOf(req), query.page, query.pageSize);
    }),
  );

  r.get(
    '/dev/mail/:id',
    allow('coach'),
    validated({ params: devMailIdParamsSchema }, ({ params }, req) => {
      requireDev();
      return getCaughtMail(emOf(req), actorOf(req), params.id);
    }),
  );

  r.get(
    '/dev/mail/:id/attachments/:index',
    allow('coach'),
    validated({ params: devMailAttachmentParamsSchema }, async ({ params }, req, res) => {
      requireDev();
      const att = await caughtAttachment(emOf(req), actorOf(req), params.id, params.index);
      res.setHeader('content-type', att.contentType);
      res.setHeader('content-disposition', `inline; filename="${att.filename.replace(/[^\w.\- ]+/g, '_')}"`);
      res.setHeader('x-content-type-options', 'nosniff');
      res.send(att.content);
    }),
  );

  return r;
}
