import Papa from 'papaparse';
import type { EntityManager } from '@mikro-orm/postgresql';
import { allergenFromWord, MAJOR_ALLERGENS } from '@shared/domain/allergens.js';
import { heightCmFromText, perKgOfPerLb, weightKgFromText, type BodyUnits } from '@shared/domain/body-measures.js';
import { ambiguousCommaMessage, decimalCommaToPoint } from '@shared/domain/units.js';
import type { ImportProblem } from '@shared/schemas/csv-import.js';
import {
  ACTIVITY_LABELS,
  CLIENT_DEFAULTS,
  CLIENT_IMPORT_COLUMNS,
  CLIENT_TARGET_COLUMNS,
  createClientSchema,
  GOAL_LABELS,
  REQUIRED_CLIENT_IMPORT_COLUMNS,
  type ClientImportColumn,
  type ClientImportResultDto,
  type CreateClientData,
} from '@shared/schemas/clients.schema.js';
import type { ActivityLevel, Goal } from '@shared/domain/targets.js';
import type { Actor } from '../../http/authz.js';
import { cellOf, csvText, dedupe, ImportRejected, plainDecimal, readCsv, splitList } from '../../lib/csv-import.js';
import { Client } from './client.entity.js';
import { newClientRow } from './client.service.js';

/**
 * CSV import (and export) of client profiles, for a coach who starts with a list of clients in a spreadsheet: every row is
 * checked with the same zod schema as the profile form (after its cells are read as people write them: "5 ft 6 in",
 * "163 lb", "Lightly active", "tree nuts; milk"); when any row fails nothing is written and the answer is a 400 with
 * a row-level report (line, column, reason). Otherwise all profiles are created in ONE transaction. No invitation is
 * sent: the coach invites each client from their page when ready.
 */
export const MAX_CLIENT_IMPORT_ROWS = 500;

/** Field path of the schema → CSV column (the protein column is the one the row used). */
const FIELD_COLUMNS: Record<string, ClientImportColumn> = {
  name: 'name',
  email: 'email',
  householdMultiplier: 'portions_per_plate',
  sex: 'sex',
  ageYears: 'age',
  heightCm: 'height',
  weightKg: 'weight',
  activity: 'activity',
  goal: 'goal',
  netCarbCapG: 'net_carb_cap_g',
  proteinGPerKg: 'protein_g_per_kg',
  allergens: 'allergens',
  dislikes: 'dislikes',
  healthNotes: 'health_notes',
};
const TARGET_FIELDS: Record<string, (typeof CLIENT_TARGET_COLUMNS)[number]> = {
  targetKcal: 'target_kcal',
  netCarbCapG: 'target_net_carbs_g',
  proteinG: 'target_protein_g',
  fatG: 'target_fat_g',
};

/** A cell's word as the maps below key it: lower case, one space for runs of spaces, "_" or "-", no "(…)" at the end. */
const word = (s: string) => s.trim().toLowerCase().replace(/\s*\(.*\)\s*$/, '').replace(/[\s_-]+/g, ' ');

const SEX_WORDS = new Map<string, 'female' | 'male'>([
  ['f', 'female'], ['female', 'female'], ['woman', 'female'], ['w', 'female'],
  ['m', 'male'], ['male', 'male'], ['man', 'male'],
]);
/** By code ("very-active" → "very active") and by the form's words ("Lightly active (1–3 days a week)"). */
const ACTIVITY_WORDS = new Map<string, ActivityLevel>(
  Object.entries(ACTIVITY_LABELS).flatMap(([code, label]) => [
    [word(code), code as ActivityLevel] as const,
    [word(label), code as ActivityLevel] as const,
  ]),
);
const GOAL_WORDS = new Map<string, Goal>(
  Object.entries(GOAL_LABELS).flatMap(([code, label]) => [
    [code, code as Goal] as const,
    [word(label), code as Goal] as const,
    [`${code} weight`, code as Goal] as const,
  ]),
);

/** One CSV record → the input object of the form schema, with the problems of reading its cells. */
function toInput(rec: Record<string, string>, line: number, units: BodyUnits, problems: ImportProblem[]) {
  const cell = (c: ClientImportColumn) => cellOf(rec, c);
  const problem = (column: ClientImportColumn, reason: string) => problems.push({ line, column, reason });
  /** A decimal as typed (a decimal comma read as a point); blank → the fallback. */
  const decimal = (c: ClientImportColumn, fallback?: string): string | undefined => {
    const t = cell(c);
    if (!t) return fallback;
    const point = decimalCommaToPoint(t);
    if (point === null) problem(c, ambiguousCommaMessage(t));
    return point ?? t;
  };
  const number = (c: ClientImportColumn, what: string): number | undefined => {
    const t = decimal(c);
    if (t === undefined) return undefined;
    const n = Number(t);
    if (!/^\d+(\.\d+)?$/.test(t) || !Number.isFinite(n)) {
      problem(c, `${what}: enter a number`);
      return undefined;
    }
    return n;
  };

  const sexText = cell('sex');
  const sex = SEX_WORDS.get(word(sexText));
  if (!sex) problem('sex', sexText ? `"${sexText}": write female or male (the equation for daily energy has a form for each)` : 'Give female or male');

  const ageText = cell('age');
  let ageYears = ageText ? number('age', 'Age') : undefined;
  if (ageYears !== undefined && !Number.isInteger(ageYears)) {
    problem('age', 'Age: enter whole years');
    ageYears = undefined;
  }
  if (!ageText) problem('age', 'Give the age in years');

  const height = heightCmFromText(cell('height'), units);
  if (!height.ok) problem('height', height.reason);
  const weight = weightKgFromText(cell('weight'), units);
  if (!weight.ok) problem('weight', weight.reason);

  const activityText = cell('activity');
  const activity = ACTIVITY_WORDS.get(word(activityText));
  if (!activity) {
    problem('activity', `${activityText ? `"${activityText}": write` : 'Give'} one of sedentary, light, moderate, active, very active`);
  }
  const goalText = cell('goal');
  const goal = GOAL_WORDS.get(word(goalText));
  if (!goal) problem('goal', `${goalText ? `"${goalText}": write` : 'Give'} one of lose, maintain, gain`);

  let proteinGPerKg = decimal('protein_g_per_kg');
  const perLb = decimal('protein_g_per_lb');
  if (proteinGPerKg !== undefined && perLb !== undefined) problem('protein_g_per_lb', 'Give protein per kg or per lb, not both');
  else if (perLb !== undefined) {
    proteinGPerKg = perKgOfPerLb(perLb);
    if (!proteinGPerKg) problem('protein_g_per_lb', 'Protein (g per lb): enter a number');
  }

  const given = CLIENT_TARGET_COLUMNS.filter((c) => cell(c));
  let manualTargets: CreateClientData['manualTargets'] = null;
  if (given.length > 0 && given.length < CLIENT_TARGET_COLUMNS.length) {
    for (const c of CLIENT_TARGET_COLUMNS.filter((c) => !cell(c))) {
      problem(c, 'Typed targets take all four columns (kcal, net carbs, protein, fat); leave all four blank to have them computed');
    }
  } else if (given.length) {
    const t = {
      targetKcal: number('target_kcal', 'Daily kcal'),
      netCarbCapG: number('target_net_carbs_g', 'Net carbs (g)'),
      proteinG: number('target_protein_g', 'Protein (g)'),
      fatG: number('target_fat_g', 'Fat (g)'),
    };
    if (Object.values(t).every((v) => v !== undefined)) manualTargets = t as NonNullable<CreateClientData['manualTargets']>;
  }

  const allergens = splitList(cell('allergens')).flatMap((w) => {
    const code = allergenFromWord(w);
    if (!code) {
      problem('allergens', `"${w}" is not one of the nine major allergens (${MAJOR_ALLERGENS.map((a) => a.label.toLowerCase()).join(', ')}): put other sensitivities under dislikes`);
      return [];
    }
    return [code];
  });

  return {
    name: cell('name'),
    email: cell('email'),
    householdMultiplier: decimal('portions_per_plate', CLIENT_DEFAULTS.householdMultiplier),
    sex,
    ageYears,
    heightCm: height.ok ? height.value : undefined,
    weightKg: weight.ok ? weight.value : undefined,
    activity,
    goal,
    netCarbCapG: decimal('net_carb_cap_g', CLIENT_DEFAULTS.netCarbCapG),
    proteinGPerKg: proteinGPerKg ?? CLIENT_DEFAULTS.proteinGPerKg,
    targetMode: manualTargets ? 'manual' : 'computed',
    manualTargets,
    allergens: [...new Set(allergens)],
    dislikes: [...new Set(splitList(cell('dislikes')))],
    healthNotes: cell('health_notes'),
  };
}

function columnOf(path: readonly PropertyKey[], perLb: boolean): string {
  const [a, b] = path.map(String);
  if (a === 'manualTargets') return (b && TARGET_FIELDS[b]) || 'target_kcal';
  if (a === 'proteinGPerKg' && perLb) return 'protein_g_per_lb';
  return FIELD_COLUMNS[a] ?? a ?? 'row';
}

/**
 * Checks every row; returns the profiles to write, or the full report of problems. A name already among the
 * workspace's clients (`existingNames`, lower case, archived ones too) is a problem: an import adds clients, it
 * does not change them, so a file imported twice is refused the second time rather than doubling everyone.
 */
export function checkClientCsv(text: string, existingNames: Map<string, { archived: boolean }>, units: BodyUnits) {
  const { records, report } = readCsv(text, {
    columns: CLIENT_IMPORT_COLUMNS,
    required: REQUIRED_CLIENT_IMPORT_COLUMNS,
    maxRows: MAX_CLIENT_IMPORT_ROWS,
    nouns: 'clients',
  });
  const values: CreateClientData[] = [];
  const seen = new Map<string, number>();
  for (const { line, cells } of records) {
    const rowProblems: ImportProblem[] = [];
    const input = toInput(cells, line, units, rowProblems);
    const parsed = createClientSchema.safeParse(input);
    const perLb = !!cellOf(cells, 'protein_g_per_lb');
    if (!parsed.success) {
      // A cell already reported as unreadable is not reported again as missing.
      const said = new Set(rowProblems.map((p) => p.column));
      for (const issue of parsed.error.issues) {
        const column = columnOf(issue.path, perLb);
        if (!said.has(column)) rowProblems.push({ line, column, reason: issue.message });
      }
    } else {
      const key = parsed.data.name.toLowerCase();
      const taken = existingNames.get(key);
      if (taken) {
        rowProblems.push({
          line,
          column: 'name',
          reason: `"${parsed.data.name}" is already one of your clients${taken.archived ? ' (archived)' : ''}: an import adds new clients; change a profile on its page`,
          code: 'name_taken',
        });
      } else if (seen.has(key)) rowProblems.push({ line, column: 'name', reason: `Same name as line ${seen.get(key)}` });
      seen.set(key, line);
      if (!rowProblems.length) values.push(parsed.data);
    }
    report.push(...dedupe(rowProblems));
  }
  return { values, report };
}

/** All rows or none: a report of every problem (400), else every profile created in one transaction. */
export async function importClientsCsv(em: EntityManager, actor: Actor, buffer: Buffer, units?: BodyUnits): Promise<ClientImportResultDto> {
  const text = csvText(buffer);
  const rows = await em.find(Client, { workspace: actor.workspaceId }, { fields: ['name', 'archivedAt'] });
  const existing = new Map(rows.map((r) => [r.name.trim().toLowerCase(), { archived: !!r.archivedAt }]));
  const { values, report } = checkClientCsv(text, existing, units ?? actor.unitSystem ?? 'us');
  if (report.length) throw new ImportRejected(report);
  return em.transactional(async (tx) => {
    const created = values.map((v) => newClientRow(tx, actor.workspaceId, v));
    await tx.flush();
    return {
      created: created.length,
      ids: created.map((r) => r.id),
      names: values.map((v) => v.name),
      withEmail: values.filter((v) => v.email).length,
    };
  });
}

/** The export's columns: the import's, protein per kg only (as stored). */
const CLIENT_EXPORT_COLUMNS = CLIENT_IMPORT_COLUMNS.filter((c) => c !== 'protein_g_per_lb');

/**
 * The workspace's clients (not the archived ones) as a CSV the import reads back: height and weight exact as stored,
 * with their unit ("165.1 cm", "64.86 kg", so any coach's import reads them alike), typed targets in the four target
 * columns (blank when computed), allergens by code, health notes included (the file is the coach's). Ordered by name;
 * cells a spreadsheet would run as a formula are escaped.
 */
export async function exportClientsCsv(em: EntityManager, actor: Actor): Promise<string> {
  const rows = await em.find(Client, { workspace: actor.workspaceId, archivedAt: null }, { orderBy: { name: 'asc', id: 'asc' } });
  const data = rows.map((c) => {
    const t = c.targetMode === 'manual' ? c.manualTargets : null;
    const cells: Record<(typeof CLIENT_EXPORT_COLUMNS)[number], string> = {
      name: c.name,
      email: c.email ?? '',
      portions_per_plate: plainDecimal(c.householdMultiplier),
      sex: c.sex,
      age: String(c.ageYears),
      height: `${plainDecimal(c.heightCm)} cm`,
      weight: `${plainDecimal(c.weightKg)} kg`,
      activity: c.activity,
      goal: c.goal,
      net_carb_cap_g: plainDecimal(c.netCarbCapG),
      protein_g_per_kg: plainDecimal(c.proteinGPerKg),
      target_kcal: plainDecimal(t?.targetKcal),
      target_net_carbs_g: plainDecimal(t?.netCarbCapG),
      target_protein_g: plainDecimal(t?.proteinG),
      target_fat_g: plainDecimal(t?.fatG),
      allergens: (c.allergens ?? []).join('; '),
      dislikes: (c.dislikes ?? []).join('; '),
      health_notes: c.healthNotes ?? '',
    };
    return CLIENT_EXPORT_COLUMNS.map((col) => cells[col]);
  });
  return Papa.unparse({ fields: [...CLIENT_EXPORT_COLUMNS], data }, { escapeFormulae: true, newline: '\r\n' });
}
