import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { energyShares, toNutrientNumbers } from '@shared/domain/nutrition.js';
import { panOf, planScale, portionAreaOf, portionSizeText, portionsOf, SCALE_ROUNDING_NOTE, type ScaleRequest } from '@shared/domain/tray-plan.js';
import { scaleLines } from '@shared/domain/scaling.js';
import { formatKitchenAmount, formatPieces, parseAmount, unitKind, UnitConversionError, amountWithUnit } from '@shared/domain/units.js';
import type {
  PortionCardDto,
  ScaleResultDto,
  TrayDto,
  TraySummaryDto,
  TrayValues,
} from '@shared/schemas/trays.schema.js';
import type { listTraysQuerySchema, scaleTraySchema, updateTraySchema } from '@shared/schemas/trays.schema.js';
import type { z } from 'zod';
import type { Actor } from '../../http/authz.js';
import { NotFound, StaleEdit, ValidationError } from '../../http/errors.js';
import { User } from '../auth/user.entity.js';
import { Tray, TrayLine, TrayPhoto, type ITray, type ITrayPhoto } from './tray.entity.js';
import {
  cutPlanOf,
  nutritionLines,
  presentPan,
  presentSummary,
  presentTray,
  storedPanOf,
  linesOf,
} from './tray.presenter.js';
import {
  gramsOfLine,
  loadTrayIngredients,
  netCarbRuleOf,
  trayAllergens,
  trayCost,
  trayNutrition,
  type TrayIngredient,
} from './tray-nutrition.js';
import { removePhotoFiles } from './tray-photo.service.js';
import { publishedTrayIdsForClient, trayInUse } from '../weeks/week-publish.service.js';

type ListQuery = z.output<typeof listTraysQuerySchema>;
type UpdateValues = z.output<typeof updateTraySchema>;
type ScaleValues = z.output<typeof scaleTraySchema>;

// ---------------------------------------------------------------------------------------------------------------
// Hooks for the week board
// ---------------------------------------------------------------------------------------------------------------

/** Ids of the trays in the signed-in client's own published plans (the weeks module reads the publications). */
export async function trayIdsInClientPlan(em: EntityManager, actor: Actor): Promise<number[]> {
  return publishedTrayIdsForClient(em, actor);
}

/** Whether a plate or a prep week uses this tray. A used tray is archived on DELETE, never deleted. */
export async function trayIsUsedByPlan(em: EntityManager, actor: Actor, trayId: number): Promise<boolean> {
  return trayInUse(em, actor.workspaceId, trayId);
}

// ---------------------------------------------------------------------------------------------------------------
// Reading
// ---------------------------------------------------------------------------------------------------------------

/** Loads a tray of the actor's workspace with its lines; a client only sees trays in their own plan. */
export async function findTray(em: EntityManager, actor: Actor, id: number): Promise<ITray> {
  if (actor.role === 'client' && !(await trayIdsInClientPlan(em, actor)).includes(id)) throw new NotFound('Tray');
  const tray = await em.findOne(Tray, { id, workspace: actor.workspaceId }, { populate: ['lines'] });
  if (!tray) throw new NotFound('Tray');
  return tray;
}

async function photosOf(em: EntityManager, trayIds: number[]): Promise<Map<number, ITrayPhoto>> {
  if (!trayIds.length) return new Map();
  const rows = await em.find(TrayPhoto, { tray: { $in: trayIds } });
  return new Map(rows.map((p) => [p.tray.id, p]));
}

async function ingredientsOfTrays(em: EntityManager, actor: Actor, trays: ITray[]) {
  return loadTrayIngredients(
    em,
    actor,
    trays.flatMap((t) => linesOf(t).map((l) => l.ingredient.id)),
  );
}

export async function getTray(em: EntityManager, actor: Actor, id: number): Promise<TrayDto> {
  const tray = await findTray(em, actor, id);
  const [ingredients, photos] = await Promise.all([ingredientsOfTrays(em, actor, [tray]), photosOf(em, [tray.id])]);
  return presentTray(tray, ingredients, photos.get(tray.id));
}

/** The library: filters on archived, text, tag, allergens the tray is free of, and net carbs per portion. */
export async function listTrays(em: EntityManager, actor: Actor, query: ListQuery): Promise<TraySummaryDto[]> {
  const where: Record<string, unknown> = { workspace: actor.workspaceId };
  if (actor.role === 'client') where.id = { $in: await trayIdsInClientPlan(em, actor) };
  if (query.archived !== 'all') where.archived = query.archived === 'true';
  if (query.q) where.name = { $ilike: `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%` };
  const trays = await em.find(Tray, where, { populate: ['lines'], orderBy: { name: 'asc', id: 'asc' } });
  const [ingredients, photos, rule] = await Promise.all([
    ingredientsOfTrays(em, actor, trays),
    photosOf(em, trays.map((t) => t.id)),
    netCarbRuleOf(em, actor),
  ]);
  return trays
    .filter((t) => !query.tag || (t.tags ?? []).includes(query.tag))
    .map((t) => presentSummary(t, ingredients, photos.get(t.id), rule))
    .filter((s) => !query.freeOf?.length || query.freeOf.every((a) => !s.allergens.includes(a)))
    .filter((s) => query.maxNetCarbs === undefined || (s.perPortion !== null && s.perPortion.netCarbsG <= query.maxNetCarbs));
}

// ---------------------------------------------------------------------------------------------------------------
// Writing
// ---------------------------------------------------------------------------------------------------------------

/** Every line's ingredient must be usable by the workspace, and its unit convertible to grams. */
function checkLines(values: TrayValues, ingredients: Map<number, TrayIngredient>): void {
  const errors: Record<string, string[]> = {};
  values.lines.forEach((line, i) => {
    const ing = ingredients.get(line.ingredientId);
    if (!ing) {
      errors[`lines.${i}.ingredientId`] = ['This ingredient does not exist in your library'];
      return;
    }
    try {
      const grams = gramsOfLine({ ingredientId: line.ingredientId, amount: parseAmount(line.amountText).value, unit: line.unit }, ing);
      if (grams === null) throw new UnitConversionError(ing.name, 'density', '');
    } catch {
      const kind = unitKind(line.unit);
      errors[`lines.${i}.unit`] = [
        kind === 'volume'
          ? `${ing.name} has no density, so "${line.unit}" cannot be weighed: use a weight unit`
          : `${ing.name} has no weight for one "${line.unit}": use a weight unit or a piece it knows (${Object.keys(ing.facts.pieceWeights ?? {}).join(', ') || 'none'})`,
      ];
    }
  });
  if (Object.keys(errors).length) throw new ValidationError(`Check ${Object.keys(errors).join(', ')}`, errors);
}

function assignFields(tray: ITray, v: TrayValues): void {
  tray.name = v.name;
  tray.description = v.description;
  tray.panCode = v.pan.code;
  tray.panLength = v.pan.code === 'custom' ? new Decimal(v.pan.length!).toFixed() : null;
  tray.panWidth = v.pan.code === 'custom' ? new Decimal(v.pan.width!).toFixed() : null;
  tray.panUnit = v.pan.code === 'custom' ? v.pan.unit : 'in';
  tray.panLining = v.panLining;
  tray.bakeCategory = v.bake.category;
  tray.bakeTempF = v.bake.tempF;
  tray.bakeMinMinutes = v.bake.minMinutes;
  tray.bakeMaxMinutes = v.bake.maxMinutes;
  tray.yieldFactor = new Decimal(v.yieldFactor).toFixed();
  tray.cutKind = v.cutPlan.kind;
  tray.cutRows = v.cutPlan.kind === 'grid' ? v.cutPlan.rows : null;
  tray.cutColumns = v.cutPlan.kind === 'grid' ? v.cutPlan.columns : null;
  tray.cutPieces = v.cutPlan.kind === 'pieces' ? v.cutPlan.pieces : null;
  tray.fridgeDays = v.storage.fridgeDays;
  tray.freezerWeeks = v.storage.freezerWeeks;
  tray.reheatSteps = v.reheatSteps;
  tray.tags = v.tags;
}

function addLines(em: EntityManager, tray: ITray, v: TrayValues): void {
  v.lines.forEach((line, i) => {
    tray.lines.add(
      em.create(TrayLine, {
        tray,
        position: i + 1,
        ingredient: line.ingredientId,
        amountText: line.amountText,
        amount: parseAmount(line.amountText).value.toFixed(),
        unit: line.unit,
        note: line.note,
      }),
    );
  });
}

export interface CreateOptions {
  isDemo?: boolean;
}

export async function createTray(em: EntityManager, actor: Actor, values: TrayValues, opts: CreateOptions = {}): Promise<TrayDto> {
  const ingredients = await loadTrayIngredients(em, actor, values.lines.map((l) => l.ingredientId));
  checkLines(values, ingredients);
  const id = await em.transactional(async (tx) => {
    const tray = tx.create(Tray, {
      workspace: actor.workspaceId,
      name: values.name,
      panCode: values.pan.code,
      bakeCategory: values.bake.category,
      bakeTempF: values.bake.tempF,
      bakeMinMinutes: values.bake.minMinutes,
      bakeMaxMinutes: values.bake.maxMinutes,
      fridgeDays: values.storage.fridgeDays,
      freezerWeeks: values.storage.freezerWeeks,
      isDemo: opts.isDemo ?? false,
    } as never) as ITray;
    assignFields(tray, values);
    addLines(tx, tray, values);
    await tx.flush();
    return tray.id;
  });
  return getTray(em, actor, id);
}

/** A full update from the version the person started from; a stale version answers 409 with the current record. */
export async function updateTray(em: EntityManager, actor: Actor, id: number, values: UpdateValues): Promise<TrayDto> {
  const current = await findTray(em, actor, id);
  if (current.version !== values.version) throw new StaleEdit(current.version, await getTray(em, actor, id));
  const ingredients = await loadTrayIngredients(em, actor, values.lines.map((l) => l.ingredientId));
  checkLines(values, ingredients);
  await em.transactional(async (tx) => {
    const tray = await tx.findOneOrFail(Tray, { id, workspace: actor.workspaceId }, { populate: ['lines'] });
    if (tray.version !== values.version) throw new StaleEdit(tray.version);
    assignFields(tray, values);
    if (values.archived !== undefined) tray.archived = values.archived;
    const old = tray.lines.getItems();
    tray.lines.removeAll();
    for (const line of old) tx.remove(line);
    addLines(tx, tray, values);
    // Lines alone do not make the tray row dirty: touch it so its version moves on every save.
    tray.updatedAt = new Date();
    await tx.flush();
  });
  em.clear();
  return getTray(em, actor, id);
}

/** Deletes a tray no plan uses; a used tray is archived instead. */
export async function deleteTray(
  em: EntityManager,
  actor: Actor,
  id: number,
  filesDir: string,
): Promise<{ archived: boolean }> {
  const tray = await findTray(em, actor, id);
  if (await trayIsUsedByPlan(em, actor, id)) {
    tray.archived = true;
    await em.flush();
    return { archived: true };
  }
  const photo = await em.findOne(TrayPhoto, { tray: id });
  await em.transactional(async (tx) => {
    await tx.nativeDelete(TrayPhoto, { tray: id });
    await tx.nativeDelete(TrayLine, { tray: id });
    await tx.nativeDelete(Tray, { id, workspace: actor.workspaceId });
  });
  if (photo) await removePhotoFiles(photo, filesDir);
  return { archived: false };
}

/** A copy named "… (copy)", active, with the same lines; the photo is not copied. */
export async function duplicateTray(em: EntityManager, actor: Actor, id: number): Promise<TrayDto> {
  const source = await getTray(em, actor, id);
  const values: TrayValues = {
    name: `${source.name} (copy)`.slice(0, 120),
    description: source.description,
    lines: source.lines.map((l) => ({ ingredientId: l.ingredientId, amountText: l.amountText, unit: l.unit, note: l.note })),
    pan:
      source.pan.code === 'custom'
        ? { code: 'custom', length: source.pan.length, width: source.pan.width, unit: source.pan.unit }
        : { code: source.pan.code, unit: 'in' },
    panLining: source.panLining,
    bake: { category: source.bake.category, tempF: source.bake.tempF, minMinutes: source.bake.minMinutes, maxMinutes: source.bake.maxMinutes },
    yieldFactor: source.yieldFactor,
    cutPlan: source.cutPlan,
    storage: source.storage,
    reheatSteps: source.reheatSteps,
    tags: source.tags,
  };
  return createTray(em, actor, values);
}

// ---------------------------------------------------------------------------------------------------------------
// Portion card and scaling
// ---------------------------------------------------------------------------------------------------------------

export async function portionCard(em: EntityManager, actor: Actor, id: number): Promise<PortionCardDto> {
  const tray = await findTray(em, actor, id);
  const [ingredients, rule] = await Promise.all([ingredientsOfTrays(em, actor, [tray]), netCarbRuleOf(em, actor)]);
  const cut = cutPlanOf(tray);
  const portions = portionsOf(cut);
  const lines = nutritionLines(tray);
  const exact = trayNutrition(lines, ingredients, { portions, yieldFactor: tray.yieldFactor, rule });
  if (!exact) throw new ValidationError('A line cannot be weighed', { lines: ['A line cannot be turned into grams; fix its unit'] });
  const pan = panOf(storedPanOf(tray));
  const cost = trayCost(lines, ingredients);
  const perPortion = toNutrientNumbers(exact.perPortion);
  return {
    trayId: tray.id,
    name: tray.name,
    portions,
    gramsPerPortion: perPortion.massG,
    portionSize: portionSizeText(pan, cut),
    portionArea: portionAreaOf(pan, cut).toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toNumber(),
    areaUnit: pan.unit === 'in' ? 'in²' : 'cm²',
    perPortion,
    total: toNutrientNumbers(exact.total),
    energyShares: energyShares(exact.perPortion),
    costPerPortionCents: cost.totalCents
      ? cost.totalCents.div(portions).toDecimalPlaces(0, Decimal.ROUND_HALF_UP).toNumber()
      : null,
    unpricedIngredients: cost.unpriced,
    netCarbRule: rule.kind,
    allergens: trayAllergens(lines, ingredients),
  };
}

/** A scaled line in kitchen units: weights as weights, volumes as volumes, pieces as pieces (to the nearest ¼). */
function kitchenText(amount: Decimal, unit: string, grams: Decimal | null, ing: TrayIngredient | undefined, system: 'us' | 'metric'): string {
  const kind = unitKind(unit);
  if (kind === 'count') return formatPieces(amount, unit).text;
  if (grams && ing) {
    try {
      return formatKitchenAmount(grams, ing.facts, { system, measure: kind }).text;
    } catch (e) {
      if (!(e instanceof UnitConversionError)) throw e;
    }
  }
  return `${amount.toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toString()} ${unit}`;
}

/** Stateless: the tray's lines scaled by a factor, to whole trays for a portion count, or to another pan. */
export async function scaleTray(em: EntityManager, actor: Actor, id: number, input: ScaleValues): Promise<ScaleResultDto> {
  const tray = await findTray(em, actor, id);
  const ingredients = await ingredientsOfTrays(em, actor, [tray]);
  const system = input.system ?? ((await em.findOneOrFail(User, actor.userId)).unitSystem as 'us' | 'metric');
  const from = panOf(storedPanOf(tray));
  const portions = portionsOf(cutPlanOf(tray));
  const req: ScaleRequest =
    input.factor !== undefined
      ? { mode: 'factor', factor: new Decimal(input.factor) }
      : input.targetPortions !== undefined
        ? { mode: 'targetPortions', targetPortions: input.targetPortions }
        : { mode: 'pan', pan: panOf({ code: input.pan!.code, length: input.pan!.length, width: input.pan!.width, unit: input.pan!.unit }) };
  const plan = planScale(from, portions, req);
  const source = linesOf(tray);
  const scaled = scaleLines(
    source.map((l) => ({ line: l, amount: l.amount })),
    plan.factor,
  );
  return {
    mode: req.mode,
    factor: plan.factor.toDecimalPlaces(4, Decimal.ROUND_HALF_UP).toNumber(),
    system,
    trays: plan.trays?.trays ?? null,
    portionsBaked: plan.trays?.portionsBaked ?? null,
    spare: plan.trays?.spare ?? null,
    pan: plan.pan ? presentPan(plan.pan) : null,
    portionsAtSameSize: plan.portionsAtSameSize,
    lines: scaled.map(({ line, amount }) => {
      const ing = ingredients.get(line.ingredient.id);
      const grams = gramsOfLine({ ingredientId: line.ingredient.id, amount, unit: line.unit }, ing);
      const display = kitchenText(amount, line.unit, grams, ing, system);
      return {
        ingredientId: line.ingredient.id,
        ingredientName: ing?.name ?? 'Unknown ingredient',
        originalText: amountWithUnit(line.amountText, line.unit),
        unit: line.unit,
        amount: amount.toDecimalPlaces(4, Decimal.ROUND_HALF_UP).toNumber(),
        grams: grams ? grams.toDecimalPlaces(1, Decimal.ROUND_HALF_UP).toNumber() : null,
        display,
        note: line.note,
      };
    }),
    roundingNote: SCALE_ROUNDING_NOTE,
  };
}
