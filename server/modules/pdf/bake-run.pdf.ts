import type { BakeEvent, BakeRunResult } from '@shared/domain/bake-run-types.js';
import { CAUTIONS } from '@shared/domain/eat-by.js';
import { bothScales, inReadersScale, toCelsiusRounded, type TempScale } from '@shared/domain/temperature.js';
import { cautionsBlock, createDoc, finishDoc, heading, paragraph, table } from './pdf-document.js';
import { DEFAULT_DATE_ORDER, longDate, type DateOrder } from '@shared/domain/iso-date.js';
import { replannedSummary } from '@shared/domain/bake-run-words.js';
import { checkOnPaper, clockFrom, FOOD_CODE_COOLING, inTakenOrder, type CoolingState, type RecordedCooling } from '@shared/domain/cooling.js';
import { clockText, DEFAULT_CLOCK, type ClockStyle } from '@shared/domain/clock.js';

export interface BakeRunPdfMeta {
  businessName: string;
  /** e.g. "Bake run, Sun 6 Dec". */
  title: string;
  filename?: string;
  /** How the workspace writes dates (absent: month-day). */
  dateOrder?: DateOrder;
  /** How the workspace writes a time of day (absent: 24-hour). */
  clock?: ClockStyle;
  /** Planned again part-way through the day: when the rest starts and how many trays were already out. */
  replanned?: { from: string; kept: number } | null;
  /** What the cooling record says so far (a sheet printed before the bake has none: its lines are written by hand). */
  cooling?: readonly (RecordedCooling & { recordedBy?: string })[];
  /** The kitchen's time zone: its deadlines are real hours on the kitchen's clock (across a daylight-time change too). */
  timeZone?: string | null;
  /** The reader's temperature scale, written first in every pair and alone in the cooling columns' heads (absent: °F). */
  tempScale?: TempScale;
}

/** A temperature in the reader's scale alone, whole degrees ("70 °F", "21 °C"): short column heads and results. */
const inScale = (f: number, scale: TempScale) => (scale === 'C' ? `${toCelsiusRounded(f)} °C` : `${f} °F`);

/** A record's result as the paper says it; a stage still running is left to write. */
const resultSaid = (state: CoolingState, scale: TempScale): string =>
  ({
    'to-70': '',
    'to-41': '',
    cooled: 'Cooled in time',
    'missed-70': `Missed ${inScale(FOOD_CODE_COOLING.firstStageF, scale)}: reheat or throw away`,
    'missed-41': `Missed ${inScale(FOOD_CODE_COOLING.finalF, scale)}: throw away`,
    discarded: 'Thrown away',
  })[state];

/** Initials of the person who wrote a record down ("Kit Moreno" → "KM"). */
const initials = (name: string | undefined) =>
  (name ?? '')
    .split(/\s+/)
    .filter(Boolean)
    .map((w) => w[0]!.toUpperCase())
    .join('');

type Deg = (f: number | null | undefined) => string;

function what(e: BakeEvent, trayName: (id: string | null) => string, clock: (local: string) => string, deg: Deg): string {
  const tray = trayName(e.trayId);
  switch (e.kind) {
    case 'preheat':
      return `Preheat to ${deg(e.tempF)}`;
    case 'setpoint-change':
      return e.fromF === e.tempF ? `Stays at ${deg(e.tempF)}` : `Change set point from ${deg(e.fromF)} to ${deg(e.tempF)}`;
    case 'ready':
      return `Oven at ${deg(e.tempF)}`;
    case 'hands-on-start':
      return `Cook ${e.cook ?? 1}: prepare ${tray}${e.untilAt ? ` (until ${clock(e.untilAt)})` : ''}`;
    case 'tray-in':
      return `${tray} in`;
    case 'first-check':
      return `First check of ${tray}${e.internalF ? `: internal ${deg(e.internalF)}` : ''}`;
    case 'tray-out':
      return `${tray} out`;
    case 'cooling-start':
      return `${tray}: start cooling (from ${deg(e.tempF ?? 135)})`;
    case 'cool-to-70-by':
      return `${tray} at ${deg(70)} or below by now`;
    case 'fridge-41-by':
      return `${tray} at ${deg(41)} or below (in the fridge) by now`;
    default:
      return e.kind;
  }
}

/** The bake-run sheet (shared/domain/bake-run.ts output): ovens and set points, the timeline, the trays, cautions. */
export async function renderBakeRunPdf(run: BakeRunResult, meta: BakeRunPdfMeta): Promise<{ filename: string; buffer: Buffer }> {
  const doc = createDoc({ businessName: meta.businessName, title: meta.title, subject: 'Bake run' });
  const names = new Map(run.trays.map((t) => [t.id, t.name]));
  const trayName = (id: string | null) => (id ? names.get(id) ?? id : '');
  const style = meta.clock ?? DEFAULT_CLOCK;
  const clock = (local: string) => clockText(local, style);
  const scale = meta.tempScale ?? 'F';
  const deg: Deg = (f) => (f == null ? '' : bothScales(f, scale));
  heading(doc, meta.title, 20);
  paragraph(doc, `${longDate(run.start.slice(0, 10), meta.dateOrder ?? DEFAULT_DATE_ORDER)}: start ${clock(run.start)}, last tray out ${clock(run.endAt)} (${run.sessionMinutes} minutes).`);
  if (meta.replanned) {
    const { from, kept } = meta.replanned;
    paragraph(doc, `Planned again at ${clock(from)}: ${replannedSummary(from, kept, run.trays.length, style)}.`);
  }
  paragraph(
    doc,
    run.provenOptimal
      ? `${meta.replanned ? 'The rest is' : 'This is'} the shortest plan among those the scheduler considers.`
      : `Within ${run.gapPct}% of the lower bound (${run.lowerBoundMinutes} minutes).`,
    { size: 9 },
  );
  doc.moveDown(0.5);

  heading(doc, 'Ovens', 14);
  table(
    doc,
    [
      { header: 'Oven', width: 0.16 },
      { header: 'Set point', width: 0.2 },
      { header: 'Heat from', width: 0.1, align: 'right' },
      { header: 'Ready', width: 0.1, align: 'right' },
      { header: 'Until', width: 0.1, align: 'right' },
      { header: 'Trays', width: 0.34 },
    ],
    run.ovens.flatMap((o) =>
      o.setPoints.map((sp) => [o.name, deg(sp.tempF), clock(sp.changeAt), clock(sp.readyAt), clock(sp.endAt), sp.trayIds.map(trayName).join(', ')]),
    ),
  );

  heading(doc, 'Timeline', 14);
  table(
    doc,
    [
      { header: 'Time', width: 0.1, align: 'right' },
      { header: 'Oven', width: 0.16 },
      { header: 'What', width: 0.74 },
    ],
    run.events.map((e) => [clock(e.at), e.oven ?? '', what(e, trayName, clock, deg)]),
  );

  heading(doc, 'Trays', 14);
  table(
    doc,
    [
      { header: 'Tray', width: 0.28 },
      { header: 'Oven', width: 0.14 },
      { header: 'Rack / spot', width: 0.12, align: 'center' },
      { header: 'Set point', width: 0.18 },
      { header: 'In', width: 0.09, align: 'right' },
      { header: 'Out', width: 0.09, align: 'right' },
      { header: 'Minutes', width: 0.1, align: 'right' },
    ],
    run.trays.map((t) => [t.name, t.oven, `${t.rack} / ${t.position}`, deg(t.tempF), clock(t.inAt), clock(t.outAt), String(t.bakeMinutes)]),
  );

  heading(doc, 'Cooling record', 14);
  paragraph(
    doc,
    `Write the time each tray comes out, then the food temperature in the thickest part as it cools. ${FOOD_CODE_COOLING.source}: ` +
      `to ${deg(FOOD_CODE_COOLING.firstStageF)} within 2 hours and to ${deg(FOOD_CODE_COOLING.finalF)} or below within 6 hours in total; the clock here starts when the tray comes out. ` +
      'Your local food code and inspector decide what to keep and for how long.',
    { size: 9 },
  );
  const records = new Map((meta.cooling ?? []).map((r) => [r.runTrayId, r]));
  table(
    doc,
    [
      { header: 'Tray', width: 0.2 },
      { header: 'Out', width: 0.09, align: 'right' },
      { header: `${inScale(FOOD_CODE_COOLING.firstStageF, scale)} by`, width: 0.1, align: 'right' },
      { header: `${inScale(FOOD_CODE_COOLING.finalF, scale)} by`, width: 0.1, align: 'right' },
      { header: 'Readings (time, temperature)', width: 0.27 },
      { header: 'Result', width: 0.16 },
      { header: 'Initials', width: 0.08, align: 'center' },
    ],
    [...run.trays]
      .sort((a, b) => a.outMinute - b.outMinute)
      .map((t) => {
        const r = records.get(t.id);
        // Blank lines to write on, the planned time out as a reminder.
        if (!r) return [`${t.name}\n(planned out ${clock(t.outAt)})`, '', '', '', '\n\n', '', ''];
        const c = checkOnPaper(r, meta.timeZone ?? null);
        const readings = inTakenOrder(r.readings)
          // One reading never splits across lines (no-break spaces inside it); the list wraps between readings.
          .map((x) => `${clockFrom(x.at, r.outAt, style)} ${deg(x.tempF)}`.replace(/ /g, '\u00a0'))
          .join(', ');
        const restart = r.restartedAt ? `Reheated, cooling again from ${clockFrom(r.restartedAt, r.outAt, style)}. ` : '';
        return [t.name, clock(r.outAt), clockFrom(c.by70, r.outAt, style), clockFrom(c.by41, r.outAt, style), `${restart}${readings}`, resultSaid(c.state, scale), initials(r.recordedBy)];
      }),
  );

  const cooling = CAUTIONS.filter((c) => c.topic === 'food-safety').map((c) => ({ text: inReadersScale(c.text, scale), source: c.source }));
  cautionsBlock(doc, [...run.cautions.map((text) => ({ text: inReadersScale(text, scale), source: 'Bake run' })), ...cooling]);
  return { filename: meta.filename ?? 'bake-run.pdf', buffer: await finishDoc(doc, { businessName: meta.businessName, title: meta.title }) };
}
