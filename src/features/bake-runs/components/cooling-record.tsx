import { useMemo, useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { BakeRunResult, BakeTrayPlan } from '@shared/domain/bake-run-types';
import { checkCooling, clockFrom, FOOD_CODE_COOLING, inTakenOrder, notWrittenDown, type CoolingCheck } from '@shared/domain/cooling';
import { REHEAT_MIN_F } from '@shared/domain/eat-by';
import { bothScales, inReadersScale } from '@shared/domain/temperature';
import type { CoolingRecordDto, CoolingRecordInput } from '@shared/schemas/cooling.schema';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorState, Notice } from '@/components/ui/states';
import { coolingQuery, useClearCooling, useSaveCooling } from '../api/cooling';
import { errorMessage, isApiError, markShown } from '@/lib/problem';
import { useFollowedText } from '@/lib/use-followed-text';
import { currentClockStyle, currentKitchenZone, deviceNow, kitchenNow, kitchenToday, timeLabel } from '@/lib/dates';
import { addDays } from '@shared/domain/iso-date';
import { clock, formatTemp, type TempUnit } from './temperature';
import { minutesSpan } from '@shared/domain/clock';
import { zoneName } from '@shared/domain/time-zone';
import { useDeviceClock, useRunMinute } from './bake-run-timers';

/** "HH:mm" typed for a reading, as a local date-time: on the day the tray came out, or the next day when earlier. */
export function readingAt(time: string, outAt: string): string {
  const day = outAt.slice(0, 10);
  return time >= outAt.slice(11) ? `${day}T${time}` : `${addDays(day, 1)}T${time}`;
}

/** Who writes the record: the coach or the kitchen assistant. */
export type CoolingReader = 'coach' | 'assistant';

/** Fields a tray's own form shows a refusal beside; any other refusal is said under the tray. */
const SAID_BESIDE = (field: string) => field.startsWith('readings.') || field === 'note' || field === 'restartedAt';

/** Writes the tray's whole record again with `change`; `done` once it is saved. */
type Write = (input: CoolingRecordInput, done?: () => void) => void;

/** The record as the API takes it again (the whole record is written each time). */
const asInput = (r: CoolingRecordDto): CoolingRecordInput => ({
  outAt: r.outAt,
  restartedAt: r.restartedAt,
  readings: r.readings.map((x) => ({ at: x.at, tempF: x.tempF })),
  discarded: r.discarded,
  note: r.note,
  version: r.version,
});

const TONE_CLASS: Record<CoolingCheck['tone'], string> = {
  ok: 'text-ink',
  block: 'font-bold text-signal-700',
  info: 'text-ink-soft',
};

/** Why a write did not land: someone wrote the tray down meanwhile (their record now shows), or another failure. */
function Refused({ error }: { error: unknown }) {
  if (!error || isApiError(error, 400)) return null;
  if (isApiError(error, 409)) {
    markShown(error);
    return (
      <p role="alert" className="font-bold text-signal-700">
        ⚠ Someone wrote this tray down meanwhile: their record shows now. Add your change again if it is still needed.
      </p>
    );
  }
  return (
    <p role="alert" className="font-bold text-signal-700">
      ⚠ Not saved: {errorMessage(error)}
    </p>
  );
}

/** A tray not written down yet: out now, or at another time. */
function NotOut({ tray, day, save, busy }: { tray: BakeTrayPlan; day: string; save: Write; busy: boolean }) {
  // On the day, before its planned time out: now (pulled early); once that time has passed, or on a later day
  // (written down afterwards): the planned time, to change to what happened.
  const [time, setTime] = useState(() => (kitchenToday() === day && kitchenNow() < tray.outAt ? clock(kitchenNow()) : clock(tray.outAt)));
  return (
    <div className="no-print flex flex-wrap items-end gap-3">
      {/* Out now: only on the prep day itself (a later day gives the time it came out). */}
      {kitchenToday() === day && (
        <Button type="button" busy={busy} onClick={() => save({ outAt: kitchenNow() })}>
          Out now
        </Button>
      )}
      <form
        className="flex flex-wrap items-end gap-2"
        aria-label={`Time out of ${tray.name}`}
        onSubmit={(e) => {
          e.preventDefault();
          save({ outAt: `${day}T${time}` });
        }}
      >
        <TextField label={kitchenToday() === day ? 'Or came out at' : 'Came out at'} type="time" required value={time} onChange={(e) => setTime(e.target.value)} className="w-40" />
        <Button type="submit" variant="secondary" busy={busy}>
          Write down
        </Button>
      </form>
    </div>
  );
}

/** One tray's record: its state against the Food Code, its readings, and what can be written down next. */
function Written({ record, check, unit, write: save, error, busy, onClear, clearing, role }: {
  record: CoolingRecordDto;
  /** Who reads the page: a tray thrown away by the assistant is e-mailed to the coach. */
  role: CoolingReader;
  /** Where it stands now (checkCooling). */
  check: CoolingCheck;
  unit: TempUnit;
  write: Write;
  /** The last write's failure for this tray (a 400 shows beside its field). */
  error: unknown;
  busy: boolean;
  onClear: () => void;
  clearing: boolean;
}) {
  const [temp, setTemp] = useState('');
  const [time, setTime] = useState('');
  // A note changed elsewhere (the page refreshes while the tray cools) shows here unless one is being typed.
  const [note, setNote, noteEdit] = useFollowedText(record.note);
  const [restart, setRestart] = useState('');
  const fieldErrors = isApiError(error, 400) ? error.fieldErrors : {};
  const readingError = Object.entries(fieldErrors).find(([k]) => k.startsWith('readings.'))?.[1]?.[0];
  const write = (change: Partial<CoolingRecordInput>, done?: () => void) => save({ ...asInput(record), ...change }, done);
  const readings = inTakenOrder(record.readings);
  // Cooled in time: nothing more to write down, so the card stays short (the changes are folded away).
  const settled = check.state === 'cooled';
  const readingList = readings.length > 0 && (
    <ol className="num flex flex-col gap-1 text-base" aria-label={`Readings of ${record.trayName}`}>
      {readings.map((r, i) => (
        <li key={`${r.at}-${i}`} className="flex min-h-9 items-center gap-3">
          <span className="w-32">{clockFrom(r.at, record.outAt, currentClockStyle())}</span>
          <span className="font-bold">{formatTemp(r.tempF, unit === 'C' ? 'C' : 'F')}</span>
          {unit === 'C' && <span className="text-sm text-ink-soft">({formatTemp(r.tempF, 'F')})</span>}
          <Button
            size="sm"
            variant="ghost"
            className="no-print"
            aria-label={`Remove the ${timeLabel(r.at)} reading`}
            disabled={busy}
            onClick={() => {
              if (window.confirm(`Remove the ${timeLabel(r.at)} reading of ${formatTemp(r.tempF, unit)}?`)) write({ readings: record.readings.filter((x) => x !== r) });
            }}
          >
            Remove
          </Button>
        </li>
      ))}
    </ol>
  );
  const thrownAway = (
    <div className="no-print flex flex-wrap gap-2">
      <Button type="button" variant={check.tone === 'block' ? 'danger' : 'ghost'} disabled={busy} onClick={() => write({ discarded: !record.discarded })}>
        {record.discarded ? 'Not thrown away after all' : 'Thrown away'}
      </Button>
    </div>
  );
  return (
    <div className="flex flex-col gap-2">
      <p className="text-base">
        Out at <span className="num font-bold">{timeLabel(record.outAt)}</span>
        {record.restartedAt && (
          <>
            {' '}
            · reheated, cooling again from <span className="num font-bold">{clockFrom(record.restartedAt, record.outAt, currentClockStyle())}</span>
          </>
        )}
        <span className="text-sm text-ink-soft"> · written down by {record.recordedBy}</span>
      </p>
      <p className={`text-base ${TONE_CLASS[check.tone]}`} role={check.tone === 'block' ? 'alert' : undefined}>
        {check.tone === 'block' ? '⚠ ' : settled ? '✓ ' : ''}
        {inReadersScale(check.said, unit)}
      </p>
      {!settled && readingList}
      {settled && readings.length > 0 && (
        // A tray cooled in time is done: its readings on one line (on paper too), the changes folded away.
        <p className="num text-base">
          Readings: {readings.map((r) => `${clockFrom(r.at, record.outAt, currentClockStyle())} ${formatTemp(r.tempF, unit)}`).join(' · ')}
        </p>
      )}
      {record.discarded && (
        <p className="text-sm text-ink-soft">
          Its portions no longer count as baked: the week board shows what is short
          {role === 'assistant' ? ', and the coach gets an e-mail about it.' : '; any other coach of the team gets an e-mail about it.'}
        </p>
      )}
      {check.state !== 'discarded' && check.state !== 'cooled' && (
        <form
          className="no-print flex flex-wrap items-end gap-2"
          aria-label={`Add a reading for ${record.trayName}`}
          onSubmit={(e) => {
            e.preventDefault();
            const value = Number(temp.replace(',', '.'));
            const at = readingAt(time || clock(kitchenNow()), record.outAt);
            const reading = unit === 'C' ? { at, tempC: value } : { at, tempF: value };
            write({ readings: [...record.readings, reading] }, () => {
              setTemp('');
              setTime('');
            });
          }}
        >
          <TextField
            label={`Food temperature (°${unit})`}
            type="number"
            inputMode="decimal"
            step="0.1"
            required
            value={temp}
            onChange={(e) => setTemp(e.target.value)}
            error={readingError}
            className="w-44"
          />
          <TextField label="Taken at (empty: now)" type="time" value={time} onChange={(e) => setTime(e.target.value)} className="w-44" />
          <Button type="submit" busy={busy}>
            Add reading
          </Button>
        </form>
      )}
      {!settled && thrownAway}
      {check.state === 'missed-70' && !record.restartedAt && (
        <form
          className="no-print flex flex-wrap items-end gap-2"
          aria-label={`Reheated: ${record.trayName}`}
          onSubmit={(e) => {
            e.preventDefault();
            write({ restartedAt: readingAt(restart || clock(kitchenNow()), record.outAt) });
          }}
        >
          <TextField
            label={`Reheated to ${bothScales(REHEAT_MIN_F, unit)}, cooling again from (empty: now)`}
            type="time"
            value={restart}
            onChange={(e) => setRestart(e.target.value)}
            error={fieldErrors.restartedAt?.[0]}
            className="w-72"
          />
          <Button type="submit" variant="secondary" busy={busy}>
            Cool again from then
          </Button>
        </form>
      )}
      <details className="no-print">
        <summary className="min-h-11 cursor-pointer py-2">{settled ? 'Change this record' : 'Note, or written down by mistake?'}</summary>
        {settled && (
          <div className="mt-1 flex flex-col gap-2">
            {readingList}
            {thrownAway}
          </div>
        )}
        <form
          className="mt-1 flex flex-wrap items-end gap-2"
          aria-label={`Note for ${record.trayName}`}
          onSubmit={(e) => {
            e.preventDefault();
            // Someone else's note came in while this one was typed: it is replaced only when asked.
            const theirs = record.note ? `changed meanwhile to “${record.note}”` : 'removed meanwhile';
            if (noteEdit.changedUnderTyping && !window.confirm(`The note was ${theirs}. Put yours in its place?`)) return;
            write({ note });
          }}
        >
          <TextField
            label="Note"
            value={note}
            maxLength={500}
            onChange={(e) => setNote(e.target.value)}
            error={fieldErrors.note?.[0]}
            hint={noteEdit.changedUnderTyping ? `Someone else ${record.note ? 'changed the note meanwhile (shown below)' : 'removed the note meanwhile'}; saving puts yours in its place.` : undefined}
            className="min-w-64 flex-1"
          />
          <Button type="submit" variant="secondary" busy={busy}>
            Save note
          </Button>
        </form>
        <Button
          type="button"
          variant="ghost"
          className="mt-2"
          busy={clearing}
          onClick={() => {
            if (window.confirm(`Clear the cooling record of ${record.trayName}? Its time out and readings are removed.`)) onClear();
          }}
        >
          Clear this record (not out yet)
        </Button>
      </details>
      {record.note && <p className="text-sm text-ink-soft">Note: {record.note}</p>}
    </div>
  );
}

/**
 * The cooling record of a prep day (FDA Food Code §3-501.14): each tray's time out, the food temperatures taken as it
 * cools and where it stands; the timers count its deadlines from what is written here.
 */
export function CoolingRecord({ weekId, run, unit, role }: { weekId: number; run: BakeRunResult; unit: TempUnit; role: CoolingReader }) {
  const day = run.start.slice(0, 10);
  const q = useQuery(coolingQuery(weekId, day));
  const save = useSaveCooling(weekId, day);
  const clear = useClearCooling(weekId, day);
  const tick = useDeviceClock(20_000);
  const now = kitchenNow(tick);
  // The tray the last write was for (its pending state and its refusal show on that tray only).
  const saving = save.variables?.runTrayId ?? null;
  const started = kitchenToday() >= day;
  const trays = [...run.trays].sort((a, b) => a.outMinute - b.outMinute || (a.id < b.id ? -1 : 1));
  const inRun = new Set(trays.map((t) => t.id));
  const records = q.data?.records;
  const byId = useMemo(() => new Map((records ?? []).map((r) => [r.runTrayId, r])), [records]);
  // Each record judged once per tick of the clock (the count, the tray's line and the list below read it).
  const checks = useMemo(() => new Map((records ?? []).map((r) => [r.runTrayId, checkCooling(r, now, currentClockStyle(), currentKitchenZone())])), [records, now]);
  const gone = (records ?? []).filter((r) => !inRun.has(r.runTrayId));
  // On the prep day: the trays due out by now that are not written down yet (the timers above name them too).
  const nowMinute = useRunMinute(run);
  const late = new Set(nowMinute === null || !records ? [] : notWrittenDown(trays, records, nowMinute).map((t) => t.id));
  const counts = { out: 0, missed: 0, cooled: 0 };
  for (const t of trays) {
    const c = checks.get(t.id);
    if (!c) continue;
    counts.out++;
    if (c.tone === 'block') counts.missed++;
    if (c.state === 'cooled') counts.cooled++;
  }
  return (
    <section className="flex flex-col gap-3" aria-labelledby="cooling-record-title">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="cooling-record-title" className="text-xl">
          Cooling record
        </h2>
        {q.data && started && (
          <p className="text-base text-ink-soft" role="status">
            {counts.out} of {trays.length} out · {counts.cooled} cooled in time
            {counts.missed > 0 && <span className="font-bold text-signal-700"> · {counts.missed} missed a deadline</span>}
          </p>
        )}
      </div>
      <p className="text-sm text-ink-soft">
        Write down each tray as it comes out, then the food temperature in the thickest part as it cools. FDA Food Code
        §3-501.14: to {bothScales(FOOD_CODE_COOLING.firstStageF, unit)} within 2 hours and to {bothScales(FOOD_CODE_COOLING.finalF, unit)} or below within 6 hours in total; the clock here
        starts when the tray comes out. Your local food code and inspector decide what to keep and for how long. Every
        prep day’s records are in the{' '}
        <Link to={paths.coolingLog} className="font-bold underline">
          cooling log
        </Link>
        .
      </p>
      {q.data && <WatchLine timeZone={q.data.timeZone} role={role} />}
      <ElsewhereLine kitchen={now} device={tick} />
      {q.isPending ? (
        <div className="h-24 animate-pulse rounded-lg bg-paper-deep" aria-label="Loading the cooling record" />
      ) : q.isError ? (
        <ErrorState error={q.error} retry={() => q.refetch()} />
      ) : !started ? (
        <Notice tone="info">Nothing to write down before prep day: on the day, each tray gets its line here as it comes out.</Notice>
      ) : (
        <>
          <ul className="flex flex-col gap-3" aria-label="Trays cooling">
            {trays.map((t) => {
              const record = byId.get(t.id);
              const busy = saving === t.id && save.isPending;
              const write: Write = (input, done) => save.mutate({ runTrayId: t.id, ...input }, { onSuccess: () => done?.() });
              return (
                <li key={t.id} className="flex break-inside-avoid flex-col gap-2 rounded-lg border border-line bg-paper-card p-3">
                  <div className="flex flex-wrap items-baseline justify-between gap-2">
                    <h3 className="text-lg font-bold">{t.name}</h3>
                    <span className="num text-sm text-ink-soft">
                      {t.oven} · planned out {timeLabel(t.outAt)}
                      {late.has(t.id) && nowMinute !== null && (
                        <span className="font-bold text-signal-700"> · ⚠ due {minutesSpan(nowMinute - t.outMinute)} ago</span>
                      )}
                    </span>
                  </div>
                  {record ? (
                    <Written
                      record={record}
                      role={role}
                      check={checks.get(t.id)!}
                      unit={unit}
                      write={write}
                      error={saving === t.id ? save.error : null}
                      busy={busy}
                      clearing={clear.isPending && clear.variables?.runTrayId === t.id}
                      onClear={() => clear.mutate({ runTrayId: t.id, version: record.version })}
                    />
                  ) : (
                    <NotOut
                      tray={t}
                      day={day}
                      busy={busy}
                      save={write}
                    />
                  )}
                  {saving === t.id && <Refused error={save.error} />}
                  {saving === t.id && isApiError(save.error, 400) && !Object.keys(save.error.fieldErrors).some(SAID_BESIDE) && (
                    <p role="alert" className="font-bold text-signal-700">
                      ⚠ {errorMessage(save.error)}
                    </p>
                  )}
                  {clear.error && clear.variables?.runTrayId === t.id && <Refused error={clear.error} />}
                </li>
              );
            })}
          </ul>
          {gone.length > 0 && (
            <div className="flex flex-col gap-1">
              <h3 className="text-lg font-bold">No longer in the run</h3>
              <p className="text-sm text-ink-soft">Written down before the week's tray counts changed; kept as written.</p>
              <ul className="flex flex-col gap-1 text-base">
                {gone.map((r) => (
                  <li key={r.runTrayId}>
                    {r.trayName}: out at <span className="num">{timeLabel(r.outAt)}</span>. {inReadersScale(checks.get(r.runTrayId)?.said ?? '', unit)}
                  </li>
                ))}
              </ul>
            </div>
          )}
        </>
      )}
    </section>
  );
}

/**
 * Said when this device's clock reads otherwise than the kitchen's (a coach looking in from another zone): the times
 * on the page, and the ones typed into it, are the kitchen's.
 */
function ElsewhereLine({ kitchen, device }: { kitchen: string; device: Date }) {
  const zone = currentKitchenZone();
  const here = deviceNow(device);
  if (!zone || here === kitchen) return null;
  return (
    <Notice tone="info" title="This device is on another clock">
      Times on this page, and the ones you type, are the kitchen’s ({zoneName(zone)}): {timeLabel(kitchen)} there now, {timeLabel(here)}{' '}
      {here.slice(0, 10) === kitchen.slice(0, 10) ? '' : here.slice(0, 10) > kitchen.slice(0, 10) ? 'tomorrow ' : 'yesterday '}on this device.
    </Notice>
  );
}

/** Whether a missed deadline is e-mailed (the server's cooling watch needs the kitchen's time zone). */
function WatchLine({ timeZone, role }: { timeZone: string | null; role: CoolingReader }) {
  if (timeZone)
    return (
      <p className="text-sm text-ink-soft">
        A tray past a deadline with no reading showing it cooled, or not written down 30 minutes after its planned time
        out, is e-mailed to every coach and kitchen assistant, by the kitchen’s clock ({zoneName(timeZone)}),
        even with this page closed.
      </p>
    );
  return (
    <p className="text-sm text-ink-soft">
      Missed deadlines show on this page only: they are not e-mailed until{' '}
      {role === 'coach' ? (
        <>
          you set the kitchen’s time zone in{' '}
          <Link to={paths.settings} className="font-bold underline">
            Settings
          </Link>
        </>
      ) : (
        'the coach sets the kitchen’s time zone in Settings'
      )}
      .
    </p>
  );
}
