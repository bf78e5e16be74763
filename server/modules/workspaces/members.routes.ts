import { Router } from 'express';
import { z } from 'zod';
import { actorOf, allow } from '../../http/authz.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import { changeMemberRole, listMembers, removeMember } from './members.service.js';
import { changeMemberRoleSchema } from '@shared/schemas/auth.schema.js';
import { PG_INT_MAX, TOO_LARGE } from '@shared/schemas/ids.js';

const memberIdParams = z.object({ id: z.coerce.number().int().positive().max(PG_INT_MAX, TOO_LARGE) });

/** The coach's team: who has access to the workspace, and ending someone's access. */
export function memberRoutes() {
  const r = Router();
  r.get(
    '/members',
    allow('coach'),
    validated({}, (_i, req) => listMembers(emOf(req), actorOf(req))),
  );
  r.patch(
    '/members/:id',
    allow('coach'),
    validated({ params: memberIdParams, body: changeMemberRoleSchema }, ({ params, body }, req) => changeMemberRole(emOf(req), actorOf(req), params.id, body.role)),
  );
  r.delete(
    '/members/:id',
    allow('coach'),
    validated({ params: memberIdParams }, async ({ params }, req) => {
      await removeMember(emOf(req), actorOf(req), params.id);
    }),
  );
  return r;
}
