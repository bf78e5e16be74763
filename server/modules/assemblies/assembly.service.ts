import type { EntityManager } from '@mikro-orm/postgresql';
import { parseAmount } from '@shared/domain/units.js';
import type { ArchiveAssemblyValues, AssemblyDto, DeleteAssemblyDto, AssemblyValues, PlatePreviewDto, PlatePreviewValues, UpdateAssemblyValues } from '@shared/schemas/assemblies.schema.js';
import { datesOf, type Actor } from '../../http/authz.js';
import { NotFound, StaleEdit, ValidationError } from '../../http/errors.js';
import { weekTitle } from '@shared/domain/week-board.js';
import { Assembly, AssemblyItem, type IAssembly } from './assembly.entity.js';
import { presentAssembly } from './assembly.presenter.js';
import { addOnGrams, computePlateFacts, loadPlateContext, type PlateItemRow, type PlateRow } from './plate-facts.js';
import { preparedRows } from '../../db/prepared.js';

/**
 * Plates of the workspace with their items as plain rows, by name (two prepared statements; what the week board
 * reads: no entity hydration). Writes go through the Assembly entity.
 */
export async function loadPlateRows(em: EntityManager, workspaceId: number): Promise<PlateRow[]> {
  // Plates and their items side by side (both limited to the workspace).
  const [plates, items] = await Promise.all([
    preparedRows<Omit<PlateRow, 'items' | 'updatedAt'> & { updatedAt: string | Date }>(
      em,
      'trayline_plate_rows',
      `select id, name, description, assembly_steps as "assemblySteps", reheat_steps as "reheatSteps", archived, version, updated_at as "updatedAt"
         from assembly where workspace_id = $1 order by name asc, id asc`,
      [workspaceId],
    ),
    preparedRows<Omit<PlateItemRow, 'tray' | 'ingredient'> & { assembly: number; tray: number | null; ingredient: number | null }>(
      em,
      'trayline_plate_items',
      `select i.id, i.assembly_id as assembly, i.position, i.tray_id as tray, i.portions, i.ingredient_id as ingredient,
              i.amount_text as "amountText", i.amount, i.unit, i.note
         from assembly_item i join assembly a on a.id = i.assembly_id
        where a.workspace_id = $1 order by i.assembly_id asc, i.position asc, i.id asc`,
      [workspaceId],
    ),
  ]);
  if (!plates.length) return [];
  const byPlate = new Map<number, PlateItemRow[]>();
  for (const i of items) {
    let list = byPlate.get(i.assembly);
    if (!list) byPlate.set(i.assembly, (list = []));
    list.push({ ...i, tray: i.tray === null ? null : { id: i.tray }, ingredient: i.ingredient === null ? null : { id: i.ingredient } });
  }
  return plates.map((p) => ({ ...p, updatedAt: new Date(p.updatedAt), items: byPlate.get(p.id) ?? [] }));
}

/** Plates of the workspace with their items (two queries), optionally only these ids. */
export async function loadAssemblies(em: EntityManager, workspaceId: number, ids?: readonly number[]): Promise<IAssembly[]> {
  const where = ids ? { workspace: workspaceId, id: { $in: [...ids] } } : { workspace: workspaceId };
  return em.find(Assembly, where, { populate: ['items'], orderBy: { name: 'asc', id: 'asc' } });
}

export async function findAssembly(em: EntityManager, actor: Actor, id: number): Promise<IAssembly> {
  const a = await em.findOne(Assembly, { id, workspace: actor.workspaceId }, { populate: ['items'] });
  if (!a) throw new NotFound('Plate');
  return a;
}

export async function listAssemblies(em: EntityManager, actor: Actor): Promise<AssemblyDto[]> {
  const rows = await loadAssemblies(em, actor.workspaceId);
  const ctx = await loadPlateContext(em, actor, rows);
  return rows.map((a) => presentAssembly(a, ctx));
}

export async function getAssembly(em: EntityManager, actor: Actor, id: number): Promise<AssemblyDto> {
  const a = await findAssembly(em, actor, id);
  return presentAssembly(a, await loadPlateContext(em, actor, [a]));
}

/** A plate's parts as the rows plate facts read (not saved: negative ids, no plate id). */
function draftOf(v: Pick<AssemblyValues, 'trays' | 'addOns'>): PlateRow {
  const items: PlateItemRow[] = [
    ...v.trays.map((t, i) => ({ id: -1 - i, position: i, tray: { id: t.trayId }, portions: String(t.portions), amountText: '', unit: '' })),
    ...v.addOns.map((x, j) => ({
      id: -1 - v.trays.length - j,
      position: v.trays.length + j,
      ingredient: { id: x.ingredientId },
      amountText: x.amountText,
      amount: parseAmount(x.amountText).value.toString(),
      unit: x.unit,
      note: x.note ?? '',
    })),
  ];
  return { id: 0, name: '', version: 0, updatedAt: new Date(0), items };
}

/**
 * Trays must be the workspace's, add-ons usable ingredients whose amount can be weighed: checked against the plate
 * context the parts load (the trays of the workspace, the usable ingredients), which the caller may go on using.
 */
async function checkValues(em: EntityManager, actor: Actor, v: Pick<AssemblyValues, 'trays' | 'addOns'>) {
  const draft = draftOf(v);
  const ctx = await loadPlateContext(em, actor, [draft]);
  const errors: Record<string, string[]> = {};
  v.trays.forEach((t, i) => {
    if (!ctx.trays.has(t.trayId)) errors[`trays.${i}.trayId`] = ['This base tray does not exist in your workspace'];
  });
  const addOnRows = draft.items.filter((i) => i.ingredient);
  v.addOns.forEach((a, i) => {
    const ing = ctx.ingredients.get(a.ingredientId);
    if (!ing) {
      errors[`addOns.${i}.ingredientId`] = ['This ingredient does not exist in your library'];
      return;
    }
    if (addOnGrams(addOnRows[i]!, ctx) === null) errors[`addOns.${i}.unit`] = [`${ing.name} has no weight for "${a.unit}": pick grams or a unit it knows`];
  });
  if (Object.keys(errors).length) throw new ValidationError(Object.values(errors)[0][0], errors);
  return { draft, addOnRows, ctx };
}

function writeItems(em: EntityManager, a: IAssembly, v: AssemblyValues) {
  let position = 0;
  for (const t of v.trays) {
    em.create(AssemblyItem, { assembly: a, position: position++, tray: t.trayId, portions: String(t.portions) } as never);
  }
  for (const x of v.addOns) {
    em.create(AssemblyItem, {
      assembly: a,
      position: position++,
      ingredient: x.ingredientId,
      amountText: x.amountText,
      amount: parseAmount(x.amountText).value.toString(),
      unit: x.unit,
      note: x.note ?? '',
    } as never);
  }
}

/**
 * The numbers of a plate being edited, before it is saved: the same checks and facts as a saved plate (a 400 names
 * the part that cannot be used), nothing written. Computed without the facts memo: a draft is asked once.
 */
export async function previewAssembly(em: EntityManager, actor: Actor, v: PlatePreviewValues): Promise<PlatePreviewDto> {
  const { draft, addOnRows, ctx } = await checkValues(em, actor, v);
  const facts = computePlateFacts(draft, ctx);
  return {
    macros: facts.macros,
    allergens: facts.allergens,
    complete: facts.complete,
    addOnGrams: addOnRows.map((i) => addOnGrams(i, ctx)?.toDecimalPlaces(1).toNumber() ?? null),
  };
}

export async function createAssembly(em: EntityManager, actor: Actor, v: AssemblyValues): Promise<AssemblyDto> {
  await checkValues(em, actor, v);
  const id = await em.transactional(async (tx) => {
    const a = tx.create(Assembly, {
      workspace: actor.workspaceId,
      name: v.name,
      description: v.description,
      assemblySteps: v.assemblySteps,
      reheatSteps: v.reheatSteps,
    } as never) as IAssembly;
    writeItems(tx, a, v);
    await tx.flush();
    return a.id;
  });
  return getAssembly(em, actor, id);
}

export async function updateAssembly(em: EntityManager, actor: Actor, id: number, v: UpdateAssemblyValues): Promise<AssemblyDto> {
  const a = await findAssembly(em, actor, id);
  if (a.version !== v.version) throw new StaleEdit(a.version, await getAssembly(em, actor, id));
  await checkValues(em, actor, v);
  await em.transactional(async (tx) => {
    await tx.nativeDelete(AssemblyItem, { assembly: id });
    const row = await tx.findOneOrFail(Assembly, { id, workspace: actor.workspaceId });
    row.name = v.name;
    row.description = v.description;
    row.assemblySteps = [...v.assemblySteps];
    row.reheatSteps = [...v.reheatSteps];
    row.updatedAt = new Date(); // a change of items alone still bumps the version
    writeItems(tx, row, v);
    await tx.flush();
  });
  em.clear();
  return getAssembly(em, actor, id);
}

/** Archives a plate (out of the plates list and the board's pickers) or restores it; a stale version is a 409. */
export async function archiveAssembly(em: EntityManager, actor: Actor, id: number, v: ArchiveAssemblyValues): Promise<AssemblyDto> {
  const a = await findAssembly(em, actor, id);
  if (a.version !== v.version) throw new StaleEdit(a.version, await getAssembly(em, actor, id));
  if (a.archived !== v.archived) {
    a.archived = v.archived;
    a.updatedAt = new Date();
    await em.flush();
  }
  return getAssembly(em, actor, id);
}

/** The weeks whose boards plan a plate, earliest first, with how many meals each. */
async function plateUses(em: EntityManager, workspaceId: number, assemblyId: number) {
  return em.getConnection().execute<{ name: string | null; startDate: string; meals: number }[]>(
    `select w.name, w.start_date as "startDate", count(*)::int as meals
       from week_cell c join week w on w.id = c.week_id
      where c.assembly_id = ? and w.workspace_id = ?
      group by w.id, w.name, w.start_date order by w.start_date asc`,
    [assemblyId, workspaceId],
    'all',
    em.getTransactionContext(),
  );
}

/**
 * Deletes a plate no week plans. A plate on a board (a past week's too: clients' published plans name it) is archived
 * instead, and the answer says where it is planned.
 */
export async function deleteAssembly(em: EntityManager, actor: Actor, id: number): Promise<DeleteAssemblyDto | null> {
  const a = await findAssembly(em, actor, id);
  const uses = await plateUses(em, actor.workspaceId, a.id);
  if (uses.length) {
    const meals = uses.reduce((n, u) => n + u.meals, 0);
    const weeks = uses.map((u) => weekTitle(u, datesOf(actor))).join(', ');
    if (!a.archived) {
      a.archived = true;
      a.updatedAt = new Date();
      await em.flush();
    }
    return {
      archived: true,
      plannedOn: `${meals} meal${meals === 1 ? '' : 's'} on ${uses.length === 1 ? 'the board of' : 'the boards of'} ${weeks}`,
      plate: await getAssembly(em, actor, a.id),
    };
  }
  await em.transactional(async (tx) => {
    await tx.nativeDelete(AssemblyItem, { assembly: a.id });
    await tx.nativeDelete(Assembly, { id: a.id, workspace: actor.workspaceId });
  });
  return null;
}
