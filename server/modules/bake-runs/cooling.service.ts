import type { EntityManager } from '@mikro-orm/postgresql';
import { prepDatesOf, weekTitle } from '@shared/domain/week-board.js';
import { longDate, shortDate, type IsoDate } from '@shared/domain/iso-date.js';
import type { CoolingListDto, CoolingRecordDto, CoolingRecordValues } from '@shared/schemas/cooling.schema.js';
import type { GlanceDto } from '@shared/schemas/weeks.schema.js';
import { bothScales, checkCooling, checkOnPaper, clockFrom, countedFrom, FOOD_CODE_COOLING, readingsSaid, type CoolingCheck } from '@shared/domain/cooling.js';
import { DEFAULT_CLOCK, type ClockStyle } from '@shared/domain/clock.js';
import { clockOf, datesOf, type Actor } from '../../http/authz.js';
import { NotFound, StaleEdit, ValidationError } from '../../http/errors.js';
import { Week, WeekTray, type IWeek } from '../weeks/week.entity.js';
import { Tray } from '../trays/tray.entity.js';
import { CoolingRecord, type ICoolingRecord } from './bake-run.entity.js';
import { Membership } from '../auth/user.entity.js';
import { Workspace } from '../workspaces/workspace.entity.js';
import { forReader, trayKeptMail, trayThrownAwayMail } from '../mail/mail-templates.js';
import { appLink, mailKey, queueMail, type MailQueue } from '../mail/mail.service.js';
import { toTempScale } from '@shared/domain/temperature.js';

/** Where a thrown-away tray is told: the mail queue and the app's address for the link. */
export interface CoolingAlerts {
  mail: MailQueue;
  publicUrl: string;
}

/** A record as the API gives it (and as the cooling checks read it: a CoolingEntry). */
export function presentCooling(r: ICoolingRecord): CoolingRecordDto {
  return {
    runTrayId: r.runTrayId,
    trayName: r.trayName,
    outAt: r.outAt,
    restartedAt: r.restartedAt ?? null,
    readings: r.readings.map((x) => ({ at: x.at, tempF: x.tempF })),
    discarded: r.discarded,
    note: r.note,
    recordedBy: r.recordedBy,
    updatedAt: r.updatedAt.toISOString(),
    version: r.version,
  };
}

/** The week (of the actor's workspace: another's is a 404) and the prep date asked for (one of the week's). */
async function weekAndDate(em: EntityManager, actor: Actor, weekId: number, wanted: string | undefined): Promise<{ week: IWeek; prepDate: string }> {
  const week = await em.findOne(Week, { id: weekId, workspace: actor.workspaceId });
  if (!week) throw new NotFound('Week');
  const dates = prepDatesOf(week);
  if (wanted !== undefined && !dates.includes(wanted)) throw ValidationError.field('prepDate', `This week's prep dates are ${dates.join(' and ')}.`);
  return { week, prepDate: wanted ?? week.prepDate };
}

/** GET /api/weeks/:weekId/bake-run/cooling: the prep day's cooling records (coach or assistant), by time out. */
export async function listCooling(em: EntityManager, actor: Actor, weekId: number, wanted?: string): Promise<CoolingListDto> {
  const { week, prepDate } = await weekAndDate(em, actor, weekId, wanted);
  const [rows, ws] = await Promise.all([
    em.find(CoolingRecord, { week: week.id, prepDate }, { orderBy: { outAt: 'asc', runTrayId: 'asc' } }),
    em.findOneOrFail(Workspace, actor.workspaceId, { fields: ['timeZone'] }),
  ]);
  return { weekId: week.id, prepDate, records: rows.map(presentCooling), timeZone: ws.timeZone ?? null };
}

/**
 * A week's cooling trouble for the coach's glance: the trays thrown away, and those past a deadline with no reading
 * showing the stage met, by prep date and time out. With the kitchen's time zone they are judged at the kitchen's
 * time now (a tray with no reading at all is past its deadline too); without it, on paper (only a reading can show
 * a deadline missed).
 */
export async function coolingTrouble(em: EntityManager, workspaceId: number, weekId: number, at: Date = new Date()): Promise<GlanceDto['cooling']> {
  const [rows, ws] = await Promise.all([
    em.find(CoolingRecord, { week: weekId }, { orderBy: { prepDate: 'asc', outAt: 'asc' } }),
    em.findOneOrFail(Workspace, workspaceId, { fields: ['timeZone'] }),
  ]);
  const zone = ws.timeZone;
  const named = (r: ICoolingRecord) => ({ trayName: r.trayName, prepDate: r.prepDate as IsoDate });
  const judged = (r: ICoolingRecord) => (zone ? checkCooling(presentCooling(r), at, DEFAULT_CLOCK, zone) : checkOnPaper(presentCooling(r)));
  return {
    thrownAway: rows.filter((r) => r.discarded).map(named),
    missed: rows.filter((r) => !r.discarded && judged(r).tone === 'block').map(named),
  };
}

/** The name the run gives tray `runTrayId` ("12-2" → "Chive egg slab (2/3)"), or a 404 when the run has no such tray. */
async function runTrayName(em: EntityManager, week: IWeek, prepDate: string, runTrayId: string): Promise<string> {
  const [trayId, k] = runTrayId.split('-').map(Number);
  const row = await em.findOne(WeekTray, { week: week.id, prepDate, tray: trayId });
  const tray = row && row.trayCount >= k ? await em.findOne(Tray, { id: trayId }) : null;
  if (!row || !tray) throw new NotFound('Tray of this run');
  return row.trayCount > 1 ? `${tray.name} (${k}/${row.trayCount})` : tray.name;
}

/**
 * PUT /api/weeks/:weekId/bake-run/cooling/:runTrayId: writes down one tray's cooling (coach or assistant). The first
 * write creates the record (no `version`); later ones replace it whole and need the version read (409 when stale).
 */
export async function putCooling(
  em: EntityManager,
  actor: Actor,
  weekId: number,
  runTrayId: string,
  v: CoolingRecordValues,
  alerts?: CoolingAlerts,
): Promise<CoolingRecordDto> {
  const { week, prepDate } = await weekAndDate(em, actor, weekId, v.prepDate);
  if (v.outAt.slice(0, 10) !== prepDate)
    throw ValidationError.field('outAt', `It came out on the prep day, ${longDate(prepDate, datesOf(actor))}: keep that date and change the time.`);
  const fields = {
    outAt: v.outAt,
    restartedAt: v.restartedAt,
    readings: v.readings,
    discarded: v.discarded,
    note: v.note,
    recordedBy: actor.name,
  };
  // The record and, when it newly says "thrown away", the coaches' e-mails: both or neither.
  return em.transactional(async (tx) => {
    const row = await tx.findOne(CoolingRecord, { week: week.id, prepDate, runTrayId });
    if (row) {
      if (v.version !== row.version) throw new StaleEdit(row.version, presentCooling(row));
      const wasDiscarded = row.discarded;
      tx.assign(row, fields);
      await tx.flush();
      if (row.discarded !== wasDiscarded && alerts) await tellCoaches(tx, actor, week, row, alerts);
      return presentCooling(row);
    }
    if (v.version !== undefined) throw new StaleEdit(null);
    const trayName = await runTrayName(tx, week, prepDate, runTrayId);
    const created = tx.create(CoolingRecord, { workspace: actor.workspaceId, week: week.id, prepDate, runTrayId, trayName, ...fields });
    await tx.flush();
    if (created.discarded && alerts) await tellCoaches(tx, actor, week, created, alerts);
    return presentCooling(created);
  });
}

/** "It was not at 70 °F (21 °C) by 10:35, 2 hours after it came out (FDA Food Code §3-501.14)." or null. */
function missedOnPaper(paper: CoolingCheck, r: ICoolingRecord, style: ClockStyle): string | null {
  const { firstStageF, finalF } = FOOD_CODE_COOLING;
  if (paper.state === 'missed-70')
    return `It was not at ${bothScales(firstStageF)} by ${clockFrom(paper.by70, r.outAt, style)}, 2 hours after ${countedFrom(r)} (FDA Food Code §3-501.14).`;
  if (paper.state === 'missed-41')
    return `It was not at ${bothScales(finalF)} by ${clockFrom(paper.by41, r.outAt, style)}, 6 hours after ${countedFrom(r)} (FDA Food Code §3-501.14).`;
  return null;
}

/**
 * A tray written down as thrown away, or as kept after all: an e-mail to each coach of the workspace but the one who
 * wrote it (its portions no longer count as baked, or count again; the coach decides what to bake or change). One
 * per change of the record (its version) and coach: a job retried sends nothing twice.
 */
async function tellCoaches(em: EntityManager, actor: Actor, week: IWeek, r: ICoolingRecord, alerts: CoolingAlerts): Promise<void> {
  const coaches = await em.find(Membership, { workspace: actor.workspaceId, role: 'coach' }, { populate: ['user'], orderBy: { id: 'asc' } });
  const to = coaches.map((m) => m.user.unwrap()).filter((u) => u.id !== actor.userId);
  if (!to.length) return;
  const ws = await em.findOneOrFail(Workspace, actor.workspaceId, { fields: ['name', 'timeZone'] });
  const order = datesOf(actor);
  const style = clockOf(actor);
  const said = {
    businessName: ws.name,
    trayName: r.trayName,
    prepLabel: shortDate(r.prepDate as IsoDate, order),
    weekName: weekTitle(week, order),
    recordedBy: r.recordedBy,
    link: appLink(alerts.publicUrl, `/weeks/${week.id}`),
  };
  const paper = checkOnPaper({ ...presentCooling(r), discarded: false }, ws.timeZone ?? null);
  const readings = readingsSaid(r.readings, r.outAt, style);
  for (const coach of to) {
    const written = r.discarded
      ? trayThrownAwayMail({
          ...said,
          name: coach.name,
          outAt: clockFrom(r.outAt, r.outAt, style),
          restartedAt: r.restartedAt ? clockFrom(r.restartedAt, r.outAt, style) : null,
          readings,
          // A deadline its readings show as missed is why, most often.
          standing: missedOnPaper(paper, r, style),
          note: r.note || null,
        })
      : trayKeptMail({ ...said, name: coach.name });
    // In the coach's own scale first.
    const body = forReader(written, toTempScale(coach.tempUnit));
    await queueMail(em, alerts.mail, {
      workspaceId: actor.workspaceId,
      kind: 'cooling-record',
      to: coach.email,
      subject: body.subject,
      text: body.text,
      html: body.html,
      weekId: week.id,
      idempotencyKey: mailKey('tta', `${r.id}|v${r.version}|u${coach.id}`),
    });
  }
}

/** DELETE /api/weeks/:weekId/bake-run/cooling/:runTrayId: a record written by mistake (coach or assistant). */
export async function deleteCooling(em: EntityManager, actor: Actor, weekId: number, runTrayId: string, q: { prepDate?: string; version: number }): Promise<void> {
  const { week, prepDate } = await weekAndDate(em, actor, weekId, q.prepDate);
  const row = await em.findOne(CoolingRecord, { week: week.id, prepDate, runTrayId });
  if (!row) throw new NotFound('Cooling record');
  if (q.version !== row.version) throw new StaleEdit(row.version, presentCooling(row));
  em.remove(row);
  await em.flush();
}
