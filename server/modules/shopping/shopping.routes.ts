import { Router } from 'express';
import { todayQuery } from '@shared/schemas/weeks.schema.js';
import {
  checkBodySchema,
  checkParams,
  markBoughtSchema,
  shoppingListQuerySchema,
  labelsQuerySchema,
  shoppingNeedsSchema,
  weekIdParams,
} from '@shared/schemas/shopping.schema.js';
import { actorOf, allow } from '../../http/authz.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import { weekLabels } from './labels.service.js';
import { shoppingCsv } from './shopping-csv.js';
import { shoppingPdf } from './shopping-pdf.js';
import { shoppingListFor } from './shopping.service.js';
import { currentWeek, markBought, setCheck, weekShoppingExport, weekShoppingList } from './shopping-week.service.js';

/** Shopping lists and container labels: coach and assistant only; clients never. */
export function shoppingRoutes(opts: { publicUrl: string }) {
  const r = Router();

  // A list from trays × counts and add-ons given directly (planning tray counts before or beside a prep week).
  r.post(
    '/shopping/preview',
    allow('coach', 'assistant'),
    validated({ body: shoppingNeedsSchema }, ({ body }, req) => shoppingListFor(emOf(req), actorOf(req), body)),
  );

  // The kitchen's week (kitchenWeek: the one of the next prep day, else the week covering today, else the next, else
  // the latest; null when there is none), for `today` as the person's device has it. Before '/weeks/:id'.
  r.get(
    '/weeks/current',
    allow('coach', 'assistant'),
    validated({ query: todayQuery }, async ({ query }, req) => (await currentWeek(emOf(req), actorOf(req), query.today)) ?? null),
  );

  r.get(
    '/weeks/:weekId/shopping',
    allow('coach', 'assistant'),
    validated({ params: weekIdParams, query: shoppingListQuerySchema }, ({ params, query }, req) =>
      weekShoppingList(emOf(req), actorOf(req), params.weekId, query.prepDate),
    ),
  );

  r.get(
    '/weeks/:weekId/shopping.csv',
    allow('coach', 'assistant'),
    validated({ params: weekIdParams, query: shoppingListQuerySchema }, async ({ params, query }, req, res) => {
      const { week, dto } = await weekShoppingExport(emOf(req), actorOf(req), params.weekId, query.prepDate);
      res
        .type('text/csv; charset=utf-8')
        .attachment(`shopping-list-${query.prepDate ? `prep-${query.prepDate}` : week.startDate}.csv`)
        .send(shoppingCsv(dto));
    }),
  );

  r.get(
    '/weeks/:weekId/shopping.pdf',
    allow('coach', 'assistant'),
    validated({ params: weekIdParams, query: shoppingListQuerySchema }, async ({ params, query }, req, res) => {
      const pdf = await shoppingPdf(emOf(req), actorOf(req), params.weekId, query.prepDate);
      res.type('application/pdf').attachment(pdf.filename).send(pdf.buffer);
    }),
  );

  // One idempotent write per item: two shoppers never overwrite each other's marks.
  r.put(
    '/weeks/:weekId/shopping/checks/:ingredientId',
    allow('coach', 'assistant'),
    validated({ params: checkParams, body: checkBodySchema }, ({ params, body }, req) =>
      setCheck(emOf(req), actorOf(req), params.weekId, params.ingredientId, body.checked, body.prepDate),
    ),
  );

  // Once per list (the whole week, or a trip): updates the pantry; a second call changes nothing and answers the
  // recorded change.
  r.post(
    '/weeks/:weekId/shopping/bought',
    allow('coach', 'assistant'),
    validated({ params: weekIdParams, body: markBoughtSchema }, ({ params, body }, req) =>
      markBought(emOf(req), actorOf(req), params.weekId, body.prepDate),
    ),
  );

  r.get(
    '/weeks/:weekId/labels',
    allow('coach', 'assistant'),
    validated({ params: weekIdParams, query: labelsQuerySchema }, ({ params, query }, req) =>
      weekLabels(emOf(req), actorOf(req), params.weekId, query, opts.publicUrl),
    ),
  );

  return r;
}
