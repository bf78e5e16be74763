import { Router } from 'express';
import { sendPrepDaySchema } from '@shared/schemas/prep-day-mail.schema.js';
import { weekIdParams } from '@shared/schemas/shopping.schema.js';
import { actorOf, allow } from '../../http/authz.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import type { MailQueue } from '../mail/mail.service.js';
import { sendPrepDay } from './prep-day-mail.service.js';
// Registers the papers' renderers for the mail job.
import './prep-day-mail.js';

/** The coach e-mails a prep day's shopping list and bake run to the kitchen assistants. */
export function prepDayMailRoutes(deps: { mail: MailQueue; publicUrl: string }) {
  const r = Router();
  r.post(
    '/weeks/:weekId/prep-day-mail',
    allow('coach'),
    validated({ params: weekIdParams, body: sendPrepDaySchema }, async ({ params, body }, req, res) => {
      const result = await sendPrepDay(emOf(req), actorOf(req), params.weekId, body, deps.mail, deps.publicUrl);
      res.status(result.repeated ? 200 : 202);
      return result;
    }),
  );
  return r;
}
