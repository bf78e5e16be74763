// Every API module's router, in one list. Each router's routes start with `allow(...)` (see http/authz.ts).
import type { Router } from 'express';
import type { Pool } from 'pg';
import type { Env } from '../config/env.js';
import type { Orm } from '../db/orm.js';
import type { MailQueue } from './mail/mail.service.js';
import { mailRoutes } from './mail/mail.routes.js';
import { ingredientRoutes } from './ingredients/ingredient.routes.js';
import { workspaceSettingsRoutes } from './workspaces/workspace-settings.routes.js';
import { memberRoutes } from './workspaces/members.routes.js';
import { clientRoutes } from './clients/client.routes.js';
import { assemblyRoutes } from './assemblies/assembly.routes.js';
import { weekRoutes } from './weeks/week.routes.js';
import { weekMailRoutes } from './weeks/week-mail.routes.js';
import { trayRoutes } from './trays/trays.routes.js';
import { bakeRunRoutes } from './bake-runs/bake-run.routes.js';
import { pantryRoutes } from './shopping/pantry.routes.js';
import { shoppingRoutes } from './shopping/shopping.routes.js';
import { prepDayMailRoutes } from './kitchen-mail/prep-day-mail.routes.js';

export interface ModuleDeps {
  orm: Orm;
  pool: Pool;
  env: Env;
  /** The app's pg-boss mail queue: `queueMail(em, deps.mail, input)` (server/modules/mail/mail.service.ts). */
  mail: MailQueue;
}

export function apiModules(deps: ModuleDeps): Router[] {
  return [trayRoutes({ filesDir: deps.env.FILES_DIR }), clientRoutes(), assemblyRoutes(), shoppingRoutes({ publicUrl: deps.env.PUBLIC_URL }), weekMailRoutes({ mail: deps.mail, publicUrl: deps.env.PUBLIC_URL }), prepDayMailRoutes({ mail: deps.mail, publicUrl: deps.env.PUBLIC_URL }), weekRoutes(), ingredientRoutes(), workspaceSettingsRoutes(), memberRoutes(), pantryRoutes(), bakeRunRoutes({ mail: deps.mail, publicUrl: deps.env.PUBLIC_URL }), mailRoutes({ mail: deps.mail, env: deps.env })];
}
