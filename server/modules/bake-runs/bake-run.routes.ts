import { Router } from 'express';
import {
  bakeRuleCreateSchema,
  bakeRuleUpdateSchema,
  bakeRunSettingsSchema,
  bakeRunKitchenSchema,
  bakeRunStartSchema,
  calcBakeRunRequestSchema,
  idParams,
  ovenCreateSchema,
  ovenUpdateSchema,
  prepDateQuery,
  weekIdParam,
} from '@shared/schemas/bake-setup.schema.js';
import { actorOf, allow, clockOf, datesOf, scaleOf } from '../../http/authz.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import { shortDate } from '@shared/domain/iso-date.js';
import * as setup from './bake-setup.service.js';
import * as runs from './bake-run.service.js';
import { bakeRunIcs } from './bake-run-ics.js';
import { bakeRunPdf, plannedBakeRun } from './bake-run-files.js';
import { coolingDeleteQuery, coolingLogQuery, coolingParams, coolingRecordSchema } from '@shared/schemas/cooling.schema.js';
import { coolingLog, coolingLogCsv } from './cooling-log.js';
import * as cooling from './cooling.service.js';

/** Bake rules and ovens (coach writes, assistant reads), the stateless calculator and a prep week's bake run. */
/** `alerts`: where a tray written down as thrown away is told to the coaches (the mail queue, the app's address). */
export function bakeRunRoutes(alerts: cooling.CoolingAlerts) {
  const r = Router();

  r.get('/bake-rules', allow('coach', 'assistant'), validated({}, (_i, req) => setup.listBakeRules(emOf(req), actorOf(req))));
  r.post(
    '/bake-rules',
    allow('coach'),
    validated({ body: bakeRuleCreateSchema }, async ({ body }, req, res) => {
      const dto = await setup.createBakeRule(emOf(req), actorOf(req), body);
      res.status(201);
      return dto;
    }),
  );
  r.get(
    '/bake-rules/:id',
    allow('coach', 'assistant'),
    validated({ params: idParams }, ({ params }, req) => setup.getBakeRule(emOf(req), actorOf(req), params.id)),
  );
  r.put(
    '/bake-rules/:id',
    allow('coach'),
    validated({ params: idParams, body: bakeRuleUpdateSchema }, ({ params, body }, req) =>
      setup.updateBakeRule(emOf(req), actorOf(req), params.id, body),
    ),
  );
  r.delete(
    '/bake-rules/:id',
    allow('coach'),
    validated({ params: idParams }, async ({ params }, req) => {
      await setup.deleteBakeRule(emOf(req), actorOf(req), params.id);
    }),
  );

  r.get('/ovens', allow('coach', 'assistant'), validated({}, (_i, req) => setup.listOvens(emOf(req), actorOf(req))));
  r.post(
    '/ovens',
    allow('coach'),
    validated({ body: ovenCreateSchema }, async ({ body }, req, res) => {
      const dto = await setup.createOven(emOf(req), actorOf(req), body);
      res.status(201);
      return dto;
    }),
  );
  r.get('/ovens/:id', allow('coach', 'assistant'), validated({ params: idParams }, ({ params }, req) => setup.getOven(emOf(req), actorOf(req), params.id)));
  r.put(
    '/ovens/:id',
    allow('coach'),
    validated({ params: idParams, body: ovenUpdateSchema }, ({ params, body }, req) => setup.updateOven(emOf(req), actorOf(req), params.id, body)),
  );
  r.delete(
    '/ovens/:id',
    allow('coach'),
    validated({ params: idParams }, async ({ params }, req) => {
      await setup.deleteOven(emOf(req), actorOf(req), params.id);
    }),
  );

  r.post(
    '/calc/bake-run',
    allow('coach', 'assistant'),
    validated({ body: calcBakeRunRequestSchema }, ({ body }, req) => runs.calcBakeRun(emOf(req), actorOf(req), body)),
  );

  r.get(
    '/weeks/:weekId/bake-run',
    allow('coach', 'assistant'),
    validated({ params: weekIdParam, query: prepDateQuery }, ({ params, query }, req) =>
      runs.getWeekBakeRun(emOf(req), actorOf(req), params.weekId, query.prepDate),
    ),
  );
  r.put(
    '/weeks/:weekId/bake-run/settings',
    allow('coach'),
    validated({ params: weekIdParam, body: bakeRunSettingsSchema }, ({ params, body }, req) =>
      runs.putWeekBakeRunSettings(emOf(req), actorOf(req), params.weekId, body),
    ),
  );

  r.put(
    '/weeks/:weekId/bake-run/start',
    allow('coach', 'assistant'),
    validated({ params: weekIdParam, body: bakeRunStartSchema }, ({ params, body }, req) =>
      runs.moveWeekBakeRunStart(emOf(req), actorOf(req), params.weekId, body),
    ),
  );

  r.put(
    '/weeks/:weekId/bake-run/kitchen',
    allow('coach', 'assistant'),
    validated({ params: weekIdParam, body: bakeRunKitchenSchema }, ({ params, body }, req) =>
      runs.setWeekBakeRunKitchen(emOf(req), actorOf(req), params.weekId, body),
    ),
  );

  // The cooling record of the prep day's trays (coach or assistant: whoever runs the bake writes it down).
  r.get(
    '/weeks/:weekId/bake-run/cooling',
    allow('coach', 'assistant'),
    validated({ params: weekIdParam, query: prepDateQuery }, ({ params, query }, req) =>
      cooling.listCooling(emOf(req), actorOf(req), params.weekId, query.prepDate),
    ),
  );
  r.put(
    '/weeks/:weekId/bake-run/cooling/:runTrayId',
    allow('coach', 'assistant'),
    validated({ params: coolingParams, body: coolingRecordSchema }, ({ params, body }, req) =>
      cooling.putCooling(emOf(req), actorOf(req), params.weekId, params.runTrayId, body, alerts),
    ),
  );
  r.delete(
    '/weeks/:weekId/bake-run/cooling/:runTrayId',
    allow('coach', 'assistant'),
    validated({ params: coolingParams, query: coolingDeleteQuery }, async ({ params, query }, req) => {
      await cooling.deleteCooling(emOf(req), actorOf(req), params.weekId, params.runTrayId, query);
    }),
  );

  // The kitchen's cooling log: every tray's record over a stretch of prep days (coach or assistant).
  r.get(
    '/cooling-log',
    allow('coach', 'assistant'),
    validated({ query: coolingLogQuery }, ({ query }, req) => coolingLog(emOf(req), actorOf(req), query)),
  );
  r.get(
    '/cooling-log.csv',
    allow('coach', 'assistant'),
    validated({ query: coolingLogQuery }, async ({ query }, req, res) => {
      const log = await coolingLog(emOf(req), actorOf(req), query);
      res.type('text/csv; charset=utf-8').attachment(`cooling-log-${query.from}-to-${query.to}.csv`).send(coolingLogCsv(log, scaleOf(actorOf(req))));
    }),
  );

  r.get(
    '/weeks/:weekId/bake-run.pdf',
    allow('coach', 'assistant'),
    validated({ params: weekIdParam, query: prepDateQuery }, async ({ params, query }, req, res) => {
      const { filename, buffer } = await bakeRunPdf(emOf(req), actorOf(req), params.weekId, query.prepDate);
      res.setHeader('content-type', 'application/pdf');
      res.setHeader('content-disposition', `attachment; filename="${filename}"`);
      res.send(buffer);
    }),
  );
  r.get(
    '/weeks/:weekId/bake-run.ics',
    allow('coach', 'assistant'),
    validated({ params: weekIdParam, query: prepDateQuery }, async ({ params, query }, req, res) => {
      const { dto, run } = await plannedBakeRun(emOf(req), actorOf(req), params.weekId, query.prepDate);
      const text = bakeRunIcs(run, { calendarName: `Bake run, prep ${shortDate(dto.prepDate, datesOf(actorOf(req)))}`, uidPrefix: `week${dto.weekId}-${dto.prepDate}`, clock: clockOf(actorOf(req)), tempScale: scaleOf(actorOf(req)) });
      res.setHeader('content-type', 'text/calendar; charset=utf-8');
      res.setHeader('content-disposition', `attachment; filename="bake-run-${dto.prepDate}.ics"`);
      res.send(text);
    }),
  );

  return r;
}
