/**
 * Week check: one client's day on the week board against the client's targets and rules.
 *
 * Cell macros are what the client eats from that plate (the household multiplier is about how much
 * is cooked, not what this client eats). Day totals are summed exactly, then compared:
 * - net carbs above the cap                               → warn
 * - protein below the floor (default 90 % of the target)  → warn
 * - energy above the target by more than 10 % (default)   → warn
 * - a plate allergen the client has                       → block, or warn when overridden with a reason
 * - an ingredient name or tag the client dislikes         → warn
 * - a refrigerated portion past its eat-by date, or planned before its tray is made → block
 * - a frozen portion planned past its freezer quality limit → warn
 * The 90 % and 10 % defaults are common practice, no source; the coach edits them.
 */
import Decimal from 'decimal.js';
import { allergenConflicts, allergenLabel, type AllergenCode } from './allergens';
import { freezerQualityDate, portionStatus } from './eat-by';
import { compareIsoDates, shortDate, type DateOrder, type IsoDate } from './iso-date';
import type { MacroTargets } from './targets';

export type Severity = 'block' | 'warn';

export interface CheckRules {
  /** Protein below this share of the target is flagged (0.9 = 90 %). */
  proteinFloorShare: Decimal.Value;
  /** Energy above target × (1 + this) is flagged (0.1 = 10 %). */
  energyOverShare: Decimal.Value;
}

/** Common practice, no source; coach-editable. */
export const DEFAULT_CHECK_RULES: Readonly<CheckRules> = { proteinFloorShare: '0.9', energyOverShare: '0.1' };

export interface CellMacros {
  kcal: number;
  netCarbsG: number;
  proteinG: number;
  fatG: number;
}

export interface AllergenOverride {
  allergen: AllergenCode;
  reason: string;
}

export interface CellPortion {
  trayId: string;
  prepDate: IsoDate;
  fridgeDays: number;
  /** 'frozen' once the freeze-and-thaw remedy is applied; default 'fridge'. */
  storage?: 'fridge' | 'frozen';
  /** Needed when storage is 'frozen'; missing counts as 0 (every later day is flagged). */
  freezerWeeks?: number;
}

export interface CheckCell {
  slot: string;
  macros: CellMacros;
  allergens: readonly AllergenCode[];
  /** Ingredient names and tags of the plate, for the dislike check. */
  terms: readonly string[];
  portions: readonly CellPortion[];
  allergenOverrides?: readonly AllergenOverride[];
}

export interface DayCheckInput {
  clientId: string;
  date: IsoDate;
  targets: MacroTargets;
  clientAllergens: readonly AllergenCode[];
  clientDislikes: readonly string[];
  cells: readonly CheckCell[];
  rules?: Partial<CheckRules>;
}

interface WarningBase {
  severity: Severity;
  clientId: string;
  date: IsoDate;
}

export type WeekWarning =
  | (WarningBase & { kind: 'net-carbs-over'; actualG: number; capG: number })
  | (WarningBase & { kind: 'protein-short'; actualG: number; targetG: number; floorG: number })
  | (WarningBase & { kind: 'energy-over'; actualKcal: number; targetKcal: number; limitKcal: number })
  | (WarningBase & { kind: 'allergen'; slot: string; allergen: AllergenCode; overridden: boolean; reason?: string })
  | (WarningBase & { kind: 'dislike'; slot: string; term: string; matched?: string })
  | (WarningBase & { kind: 'past-eat-by'; slot: string; trayId: string; prepDate: IsoDate; eatBy: IsoDate })
  | (WarningBase & { kind: 'before-prep'; slot: string; trayId: string; prepDate: IsoDate })
  | (WarningBase & { kind: 'past-freezer-quality'; slot: string; trayId: string; prepDate: IsoDate; qualityUntil: IsoDate });

export type WarningKind = WeekWarning['kind'];

/** A warning's facts without the client and day it belongs to (they are its day check's). */
export type WarningData = WeekWarning extends infer W ? (W extends WeekWarning ? Omit<W, 'clientId' | 'date'> : never) : never;

/** A warning with its sentence, as people read it (the board pages, a refused publish). */
export type WordedWarning = WeekWarning & { message: string };

/**
 * A warning's sentence, from its kind and values: the one wording of each problem. The week check gives facts only;
 * whoever shows a warning to a person words it with this (`worded`).
 */
export function warningMessage(w: WarningData, date: IsoDate, order: DateOrder): string {
  switch (w.kind) {
    case 'net-carbs-over':
      return `Net carbs ${w.actualG} g are over the ${w.capG} g cap.`;
    case 'protein-short':
      return `Protein ${w.actualG} g is below the ${w.floorG} g floor (target ${w.targetG} g).`;
    case 'energy-over':
      return `Energy ${w.actualKcal} kcal is over ${w.limitKcal} kcal (target ${w.targetKcal} kcal).`;
    case 'allergen':
      return w.overridden
        ? `${allergenLabel(w.allergen)} is on the client's allergen list; allowed by the coach: ${w.reason}`
        : `${allergenLabel(w.allergen)} is on the client's allergen list.`;
    case 'dislike':
      return w.matched && w.matched !== w.term ? `The client dislikes ${w.term} (${w.matched}).` : `The client dislikes ${w.term}.`;
    case 'before-prep':
      return `Planned on ${shortDate(date, order)}, before its tray is made on ${shortDate(w.prepDate, order)}.`;
    case 'past-freezer-quality':
      return `Frozen portion planned after its freezer quality limit (${shortDate(w.qualityUntil, order)}).`;
    case 'past-eat-by':
      return `Past its eat-by date: prepped ${shortDate(w.prepDate, order)}, eat by ${shortDate(w.eatBy, order)}.`;
  }
}

/** A warning with its sentence (warningMessage, the one wording). */
export function worded(w: WeekWarning, order: DateOrder): WordedWarning {
  return { ...w, message: warningMessage(w, w.date, order) };
}

export interface DayTotals {
  kcal: number;
  netCarbsG: number;
  proteinG: number;
  fatG: number;
}

export interface DayCheck {
  clientId: string;
  date: IsoDate;
  totals: DayTotals;
  warnings: WeekWarning[];
}

const round1 = (d: Decimal) => d.toDecimalPlaces(1, Decimal.ROUND_HALF_UP).toNumber();

/** Lower-case, trimmed, inner spaces collapsed: how names and dislikes are compared. */
export function normalizeTerm(term: string): string {
  return term.trim().toLowerCase().replace(/\s+/g, ' ');
}

/**
 * Memos of pure conversions, keyed by the input objects: a week board passes the same plate macros, term lists
 * and dislike lists to hundreds of cells, so each is converted once. Each entry keeps a copy of what it was made
 * from and is rebuilt when the object has changed since; WeakMaps keep nothing alive.
 */
type ExactMacros = { kcal: Decimal; netCarbsG: Decimal; proteinG: Decimal; fatG: Decimal };
const exactMacros = new WeakMap<CellMacros, { from: CellMacros; exact: ExactMacros }>();
const normalizedTerms = new WeakMap<readonly string[], { from: string[]; terms: TermWords[] }>();
const normalizedDislikes = new WeakMap<readonly string[], { from: string[]; list: TermWords[] }>();

const sameList = (a: readonly string[], b: readonly string[]) => a.length === b.length && a.every((x, i) => x === b[i]);

function exactOf(m: CellMacros): ExactMacros {
  const e = exactMacros.get(m);
  if (e && e.from.kcal === m.kcal && e.from.netCarbsG === m.netCarbsG && e.from.proteinG === m.proteinG && e.from.fatG === m.fatG)
    return e.exact;
  const exact = { kcal: new Decimal(m.kcal), netCarbsG: new Decimal(m.netCarbsG), proteinG: new Decimal(m.proteinG), fatG: new Decimal(m.fatG) };
  exactMacros.set(m, { from: { kcal: m.kcal, netCarbsG: m.netCarbsG, proteinG: m.proteinG, fatG: m.fatG }, exact });
  return exact;
}

/** Net-carb cap, protein floor and energy limit of one client's targets under the rules (memoized like the macros above). */
interface Limits {
  floor: Decimal;
  limit: Decimal;
  /** floor(cap × 1000), ceil(floor × 1000) and floor(limit × 1000): the thresholds of the thousandths fast path. */
  capMilliFloor: number;
  floorMilliCeil: number;
  limitMilliFloor: number;
  /** floor and limit rounded to 0.1, for the messages. */
  floorG: number;
  limitKcal: number;
}
const limitMemo = new WeakMap<MacroTargets, { netCarbCapG: number; proteinG: number; targetKcal: number; share: string; over: string } & Limits>();
function limitsOf(targets: MacroTargets, rules: CheckRules): Limits {
  const share = String(rules.proteinFloorShare);
  const over = String(rules.energyOverShare);
  const e = limitMemo.get(targets);
  if (
    e &&
    e.netCarbCapG === targets.netCarbCapG &&
    e.proteinG === targets.proteinG &&
    e.targetKcal === targets.targetKcal &&
    e.share === share &&
    e.over === over
  )
    return e;
  const floor = new Decimal(targets.proteinG).times(rules.proteinFloorShare);
  const limit = new Decimal(targets.targetKcal).times(new Decimal(rules.energyOverShare).plus(1));
  const limits: Limits = {
    floor,
    limit,
    capMilliFloor: milliThreshold(targets.netCarbCapG, 'floor'),
    floorMilliCeil: milliThreshold(floor, 'ceil'),
    limitMilliFloor: milliThreshold(limit, 'floor'),
    floorG: round1(floor),
    limitKcal: round1(limit),
  };
  limitMemo.set(targets, { netCarbCapG: targets.netCarbCapG, proteinG: targets.proteinG, targetKcal: targets.targetKcal, share, over, ...limits });
  return limits;
}

/** A normalized term and its words, plurals folded (see termWords). */
interface TermWords {
  term: string;
  words: Set<string>;
}

/**
 * The words of a term, lower-case, with simple English plurals folded to one form ("mushrooms" → "mushroom",
 * "berries" → "berry", "tomatoes" → "tomato"), so a dislike typed as people say it finds the library's names
 * ("onions" finds "Onions, raw"). Both sides are folded the same way, so an odd fold ("asparagus" → "asparagu")
 * still matches itself. Common practice (simple plural folding), no source.
 */
export function termWords(term: string): Set<string> {
  const words = new Set<string>();
  for (const raw of normalizeTerm(term).split(/[^\p{L}\p{N}]+/u)) {
    if (!raw) continue;
    let w = raw;
    if (w.length > 4 && w.endsWith('ies')) w = `${w.slice(0, -3)}y`;
    else if (w.length > 4 && w.endsWith('oes')) w = w.slice(0, -2);
    else if (w.length > 3 && w.endsWith('s') && !w.endsWith('ss')) w = w.slice(0, -1);
    words.add(w);
  }
  return words;
}

/** Dislike words this long also find compounds that end with them: "berry" in "blackberry", "melon" in "watermelon". */
const COMPOUND_MIN_LETTERS = 5;

/**
 * Whether a plate term contains every word of a dislike (in any order): "red onion" is in "Onions, red, raw". A word
 * of 5 letters or more also finds an English compound ending with it ("berries" finds "Blackberries, raw"); shorter
 * ones match whole words only, so "corn" stays out of "peppercorns" and "egg" out of "eggplant". A dislike is a
 * warning the coach reads with the matched name beside it, so a compound that is not the disliked food ("apple" in
 * "pineapple") costs a glance, while a missed one would reach the client's plate. Common practice, no source.
 */
export function dislikeMatches(dislike: ReadonlySet<string>, term: ReadonlySet<string>): boolean {
  if (dislike.size === 0) return false;
  for (const w of dislike) if (!term.has(w) && !(w.length >= COMPOUND_MIN_LETTERS && endsOneOf(term, w))) return false;
  return true;
}

function endsOneOf(words: ReadonlySet<string>, ending: string): boolean {
  for (const t of words) if (t.length > ending.length && t.endsWith(ending)) return true;
  return false;
}

function dislikeList(list: readonly string[]): TermWords[] {
  const e = normalizedDislikes.get(list);
  if (e && sameList(e.from, list)) return e.list;
  const seen = new Set<string>();
  const out: TermWords[] = [];
  for (const d of list) {
    const term = normalizeTerm(d);
    if (!term || seen.has(term)) continue;
    seen.add(term);
    out.push({ term, words: termWords(term) });
  }
  normalizedDislikes.set(list, { from: [...list], list: out });
  return out;
}

function termList(list: readonly string[]): TermWords[] {
  const e = normalizedTerms.get(list);
  if (e && sameList(e.from, list)) return e.terms;
  const terms = [...new Set(list.map(normalizeTerm))].filter(Boolean).map((term) => ({ term, words: termWords(term) }));
  normalizedTerms.set(list, { from: [...list], terms });
  return terms;
}

function sumMacros(cells: readonly CheckCell[]): ExactMacros {
  const zero = new Decimal(0);
  return cells.reduce((t, c) => {
    const m = exactOf(c.macros);
    return { kcal: t.kcal.plus(m.kcal), netCarbsG: t.netCarbsG.plus(m.netCarbsG), proteinG: t.proteinG.plus(m.proteinG), fatG: t.fatG.plus(m.fatG) };
  }, { kcal: zero, netCarbsG: zero, proteinG: zero, fatG: zero });
}

/**
 * Fast exact path: plate macros are given to 0.1 (a board's plates are rounded so), so a day's sums are exact as
 * whole thousandths in ordinary integers, and every comparison with a target becomes an integer comparison
 * against a threshold computed once per client with decimal.js (an integer S beats x exactly when S > floor(x),
 * and falls short of x exactly when S < ceil(x)). Macros with more than three decimals take the Decimal path.
 */
const MILLI = 1000;
type MilliMacros = { kcal: number; netCarbsG: number; proteinG: number; fatG: number };
const milliMemo = new WeakMap<CellMacros, { from: CellMacros; milli: MilliMacros | null }>();

/** floor or ceil of x × 1000, exactly (x a target or limit). */
function milliThreshold(x: Decimal.Value, mode: 'floor' | 'ceil'): number {
  const scaled = new Decimal(x).times(MILLI);
  return (mode === 'floor' ? scaled.floor() : scaled.ceil()).toNumber();
}

function milliOf(x: number): number | null {
  const m = Math.round(x * MILLI);
  return Number.isSafeInteger(m) && m / MILLI === x ? m : null;
}

function milliMacros(m: CellMacros): MilliMacros | null {
  const e = milliMemo.get(m);
  if (e && e.from.kcal === m.kcal && e.from.netCarbsG === m.netCarbsG && e.from.proteinG === m.proteinG && e.from.fatG === m.fatG)
    return e.milli;
  const kcal = milliOf(m.kcal);
  const netCarbsG = milliOf(m.netCarbsG);
  const proteinG = milliOf(m.proteinG);
  const fatG = milliOf(m.fatG);
  const milli = kcal === null || netCarbsG === null || proteinG === null || fatG === null ? null : { kcal, netCarbsG, proteinG, fatG };
  milliMemo.set(m, { from: { kcal: m.kcal, netCarbsG: m.netCarbsG, proteinG: m.proteinG, fatG: m.fatG }, milli });
  return milli;
}

function sumMilli(cells: readonly CheckCell[]): MilliMacros | null {
  const t: MilliMacros = { kcal: 0, netCarbsG: 0, proteinG: 0, fatG: 0 };
  for (const c of cells) {
    const m = milliMacros(c.macros);
    if (!m) return null;
    t.kcal += m.kcal;
    t.netCarbsG += m.netCarbsG;
    t.proteinG += m.proteinG;
    t.fatG += m.fatG;
  }
  return Number.isSafeInteger(t.kcal + t.netCarbsG + t.proteinG + t.fatG) ? t : null;
}

/** Thousandths rounded half up to one decimal (non-negative sums). */
const milliRound1 = (m: number) => (m >= 0 ? Math.floor((m + 50) / 100) / 10 : round1(new Decimal(m).div(MILLI)));

/** A day's sums: exact thousandths (the fast path) or exact Decimals. Plain data, no closures (a board checks hundreds of days). */
type DaySums = { milli: MilliMacros; exact: null } | { milli: null; exact: ExactMacros };

function daySums(cells: readonly CheckCell[]): DaySums {
  const milli = sumMilli(cells);
  return milli ? { milli, exact: null } : { milli: null, exact: sumMacros(cells) };
}

function roundedTotals(s: DaySums): DayTotals {
  if (s.milli) return { kcal: milliRound1(s.milli.kcal), netCarbsG: milliRound1(s.milli.netCarbsG), proteinG: milliRound1(s.milli.proteinG), fatG: milliRound1(s.milli.fatG) };
  const e = s.exact;
  return { kcal: round1(e.kcal), netCarbsG: round1(e.netCarbsG), proteinG: round1(e.proteinG), fatG: round1(e.fatG) };
}

function macroWarnings(input: DayCheckInput, sums: DaySums, actual: DayTotals): WeekWarning[] {
  const rules: CheckRules = {
    proteinFloorShare: input.rules?.proteinFloorShare ?? DEFAULT_CHECK_RULES.proteinFloorShare,
    energyOverShare: input.rules?.energyOverShare ?? DEFAULT_CHECK_RULES.energyOverShare,
  };
  // Object literals, not spreads of a shared base: a board builds hundreds of these, and a spread costs microseconds.
  const { clientId, date } = input;
  const severity = 'warn' as const;
  const warnings: WeekWarning[] = [];
  const { targets } = input;

  const { floor, limit, capMilliFloor, floorMilliCeil, limitMilliFloor, floorG, limitKcal } = limitsOf(targets, rules);
  if (sums.milli ? sums.milli.netCarbsG > capMilliFloor : sums.exact.netCarbsG.gt(targets.netCarbCapG)) {
    const actualG = actual.netCarbsG;
    warnings.push({ severity, clientId, date, kind: 'net-carbs-over', actualG, capG: targets.netCarbCapG });
  }
  if (sums.milli ? sums.milli.proteinG < floorMilliCeil : sums.exact.proteinG.lt(floor)) {
    const actualG = actual.proteinG;
    warnings.push({ severity, clientId, date, kind: 'protein-short', actualG, targetG: targets.proteinG, floorG });
  }
  if (sums.milli ? sums.milli.kcal > limitMilliFloor : sums.exact.kcal.gt(limit)) {
    const actualKcal = actual.kcal;
    warnings.push({ severity, clientId, date, kind: 'energy-over', actualKcal, targetKcal: targets.targetKcal, limitKcal });
  }
  return warnings;
}

function allergenWarnings(input: DayCheckInput, cell: CheckCell): WeekWarning[] {
  return allergenConflicts(cell.allergens, input.clientAllergens).map((allergen) => {
    const reason = cell.allergenOverrides?.find((o) => o.allergen === allergen)?.reason.trim();
    const overridden = Boolean(reason);
    return {
      kind: 'allergen',
      severity: overridden ? 'warn' : 'block',
      clientId: input.clientId,
      date: input.date,
      slot: cell.slot,
      allergen,
      overridden,
      ...(overridden ? { reason } : {}),
    };
  });
}

/** One warning per dislike the plate meets, naming the first of its terms (ingredient, tray, tag) that holds it. */
function dislikeWarnings(input: DayCheckInput, cell: CheckCell): WeekWarning[] {
  if (input.clientDislikes.length === 0) return [];
  const terms = termList(cell.terms);
  const out: WeekWarning[] = [];
  for (const d of dislikeList(input.clientDislikes)) {
    const hit = terms.find((t) => dislikeMatches(d.words, t.words));
    if (!hit) continue;
    out.push({ kind: 'dislike', severity: 'warn', clientId: input.clientId, date: input.date, slot: cell.slot, term: d.term, matched: hit.term });
  }
  return out;
}

function portionWarning(input: DayCheckInput, cell: CheckCell, portion: CellPortion): WeekWarning | null {
  const { clientId, date } = input;
  const { slot } = cell;
  const { trayId, prepDate } = portion;
  const { status, eatBy } = portionStatus({ plannedDate: input.date, prepDate: portion.prepDate, fridgeDays: portion.fridgeDays });
  if (status === 'before-prep') {
    return { clientId, date, slot, trayId, prepDate, kind: 'before-prep', severity: 'block' };
  }
  if (portion.storage === 'frozen') {
    const qualityUntil = freezerQualityDate(portion.prepDate, portion.freezerWeeks ?? 0);
    if (compareIsoDates(input.date, qualityUntil) <= 0) return null;
    return { clientId, date, slot, trayId, prepDate, kind: 'past-freezer-quality', severity: 'warn', qualityUntil };
  }
  if (status === 'past-eat-by') {
    return { clientId, date, slot, trayId, prepDate, kind: 'past-eat-by', severity: 'block', eatBy };
  }
  return null;
}

/** Check one client's day. */
export function checkDay(input: DayCheckInput): DayCheck {
  const sums = daySums(input.cells);
  const totals = roundedTotals(sums);
  const warnings: WeekWarning[] = [...macroWarnings(input, sums, totals)];
  for (const cell of input.cells) {
    warnings.push(...allergenWarnings(input, cell), ...dislikeWarnings(input, cell));
    for (const portion of cell.portions) {
      const w = portionWarning(input, cell, portion);
      if (w) warnings.push(w);
    }
  }
  return {
    clientId: input.clientId,
    date: input.date,
    totals,
    warnings,
  };
}

/** Check many client-days; warnings come back flat, blocks first. */
export function checkWeek(days: readonly DayCheckInput[]): { days: DayCheck[]; warnings: WeekWarning[] } {
  const checked = days.map(checkDay);
  return { days: checked, warnings: flatWarnings(checked) };
}

/** Problems of one kind (each allergen apart, allowed by the coach apart from still to solve): how many, and whose. */
export interface WarningGroup {
  kind: WarningKind;
  /** The allergen of an allergen group (the other kinds: null). */
  allergen: AllergenCode | null;
  /** An allergen allowed by the coach with a reason (the other kinds: false). */
  allowed: boolean;
  count: number;
  /** The clients concerned, each once, in the order first met. */
  clientIds: string[];
}

/** A list of problems by kind, the most frequent first (a tie in the order first met): the long list at a glance. */
export function warningGroups(warnings: readonly WeekWarning[]): WarningGroup[] {
  const groups = new Map<string, WarningGroup>();
  for (const w of warnings) {
    const allergen = w.kind === 'allergen' ? w.allergen : null;
    const allowed = w.kind === 'allergen' && w.overridden;
    const key = `${w.kind}|${allergen}|${allowed}`;
    const g = groups.get(key) ?? { kind: w.kind, allergen, allowed, count: 0, clientIds: [] };
    groups.set(key, g);
    g.count++;
    if (!g.clientIds.includes(w.clientId)) g.clientIds.push(w.clientId);
  }
  // Array.prototype.sort is stable (ECMA-262 since 2019): equal counts keep the order first met.
  return [...groups.values()].sort((a, b) => b.count - a.count);
}

/** The warnings of checked days as one list, blocks first (the board's problem list; the week board page builds it). */
export function flatWarnings<W extends WeekWarning>(days: readonly { warnings: readonly W[] }[]): W[] {
  const warnings = days.flatMap((d) => d.warnings);
  return warnings.sort((a, b) => (a.severity === b.severity ? 0 : a.severity === 'block' ? -1 : 1));
}
