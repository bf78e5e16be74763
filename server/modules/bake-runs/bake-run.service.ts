import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { ZodError } from 'zod';
import { planBakeRunOffThread } from '../../lib/bake-run-pool.js';
import { prepDatesOf, weekTitle } from '@shared/domain/week-board.js';
import type { BakeRunResult, BakeRunRules, BakeTray } from '@shared/domain/bake-run-types.js';
import { bakeRunInputSchema, type BakeRunRequestBody } from '@shared/schemas/bake-run.schema.js';
import { daysBetween, longDate, type DateOrder } from '@shared/domain/iso-date.js';
import { addLocalMinutes } from '@shared/domain/bake-run-time.js';
import { clockText, type ClockStyle } from '@shared/domain/clock.js';
import { movedOut, ovensAt, resumeRun, takeDone, type BakeRunDone } from '@shared/domain/bake-run-resume.js';
import { resolveBakeRunRules } from '@shared/domain/bake-run-model.js';
import type {
  BakeRunKitchenValues,
  BakeRunSettingsDto,
  BakeRunSettingsValues,
  BakeRunStartValues,
  CalcBakeRunRequest,
  WeekBakeRunDto,
  WeekBakeTrayDto,
} from '@shared/schemas/bake-setup.schema.js';
import { clockOf, datesOf, type Actor } from '../../http/authz.js';
import { NotFound, StaleEdit, ValidationError } from '../../http/errors.js';
import { Week, WeekTray, type IWeek } from '../weeks/week.entity.js';
import { Tray } from '../trays/tray.entity.js';
import { BakeRunSetting, BakeRule, CoolingRecord, type IBakeRule, type IBakeRunSetting } from './bake-run.entity.js';
import { loadBakeRules, loadOvens, ovenInput, presentOven } from './bake-setup.service.js';
import { deltaIn } from '@shared/domain/temperature.js';

const num = (v: string | number): number => new Decimal(v).toNumber();

/** Run-level rules from the workspace rules the run uses (the scheduler takes one value per run). */
export function runRulesFrom(rules: readonly IBakeRule[]): { rules: Partial<BakeRunRules>; cautions: string[] } {
  if (rules.length === 0) return { rules: {}, cautions: [] };
  const crowding = rules.map((r) => num(r.crowdingPct));
  const deltas = rules.map((r) => num(r.convectionDeltaF));
  // Crowding: the largest of the rules (longer times, the safe side). Convection: the value most rules give.
  const counts = new Map<number, number>();
  for (const d of deltas) counts.set(d, (counts.get(d) ?? 0) + 1);
  const delta = [...counts.entries()].sort((a, b) => b[1] - a[1] || a[0] - b[0])[0][0];
  const cautions: string[] = [];
  if (new Set(crowding).size > 1)
    cautions.push(`The bake rules in this run give different crowding rules; the plan uses the largest, +${Math.max(...crowding)}% per extra tray.`);
  if (new Set(deltas).size > 1)
    cautions.push(
      `The bake rules in this run give different convection adjustments; the plan sets convection ovens ${deltaIn(delta, 'F')} (${deltaIn(delta, 'C')}) lower for every tray.`,
    );
  return {
    rules: {
      crowdingPerExtraTray: new Decimal(Math.max(...crowding)).dividedBy(100).toNumber(),
      convectionMode: 'temperature',
      convectionDeltaF: delta,
    },
    cautions,
  };
}

function ruleTrayDefaults(rule: IBakeRule) {
  return {
    tempF: num(rule.tempF),
    minMinutes: rule.minMinutes,
    maxMinutes: rule.maxMinutes,
    handsOnMinutes: rule.handsOnMinutes,
    toleranceF: num(rule.toleranceF),
    rackPreference: rule.rackPreference,
    ...(rule.minInternalF == null ? {} : { minInternalF: num(rule.minInternalF) }),
  };
}

/** Parses with the shared schema; a failure is a 400 naming `trays.N.field` etc. */
function parseRun(body: unknown) {
  const result = bakeRunInputSchema.safeParse(body);
  if (!result.success) {
    (result.error as unknown as { where: string }).where = 'body';
    throw result.error;
  }
  return result.data;
}

/** POST /api/calc/bake-run: resolves `ruleId`s from the workspace's rules, validates, plans. */
export async function calcBakeRun(em: EntityManager, actor: Actor, body: CalcBakeRunRequest): Promise<BakeRunResult> {
  const wanted = [...new Set(body.trays.map((t) => t.ruleId).filter((id): id is number => id !== undefined))];
  const found = wanted.length
    ? await em.find(BakeRule, { id: { $in: wanted }, workspace: actor.workspaceId, deletedAt: null })
    : [];
  const byId = new Map(found.map((r) => [r.id, r]));
  const used: IBakeRule[] = [];
  const trays = body.trays.map((t, i) => {
    const { ruleId, ...given } = t;
    if (ruleId === undefined) return given;
    const rule = byId.get(ruleId);
    if (!rule) throw ValidationError.field(`trays.${i}.ruleId`, `No bake rule with id ${ruleId} in your workspace.`);
    used.push(rule);
    const defaults = ruleTrayDefaults(rule);
    const hasTemp = given.tempF !== undefined || given.tempC !== undefined;
    return {
      name: rule.label,
      ...defaults,
      ...(hasTemp ? { tempF: undefined } : {}),
      ...Object.fromEntries(Object.entries(given).filter(([, v]) => v !== undefined)),
    };
  });
  const derived = runRulesFrom([...new Set(used)]);
  const input = parseRun({ ...body, trays, rules: body.rules ?? (used.length ? derived.rules : undefined) });
  const run = await planBakeRunOffThread(input);
  return body.rules ? run : { ...run, cautions: [...derived.cautions, ...run.cautions] };
}

// ---- the saved bake run of a prep week ----

async function findWeek(em: EntityManager, actor: Actor, id: number): Promise<IWeek> {
  const w = await em.findOne(Week, { id, workspace: actor.workspaceId });
  if (!w) throw new NotFound('Week');
  return w;
}

function pickPrepDate(w: IWeek, wanted: string | undefined): string {
  const dates = prepDatesOf(w);
  if (wanted === undefined) return w.prepDate;
  if (!dates.includes(wanted)) throw ValidationError.field('prepDate', `This week's prep dates are ${dates.join(' and ')}.`);
  return wanted;
}

function presentSettings(prepDate: string, row: IBakeRunSetting | null): BakeRunSettingsDto {
  return row
    ? {
        prepDate,
        start: row.start,
        cooks: row.cooks,
        handsOnMinutes: { ...row.handsOnMinutes },
        ovenIds: [...row.ovenIds],
        done: row.done ? { from: row.done.from, out: row.done.trays.map((t) => t.id) } : null,
        version: row.version,
      }
    : { prepDate, start: `${prepDate}T08:00`, cooks: 1, handsOnMinutes: {}, ovenIds: [], done: null, version: null };
}

/** The tray rows of the run: the week's tray counts × each base tray's bake values and its category's rule. */
async function weekTrays(em: EntityManager, week: IWeek, prepDate: string, settings: BakeRunSettingsDto, rules: IBakeRule[]) {
  const rows = await em.find(WeekTray, { week: week.id, prepDate, trayCount: { $gt: 0 } }, { orderBy: { id: 'asc' } });
  const trays = rows.length ? await em.find(Tray, { id: { $in: rows.map((r) => r.tray.id) } }) : [];
  const trayById = new Map(trays.map((t) => [t.id, t]));
  const ruleByCategory = new Map(rules.map((r) => [r.category, r]));
  const list: WeekBakeTrayDto[] = [];
  const used: IBakeRule[] = [];
  for (const row of rows) {
    const tray = trayById.get(row.tray.id);
    if (!tray) continue;
    const rule = ruleByCategory.get(tray.bakeCategory);
    if (rule) used.push(rule);
    list.push({
      trayId: tray.id,
      name: tray.name,
      category: tray.bakeCategory,
      trayCount: row.trayCount,
      tempF: tray.bakeTempF,
      minMinutes: tray.bakeMinMinutes,
      maxMinutes: tray.bakeMaxMinutes,
      handsOnMinutes: settings.handsOnMinutes[String(tray.id)] ?? rule?.handsOnMinutes ?? 10,
      donenessCue: rule?.donenessCue ?? '',
      minInternalF: rule?.minInternalF == null ? null : num(rule.minInternalF),
    });
  }
  const schedulerTrays = list.flatMap((t) => {
    const rule = ruleByCategory.get(t.category);
    return Array.from({ length: t.trayCount }, (_, k): BakeTray => ({
      id: `${t.trayId}-${k + 1}`,
      name: t.trayCount > 1 ? `${t.name} (${k + 1}/${t.trayCount})` : t.name,
      tempF: t.tempF,
      minMinutes: t.minMinutes,
      maxMinutes: t.maxMinutes,
      handsOnMinutes: t.handsOnMinutes,
      ...(rule ? { toleranceF: num(rule.toleranceF), rackPreference: rule.rackPreference as BakeTray['rackPreference'] } : {}),
      ...(t.minInternalF === null ? {} : { minInternalF: t.minInternalF }),
    }));
  });
  return { list, schedulerTrays, used: [...new Set(used)] };
}

/**
 * A week's prep days moved (the week's own edit, inside its transaction; `to` maps each old prep day that changed to
 * its new one, or to null when it is dropped): each day's saved bake-run settings go with it (cooks, ovens, hands-on
 * minutes, and the start at the same clock time of the new day), so the kitchen's choices are not lost. A run under
 * way (trays already out) stays on the day it was baked, as its cooling records do; a dropped day's settings go.
 * Every row is read before any is written: both days can move in one edit onto each other's old dates.
 */
export async function followPrepDays(tx: EntityManager, weekId: number, to: ReadonlyMap<string, string | null>): Promise<void> {
  const rows = await tx.find(BakeRunSetting, { week: weekId, prepDate: { $in: [...to.keys()] } });
  const moving = rows.filter((r) => !r.done);
  if (!moving.length) return;
  // Off their dates first (one row per week and prep day), then onto the new ones.
  for (const r of moving) await tx.nativeUpdate(BakeRunSetting, { id: r.id }, { prepDate: `~${r.id}`.slice(0, 10) });
  for (const r of moving) {
    const target = to.get(r.prepDate)!;
    const taken = target !== null && (await tx.count(BakeRunSetting, { week: weekId, prepDate: target }));
    if (target === null || taken) await tx.nativeDelete(BakeRunSetting, { id: r.id });
    else await tx.nativeUpdate(BakeRunSetting, { id: r.id }, { prepDate: target, start: addLocalMinutes(r.start, daysBetween(r.prepDate, target) * 24 * 60) });
  }
  for (const r of moving) tx.getUnitOfWork().unsetIdentity(r);
}

export async function getWeekBakeRun(em: EntityManager, actor: Actor, weekId: number, wantedDate?: string): Promise<WeekBakeRunDto> {
  const week = await findWeek(em, actor, weekId);
  const prepDate = pickPrepDate(week, wantedDate);
  const row = await em.findOne(BakeRunSetting, { week: week.id, prepDate });
  const settings = presentSettings(prepDate, row);
  const [rules, allOvens] = await Promise.all([loadBakeRules(em, actor.workspaceId), loadOvens(em, actor.workspaceId)]);
  const ovens = settings.ovenIds.length ? allOvens.filter((o) => settings.ovenIds.includes(o.id)) : allOvens;
  const { list, schedulerTrays, used } = await weekTrays(em, week, prepDate, settings, rules);
  // Planned again part-way: the trays already out stay as planned (those the week still bakes), the rest is planned.
  const ids = new Set(schedulerTrays.map((t) => t.id));
  const kept = row?.done ? { from: row.done.from, ovenF: row.done.ovenF, ...takeDone(row.done, [...ids]) } : null;
  const done: BakeRunDone | null = kept && kept.trays.length ? kept : null;
  const outIds = new Set(done?.trays.map((t) => t.id));
  const toBake = schedulerTrays.filter((t) => !outIds.has(t.id));
  const problems: string[] = [];
  if (schedulerTrays.length === 0) problems.push('No trays to bake on this prep date: set the tray counts of the week first.');
  if (ovens.length === 0) problems.push('No ovens: add your ovens under "Bake rules & ovens".');
  if (schedulerTrays.length > 200) problems.push('More than 200 trays on one prep date: split them over two prep dates.');
  let run: BakeRunResult | null = null;
  if (problems.length === 0) {
    const derived = runRulesFrom(used);
    if (done && toBake.length === 0) {
      run = resumeRun(settings.start, done, null, resolveBakeRunRules(derived.rules), clockOf(actor));
    } else {
      // Planned again part-way: an oven at a set point then starts the rest from it (if it still can reach it).
      const hot = Object.entries(done?.ovenF ?? {}).filter(([name, f]) => ovens.some((o) => o.name === name && f <= num(o.maxF)));
      const startOf = new Map(hot);
      const parsed = bakeRunInputSchema.safeParse({
        start: done ? done.from : settings.start,
        cooks: settings.cooks,
        ambientF: 70,
        ovens: ovens.map((o) => (startOf.has(o.name) ? { ...ovenInput(o), startF: startOf.get(o.name) } : ovenInput(o))),
        trays: toBake,
        rules: derived.rules,
      } satisfies BakeRunRequestBody);
      if (parsed.success) {
        const planned = await planBakeRunOffThread(parsed.data);
        const whole = { ...planned, cautions: [...derived.cautions, ...planned.cautions] };
        run = done ? resumeRun(settings.start, { ...done, ovenF: Object.fromEntries(hot) }, whole, whole.rules, clockOf(actor)) : whole;
      } else {
        problems.push(...describeIssues(parsed.error, toBake));
      }
    }
  }
  return {
    weekId: week.id,
    weekName: weekTitle(week, datesOf(actor)),
    prepDate,
    prepDates: prepDatesOf(week),
    // The trays still counted as out: those of the week's trays (a tray count lowered since drops the others).
    settings: { ...settings, done: done ? { from: done.from, out: done.trays.map((t) => t.id) } : null },
    trays: list,
    ovens: ovens.map(presentOven),
    run,
    problems,
  };
}

/** A run starts on its own prep day: a start on another day is a slip of the date picker (its timers would never show). */
function startOnPrepDay(start: string, prepDate: string, order: DateOrder): void {
  if (start.slice(0, 10) !== prepDate)
    throw ValidationError.field('start', `The run starts on its prep day, ${longDate(prepDate, order)}: keep that date and change the time.`);
}

/** Once the rest of the day is planned from a time, the day's start cannot move past it. */
function startBeforeRest(start: string, row: IBakeRunSetting | null, style: ClockStyle): void {
  if (row?.done && start > row.done.from)
    throw ValidationError.field(
      'start',
      `The rest of this run is planned from ${clockText(row.done.from, style)} (trays already out): the start can be ${clockText(row.done.from, style)} at the latest.`,
    );
}

type DayChange = Partial<Pick<IBakeRunSetting, 'start' | 'cooks' | 'ovenIds' | 'done'>>;

/**
 * Changes part of a prep day's saved settings (the rest stays; with none saved yet, the defaults fill it). A stale
 * version is a 409 like the settings' own.
 */
async function changeDaySettings(
  em: EntityManager,
  actor: Actor,
  weekId: number,
  v: { prepDate?: string; version?: number },
  change: (prepDate: string, row: IBakeRunSetting | null) => DayChange | Promise<DayChange>,
): Promise<WeekBakeRunDto> {
  // The week first: another workspace's week is a 404 whatever else the request says.
  const week = await findWeek(em, actor, weekId);
  const prepDate = pickPrepDate(week, v.prepDate);
  const row = await em.findOne(BakeRunSetting, { week: week.id, prepDate });
  const changed = await change(prepDate, row);
  if (row) {
    if (v.version !== row.version) throw new StaleEdit(row.version, presentSettings(prepDate, row));
    em.assign(row, changed);
  } else {
    if (v.version !== undefined) throw new StaleEdit(null, presentSettings(prepDate, null));
    const defaults = presentSettings(prepDate, null);
    em.create(BakeRunSetting, {
      workspace: actor.workspaceId,
      week: week.id,
      prepDate,
      start: defaults.start,
      cooks: defaults.cooks,
      handsOnMinutes: defaults.handsOnMinutes,
      ovenIds: defaults.ovenIds,
      ...changed,
    });
  }
  await em.flush();
  return getWeekBakeRun(em, actor, weekId, prepDate);
}

/**
 * PUT /api/weeks/:weekId/bake-run/start: moves the run to the time the kitchen really started (coach or assistant,
 * on prep day); cooks, ovens and hands-on minutes stay.
 */
export function moveWeekBakeRunStart(em: EntityManager, actor: Actor, weekId: number, v: BakeRunStartValues): Promise<WeekBakeRunDto> {
  return changeDaySettings(em, actor, weekId, v, (prepDate, row) => {
    startOnPrepDay(v.start, prepDate, datesOf(actor));
    startBeforeRest(v.start, row, clockOf(actor));
    return { start: v.start };
  });
}

/**
 * PUT /api/weeks/:weekId/bake-run/kitchen: the ovens that work and the cooks who came on prep day (coach or
 * assistant); the start and hands-on minutes stay. Every oven of the workspace is stored as "every oven".
 *
 * Part-way through the day, `out` names the trays already out of the oven: they are kept as the plan the kitchen
 * followed had them (read here, before the change), at the time out `outAt` gives or the cooling record has, and the
 * rest is planned from `from`. `out: []` plans the whole
 * day from its start again; without `out`, what was said before stays.
 */
export function setWeekBakeRunKitchen(em: EntityManager, actor: Actor, weekId: number, v: BakeRunKitchenValues): Promise<WeekBakeRunDto> {
  return changeDaySettings(em, actor, weekId, v, async (prepDate) => {
    const ovens = await loadOvens(em, actor.workspaceId);
    const known = new Set(ovens.map((o) => o.id));
    const missing = v.ovenIds.filter((id) => !known.has(id));
    if (missing.length) throw ValidationError.field('ovenIds', `No oven with id ${missing.join(', ')} in your workspace.`);
    const chosen = [...new Set(v.ovenIds)];
    const change: DayChange = { cooks: v.cooks, ovenIds: chosen.length === ovens.length ? [] : chosen };
    if (v.out === undefined) return change;
    if (v.out.length === 0) return { ...change, done: null };
    if (v.from === undefined) throw ValidationError.field('from', 'Say when the rest of the run starts (the trays still to bake).');
    if (v.from.slice(0, 10) !== prepDate)
      throw ValidationError.field('from', `The rest is baked on the prep day, ${longDate(prepDate, datesOf(actor))}: keep that date and change the time.`);
    const current = await getWeekBakeRun(em, actor, weekId, prepDate);
    if (!current.run) throw ValidationError.field('out', `There is no plan to take trays out of yet: ${current.problems.join(' ')}`);
    if (v.from < current.settings.start)
      throw ValidationError.field('from', `The run starts at ${clockText(current.settings.start, clockOf(actor))}: plan the rest from then or later.`);
    const inRun = new Set(current.run.trays.map((t) => t.id));
    const unknown = v.out.filter((id) => !inRun.has(id));
    if (unknown.length) throw ValidationError.field('out', `No tray ${unknown.join(', ')} in this run.`);
    // The ovens that work and are on at `from` in the plan the kitchen followed (at a set point, or part-way through a
    // preheat or change) start the rest at their temperature then.
    const working = new Set(ovens.filter((o) => chosen.includes(o.id)).map((o) => o.name));
    const ovenF = Object.fromEntries(Object.entries(ovensAt(current.run, v.from)).filter(([name]) => working.has(name)));
    const ids = [...new Set(v.out)];
    let kept = takeDone(current.run, ids);
    for (const [id, at] of Object.entries(v.outAt ?? {})) {
      const tray = kept.trays.find((t) => t.id === id);
      if (!tray) throw ValidationError.field(`outAt.${id}`, 'Tick this tray as out to give the time it came out.');
      if (at.slice(0, 10) !== prepDate) throw ValidationError.field(`outAt.${id}`, `It came out on the prep day, ${longDate(prepDate, datesOf(actor))}: change the time only.`);
      if (at < tray.inAt) throw ValidationError.field(`outAt.${id}`, `${tray.name} went in at ${clockText(tray.inAt, clockOf(actor))}: it came out after that.`);
      kept = movedOut(kept, id, at);
    }
    // A tray written down in the cooling record as out at another time keeps that time (a time given here wins).
    const records = await em.find(CoolingRecord, { week: weekId, prepDate, runTrayId: { $in: ids } });
    for (const r of records) {
      const tray = kept.trays.find((t) => t.id === r.runTrayId);
      if (tray && v.outAt?.[r.runTrayId] === undefined && r.outAt >= tray.inAt) kept = movedOut(kept, r.runTrayId, r.outAt);
    }
    return { ...change, done: { from: v.from, ...kept, ovenF } };
  });
}

function describeIssues(error: ZodError, trays: BakeTray[]): string[] {
  return [
    ...new Set(
      error.issues.map((i) => {
        const [where, index] = i.path;
        const tray = where === 'trays' && typeof index === 'number' ? trays[index] : undefined;
        return tray ? `${tray.name}: ${i.message}` : i.message;
      }),
    ),
  ];
}

export async function putWeekBakeRunSettings(
  em: EntityManager,
  actor: Actor,
  weekId: number,
  v: BakeRunSettingsValues,
): Promise<WeekBakeRunDto> {
  const week = await findWeek(em, actor, weekId);
  const prepDate = pickPrepDate(week, v.prepDate);
  if (v.ovenIds.length) {
    const ovens = await loadOvens(em, actor.workspaceId);
    const known = new Set(ovens.map((o) => o.id));
    const missing = v.ovenIds.filter((id) => !known.has(id));
    if (missing.length) throw ValidationError.field('ovenIds', `No oven with id ${missing.join(', ')} in your workspace.`);
  }
  startOnPrepDay(v.start, prepDate, datesOf(actor));
  const row = await em.findOne(BakeRunSetting, { week: week.id, prepDate });
  startBeforeRest(v.start, row, clockOf(actor));
  if (row) {
    if (v.version !== row.version) throw new StaleEdit(row.version, presentSettings(prepDate, row));
    em.assign(row, { start: v.start, cooks: v.cooks, handsOnMinutes: v.handsOnMinutes, ovenIds: [...new Set(v.ovenIds)] });
  } else {
    if (v.version !== undefined) throw new StaleEdit(null, presentSettings(prepDate, null));
    em.create(BakeRunSetting, {
      workspace: actor.workspaceId,
      week: week.id,
      prepDate,
      start: v.start,
      cooks: v.cooks,
      handsOnMinutes: v.handsOnMinutes,
      ovenIds: [...new Set(v.ovenIds)],
    });
  }
  await em.flush();
  return getWeekBakeRun(em, actor, weekId, prepDate);
}
