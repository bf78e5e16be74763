import { Router } from 'express';
import { clientIdParams, clientImportOptionsSchema, createClientSchema, updateClientSchema } from '@shared/schemas/clients.schema.js';
import { actorOf, allow } from '../../http/authz.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import { uploadCsv, uploadedFile } from '../../http/upload-csv.js';
import { exportClientsCsv, importClientsCsv } from './client-import.service.js';
import * as clients from './client.service.js';
import { todayQuery } from '@shared/schemas/weeks.schema.js';
import { publishedAllergens } from '../weeks/week-publish.service.js';

export function clientRoutes() {
  const r = Router();

  // Coach: full profiles with targets. Assistant: names and portions per plate only.
  r.get(
    '/clients',
    allow('coach', 'assistant'),
    validated({}, (_i, req) => clients.listClients(emOf(req), actorOf(req))),
  );

  r.post(
    '/clients',
    allow('coach'),
    validated({ body: createClientSchema }, async ({ body }, req, res) => {
      const dto = await clients.createClient(emOf(req), actorOf(req), body);
      res.status(201);
      return dto;
    }),
  );

  // Coach: client profiles from a CSV file, all rows or none (a row-level report otherwise); no invitation is sent.
  // Form field beside the file: `units` = us | metric, for a height or weight written as a number alone (default:
  // the coach's own units).
  r.post(
    '/clients/import',
    allow('coach'),
    uploadCsv,
    validated({ body: clientImportOptionsSchema }, async ({ body }, req, res) => {
      const result = await importClientsCsv(emOf(req), actorOf(req), uploadedFile(req), body.units);
      res.status(201);
      return result;
    }),
  );

  // Coach: the clients (not archived) as a CSV the import reads back, health notes included.
  r.get(
    '/clients.csv',
    allow('coach'),
    validated({}, async (_i, req, res) => {
      res.type('text/csv; charset=utf-8').attachment('clients.csv').send(await exportClientsCsv(emOf(req), actorOf(req)));
    }),
  );

  // Coach: published plates holding an allergen put on the client's list after publishing.
  r.get(
    '/clients/:id/published-allergens',
    allow('coach'),
    validated({ params: clientIdParams, query: todayQuery }, ({ params, query }, req) => publishedAllergens(emOf(req), actorOf(req), params.id, query.today)),
  );

  // A client reads their own profile (no health notes); any other id is "not found".
  r.get(
    '/clients/:id',
    allow('coach', 'client'),
    validated({ params: clientIdParams }, ({ params }, req) => clients.getClient(emOf(req), actorOf(req), params.id)),
  );

  r.patch(
    '/clients/:id',
    allow('coach'),
    validated({ params: clientIdParams, body: updateClientSchema }, ({ params, body }, req) =>
      clients.updateClient(emOf(req), actorOf(req), params.id, body),
    ),
  );

  r.delete(
    '/clients/:id',
    allow('coach'),
    validated({ params: clientIdParams }, async ({ params }, req) => {
      await clients.deleteClient(emOf(req), actorOf(req), params.id);
    }),
  );

  return r;
}
