import { Router } from 'express';
import { workspaceSettingsUpdateSchema } from '@shared/schemas/ingredients.schema.js';
import { actorOf, allow } from '../../http/authz.js';
import { emOf } from '../../http/request-context.js';
import { validated } from '../../http/validate.js';
import { getWorkspaceSettings, updateWorkspaceSettings } from './workspace-settings.service.js';

/** The coach's workspace settings (the net-carb rule, how dates are written). */
export function workspaceSettingsRoutes() {
  const r = Router();
  r.get(
    '/workspace/settings',
    allow('coach'),
    validated({}, (_i, req) => getWorkspaceSettings(emOf(req), actorOf(req))),
  );
  r.patch(
    '/workspace/settings',
    allow('coach'),
    validated({ body: workspaceSettingsUpdateSchema }, ({ body }, req) => updateWorkspaceSettings(emOf(req), actorOf(req), body)),
  );
  return r;
}
