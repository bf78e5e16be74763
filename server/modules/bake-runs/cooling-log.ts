/**
 * The kitchen's cooling log: every tray's cooling record over a stretch of prep days (whatever week it was baked for,
 * a deleted week's too), with where each one ended against FDA Food Code §3-501.14. What a cooling log is kept for,
 * and for how long, is the local food code's and the inspector's to say; this is the record as written down.
 */
import type { EntityManager } from '@mikro-orm/postgresql';
import Papa from 'papaparse';
import { addDays, type IsoDate } from '@shared/domain/iso-date.js';
import { addLocalMinutes } from '@shared/domain/bake-run-time.js';
import { bothScales, checkCooling, checkOnPaper, coolingResult, FOOD_CODE_COOLING, inTakenOrder, type CoolingCheck, type CoolingEntry } from '@shared/domain/cooling.js';
import { DEFAULT_CLOCK, type ClockStyle } from '@shared/domain/clock.js';
import { inReadersScale, type TempScale } from '@shared/domain/temperature.js';
import { weekTitle } from '@shared/domain/week-board.js';
import type { CoolingLogDto, CoolingLogQuery, CoolingLogRow } from '@shared/schemas/cooling.schema.js';
import { clockOf, datesOf, type Actor } from '../../http/authz.js';
import { Workspace } from '../workspaces/workspace.entity.js';
import { CoolingRecord } from './bake-run.entity.js';
import { presentCooling } from './cooling.service.js';

/**
 * Where a record stands for the log at instant `at`. With the kitchen's zone, at the kitchen's time. Without it the
 * server does not know the kitchen's time: a record from three days back or more (later than any deadline in any
 * zone: the time out is on the prep day, a restart within a day of it, the last deadline 6 hours after, so at the
 * latest 05:59 two days after the prep day, and no zone runs more than 12 hours behind UTC, from memory) is judged
 * after its deadlines; a newer one on its readings alone.
 */
export function logCheck(entry: CoolingEntry, prepDate: IsoDate, zone: string | null, at: Date, style: ClockStyle = DEFAULT_CLOCK): CoolingCheck {
  if (zone) return checkCooling(entry, at, style, zone);
  const utcToday = at.toISOString().slice(0, 10) as IsoDate;
  if (prepDate > addDays(utcToday, -3)) return checkOnPaper(entry);
  return checkCooling(entry, addLocalMinutes(entry.restartedAt ?? entry.outAt, FOOD_CODE_COOLING.totalMinutes + 1), style);
}

/** GET /api/cooling-log?from=&to=: the workspace's cooling records of those prep days, by prep date and time out. */
export async function coolingLog(em: EntityManager, actor: Actor, q: CoolingLogQuery, at: Date = new Date()): Promise<CoolingLogDto> {
  const [records, ws] = await Promise.all([
    em.find(
      CoolingRecord,
      { workspace: actor.workspaceId, prepDate: { $gte: q.from, $lte: q.to } },
      { populate: ['week'], orderBy: { prepDate: 'asc', outAt: 'asc', id: 'asc' } },
    ),
    em.findOneOrFail(Workspace, actor.workspaceId, { fields: ['timeZone'] }),
  ]);
  const zone = ws.timeZone ?? null;
  const style = clockOf(actor);
  const order = datesOf(actor);
  const rows: CoolingLogRow[] = records.map((r) => {
    const record = presentCooling(r);
    const c = logCheck(record, r.prepDate as IsoDate, zone, at, style);
    const week = r.week?.unwrap() ?? null;
    return {
      ...record,
      id: r.id,
      prepDate: r.prepDate,
      weekId: week?.id ?? null,
      weekName: week ? weekTitle(week, order) : null,
      readings: inTakenOrder(record.readings),
      state: c.state,
      by70: c.by70,
      by41: c.by41,
      reached70At: c.reached70At,
      reached41At: c.reached41At,
      result: coolingResult(c, style),
    };
  });
  return { from: q.from, to: q.to, timeZone: zone, rows };
}

export const COOLING_LOG_CSV_COLUMNS = [
  'Prep date',
  'Week',
  'Tray',
  'Out at',
  'Cooling started again at',
  'Readings',
  `${bothScales(FOOD_CODE_COOLING.firstStageF)} by`,
  `${bothScales(FOOD_CODE_COOLING.finalF)} by`,
  `${bothScales(FOOD_CODE_COOLING.firstStageF)} reached at`,
  `${bothScales(FOOD_CODE_COOLING.finalF)} reached at`,
  'Result',
  'Note',
  'Written down by',
] as const;

/** A kitchen time as the file writes it: "2026-12-02 14:05" (the kitchen's wall clock, 24-hour, sorts as text). */
const when = (local: string | null) => (local ? local.replace('T', ' ') : '');

/**
 * The log as CSV (RFC 4180 via papaparse), one row per tray; times are the kitchen's ("2026-12-02 14:05"),
 * temperatures in both scales as written on the page, the reader's first. Cells a spreadsheet would run as a
 * formula are escaped.
 */
export function coolingLogCsv(log: CoolingLogDto, scale: TempScale = 'F'): string {
  const data = log.rows.map((r) => [
    r.prepDate,
    r.weekName ?? '(week deleted)',
    r.trayName,
    when(r.outAt),
    when(r.restartedAt),
    r.readings.map((x) => `${when(x.at)} ${bothScales(x.tempF)}`).join('; '),
    when(r.by70),
    when(r.by41),
    when(r.reached70At),
    when(r.reached41At),
    r.result,
    r.note,
    r.recordedBy,
  ]);
  // Both scales everywhere, the reader's first (their Settings), as on the page.
  const flip = (cell: string) => inReadersScale(cell, scale);
  return Papa.unparse({ fields: COOLING_LOG_CSV_COLUMNS.map(flip), data: data.map((row) => row.map(flip)) }, { escapeFormulae: true, newline: '\r\n' });
}
