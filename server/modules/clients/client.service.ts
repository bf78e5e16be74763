import type { EntityManager } from '@mikro-orm/postgresql';
import type { Actor } from '../../http/authz.js';
import { NotFound, StaleEdit, ValidationError } from '../../http/errors.js';
import type { CreateClientData, UpdateClientData, ClientListItemDto } from '@shared/schemas/clients.schema.js';
import { Invitation, Membership } from '../auth/user.entity.js';
import { preparedRows } from '../../db/prepared.js';
import { Client, type ClientFacts, type IClient } from './client.entity.js';
import { presentClient, presentClientSelf, presentClientSummary } from './client.presenter.js';

/** A workspace's meal slots as stored; breakfast alone when none are set. */
export const mealSlotsFrom = (stored: string[] | null | undefined): string[] => (stored?.length ? stored : ['breakfast']);

export async function mealSlotsOf(em: EntityManager, workspaceId: number): Promise<string[]> {
  const [ws] = await preparedRows<{ mealSlots: string[] | null }>(em, 'trayline_meal_slots', 'select meal_slots as "mealSlots" from workspace where id = $1', [workspaceId]);
  if (!ws) throw new NotFound('Workspace');
  return mealSlotsFrom(ws.mealSlots);
}

/** The client profile an actor may read: coach any in the workspace, a client only their own; else NotFound. */
export async function findClient(em: EntityManager, actor: Actor, id: number): Promise<IClient> {
  if (actor.role === 'client' && actor.clientId !== id) throw new NotFound('Client');
  const row = await em.findOne(Client, { id, workspace: actor.workspaceId });
  if (!row) throw new NotFound('Client');
  return row;
}

/**
 * The clients a week's board shows, as plain rows, by name: every client not archived, and an archived one who has
 * plates on that week (a past week keeps the people it fed). Plain rows because a board holds every client, and
 * hydrating each as a managed entity cost more than computing the board. One prepared statement; writes go
 * through the Client entity.
 */
export async function loadClientFacts(em: EntityManager, workspaceId: number, weekId: number): Promise<ClientFacts[]> {
  return preparedRows<ClientFacts>(
    em,
    'trayline_client_facts',
    `select id, name, email, household_multiplier as "householdMultiplier", sex, age_years as "ageYears",
            height_cm as "heightCm", weight_kg as "weightKg", activity, goal, goal_adjustment as "goalAdjustment",
            net_carb_cap_g as "netCarbCapG", protein_g_per_kg as "proteinGPerKg", target_mode as "targetMode",
            manual_targets as "manualTargets", slot_shares as "slotShares", allergens, dislikes,
            archived_at as "archivedAt", version
       from client
      where workspace_id = $1
        and (archived_at is null or exists (select 1 from week_cell wc where wc.week_id = $2 and wc.client_id = client.id))
      order by name asc, id asc`,
    [workspaceId, weekId],
  );
}

/** Clients of the workspace as entities, by name (one query), optionally only these ids. */
export async function loadClients(em: EntityManager, workspaceId: number, ids?: readonly number[]): Promise<IClient[]> {
  const where = ids ? { workspace: workspaceId, id: { $in: [...ids] } } : { workspace: workspaceId };
  return em.find(Client, where, { orderBy: { name: 'asc', id: 'asc' } });
}

async function accounts(em: EntityManager, workspaceId: number, ids: number[]) {
  const map = new Map<number, { email: string; name: string }>();
  if (!ids.length) return map;
  const rows = await em.find(
    Membership,
    { workspace: workspaceId, role: 'client', clientId: { $in: ids } },
    { populate: ['user'] },
  );
  for (const m of rows) if (m.clientId) map.set(m.clientId, { email: m.user.unwrap().email, name: m.user.unwrap().name });
  return map;
}

/** The newest open invitation (not accepted, not expired) to each of these client profiles. */
async function openInvitations(em: EntityManager, workspaceId: number, ids: number[]) {
  const map = new Map<number, { email: string; expiresAt: Date }>();
  if (!ids.length) return map;
  const rows = await em.find(
    Invitation,
    { workspace: workspaceId, role: 'client', clientId: { $in: ids }, acceptedAt: null, expiresAt: { $gt: new Date() } },
    { orderBy: { createdAt: 'desc', id: 'desc' } },
  );
  for (const i of rows) if (i.clientId && !map.has(i.clientId)) map.set(i.clientId, { email: i.email, expiresAt: i.expiresAt });
  return map;
}

export async function listClients(em: EntityManager, actor: Actor): Promise<ClientListItemDto[]> {
  const rows = await loadClients(em, actor.workspaceId);
  if (actor.role !== 'coach') return rows.map(presentClientSummary);
  const slots = await mealSlotsOf(em, actor.workspaceId);
  const ids = rows.map((r) => r.id);
  const [acc, inv] = await Promise.all([accounts(em, actor.workspaceId, ids), openInvitations(em, actor.workspaceId, ids)]);
  return rows.map((r) => presentClient(r, slots, acc.get(r.id) ?? null, inv.get(r.id) ?? null));
}

export async function getClient(em: EntityManager, actor: Actor, id: number) {
  const row = await findClient(em, actor, id);
  const slots = await mealSlotsOf(em, actor.workspaceId);
  if (actor.role === 'client') return presentClientSelf(row, slots);
  const [acc, inv] = await Promise.all([accounts(em, actor.workspaceId, [row.id]), openInvitations(em, actor.workspaceId, [row.id])]);
  return presentClient(row, slots, acc.get(row.id) ?? null, inv.get(row.id) ?? null);
}

/** A profile's stored columns from the form's values (only those given). */
export function clientRowFields(input: Partial<CreateClientData>) {
  const out: Partial<IClient> = {};
  const keys = [
    'name', 'email', 'householdMultiplier', 'sex', 'ageYears', 'heightCm', 'weightKg', 'activity', 'goal',
    'netCarbCapG', 'proteinGPerKg', 'targetMode', 'manualTargets', 'slotShares', 'allergens', 'dislikes', 'healthNotes',
  ] as const;
  for (const k of keys) if (input[k] !== undefined) (out as Record<string, unknown>)[k] = input[k];
  if (input.goalAdjustment !== undefined) out.goalAdjustment = input.goalAdjustment === null ? null : String(input.goalAdjustment);
  return out;
}

/** A new profile of the workspace from the form's values (written at the next flush): the form and the import. */
export function newClientRow(em: EntityManager, workspaceId: number, input: CreateClientData): IClient {
  return em.create(Client, {
    workspace: workspaceId,
    slotShares: {},
    allergens: [],
    dislikes: [],
    healthNotes: '',
    ...clientRowFields(input),
  } as never) as IClient;
}

export async function createClient(em: EntityManager, actor: Actor, input: CreateClientData) {
  const row = newClientRow(em, actor.workspaceId, input);
  await em.flush();
  return getClient(em, actor, row.id);
}

export async function updateClient(em: EntityManager, actor: Actor, id: number, input: UpdateClientData) {
  const row = await findClient(em, actor, id);
  if (row.version !== input.version) {
    throw new StaleEdit(row.version, await getClient(em, actor, id));
  }
  const next = clientRowFields(input);
  const mode = next.targetMode ?? row.targetMode;
  const manual = next.manualTargets !== undefined ? next.manualTargets : row.manualTargets;
  if (mode === 'manual' && !manual) {
    throw ValidationError.field('manualTargets', 'Type the daily targets, or let Trayline compute them');
  }
  em.assign(row, next);
  // Archiving keeps the first date; restoring clears it.
  if (input.archived === true && !row.archivedAt) row.archivedAt = new Date();
  if (input.archived === false) row.archivedAt = null;
  await em.flush();
  return getClient(em, actor, id);
}

export async function deleteClient(em: EntityManager, actor: Actor, id: number) {
  const row = await findClient(em, actor, id);
  await em.transactional(async (tx) => {
    await tx.nativeUpdate(Membership, { workspace: actor.workspaceId, clientId: id }, { clientId: null });
    await tx.nativeDelete(Client, { id: row.id, workspace: actor.workspaceId });
  });
}
