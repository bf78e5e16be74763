import { Router } from 'express';
import { shoppingNeedsSchema } from '@shared/schemas/shopping.schema.js';
import { actorOf, allow } from '../../http/authz.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import { shoppingListFor } from './shopping.service.js';

/** Shopping lists: coach and assistant only; clients never. */
export function shoppingRoutes() {
  const r = Router();

  // A list from trays × counts and add-ons given directly (planning tray counts before or beside a prep week).
  r.post(
    '/shopping/preview',
    allow('coach', 'assistant'),
    validated({ body: shoppingNeedsSchema }, ({ body }, req) => shoppingListFor(emOf(req), actorOf(req), body)),
  );

  return r;
}
