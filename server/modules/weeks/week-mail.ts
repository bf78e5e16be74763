import { toTempScale, type TempScale } from '@shared/domain/temperature.js';
import Decimal from 'decimal.js';
import type { EntityManager } from '@mikro-orm/postgresql';
import { amountAndName, type MeasureSystem } from '@shared/domain/units.js';
import { allergenLabel, clientAllergenNotes } from '@shared/domain/allergens.js';
import { CAUTIONS, thawTasks } from '@shared/domain/eat-by.js';
import { reheatGroups } from '@shared/domain/reheat.js';
import { snapshotTitle } from '@shared/domain/week-board.js';
import type { MyDayDto, MyPlateDto } from '@shared/schemas/weeks.schema.js';
import type { PdfMacros, WeekPlanPdfData, WeekPlanPdfDay } from '@shared/schemas/pdf.schema.js';
import { NotFound } from '../../http/errors.js';
import { registerAttachment, type RenderedAttachment } from '../mail/attachment-registry.js';
import { thawRemindersIcs } from './thaw-reminders-ics.js';
import { renderWeekPlanPdf } from '../pdf/week-plan.pdf.js';
import { longDate, toDateOrder, type DateOrder } from '@shared/domain/iso-date.js';
import { Client, type IClient } from '../clients/client.entity.js';
import { plannedTargets, slotShares } from '../clients/client.presenter.js';
import { mealSlotsOf } from '../clients/client.service.js';
import { Workspace } from '../workspaces/workspace.entity.js';
import { Membership } from '../auth/user.entity.js';
import { Week, WeekPublication } from './week.entity.js';
import { withYourList } from './week-publish.service.js';

/**
 * The week-plan PDF: one client's days from a PUBLISHED snapshot (what the client reads on "my plates"), never
 * from the live board. The mail job renders it at send time from `{ weekId, clientId, publicationVersion }`.
 */
export interface WeekPlanPayload {
  weekId: number;
  clientId: number;
  publicationVersion: number;
  note?: string | null;
}

export const WEEK_PLAN_PDF = 'week-plan';
/** The client's thaw reminders as a calendar file, sent beside the plan when the week has a frozen plate. */
export const THAW_REMINDERS_ICS = 'week-thaw-reminders';

function macros(m: MyPlateDto['macros']): PdfMacros {
  return { kcal: m.kcal, fatG: m.fatG, proteinG: m.proteinG, netCarbsG: m.netCarbsG, carbsG: m.carbsG };
}

function plateNotes(p: MyPlateDto, order: DateOrder, system?: MeasureSystem): string[] {
  const notes: string[] = [];
  if (p.storage === 'frozen' && p.thawOn) notes.push(`Frozen: move it from the freezer to the fridge on the evening of ${longDate(p.thawOn, order)}.`);
  if (p.allergens.length) notes.push(`Contains: ${p.allergens.map(allergenLabel).join(', ')}.`);
  for (const n of clientAllergenNotes(p.onYourList ?? [], p.allowedAllergens)) notes.push(`${n.title}. ${n.body}`);
  if (p.addOns.length) notes.push(`Add: ${p.addOns.map((a) => amountAndName(a.amountText, a.unit, a.name, system)).join('; ')}.`);
  return notes;
}

/**
 * The snapshot's days as the PDF lays them out; portions per plate = the client's household multiplier. With the
 * client's measure system, add-ons typed in the other one also give the client's amount.
 */
export function pdfDays(days: readonly MyDayDto[], householdMultiplier: Decimal.Value, order: DateOrder, system?: MeasureSystem): WeekPlanPdfDay[] {
  const portions = new Decimal(householdMultiplier).toString();
  return days.map((d) => ({
    date: d.date,
    slots: d.plates.map((p) => ({
      slot: p.slot,
      plateName: p.name,
      portions,
      assemblySteps: p.assemblySteps,
      reheat: reheatGroups(p),
      macros: macros(p.macros),
      eatBy: p.eatBy,
      notes: plateNotes(p, order, system),
    })),
    totals: macros(d.totals),
  }));
}

/**
 * What a plan's targets cover when the board plans part of the day: "breakfast and lunch, 50 % of your day"
 * (their shares of the client's day); null when the planned meals make the whole day.
 */
export function targetsCover(client: Pick<IClient, 'slotShares'>, slots: readonly string[]): string | null {
  const share = Object.values(slotShares(client, slots)).reduce((s, v) => s.plus(v), new Decimal(0));
  if (share.gte(1) || slots.length === 0) return null;
  const names = slots.map((s) => s.toLowerCase());
  const list = names.length === 1 ? names[0] : `${names.slice(0, -1).join(', ')} and ${names.at(-1)}`;
  return `${list}, ${share.times(100).toDecimalPlaces(0, Decimal.ROUND_HALF_UP).toString()} % of your day`;
}

export interface PublishedPlan {
  data: WeekPlanPdfData;
  client: IClient;
  weekName: string;
  startDate: string;
}

/**
 * One client's plan from publication `publicationVersion` of the week, scoped to the week's workspace (the client
 * must belong to it). NotFound when the publication, the client or their plates in it are missing.
 */
export async function publishedPlan(em: EntityManager, p: WeekPlanPayload, workspaceId?: number): Promise<PublishedPlan> {
  const week = await em.findOne(Week, { id: p.weekId, ...(workspaceId ? { workspace: workspaceId } : {}) });
  if (!week) throw new NotFound('Week');
  const wsId = week.workspace.id;
  const pub = await em.findOne(WeekPublication, { week: week.id, number: p.publicationVersion });
  if (!pub) throw new NotFound('Published week');
  const client = await em.findOne(Client, { id: p.clientId, workspace: wsId });
  if (!client) throw new NotFound('Client');
  const mine = pub.snapshot.clients[String(client.id)];
  if (!mine?.days.length) throw new NotFound("This client's plates in the published week");
  const ws = await em.findOneOrFail(Workspace, wsId);
  const slots = await mealSlotsOf(em, wsId);
  const t = plannedTargets(client, slots);
  // The client's own measure preference when they have an account (the plan is theirs to read); else as typed.
  const account = await clientAccountOf(em, client.id, wsId);
  const system = account ? (account.unitSystem === 'metric' ? 'metric' : 'us') : undefined;
  const tempScale = toTempScale(account?.tempUnit);
  return {
    client,
    weekName: snapshotTitle(pub.snapshot, toDateOrder(ws.dateOrder)),
    startDate: pub.snapshot.startDate,
    data: {
      businessName: ws.name,
      clientName: client.name,
      weekStart: pub.snapshot.startDate,
      dateOrder: toDateOrder(ws.dateOrder),
      targets: { kcal: t.targetKcal, fatG: t.fatG, proteinG: t.proteinG, netCarbsG: t.netCarbCapG },
      targetsCover: targetsCover(client, slots),
      days: pdfDays(withYourList(mine.days, client.allergens), client.householdMultiplier, toDateOrder(ws.dateOrder), system),
      note: p.note ?? null,
      cautions: CAUTIONS.map((c) => ({ text: c.text, source: c.source })),
      tempScale,
    },
  };
}

export async function renderPublishedPlan(em: EntityManager, p: WeekPlanPayload, workspaceId?: number): Promise<RenderedAttachment> {
  return renderWeekPlanPdf((await publishedPlan(em, p, workspaceId)).data);
}

/** The account a client signs in with, if any: the plan and its calendar file follow its measure and scale. */
async function clientAccountOf(em: EntityManager, clientId: number, workspaceId: number) {
  const m = await em.findOne(Membership, { clientId, workspace: workspaceId, role: 'client' }, { populate: ['user'] });
  return m?.user.$ ?? null;
}

/** A client's thaw reminders for a published week, as a calendar file (the download and the plan e-mail's). */
export function thawRemindersFile(
  week: { weekId: number; name: string; startDate: string },
  days: readonly MyDayDto[],
  order: DateOrder,
  tempScale: TempScale = 'F',
): RenderedAttachment {
  return {
    filename: `thaw-reminders-${week.startDate}.ics`,
    buffer: Buffer.from(thawRemindersIcs(thawTasks(days), { calendarName: `Thaw reminders, ${week.name}`, uidPrefix: `week${week.weekId}-thaw`, dateOrder: order, tempScale })),
    contentType: 'text/calendar; charset=utf-8',
  };
}

/** The thaw reminders of one client's published plan, rendered when the plan e-mail leaves. */
export async function renderThawReminders(em: EntityManager, p: WeekPlanPayload): Promise<RenderedAttachment> {
  const pub = await em.findOne(WeekPublication, { week: p.weekId, number: p.publicationVersion }, { populate: ['workspace'] });
  if (!pub) throw new NotFound('Published week');
  const days = pub.snapshot.clients[String(p.clientId)]?.days ?? [];
  const order = toDateOrder(pub.workspace.$.dateOrder);
  // In the client's own scale when they have an account, as their plan PDF.
  const scale = toTempScale((await clientAccountOf(em, p.clientId, pub.workspace.id))?.tempUnit);
  return thawRemindersFile({ weekId: p.weekId, name: snapshotTitle(pub.snapshot, order), startDate: pub.snapshot.startDate }, days, order, scale);
}

function payloadOf(raw: Record<string, unknown>): WeekPlanPayload {
  const n = (k: string) => {
    const v = Number(raw[k]);
    if (!Number.isInteger(v) || v <= 0) throw new Error(`week-plan PDF: bad ${k} in the payload`);
    return v;
  };
  return { weekId: n('weekId'), clientId: n('clientId'), publicationVersion: n('publicationVersion'), note: typeof raw.note === 'string' ? raw.note : null };
}

// Wiring at import time (the routes import this file): the mail job finds the renderer by kind.
registerAttachment(WEEK_PLAN_PDF, (em, payload) => renderPublishedPlan(em as EntityManager, payloadOf(payload)));
registerAttachment(THAW_REMINDERS_ICS, (em, payload) => renderThawReminders(em as EntityManager, payloadOf(payload)));
