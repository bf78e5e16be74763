import { Router } from 'express';
import { pantryCreateSchema, pantryIdParams, pantryUpdateSchema } from '@shared/schemas/shopping.schema.js';
import { actorOf, allow } from '../../http/authz.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import * as pantry from './pantry.service.js';

/** The pantry: what the workspace has on hand. Assistants and coaches edit it; clients never see it. */
export function pantryRoutes() {
  const r = Router();

  r.get(
    '/pantry',
    allow('coach', 'assistant'),
    validated({}, (_i, req) => pantry.listPantry(emOf(req), actorOf(req))),
  );

  r.post(
    '/pantry',
    allow('coach', 'assistant'),
    validated({ body: pantryCreateSchema }, async ({ body }, req, res) => {
      const dto = await pantry.createPantryItem(emOf(req), actorOf(req), body);
      res.status(201);
      return dto;
    }),
  );

  r.get(
    '/pantry/:id',
    allow('coach', 'assistant'),
    validated({ params: pantryIdParams }, ({ params }, req) => pantry.getPantryItem(emOf(req), actorOf(req), params.id)),
  );

  r.patch(
    '/pantry/:id',
    allow('coach', 'assistant'),
    validated({ params: pantryIdParams, body: pantryUpdateSchema }, ({ params, body }, req) =>
      pantry.updatePantryItem(emOf(req), actorOf(req), params.id, body),
    ),
  );

  r.delete(
    '/pantry/:id',
    allow('coach', 'assistant'),
    validated({ params: pantryIdParams }, async ({ params }, req) => {
      await pantry.deletePantryItem(emOf(req), actorOf(req), params.id);
    }),
  );

  return r;
}
