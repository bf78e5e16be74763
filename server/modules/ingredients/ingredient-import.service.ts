import Papa from 'papaparse';
import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { allergenFromWord } from '@shared/domain/allergens.js';
import { readRow } from '@shared/schemas/csv-import.js';
import {
  crossCheck,
  IMPORT_COLUMNS,
  ingredientFields,
  ingredientInputSchema,
  REQUIRED_IMPORT_COLUMNS,
  type ImportColumn,
  type ImportProblem,
  type ImportResultDto,
  type IngredientValues,
} from '@shared/schemas/ingredients.schema.js';
import type { Actor } from '../../http/authz.js';
import { cellOf, csvText, dedupe, ImportRejected, plainDecimal, readCsv, splitList } from '../../lib/csv-import.js';
import { Ingredient, type IIngredient } from './ingredient.entity.js';
import { ownNames, rowData } from './ingredient.service.js';

/**
 * CSV import of workspace-own ingredients: every row is checked first with the same zod schema as the form;
 * when any row fails, nothing is written and the answer is a 400 with a row-level report (line, column,
 * reason). Otherwise all rows are created in ONE transaction.
 */
export const MAX_IMPORT_ROWS = 2000;

/** Field path of the schema → CSV column. */
const FIELD_COLUMNS: Record<string, ImportColumn> = {
  name: 'name',
  category: 'category',
  kcal: 'kcal',
  fatG: 'fat_g',
  satFatG: 'sat_fat_g',
  proteinG: 'protein_g',
  carbsG: 'carbs_g',
  fiberG: 'fiber_g',
  sugarsG: 'sugars_g',
  erythritolG: 'erythritol_g',
  alluloseG: 'allulose_g',
  otherPolyolsG: 'other_polyols_g',
  sodiumMg: 'sodium_mg',
  densityGPerMl: 'density_g_per_ml',
  densitySource: 'density_g_per_ml',
  pieceWeights: 'piece_weights',
  allergens: 'allergens',
  'purchase.amount': 'purchase_amount',
  'purchase.unit': 'purchase_unit',
  'purchase.label': 'purchase_label',
  priceCents: 'price_cents',
  aisle: 'aisle',
  source: 'source',
  note: 'note',
};

function columnOf(path: readonly PropertyKey[]): string {
  const [a, b] = path.map(String);
  if (a === 'purchase' && b) return FIELD_COLUMNS[`purchase.${b}`] ?? 'purchase_unit';
  return FIELD_COLUMNS[a] ?? a ?? 'row';
}

/** One CSV record → the input object of the form schema (cells as text; the schema does the checking). */
function toInput(rec: Record<string, string>, line: number, problems: ImportProblem[]) {
  const cell = (c: ImportColumn) => cellOf(rec, c);
  const pieceWeights = splitList(cell('piece_weights')).map((part) => {
    const m = /^(.+?)\s*[:=]\s*(.+)$/.exec(part);
    if (!m) {
      problems.push({ line, column: 'piece_weights', reason: `"${part}" is not "name:grams" (e.g. large:50; slice:28)` });
      return { name: part, grams: '1' };
    }
    return { name: m[1], grams: m[2] };
  });
  const allergens = splitList(cell('allergens')).map((word) => {
    return allergenFromWord(word) ?? word;
  });
  const hasPurchase = cell('purchase_amount') || cell('purchase_unit') || cell('purchase_label');
  return {
    name: cell('name'),
    category: cell('category').toLowerCase(),
    kcal: cell('kcal'),
    fatG: cell('fat_g'),
    satFatG: cell('sat_fat_g'),
    proteinG: cell('protein_g'),
    carbsG: cell('carbs_g'),
    fiberG: cell('fiber_g'),
    sugarsG: cell('sugars_g'),
    erythritolG: cell('erythritol_g'),
    alluloseG: cell('allulose_g'),
    otherPolyolsG: cell('other_polyols_g'),
    sodiumMg: cell('sodium_mg'),
    densityGPerMl: cell('density_g_per_ml'),
    densitySource: cell('density_g_per_ml') ? 'CSV import' : null,
    pieceWeights,
    allergens,
    purchase: hasPurchase
      ? { amount: cell('purchase_amount'), unit: cell('purchase_unit'), label: cell('purchase_label') }
      : null,
    priceCents: cell('price_cents'),
    aisle: cell('aisle').toLowerCase(),
    source: cell('source'),
    note: cell('note'),
  };
}

/**
 * Checks every row; returns the values to write, or the full report of problems. A name already in the library
 * (`existingNames`, lower case) is a problem unless the import updates those rows (`existingNames` then empty).
 */
export function checkCsv(text: string, existingNames: Set<string>): { values: IngredientValues[]; report: ImportProblem[] } {
  const { records, report } = readCsv(text, {
    columns: IMPORT_COLUMNS,
    required: REQUIRED_IMPORT_COLUMNS,
    maxRows: MAX_IMPORT_ROWS,
    nouns: 'ingredients',
  });
  const values: IngredientValues[] = [];
  const seen = new Map<string, number>();
  for (const { line, cells } of records) {
    const rowProblems: ImportProblem[] = [];
    // Field problems and the checks between the fields that read, in one pass.
    const parsed = readRow(ingredientFields, ingredientInputSchema, crossCheck, toInput(cells, line, rowProblems));
    if (!parsed.success) {
      for (const issue of parsed.issues) rowProblems.push({ line, column: columnOf(issue.path), reason: issue.message });
    } else {
      const key = parsed.data.name.toLowerCase();
      if (existingNames.has(key)) rowProblems.push({ line, column: 'name', reason: `Your library already has "${parsed.data.name}"`, code: 'name_taken' });
      else if (seen.has(key)) rowProblems.push({ line, column: 'name', reason: `Same name as line ${seen.get(key)}` });
      seen.set(key, line);
      values.push(parsed.data);
    }
    report.push(...dedupe(rowProblems));
  }
  return { values, report };
}

/** What the import does with a row named like an ingredient already in the workspace's library. */
export type ImportExisting = 'refuse' | 'update';

const DECIMAL_FIELDS = [
  'kcal', 'fatG', 'satFatG', 'proteinG', 'carbsG', 'fiberG', 'sugarsG', 'erythritolG', 'alluloseG', 'otherPolyolsG',
  'sodiumMg', 'densityGPerMl', 'purchaseAmount',
] as const;
const TEXT_FIELDS = ['name', 'category', 'purchaseUnit', 'purchaseLabel', 'aisle', 'source', 'note'] as const;

type RowData = ReturnType<typeof rowData>;

const sameDecimal = (a: string | number | null | undefined, b: string | number | null | undefined) =>
  a === null || a === undefined || b === null || b === undefined ? (a ?? null) === (b ?? null) : new Decimal(a).eq(b);

/**
 * Whether a row of the file says anything the stored ingredient does not: numbers compared as numbers ("0.95" is
 * 0.9500), piece weights and allergens as sets, a blank text as no text. The density's source is not in the file.
 */
export function differsFrom(row: IIngredient, data: RowData): boolean {
  if (DECIMAL_FIELDS.some((f) => !sameDecimal(row[f], data[f]))) return true;
  if (TEXT_FIELDS.some((f) => (row[f] ?? '') !== (data[f] ?? ''))) return true;
  if ((row.priceCents ?? null) !== (data.priceCents ?? null)) return true;
  const pieces = Object.entries(row.pieceWeights ?? {});
  if (pieces.length !== Object.keys(data.pieceWeights).length) return true;
  if (pieces.some(([name, grams]) => !(name in data.pieceWeights) || !sameDecimal(grams, data.pieceWeights[name]))) return true;
  const allergens = new Set(row.allergens ?? []);
  return allergens.size !== new Set(data.allergens).size || data.allergens.some((a) => !allergens.has(a));
}

/**
 * All rows or none: a report of every problem (400), else every row written in one transaction. A row named like
 * one of the workspace's own ingredients is a problem (`refuse`), or replaces that ingredient's values (`update`:
 * as an edit by hand would, its version moving on, so a form open on it meets a 409; a row that changes nothing
 * leaves it as it is). The shared library is never written: a row named like a shared ingredient is a new own one.
 */
export async function importIngredientsCsv(
  em: EntityManager,
  actor: Actor,
  buffer: Buffer,
  existing: ImportExisting = 'refuse',
): Promise<ImportResultDto> {
  const text = csvText(buffer);
  const { values, report } = checkCsv(text, existing === 'update' ? new Set() : await ownNames(em, actor));
  if (report.length) throw new ImportRejected(report);
  return em.transactional(async (tx) => {
    const own = existing === 'update' ? await tx.find(Ingredient, { workspace: actor.workspaceId }) : [];
    const byName = new Map(own.map((r) => [r.name.trim().toLowerCase(), r]));
    const created: IIngredient[] = [];
    const updated: IIngredient[] = [];
    let unchanged = 0;
    for (const v of values) {
      const data = rowData(v);
      const row = byName.get(v.name.trim().toLowerCase());
      if (!row) created.push(tx.create(Ingredient, { ...data, workspace: actor.workspaceId, provenance: 'workspace' }));
      else if (!differsFrom(row, data)) unchanged += 1;
      else {
        // The density's source stays what it was unless the file gives another density.
        tx.assign(row, { ...data, densitySource: sameDecimal(row.densityGPerMl, data.densityGPerMl) ? row.densitySource : data.densitySource });
        updated.push(row);
      }
    }
    await tx.flush();
    return { created: created.length, ids: created.map((r) => r.id), updated: updated.length, updatedIds: updated.map((r) => r.id), updatedNames: updated.map((r) => r.name), unchanged };
  });
}

/**
 * The workspace's own ingredients as a CSV the import reads back (the same columns, per 100 g; piece weights as
 * "large:50; slice:28", allergens by code), ordered by name: a copy of the coach's data to keep, or to import into
 * another workspace. Cells a spreadsheet would run as a formula are escaped. The reference rows everyone shares are
 * not included.
 */
export async function exportIngredientsCsv(em: EntityManager, actor: Actor): Promise<string> {
  const rows = await em.find(Ingredient, { workspace: actor.workspaceId }, { orderBy: { name: 'asc', id: 'asc' } });
  const data = rows.map((r) => {
    const cells: Record<ImportColumn, string | number> = {
      name: r.name,
      category: r.category,
      kcal: plainDecimal(r.kcal),
      fat_g: plainDecimal(r.fatG),
      sat_fat_g: plainDecimal(r.satFatG),
      protein_g: plainDecimal(r.proteinG),
      carbs_g: plainDecimal(r.carbsG),
      fiber_g: plainDecimal(r.fiberG),
      sugars_g: plainDecimal(r.sugarsG),
      erythritol_g: plainDecimal(r.erythritolG),
      allulose_g: plainDecimal(r.alluloseG),
      other_polyols_g: plainDecimal(r.otherPolyolsG),
      sodium_mg: plainDecimal(r.sodiumMg),
      density_g_per_ml: plainDecimal(r.densityGPerMl),
      piece_weights: Object.entries(r.pieceWeights ?? {})
        .map(([name, grams]) => `${name}:${plainDecimal(grams)}`)
        .join('; '),
      allergens: (r.allergens ?? []).join('; '),
      purchase_amount: plainDecimal(r.purchaseAmount),
      purchase_unit: r.purchaseUnit ?? '',
      purchase_label: r.purchaseLabel ?? '',
      price_cents: r.priceCents ?? '',
      aisle: r.aisle ?? '',
      source: r.source,
      note: r.note ?? '',
    };
    return IMPORT_COLUMNS.map((c) => cells[c]);
  });
  return Papa.unparse({ fields: [...IMPORT_COLUMNS], data }, { escapeFormulae: true, newline: '\r\n' });
}
