import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { DEFAULT_BAKE_RULES } from '@shared/domain/bake-rules-defaults.js';
import { toCelsiusRounded } from '@shared/domain/temperature.js';
import type {
  BakeRuleCreateValues,
  BakeRuleDto,
  BakeRuleUpdateValues,
  OvenCreateValues,
  OvenDto,
  OvenUpdateValues,
} from '@shared/schemas/bake-setup.schema.js';
import type { Actor } from '../../http/authz.js';
import { Conflict, NotFound, StaleEdit } from '../../http/errors.js';
import { BakeRule, Oven, type IBakeRule, type IOven } from './bake-run.entity.js';

/** numeric column (string) → number at the presentation edge. */
const num = (v: string | number): number => new Decimal(v).toNumber();
const dec = (v: number): string => new Decimal(v).toFixed(4);

export function presentBakeRule(r: IBakeRule): BakeRuleDto {
  return {
    id: r.id,
    category: r.category,
    label: r.label,
    tempF: num(r.tempF),
    tempC: toCelsiusRounded(r.tempF),
    minMinutes: r.minMinutes,
    maxMinutes: r.maxMinutes,
    handsOnMinutes: r.handsOnMinutes,
    toleranceF: num(r.toleranceF),
    donenessCue: r.donenessCue,
    minInternalF: r.minInternalF == null ? null : num(r.minInternalF),
    restMinutes: r.restMinutes,
    minInternalSource: r.minInternalSource ?? null,
    rackPreference: r.rackPreference as BakeRuleDto['rackPreference'],
    convectionDeltaF: num(r.convectionDeltaF),
    crowdingPct: num(r.crowdingPct),
    bakeSource: r.bakeSource,
    note: r.note,
    version: r.version,
    updatedAt: r.updatedAt.toISOString(),
  };
}

/** An oven as the bake-run scheduler takes it (numbers, °F). */
export function ovenInput(o: IOven) {
  return {
    name: o.name,
    racks: o.racks,
    traysPerRack: o.traysPerRack,
    convection: o.convection,
    heatFPerMin: num(o.heatFPerMin),
    coolFPerMin: num(o.coolFPerMin),
    maxF: num(o.maxF),
  };
}

export function presentOven(o: IOven): OvenDto {
  return {
    id: o.id,
    ...ovenInput(o),
    maxC: toCelsiusRounded(o.maxF),
    version: o.version,
    updatedAt: o.updatedAt.toISOString(),
  };
}

/**
 * Copies DEFAULT_BAKE_RULES into the workspace the first time its rules are read (never again: a deleted rule
 * stays as a row with `deletedAt`). Race-safe: concurrent first reads insert with ON CONFLICT DO NOTHING.
 */
export async function ensureBakeRules(em: EntityManager, workspaceId: number): Promise<void> {
  const count = await em.count(BakeRule, { workspace: workspaceId });
  if (count > 0) return;
  const now = new Date();
  await em
    .createQueryBuilder(BakeRule)
    .insert(
      DEFAULT_BAKE_RULES.map((d) => ({
        workspace: workspaceId,
        category: d.category,
        label: d.label,
        tempF: dec(d.tempF),
        minMinutes: d.minMinutes,
        maxMinutes: d.maxMinutes,
        handsOnMinutes: d.handsOnMinutes,
        toleranceF: dec(d.toleranceF),
        donenessCue: d.donenessCue,
        minInternalF: d.minInternalF === null ? null : dec(d.minInternalF),
        restMinutes: d.restMinutes,
        minInternalSource: d.minInternalSource,
        rackPreference: d.rackPreference,
        convectionDeltaF: dec(25),
        crowdingPct: dec(10),
        bakeSource: d.bakeSource,
        note: d.note ?? '',
        version: 1,
        createdAt: now,
        updatedAt: now,
      })),
    )
    .onConflict(['workspace', 'category'])
    .ignore()
    .execute();
}

export async function loadBakeRules(em: EntityManager, workspaceId: number): Promise<IBakeRule[]> {
  await ensureBakeRules(em, workspaceId);
  return em.find(BakeRule, { workspace: workspaceId, deletedAt: null }, { orderBy: { label: 'asc', id: 'asc' } });
}

export async function listBakeRules(em: EntityManager, actor: Actor): Promise<BakeRuleDto[]> {
  return (await loadBakeRules(em, actor.workspaceId)).map(presentBakeRule);
}

async function findRule(em: EntityManager, actor: Actor, id: number): Promise<IBakeRule> {
  const row = await em.findOne(BakeRule, { id, workspace: actor.workspaceId, deletedAt: null });
  if (!row) throw new NotFound('Bake rule');
  return row;
}

export async function getBakeRule(em: EntityManager, actor: Actor, id: number): Promise<BakeRuleDto> {
  return presentBakeRule(await findRule(em, actor, id));
}

function ruleColumns(v: BakeRuleUpdateValues) {
  return {
    label: v.label,
    tempF: dec(v.tempF),
    minMinutes: v.minMinutes,
    maxMinutes: v.maxMinutes,
    handsOnMinutes: v.handsOnMinutes,
    toleranceF: dec(v.toleranceF),
    donenessCue: v.donenessCue,
    minInternalF: v.minInternalF === null ? null : dec(v.minInternalF),
    restMinutes: v.restMinutes,
    minInternalSource: v.minInternalSource,
    rackPreference: v.rackPreference,
    convectionDeltaF: dec(v.convectionDeltaF),
    crowdingPct: dec(v.crowdingPct),
    bakeSource: v.bakeSource,
    note: v.note,
  };
}

/** A new category; a category that was deleted earlier comes back with the new values. 409 when it exists. */
export async function createBakeRule(em: EntityManager, actor: Actor, v: BakeRuleCreateValues): Promise<BakeRuleDto> {
  await ensureBakeRules(em, actor.workspaceId);
  const existing = await em.findOne(BakeRule, { workspace: actor.workspaceId, category: v.category });
  if (existing && !existing.deletedAt) {
    throw new Conflict(`A bake rule for "${v.category}" exists already: edit that one instead`, { existingId: existing.id });
  }
  const { category, ...rest } = v;
  const row = existing ?? em.create(BakeRule, { workspace: actor.workspaceId, category, ...ruleColumns({ ...rest, version: 1 }) });
  if (existing) {
    em.assign(existing, ruleColumns({ ...rest, version: existing.version }));
    existing.deletedAt = null;
  }
  await em.flush();
  return presentBakeRule(row);
}

export async function updateBakeRule(em: EntityManager, actor: Actor, id: number, v: BakeRuleUpdateValues): Promise<BakeRuleDto> {
  const row = await findRule(em, actor, id);
  if (row.version !== v.version) throw new StaleEdit(row.version, presentBakeRule(row));
  em.assign(row, ruleColumns(v));
  await em.flush();
  return presentBakeRule(row);
}

export async function deleteBakeRule(em: EntityManager, actor: Actor, id: number): Promise<void> {
  const row = await findRule(em, actor, id);
  row.deletedAt = new Date();
  await em.flush();
}

// ---- ovens ----

export async function loadOvens(em: EntityManager, workspaceId: number): Promise<IOven[]> {
  return em.find(Oven, { workspace: workspaceId }, { orderBy: { id: 'asc' } });
}

export async function listOvens(em: EntityManager, actor: Actor): Promise<OvenDto[]> {
  return (await loadOvens(em, actor.workspaceId)).map(presentOven);
}

async function findOven(em: EntityManager, actor: Actor, id: number): Promise<IOven> {
  const row = await em.findOne(Oven, { id, workspace: actor.workspaceId });
  if (!row) throw new NotFound('Oven');
  return row;
}

export async function getOven(em: EntityManager, actor: Actor, id: number): Promise<OvenDto> {
  return presentOven(await findOven(em, actor, id));
}

function ovenColumns(v: OvenCreateValues) {
  return {
    name: v.name,
    racks: v.racks,
    traysPerRack: v.traysPerRack,
    convection: v.convection,
    heatFPerMin: dec(v.heatFPerMin),
    coolFPerMin: dec(v.coolFPerMin),
    maxF: dec(v.maxF),
  };
}

async function assertNameFree(em: EntityManager, actor: Actor, name: string, exceptId?: number) {
  const other = await em.findOne(Oven, { workspace: actor.workspaceId, name });
  if (other && other.id !== exceptId) throw new Conflict(`An oven named "${name}" exists already`, { existingId: other.id });
}

export async function createOven(em: EntityManager, actor: Actor, v: OvenCreateValues): Promise<OvenDto> {
  await assertNameFree(em, actor, v.name);
  const row = em.create(Oven, { workspace: actor.workspaceId, ...ovenColumns(v) });
  await em.flush();
  return presentOven(row);
}

export async function updateOven(em: EntityManager, actor: Actor, id: number, v: OvenUpdateValues): Promise<OvenDto> {
  const row = await findOven(em, actor, id);
  if (row.version !== v.version) throw new StaleEdit(row.version, presentOven(row));
  await assertNameFree(em, actor, v.name, row.id);
  em.assign(row, ovenColumns(v));
  await em.flush();
  return presentOven(row);
}

export async function deleteOven(em: EntityManager, actor: Actor, id: number): Promise<void> {
  const row = await findOven(em, actor, id);
  await em.removeAndFlush(row);
}
