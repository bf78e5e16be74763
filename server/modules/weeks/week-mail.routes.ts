import { Router } from 'express';
import {
  clientDeliveriesParams,
  deliveriesQuerySchema,
  sendWeekSchema,
  weekClientPlanParams,
  weekSendParams,
} from '@shared/schemas/week-mail.schema.js';
import { actorOf, allow, datesOf, scaleOf } from '../../http/authz.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import type { MailQueue } from '../mail/mail.service.js';
import type { RenderedAttachment } from '../mail/attachment-registry.js';
import { todayQuery } from '@shared/schemas/weeks.schema.js';
import { clientDeliveries, coachPlanPdf, myPlanPdf, sendWeek } from './week-mail.service.js';
import { myWeek } from './week-publish.service.js';
import { thawRemindersFile } from './week-mail.js';
import { NotFound } from '../../http/errors.js';
import type { Response } from 'express';

/** A personal file to download (a plan PDF, a calendar file): never kept by a shared cache. */
function sendAttachment(res: Response, file: RenderedAttachment) {
  res.type(file.contentType ?? 'application/pdf').attachment(file.filename).setHeader('cache-control', 'private, no-store');
  res.send(file.buffer);
}

/** Sending a published week to clients, the delivery log, and the week-plan PDF downloads. */
export function weekMailRoutes(deps: { mail: MailQueue; publicUrl: string }) {
  const r = Router();

  // Fixed path before any '/weeks/:id…': the signed-in client's own current published week.
  r.get(
    '/weeks/mine/plan.pdf',
    allow('client'),
    validated({ query: todayQuery }, async ({ query }, req, res) => sendAttachment(res, await myPlanPdf(emOf(req), actorOf(req), query.today))),
  );

  // The signed-in client's thaw reminders (the evening before each frozen plate of their current week), for a calendar.
  r.get(
    '/weeks/mine/thaw-reminders.ics',
    allow('client'),
    validated({ query: todayQuery }, async ({ query }, req, res) => {
      const week = await myWeek(emOf(req), actorOf(req), query.today);
      if (!week) throw new NotFound('Published week');
      sendAttachment(res, thawRemindersFile(week, week.days, datesOf(actorOf(req)), scaleOf(actorOf(req))));
    }),
  );

  r.post(
    '/weeks/:weekId/send',
    allow('coach'),
    validated({ params: weekSendParams, body: sendWeekSchema }, async ({ params, body }, req, res) => {
      const out = await sendWeek(emOf(req), deps.mail, actorOf(req), params.weekId, body, { publicUrl: deps.publicUrl });
      res.status(202);
      return out;
    }),
  );

  r.get(
    '/weeks/:weekId/clients/:clientId/plan.pdf',
    allow('coach'),
    validated({ params: weekClientPlanParams }, async ({ params }, req, res) =>
      sendAttachment(res, await coachPlanPdf(emOf(req), actorOf(req), params.weekId, params.clientId)),
    ),
  );

  r.get(
    '/clients/:clientId/deliveries',
    allow('coach'),
    validated({ params: clientDeliveriesParams, query: deliveriesQuerySchema }, ({ params, query }, req) =>
      clientDeliveries(emOf(req), actorOf(req), params.clientId, query.limit),
    ),
  );

  return r;
}
