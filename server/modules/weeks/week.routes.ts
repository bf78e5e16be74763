import { Router } from 'express';
import {
  copyDaySchema,
  copyWeekSchema,
  createWeekSchema,
  todayQuery,
  putCellsSchema,
  putTraysSchema,
  updateWeekSchema,
  versionOnlySchema,
  weekIdParams,
} from '@shared/schemas/weeks.schema.js';
import { actorOf, allow } from '../../http/authz.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import * as weeks from './week.service.js';
import { getBoard } from './week-board.service.js';
import { listPublications, myWeek, publishWeek, weekPublishedAllergens } from './week-publish.service.js';


export function weekRoutes() {
  const r = Router();

  // Fixed paths before '/weeks/:id'.
  // A client's published week (their own plates only); null when nothing is published for them.
  r.get(
    '/weeks/mine',
    allow('client'),
    validated({ query: todayQuery }, async ({ query }, req) => (await myWeek(emOf(req), actorOf(req), query.today)) ?? null),
  );

  r.get(
    '/weeks/glance',
    allow('coach'),
    validated({ query: todayQuery }, ({ query }, req) => weeks.glance(emOf(req), actorOf(req), query.today)),
  );

  r.get('/weeks', allow('coach', 'assistant'), validated({}, (_i, req) => weeks.listWeeks(emOf(req), actorOf(req))));

  r.post(
    '/weeks',
    allow('coach'),
    validated({ body: createWeekSchema }, async ({ body }, req, res) => {
      const dto = await weeks.createWeek(emOf(req), actorOf(req), body);
      res.status(201);
      return dto;
    }),
  );

  // The board holds clients' targets: coach only.
  r.get('/weeks/:id', allow('coach'), validated({ params: weekIdParams }, ({ params }, req) => getBoard(emOf(req), actorOf(req), params.id)));

  r.patch(
    '/weeks/:id',
    allow('coach'),
    validated({ params: weekIdParams, body: updateWeekSchema }, ({ params, body }, req) =>
      weeks.updateWeek(emOf(req), actorOf(req), params.id, body),
    ),
  );

  r.delete(
    '/weeks/:id',
    allow('coach'),
    validated({ params: weekIdParams }, async ({ params }, req) => {
      await weeks.deleteWeek(emOf(req), actorOf(req), params.id);
    }),
  );

  r.put(
    '/weeks/:id/cells',
    allow('coach'),
    validated({ params: weekIdParams, body: putCellsSchema }, ({ params, body }, req) =>
      weeks.putCells(emOf(req), actorOf(req), params.id, body),
    ),
  );

  r.put(
    '/weeks/:id/trays',
    allow('coach'),
    validated({ params: weekIdParams, body: putTraysSchema }, ({ params, body }, req) =>
      weeks.putTrays(emOf(req), actorOf(req), params.id, body),
    ),
  );

  r.post(
    '/weeks/:id/trays/cover',
    allow('coach'),
    validated({ params: weekIdParams, body: versionOnlySchema }, ({ params, body }, req) =>
      weeks.coverTrays(emOf(req), actorOf(req), params.id, body.version),
    ),
  );

  r.post(
    '/weeks/:id/copy-day',
    allow('coach'),
    validated({ params: weekIdParams, body: copyDaySchema }, ({ params, body }, req) =>
      weeks.copyDay(emOf(req), actorOf(req), params.id, body),
    ),
  );

  r.post(
    '/weeks/:id/copy',
    allow('coach'),
    validated({ params: weekIdParams, body: copyWeekSchema }, async ({ params, body }, req, res) => {
      const dto = await weeks.copyWeek(emOf(req), actorOf(req), params.id, body);
      res.status(201);
      return dto;
    }),
  );

  r.post(
    '/weeks/:id/publish',
    allow('coach'),
    validated({ params: weekIdParams, body: versionOnlySchema }, ({ params, body }, req) =>
      publishWeek(emOf(req), actorOf(req), params.id, body.version),
    ),
  );

  // The published version's plates holding an allergen put on a client's list since (what "Send plans" warns of).
  r.get(
    '/weeks/:id/published-allergens',
    allow('coach'),
    validated({ params: weekIdParams, query: todayQuery }, ({ params, query }, req) => weekPublishedAllergens(emOf(req), actorOf(req), params.id, query.today)),
  );

  r.get(
    '/weeks/:id/publications',
    allow('coach'),
    validated({ params: weekIdParams }, ({ params }, req) => listPublications(emOf(req), actorOf(req), params.id)),
  );

  return r;
}
