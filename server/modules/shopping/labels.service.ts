import type { EntityManager } from '@mikro-orm/postgresql';
import QRCode from 'qrcode';
import Decimal from 'decimal.js';
import { allergenConflicts, allergenLabel, type AllergenCode } from '@shared/domain/allergens.js';
import { eatByDate, freezerQualityDate } from '@shared/domain/eat-by.js';
import { compareIsoDates, type IsoDate } from '@shared/domain/iso-date.js';
import { compareNames } from '@shared/domain/words.js';
import { labelCarbohydrate, labelPanel } from '@shared/domain/label-rounding.js';
import { toVector, type NutrientVector } from '@shared/domain/nutrition.js';
import { cellPrepDate, computeBoard } from '@shared/domain/week-board.js';
import {
  labelsQuerySchema,
  type ContainerLabelDto,
  type LabelMacrosDto,
  type LabelSheetDto,
  type LabelsQuery,
  type ShortTrayDto,
} from '@shared/schemas/shopping.schema.js';
import type { Actor } from '../../http/authz.js';
import { ValidationError } from '../../http/errors.js';
import { plateFacts } from '../assemblies/plate-facts.js';
import { boardInput, findWeek, loadBoardData, prepDatesOf } from '../weeks/week-board.service.js';

/**
 * What a container label prints, per portion, rounded per 21 CFR 101.9(c) (shared/domain/label-rounding.ts).
 * Net carbs have no regulatory definition: they follow the workspace's rule and the carbohydrate rounding step.
 */
export function labelMacros(v: NutrientVector): LabelMacrosDto {
  const panel = labelPanel(v);
  return {
    calories: panel.kcal.text,
    fat: panel.fatG.text,
    carbohydrate: panel.carbsG.text,
    protein: panel.proteinG.text,
    netCarbs: labelCarbohydrate(Decimal.max(v.netCarbsG, 0)).text,
  };
}

export function allergenText(codes: readonly AllergenCode[]): string {
  return codes.length ? `Contains: ${codes.map(allergenLabel).join(', ')}` : 'No major allergens listed';
}

const qrCache = new Map<string, string>();

/** The address as an SVG QR code data URL (error correction M). */
export async function qrDataUrl(url: string): Promise<string> {
  const hit = qrCache.get(url);
  if (hit) return hit;
  const svg = await QRCode.toString(url, { type: 'svg', errorCorrectionLevel: 'M', margin: 1 });
  const data = `data:image/svg+xml;base64,${Buffer.from(svg).toString('base64')}`;
  if (qrCache.size > 2000) qrCache.clear();
  qrCache.set(url, data);
  return data;
}

const minDate = (dates: IsoDate[]): IsoDate | null => (dates.length ? [...dates].sort(compareIsoDates)[0] : null);

interface Draft extends Omit<ContainerLabelDto, 'qr'> {
  sort: string;
}

/**
 * The container labels of one prep day: one per board cell (a client's plate) supplied by that prep date, then one
 * per spare portion of each tray baked that day (labelled with the tray's name). QR codes point at the client's
 * plates of that day, or at the tray.
 */
export async function weekLabels(
  em: EntityManager,
  actor: Actor,
  weekId: number,
  query: LabelsQuery,
  publicUrl: string,
): Promise<LabelSheetDto> {
  const q = labelsQuerySchema.parse(query);
  const week = await findWeek(em, actor, weekId);
  const prepDates = prepDatesOf(week);
  const prepDate = q.prepDate ?? prepDates[0];
  if (!prepDates.includes(prepDate)) {
    throw ValidationError.field('prepDate', `This week's prep dates are ${prepDates.join(' and ')}`);
  }
  const data = await loadBoardData(em, actor, week);
  const input = boardInput(data);
  const result = computeBoard(input);
  const base = publicUrl.replace(/\/+$/, '');
  const clients = new Map(data.clients.map((c) => [c.id, c]));
  const plates = new Map(data.assemblies.map((a) => [a.id, a]));
  const cellResults = new Map(result.cells.map((c) => [`${c.clientId}|${c.date}|${c.slot}`, c]));
  const slotRank = (slot: string) => {
    const i = data.slots.indexOf(slot);
    return String(i < 0 ? 99 : i).padStart(2, '0');
  };
  // Trays this prep day has fewer portions of than its plates need (thrown away, or too few trays set): the plates
  // that use them may not all be fillable. Which ones go without is the coach's choice on the week board.
  const short: ShortTrayDto[] = [];
  for (const tally of result.inventory) {
    const day = tally.byPrepDate.find((b) => b.prepDate === prepDate);
    const tray = data.ctx.trays.get(Number(tally.trayId));
    if (!day || !tray || day.short <= 0) continue;
    const trayCount = data.trays.filter((t) => t.tray.id === tray.id && t.prepDate === prepDate).reduce((n, t) => n + t.trayCount, 0);
    short.push({ trayId: tray.id, trayName: tray.name, portions: day.short, lostTrays: day.lostTrays, trayCount, plateLabels: 0 });
  }
  const shortById = new Map(short.map((t) => [t.trayId, t]));
  const drafts: Draft[] = [];

  for (const cell of data.cells) {
    if (cellPrepDate({ date: cell.date, prepDate: cell.prepDate ?? null }, prepDates) !== prepDate) continue;
    const client = clients.get(cell.client.id);
    const plate = plates.get(cell.assembly.id);
    if (!client || !plate) continue;
    const facts = plateFacts(plate, data.ctx);
    const trays = facts.trays.map((t) => data.ctx.trays.get(t.trayId)).filter((t) => t !== undefined);
    const portions = cellResults.get(`${cell.client.id}|${cell.date}|${cell.slot}`)?.portions ?? [];
    const frozen = cell.storage === 'frozen';
    // A plate of add-ons only is put together fresh: eat it on its day.
    const eatBy = minDate(portions.map((p) => p.eatBy)) ?? cell.date;
    const freezerWeeks = trays.length ? Math.min(...trays.map((t) => t.freezerWeeks)) : 0;
    const multiplier = new Decimal(client.householdMultiplier ?? 1);
    const shortTrays = [...new Set(facts.trays.map((t) => shortById.get(t.trayId)).filter((t) => t !== undefined))];
    for (const t of shortTrays) t.plateLabels += 1;
    drafts.push({
      sort: `0|${cell.date}|${slotRank(cell.slot)}|${client.name}`,
      kind: 'plate',
      title: client.name,
      clientId: client.id,
      subtitle: plate.name,
      planned: { date: cell.date, slot: cell.slot },
      portions: multiplier.eq(1) ? null : multiplier.toString(),
      madeOn: prepDate,
      eatBy: frozen ? cell.date : eatBy,
      freezeBy: !frozen && freezerWeeks > 0 && trays.length ? eatBy : null,
      frozenBestBy: frozen ? freezerQualityDate(prepDate, Math.max(freezerWeeks, 0)) : null,
      reheat: plate.reheatSteps?.[0] ?? trays.find((t) => t.reheatSteps.length)?.reheatSteps[0] ?? null,
      macros: facts.complete ? labelMacros(facts.vector) : null,
      allergens: facts.allergens,
      allergenText: allergenText(facts.allergens),
      onClientList: allergenConflicts(facts.allergens, client.allergens as AllergenCode[]),
      url: `${base}/my-plates?date=${cell.date}`,
      shortTrays: shortTrays.map((t) => t.trayName),
    });
  }

  // Spare portions of the trays baked that day: one container each, named after the tray.
  for (const tally of result.inventory) {
    const day = tally.byPrepDate.find((b) => b.prepDate === prepDate);
    const tray = data.ctx.trays.get(Number(tally.trayId));
    if (!day || !tray || day.spare <= 0) continue;
    const eatBy = eatByDate(prepDate, tray.fridgeDays);
    const macros = tray.perPortion ? labelMacros(toVector(tray.perPortion, data.ctx.rule)) : null;
    for (let i = 0; i < Math.floor(day.spare); i++) {
      drafts.push({
        sort: `1|${tray.name}|${String(i).padStart(4, '0')}`,
        kind: 'spare',
        title: tray.name,
        clientId: null,
        subtitle: 'Spare portion',
        planned: null,
        portions: null,
        madeOn: prepDate,
        eatBy,
        freezeBy: tray.freezerWeeks > 0 ? eatBy : null,
        frozenBestBy: null,
        reheat: tray.reheatSteps[0] ?? null,
        macros,
        allergens: tray.allergens,
        allergenText: allergenText(tray.allergens),
        onClientList: [],
        url: `${base}/trays/${tray.id}`,
        shortTrays: [],
      });
    }
  }

  drafts.sort((a, b) => compareNames(a.sort, b.sort));
  const labels = await Promise.all(drafts.map(async ({ sort: _sort, ...d }) => ({ ...d, qr: await qrDataUrl(d.url) })));
  return { layout: q.layout, prepDate, prepDates, labels, short: short.sort((a, b) => compareNames(a.trayName, b.trayName)) };
}
