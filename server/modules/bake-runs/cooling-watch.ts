import type { EntityManager } from '@mikro-orm/postgresql';
import { addDays, shortDate, toDateOrder, type IsoDate } from '@shared/domain/iso-date.js';
import { bothScales, checkCooling, CLOCKS_CHANGED, clockFrom, FOOD_CODE_COOLING, notWrittenDown, readingsSaid, type CoolingEntry } from '@shared/domain/cooling.js';
import { clockText, DEFAULT_CLOCK, minutesSpan, toClockStyle } from '@shared/domain/clock.js';
import { requireLocalMinutes } from '@shared/domain/bake-run-time.js';
import { instantOfWall, wallClockIn } from '@shared/domain/time-zone.js';
import { weekTitle } from '@shared/domain/week-board.js';
import { CoolingRecord, type ICoolingRecord } from './bake-run.entity.js';
import { Membership, type IMembership } from '../auth/user.entity.js';
import type { IWorkspace } from '../workspaces/workspace.entity.js';
import type { IWeek } from '../weeks/week.entity.js';
import { Outbox } from '../mail/outbox.entity.js';
import { coolingMissedMail, coolingNotWrittenMail, forReader, type MailBody } from '../mail/mail-templates.js';
import type { Actor } from '../../http/authz.js';
import { getWeekBakeRun } from './bake-run.service.js';
import { presentCooling } from './cooling.service.js';
import { appLink, mailKey, queueMail, type MailQueue } from '../mail/mail.service.js';
import { toTempScale } from '@shared/domain/temperature.js';

/**
 * The cooling watch: once a minute (a pg-boss schedule, server/modules/mail/mail-runtime.ts) the server reads its
 * clock in each workspace's kitchen time zone and looks at the cooling records of recent prep days. A tray whose
 * record passed a Food Code deadline (70 °F within 2 hours, 41 °F within 6 hours, FDA Food Code §3-501.14) with no
 * reading showing the stage met, and not written down as thrown away, is e-mailed to every coach and kitchen
 * assistant of the workspace: once per tray, stage and cooling start (a reheat and a new start is watched again).
 * It also watches for a tray forgotten in the record: on a prep day under way (at least one tray of the day written
 * down), a tray the day's bake run planned out NOT_WRITTEN_AFTER_MINUTES ago or more that the record does not have
 * is e-mailed to the same people, once per tray and planned time out.
 * Every run is idempotent (the e-mails' keys), so several instances and a retried job send nothing twice.
 *
 * A workspace without a time zone is not watched (its kitchen's time is unknown). Deadlines missed more than
 * WATCH_WINDOW_HOURS ago are not told (a server that was stopped for days does not send old news on start).
 */
export const COOLING_WATCH_QUEUE = 'cooling.watch';
/** Every minute (the cron of the pg-boss schedule). */
export const COOLING_WATCH_CRON = '* * * * *';
export const WATCH_WINDOW_HOURS = 24;
/**
 * How long after its planned time out a tray missing from the cooling record is e-mailed (common practice, no
 * source: longer than the page's own 5-minute prompt, so a check that keeps a tray in a little longer says nothing).
 */
export const NOT_WRITTEN_AFTER_MINUTES = 30;

export interface CoolingWatchDeps {
  mail: MailQueue;
  publicUrl: string;
}

export interface CoolingWatchResult {
  /** Records looked at (not thrown away, on a recent prep day of a workspace with a time zone). */
  watched: number;
  /** E-mails queued this run (ones queued by an earlier run are not counted). */
  queued: number;
}

/**
 * The deadline a record has missed at instant `at` in the kitchen's zone (its deadlines real hours after the start,
 * read on the kitchen's wall clock), the stage's temperature (°F), and how many minutes ago; or null.
 */
export function missedDeadline(
  entry: CoolingEntry,
  at: Date,
  zone: string,
): { stageF: number; deadline: string; minutesAgo: number; clocksChanged: boolean } | null {
  const check = checkCooling(entry, at, DEFAULT_CLOCK, zone);
  const ago = (deadline: string) => Math.floor((at.getTime() - instantOfWall(deadline, zone)) / 60_000);
  const { clocksChanged } = check;
  if (check.state === 'missed-70') return { stageF: FOOD_CODE_COOLING.firstStageF, deadline: check.by70, minutesAgo: ago(check.by70), clocksChanged };
  if (check.state === 'missed-41') return { stageF: FOOD_CODE_COOLING.finalF, deadline: check.by41, minutesAgo: ago(check.by41), clocksChanged };
  return null;
}

/** One run of the watch at instant `at` (the server's clock; tests pass their own). */
export async function watchCooling(em: EntityManager, deps: CoolingWatchDeps, at: Date = new Date()): Promise<CoolingWatchResult> {
  // Prep days from two days back to one ahead in UTC cover every zone's today and yesterday.
  const utcToday = at.toISOString().slice(0, 10) as IsoDate;
  const records = await em.find(
    CoolingRecord,
    // A record whose week was deleted stays in the cooling log, and is not watched (nothing to link to, nothing baked).
    { prepDate: { $gte: addDays(utcToday, -2), $lte: addDays(utcToday, 1) }, workspace: { timeZone: { $ne: null } }, week: { $ne: null } },
    { populate: ['workspace', 'week'], orderBy: { id: 'asc' } },
  );
  let queued = 0;
  // Who is told, read once per workspace in a run.
  const kitchens = new Map<number, Promise<IMembership[]>>();
  const kitchenOf = (wsId: number) => {
    let k = kitchens.get(wsId);
    if (!k) kitchens.set(wsId, (k = em.find(Membership, { workspace: wsId, role: { $in: ['coach', 'assistant'] } }, { populate: ['user'], orderBy: { id: 'asc' } })));
    return k;
  };
  const tell: Tell = { em, deps, kitchenOf };
  // The prep days under way: today's in the kitchen with at least one tray written down.
  const days = new Map<string, { ws: IWorkspace; weekId: number; prepDate: string; now: string; records: ICoolingRecord[] }>();
  for (const r of records) {
    const ws = r.workspace.unwrap();
    const week = r.week?.unwrap();
    if (!ws.timeZone || !week) continue;
    const now = wallClockIn(at, ws.timeZone);
    if (r.prepDate === now.slice(0, 10)) {
      const key = `${week.id}|${r.prepDate}`;
      const day = days.get(key) ?? { ws, weekId: week.id, prepDate: r.prepDate, now, records: [] };
      day.records.push(r);
      days.set(key, day);
    }
    if (r.discarded) continue;
    const missed = missedDeadline(presentCooling(r), at, ws.timeZone);
    if (!missed) continue;
    if (missed.minutesAgo > WATCH_WINDOW_HOURS * 60) continue;
    queued += await tellKitchen(tell, ws, week, r, missed);
  }
  for (const day of days.values()) queued += await tellForgotten(tell, day);
  return { watched: records.filter((r) => !r.discarded).length, queued };
}

/** What a run tells with: its entity manager, the mail queue, and the people of each workspace it tells (its coaches and kitchen assistants, read once a run). */
interface Tell {
  em: EntityManager;
  deps: CoolingWatchDeps;
  kitchenOf: (workspaceId: number) => Promise<IMembership[]>;
}

/**
 * The trays of a prep day under way that its bake run planned out NOT_WRITTEN_AFTER_MINUTES ago or more and the
 * cooling record does not have (the page names them after 5 minutes; this tells the kitchen with the page closed).
 */
async function tellForgotten(
  tell: Tell,
  day: { ws: IWorkspace; weekId: number; prepDate: string; now: string; records: ICoolingRecord[] },
): Promise<number> {
  const { ws } = day;
  const { em, deps } = tell;
  const order = toDateOrder(ws.dateOrder);
  const style = toClockStyle(ws.clock);
  // The run as the kitchen's pages read it (a start moved, a day planned again), by the workspace's own settings.
  const reader: Actor = { userId: 0, email: '', name: 'cooling watch', role: 'coach', workspaceId: ws.id, clientId: null, dateOrder: order, clock: style };
  const { run, weekName } = await getWeekBakeRun(em, reader, day.weekId, day.prepDate);
  if (!run) return 0;
  const nowMinute = requireLocalMinutes(day.now) - requireLocalMinutes(run.start);
  const late = notWrittenDown(run.trays, day.records, nowMinute, NOT_WRITTEN_AFTER_MINUTES);
  if (!late.length) return 0;
  let queued = 0;
  for (const tray of late) {
    queued += await mailKitchen(tell, ws, day.weekId, 'cnw', `${day.weekId}|${day.prepDate}|${tray.id}|${tray.outAt}`, (name) =>
      coolingNotWrittenMail({
        businessName: ws.name,
        name,
        trayName: tray.name,
        prepLabel: shortDate(day.prepDate as IsoDate, order),
        weekName,
        plannedOut: clockText(tray.outAt, style),
        late: minutesSpan(nowMinute - tray.outMinute),
        link: appLink(deps.publicUrl, `/weeks/${day.weekId}/bake-run?prepDate=${day.prepDate}#cooling-record-title`),
      }),
    );
  }
  return queued;
}

/**
 * One watch e-mail to each coach and kitchen assistant of the workspace, written for them by `write`; keyed by
 * `identity` and the person, so a later run (or a retried job) sends nothing again. Returns how many were queued.
 */
async function mailKitchen(
  tell: Tell,
  ws: IWorkspace,
  weekId: number,
  prefix: string,
  identity: string,
  write: (name: string) => MailBody,
): Promise<number> {
  const { em, deps } = tell;
  const people = (await tell.kitchenOf(ws.id)).map((m) => ({ user: m.user.unwrap(), key: mailKey(prefix, `${identity}|u${m.user.id}`) }));
  // The ones told by an earlier run, in one query.
  const sent = new Set((await em.find(Outbox, { idempotencyKey: { $in: people.map((p) => p.key) } }, { fields: ['idempotencyKey'] })).map((o) => o.idempotencyKey));
  let queued = 0;
  for (const { user, key } of people) {
    if (sent.has(key)) continue;
    // Each person reads the temperatures in their own scale first.
    const body = forReader(write(user.name), toTempScale(user.tempUnit));
    await queueMail(em, deps.mail, { workspaceId: ws.id, kind: 'cooling-missed', to: user.email, subject: body.subject, text: body.text, html: body.html, weekId, idempotencyKey: key });
    queued += 1;
  }
  return queued;
}

/** What the kitchen does about a missed stage, in the cooling check's words (shared/domain/cooling.ts). */
function whatToDo(stageF: number, reheated: boolean): string {
  const code = ' (common practice; your local food code decides).';
  if (stageF === FOOD_CODE_COOLING.finalF) return `Throw it away${code}`;
  if (reheated) return `It has been reheated once already: throw it away${code}`;
  return `Reheat it to ${bothScales(165)} and start cooling again, or throw it away${code}`;
}

async function tellKitchen(
  tell: Tell,
  ws: IWorkspace,
  week: IWeek,
  r: ICoolingRecord,
  missed: { stageF: number; deadline: string; clocksChanged: boolean },
): Promise<number> {
  const order = toDateOrder(ws.dateOrder);
  const style = toClockStyle(ws.clock);
  // The cooling clock's start: a reheat starts it again, and the watch tells of the new start's deadlines too.
  const from = r.restartedAt ?? r.outAt;
  const readings = readingsSaid(r.readings, r.outAt, style);
  const query = r.prepDate === week.prepDate ? '' : `?prepDate=${r.prepDate}`;
  return mailKitchen(tell, ws, week.id, 'cdm', `${r.id}|${from}|${missed.stageF}`, (name) =>
    coolingMissedMail({
      businessName: ws.name,
      name,
      trayName: r.trayName,
      prepLabel: shortDate(r.prepDate as IsoDate, order),
      weekName: weekTitle(week, order),
      stage: bothScales(missed.stageF),
      deadline: clockFrom(missed.deadline, r.outAt, style),
      outAt: clockFrom(r.outAt, r.outAt, style),
      restartedAt: r.restartedAt ? clockFrom(r.restartedAt, r.outAt, style) : null,
      readings,
      said: whatToDo(missed.stageF, r.restartedAt != null) + (missed.clocksChanged ? ` ${CLOCKS_CHANGED}` : ''),
      link: appLink(tell.deps.publicUrl, `/weeks/${week.id}/bake-run${query}#cooling-record-title`),
    }),
  );
}
