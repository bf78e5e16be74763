import { Router } from 'express';
import { archiveAssemblySchema, assemblyIdParams, createAssemblySchema, platePreviewSchema, updateAssemblySchema } from '@shared/schemas/assemblies.schema.js';
import { actorOf, allow } from '../../http/authz.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import * as plates from './assembly.service.js';

export function assemblyRoutes() {
  const r = Router();

  // Plates hold no client data: the assistant may read them (prep day), only the coach writes.
  r.get('/assemblies', allow('coach', 'assistant'), validated({}, (_i, req) => plates.listAssemblies(emOf(req), actorOf(req))));

  r.post(
    '/assemblies',
    allow('coach'),
    validated({ body: createAssemblySchema }, async ({ body }, req, res) => {
      const dto = await plates.createAssembly(emOf(req), actorOf(req), body);
      res.status(201);
      return dto;
    }),
  );

  // The plate editor's live numbers (nothing is written).
  r.post(
    '/assemblies/preview',
    allow('coach'),
    validated({ body: platePreviewSchema }, ({ body }, req) => plates.previewAssembly(emOf(req), actorOf(req), body)),
  );

  r.get(
    '/assemblies/:id',
    allow('coach', 'assistant'),
    validated({ params: assemblyIdParams }, ({ params }, req) => plates.getAssembly(emOf(req), actorOf(req), params.id)),
  );

  r.put(
    '/assemblies/:id',
    allow('coach'),
    validated({ params: assemblyIdParams, body: updateAssemblySchema }, ({ params, body }, req) =>
      plates.updateAssembly(emOf(req), actorOf(req), params.id, body),
    ),
  );

  // Archive or restore: out of the plates list and the board's pickers; boards that plan it keep it.
  r.put(
    '/assemblies/:id/archived',
    allow('coach'),
    validated({ params: assemblyIdParams, body: archiveAssemblySchema }, ({ params, body }, req) =>
      plates.archiveAssembly(emOf(req), actorOf(req), params.id, body),
    ),
  );

  // 204 when deleted; 200 with { archived: true, plannedOn } when a week board plans it and it was archived instead.
  r.delete(
    '/assemblies/:id',
    allow('coach'),
    validated({ params: assemblyIdParams }, async ({ params }, req) => (await plates.deleteAssembly(emOf(req), actorOf(req), params.id)) ?? undefined),
  );

  return r;
}
