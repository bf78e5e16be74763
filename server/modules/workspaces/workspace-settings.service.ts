import { toDateOrder } from '@shared/domain/iso-date.js';
import { toClockStyle } from '@shared/domain/clock.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { NET_CARB_RULES } from '@shared/domain/nutrition.js';
import {
  NET_CARB_HELP,
  workspaceSettingsUpdateSchema,
  type WorkspaceSettingsDto,
  type WorkspaceSettingsUpdateInput,
} from '@shared/schemas/ingredients.schema.js';
import type { Actor } from '../../http/authz.js';
import { StaleEdit } from '../../http/errors.js';
import { Workspace, type IWorkspace } from './workspace.entity.js';
import { toNetCarbRule } from '../ingredients/ingredient.service.js';

function present(ws: IWorkspace): WorkspaceSettingsDto {
  return {
    netCarbRule: toNetCarbRule(ws.netCarbRule).kind,
    dateOrder: toDateOrder(ws.dateOrder),
    clock: toClockStyle(ws.clock),
    timeZone: ws.timeZone ?? null,
    netCarbRules: NET_CARB_RULES.map((r) => ({ ...r })),
    help: NET_CARB_HELP,
    version: ws.version,
  };
}

export async function getWorkspaceSettings(em: EntityManager, actor: Actor): Promise<WorkspaceSettingsDto> {
  return present(await em.findOneOrFail(Workspace, actor.workspaceId));
}

/** Changes the net-carb rule, how dates and times are written, the kitchen's time zone (each when given); a stale version is 409 with the current settings. */
export async function updateWorkspaceSettings(
  em: EntityManager,
  actor: Actor,
  input: WorkspaceSettingsUpdateInput,
): Promise<WorkspaceSettingsDto> {
  const v = workspaceSettingsUpdateSchema.parse(input);
  const ws = await em.findOneOrFail(Workspace, actor.workspaceId);
  if (ws.version !== v.version) throw new StaleEdit(ws.version, present(ws));
  if (v.netCarbRule) ws.netCarbRule = v.netCarbRule;
  if (v.dateOrder) ws.dateOrder = v.dateOrder;
  if (v.clock) ws.clock = v.clock;
  if (v.timeZone !== undefined) ws.timeZone = v.timeZone;
  await em.flush();
  return present(ws);
}
