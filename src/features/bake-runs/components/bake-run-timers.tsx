import { useEffect, useRef, useState } from 'react';
import type { BakeEventKind, BakeRunResult } from '@shared/domain/bake-run-types';
import { addLocalMinutes, requireLocalMinutes } from '@shared/domain/bake-run-time';
import { eventsWithCooling, notWrittenDown, type RecordedCooling } from '@shared/domain/cooling';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/states';
import { errorMessage, isApiError, markShown } from '@/lib/problem';
import { splitFieldErrors } from '@/lib/form-errors';
import { describeEvent } from './bake-run-sheet';
import { OvenChecks } from './oven-checks';
import { currentKitchenZone, kitchenNow, kitchenToday, timeLabel } from '@/lib/dates';
import { clock, type TempUnit } from './temperature';

/** The device clock, read again every `ms`. */
export function useDeviceClock(ms: number): Date {
  const [now, setNow] = useState(() => new Date());
  useEffect(() => {
    const id = window.setInterval(() => setNow(new Date()), ms);
    return () => window.clearInterval(id);
  }, [ms]);
  return now;
}

/** Minutes since the run's start on the kitchen's clock, or null when today is not the run's day there. Ticks every 15 s. */
export function useRunMinute(run: BakeRunResult | null): number | null {
  const now = useDeviceClock(15_000);
  if (!run) return null;
  const minute = requireLocalMinutes(kitchenNow(now)) - requireLocalMinutes(run.start);
  return kitchenToday(now) === run.start.slice(0, 10) ? minute : null;
}

function beep() {
  try {
    const ctx = new AudioContext();
    const osc = ctx.createOscillator();
    osc.frequency.value = 880;
    osc.connect(ctx.destination);
    osc.start();
    osc.stop(ctx.currentTime + 0.4);
  } catch {
    // no audio on this device: the words on screen remain
  }
}

/** Steps with a countdown: the oven's, the trays' (in, check, out) and the cooling deadlines of the food code. */
const TIMED = new Set<BakeEventKind>(['preheat', 'setpoint-change', 'tray-in', 'first-check', 'tray-out', 'cool-to-70-by', 'fridge-41-by']);
/** Steps the sound announces when they are due: a tray to check or to take out. */
const RUNG = new Set<BakeEventKind>(['first-check', 'tray-out']);

/** Moving a saved run to the time the kitchen really started (the week's run page gives it; the planner does not). */
export interface MoveStart {
  saving: boolean;
  error: unknown;
  /** The new start, "YYYY-MM-DDTHH:mm" on the run's day. */
  onMove: (start: string) => void;
  onReload: () => void;
}


/**
 * Why a change of the day's run was not made: someone changed the run meanwhile (409: load their version, then redo
 * it), or another failure. A refused field (400) is said beside the field instead; with `said` (which fields the form
 * shows), a 400 about any other field is said here, never dropped.
 */
function ChangeRefused({
  error,
  redo,
  notDone,
  onReload,
  said,
}: {
  error: unknown;
  redo: string;
  notDone: string;
  onReload: () => void;
  said?: (field: string) => boolean;
}) {
  if (isApiError(error, 409)) {
    markShown(error);
    return (
      <Notice tone="warn" title="Someone changed this run meanwhile">
        <p>Load their version, then {redo} again if it is still needed.</p>
        <Button type="button" variant="secondary" onClick={onReload}>
          Load their version
        </Button>
      </Notice>
    );
  }
  if (isApiError(error, 400)) {
    if (!said) return null;
    const { onFields, unseen } = splitFieldErrors(error, said);
    if (Object.keys(onFields).length > 0 && unseen.length === 0) return null;
    markShown(error);
    return (
      <Notice tone="block" title={notDone}>
        {unseen[0] ?? errorMessage(error)}
      </Notice>
    );
  }
  return error ? (
    <Notice tone="block" title={notDone}>
      {errorMessage(error)}
    </Notice>
  ) : null;
}

/** "Started at another time?": a time on the run's day; the timers, timeline and run sheet follow the new start. */
function MoveStartForm({ run, move }: { run: BakeRunResult; move: MoveStart }) {
  const [time, setTime] = useState(() => clock(kitchenNow()));
  // The time offered is "now" when the question is opened (the page may have been open since before the start),
  // until the person types their own.
  const typed = useRef(false);
  const [movedTo, setMovedTo] = useState<string | null>(null);
  const planned = clock(run.start);
  const fieldError = isApiError(move.error, 400) ? move.error.fieldErrors.start?.[0] ?? errorMessage(move.error) : undefined;
  // The answer is the new plan: the move is done once its start is the time asked for.
  const done = movedTo !== null && movedTo === planned && !move.saving && !move.error;
  return (
    <details
      className="rounded-lg border border-line p-3"
      onToggle={(e) => {
        if (e.currentTarget.open && !typed.current) setTime(clock(kitchenNow()));
      }}
    >
      <summary className="min-h-11 cursor-pointer py-2 font-bold">Started at another time?</summary>
      <form
        className="mt-2 flex flex-wrap items-end gap-3"
        aria-label="Move the start"
        onSubmit={(e) => {
          e.preventDefault();
          setMovedTo(time);
          move.onMove(`${run.start.slice(0, 10)}T${time}`);
        }}
      >
        <TextField
          label="Started at"
          type="time"
          required
          value={time}
          onChange={(e) => {
            typed.current = true;
            setTime(e.target.value);
          }}
          error={fieldError}
          hint={`Planned ${timeLabel(planned)}. Every time on this page, the run sheet, the PDF and the calendar move with it.`}
          className="w-44"
        />
        <Button type="submit" busy={move.saving}>
          Move the plan
        </Button>
      </form>
      <p role="status" className="mt-2 text-base">
        {done ? `The plan now starts at ${timeLabel(planned)}.` : ''}
      </p>
      <ChangeRefused error={move.error} redo="move the start" notDone="Start not moved" onReload={move.onReload} />
    </details>
  );
}

/** Changing the kitchen a saved run plans with (the week's run page gives it; the planner does not). */
export interface KitchenChange {
  /** Every oven of the workspace. */
  allOvens: { id: number; name: string }[];
  /** The ovens the run uses now. */
  ovenIds: number[];
  cooks: number;
  /** Planned again part-way: when the rest starts and the trays already out (null: the day from its start). */
  done: { from: string; out: string[] } | null;
  /** The saved settings' version these come from (null before any are saved). */
  version: number | null;
  saving: boolean;
  error: unknown;
  /**
   * `version`: the one the person's choice started from (a change saved meanwhile makes it a 409). `out`: the trays
   * already out of the oven (none: the day from its start), `from` ("YYYY-MM-DDTHH:mm"): when the rest starts.
   */
  onChange: (
    cooks: number,
    ovenIds: number[],
    version: number | null,
    progress: { out: string[]; from?: string; outAt?: Record<string, string> },
  ) => void;
  onReload: () => void;
}

interface KitchenState {
  cooks: number | string;
  ovenIds: readonly number[];
  out: readonly string[];
  /** "HH:mm" (only counts with trays out). */
  from: string;
}

const kitchenKey = (k: KitchenState) =>
  [k.cooks, [...k.ovenIds].sort((a, b) => a - b).join(), [...k.out].sort().join(), k.out.length ? k.from : ''].join('|');

const savedKitchen = (kitchen: KitchenChange): KitchenState => ({
  cooks: kitchen.cooks,
  ovenIds: kitchen.ovenIds,
  out: kitchen.done?.out ?? [],
  from: kitchen.done?.from.slice(11) ?? '',
});

/**
 * "An oven down or a cook missing?": the ovens that work and the cooks who came today. Before the first tray goes in,
 * the day is planned again from its start; part-way through, the trays already out are ticked (those planned out by
 * now are offered ticked), they stay as planned, and the rest is planned from a time (now, or when the last ticked
 * tray comes out).
 */
function KitchenForm({ kitchen, run, nowMinute }: { kitchen: KitchenChange; run: BakeRunResult; nowMinute: number }) {
  const saved = savedKitchen(kitchen);
  const [form, setForm] = useState<KitchenState>(saved);
  const [fromTyped, setFromTyped] = useState(false);
  /** The tray ticks were offered on opening (not yet changed by hand): they follow the ovens ticked. */
  const [offered, setOffered] = useState(false);
  /** Ticked trays that came out at another time than planned: id → "HH:mm" typed. */
  const [outAt, setOutAt] = useState<Record<string, string>>({});
  /** What "Plan again" sent, until the person starts over. */
  const [sent, setSent] = useState<string | null>(null);
  // What the form started from: a change saved elsewhere replaces it unless the person changed it.
  const [base, setBase] = useState({ key: kitchenKey(saved), version: kitchen.version });
  const adopt = () => {
    setForm(saved);
    setFromTyped(false);
    setOffered(false);
    setOutAt({});
    setBase({ key: kitchenKey(saved), version: kitchen.version });
  };
  if (base.version !== kitchen.version) {
    const untouched = kitchenKey(form) === base.key;
    const ownAnswer = sent !== null && !kitchen.error && kitchenKey(form) === kitchenKey(saved);
    if (untouched || ownAnswer) adopt();
  }
  const outAtOf = new Map(run.trays.map((t) => [t.id, t.outAt]));
  /** The rest starts now, or when the last tray ticked comes out if that is later. */
  const suggestedFrom = (out: readonly string[]) =>
    [clock(kitchenNow()), ...out.map((id) => outAtOf.get(id)?.slice(11) ?? '')].reduce((a, b) => (b > a ? b : a));
  const setOut = (out: string[]) => setForm((f) => ({ ...f, out, from: fromTyped ? f.from : suggestedFrom(out) }));
  const ovenName = new Map(kitchen.allOvens.map((o) => [o.id, o.name]));
  /**
   * The trays to offer ticked: those said before, those planned out by now, and those baking now in an oven ticked
   * as working (they stay in; the rest then waits until they come out). A tray in an oven that is down is baked again.
   */
  const offer = (ovenIds: readonly number[]) => {
    const working = new Set(ovenIds.map((id) => ovenName.get(id)));
    const due = run.trays.filter((t) => t.outMinute <= nowMinute || (t.inMinute <= nowMinute && working.has(t.oven)));
    return [...new Set([...saved.out, ...due.map((t) => t.id)])];
  };
  const fieldErrors = isApiError(kitchen.error, 400) ? kitchen.error.fieldErrors : {};
  // Done once the run shown is planned with what was sent (not merely once the request left).
  const done = sent !== null && sent === kitchenKey(saved) && !kitchen.saving && !kitchen.error;
  const names = kitchen.allOvens.filter((o) => kitchen.ovenIds.includes(o.id)).map((o) => o.name);
  const cooksSaid = kitchen.cooks === 1 ? 'one cook' : `${kitchen.cooks} cooks`;
  const keptSaid = kitchen.done
    ? ` from ${timeLabel(kitchen.done.from)}; ${kitchen.done.out.length === 1 ? 'one tray' : `${kitchen.done.out.length} trays`} already out kept as planned`
    : '';
  const trays = [...run.trays].sort((a, b) => a.outMinute - b.outMinute);
  return (
    <details
      className="rounded-lg border border-line p-3"
      onToggle={(e) => {
        // Opened part-way through the day: the trays out by now are offered ticked (unless the person has changed
        // something already).
        if (!e.currentTarget.open || kitchenKey(form) !== base.key) return;
        const out = offer(form.ovenIds);
        if (out.length !== form.out.length) {
          setOut(out);
          setOffered(true);
        }
      }}
    >
      <summary className="min-h-11 cursor-pointer py-2 font-bold">An oven down or a cook missing?</summary>
      <form
        className="mt-2 flex flex-col gap-3"
        aria-label="Today's kitchen"
        onSubmit={(e) => {
          e.preventDefault();
          setSent(kitchenKey(form));
          const day = run.start.slice(0, 10);
          // Only the times changed from the plan's, for trays still ticked.
          const moved = Object.entries(outAt).filter(([id, t]) => form.out.includes(id) && t && t !== clock(outAtOf.get(id) ?? ''));
          kitchen.onChange(
            Number(form.cooks),
            [...form.ovenIds],
            base.version,
            form.out.length
              ? { out: [...form.out], from: `${day}T${form.from}`, ...(moved.length ? { outAt: Object.fromEntries(moved.map(([id, t]) => [id, `${day}T${t}`])) } : {}) }
              : { out: [] },
          );
        }}
      >
        <OvenChecks
          legend="Ovens that work today"
          ovens={kitchen.allOvens}
          chosen={[...form.ovenIds]}
          onChange={(ovenIds) => {
            setForm((f) => ({ ...f, ovenIds }));
            if (offered) setOut(offer(ovenIds));
          }}
          error={fieldErrors.ovenIds?.[0]}
          className="flex flex-col gap-1 text-base"
        />
        <TextField
          label="Cooks here today"
          type="number"
          inputMode="numeric"
          min={1}
          max={50}
          required
          value={form.cooks}
          onChange={(e) => setForm((f) => ({ ...f, cooks: e.target.value }))}
          error={fieldErrors.cooks?.[0]}
          className="w-44"
        />
        <fieldset className="flex flex-col gap-1 text-base" aria-describedby="trays-out-hint">
          <legend className="font-bold">Trays already out of the oven</legend>
          <p id="trays-out-hint" className="text-sm text-ink-soft">
            Ticked trays stay as planned, and their cooling deadlines still run. A tray still baking in an oven that works
            stays ticked, and the rest waits until it comes out; one in an oven that is down is baked again.
          </p>
          {trays.map((t) => (
            <label key={t.id} className="flex min-h-11 items-center gap-2">
              <input
                type="checkbox"
                className="h-5 w-5"
                checked={form.out.includes(t.id)}
                onChange={(e) => {
                  setOffered(false);
                  setOut(e.target.checked ? [...form.out, t.id] : form.out.filter((id) => id !== t.id));
                }}
              />
              <span>
                {t.name} <span className="num text-ink-soft">· out {timeLabel(t.outAt)}</span>
              </span>
            </label>
          ))}
          {fieldErrors.out && <p className="font-bold text-signal-700">⚠ {fieldErrors.out[0]}</p>}
          {form.out.length > 0 && (
            <details className="mt-1" open={Object.keys(fieldErrors).some((k) => k.startsWith('outAt.')) || undefined}>
              <summary className="min-h-11 cursor-pointer py-2">A tray came out at another time?</summary>
              <p className="text-sm text-ink-soft">
                Its cooling deadlines then count from when it really came out. A tray written down in the cooling record
                keeps the time written there unless you give another here.
              </p>
              <div className="mt-2 flex flex-col gap-2">
                {trays
                  .filter((t) => form.out.includes(t.id))
                  .map((t) => (
                    <TextField
                      key={t.id}
                      label={`${t.name} came out at`}
                      type="time"
                      value={outAt[t.id] ?? clock(t.outAt)}
                      onChange={(e) => setOutAt((o) => ({ ...o, [t.id]: e.target.value }))}
                      error={fieldErrors[`outAt.${t.id}`]?.[0]}
                      className="max-w-xs"
                    />
                  ))}
              </div>
            </details>
          )}
        </fieldset>
        {form.out.length > 0 ? (
          <TextField
            label="Plan the rest from"
            type="time"
            required
            value={form.from}
            onChange={(e) => {
              setFromTyped(true);
              setForm((f) => ({ ...f, from: e.target.value }));
            }}
            error={fieldErrors.from?.[0]}
            hint="An oven still on then starts from where the plan has it (at its set point, or part-way through warming or cooling); one done with its trays is planned from cold."
            className="w-44"
          />
        ) : (
          <p className="text-sm text-ink-soft">Nothing ticked: the day is planned again from its start, {timeLabel(run.start)}.</p>
        )}
        <div>
          <Button type="submit" busy={kitchen.saving}>
            Plan again
          </Button>
        </div>
      </form>
      <p role="status" className="mt-2 text-base">
        {done ? `Planned again with ${names.join(' and ')} and ${cooksSaid}${keptSaid}.` : ''}
      </p>
      <ChangeRefused
        error={kitchen.error}
        redo="change the kitchen"
        notDone="Not planned again"
        said={(field) => ['ovenIds', 'cooks', 'out'].includes(field) || field.startsWith('outAt.') || (field === 'from' && form.out.length > 0)}
        onReload={() => {
          // What is on screen now; the reload's newer version then replaces it (nothing is typed over it).
          setSent(null);
          adopt();
          kitchen.onReload();
        }}
      />
    </details>
  );
}

const LATE_NAMED = 3;

/** Trays due out by now that the cooling record does not have: still in the oven, or out and not written down. */
function NotWrittenDown({ trays }: { trays: readonly { id: string; name: string; outAt: string }[] }) {
  const named = trays.slice(0, LATE_NAMED).map((t) => `${t.name} (planned out ${timeLabel(t.outAt)})`);
  const more = trays.length - named.length;
  return (
    <Notice tone="warn" title={`Due out by now, not in the cooling record: ${named.join(', ')}${more > 0 ? ` and ${more} more` : ''}.`}>
      Still in the oven? Check it and pull it. Already out? Write down when it came out: its cooling deadlines count from
      then. <a href="#cooling-record-title" className="font-bold underline">Go to the cooling record</a>
    </Notice>
  );
}

/** On prep day: the next steps with a countdown (ovens, trays in, checks, out, cooling deadlines), optional sound at checks and outs. */
export function BakeRunTimers({
  run,
  unit,
  nowMinute,
  move,
  kitchen,
  cooling,
}: {
  run: BakeRunResult;
  unit: TempUnit;
  nowMinute: number;
  move?: MoveStart;
  kitchen?: KitchenChange;
  /** The cooling record: a tray written down as out has no check or time out to come, its deadlines count from it. */
  cooling?: readonly RecordedCooling[];
}) {
  const [sound, setSound] = useState(false);
  const events = cooling?.length ? eventsWithCooling(run, cooling, addLocalMinutes(run.start, nowMinute), currentKitchenZone()) : run.events;
  const rung = useRef(new Set<string>());
  const names = new Map(run.trays.map((t) => [t.id, t.name]));
  const trayName = (id: string | null) => (id ? names.get(id) ?? id : '');
  // A tray taken out at its check time is one step: "Check …" (the run sheet leaves such an "out" line out too).
  const checks = new Set(events.filter((e) => e.kind === 'first-check').map((e) => `${e.trayId}@${e.minute}`));
  // Due out by now and not in the cooling record (only where the page has one): pull it, or write it down.
  const late = cooling ? notWrittenDown(run.trays, cooling, nowMinute) : [];
  const upcoming = events
    .filter((e) => TIMED.has(e.kind) && e.minute >= nowMinute - 2 && !(e.kind === 'tray-out' && checks.has(`${e.trayId}@${e.minute}`)))
    .slice(0, 4);
  useEffect(() => {
    if (!sound) return;
    for (const e of events) {
      const key = `${e.kind}-${e.trayId}-${e.minute}`;
      if (RUNG.has(e.kind) && e.minute === nowMinute && !rung.current.has(key)) {
        rung.current.add(key);
        beep();
      }
    }
  }, [sound, nowMinute, events]);
  return (
    <section aria-label="Timers" className="no-print flex flex-col gap-2 rounded-tray border-2 border-oven-4 bg-paper-card p-4" aria-live="polite">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="now-and-next" className="text-xl">
          Now and next
        </h2>
        <label className="flex min-h-11 items-center gap-2 text-base">
          <input type="checkbox" className="h-5 w-5" checked={sound} onChange={(e) => setSound(e.target.checked)} /> Sound at checks and outs
        </label>
      </div>
      {late.length > 0 && <NotWrittenDown trays={late} />}
      {upcoming.length === 0 ? (
        <p className="text-lg">Every step of this run is done.</p>
      ) : (
        <ul className="flex flex-col gap-2">
          {upcoming.map((e, i) => {
            const left = e.minute - nowMinute;
            return (
              <li key={i} className={`flex items-baseline gap-3 text-xl ${left <= 0 ? 'font-bold text-signal-700' : ''}`}>
                <span className="num w-28 shrink-0">{left > 0 ? `in ${left} min` : left === 0 ? '⚠ now' : `⚠ ${-left} min ago`}</span>
                <span>{describeEvent(e, trayName, unit)}</span>
              </li>
            );
          })}
        </ul>
      )}
      {move && <MoveStartForm run={run} move={move} />}
      {kitchen && <KitchenForm kitchen={kitchen} run={run} nowMinute={nowMinute} />}
    </section>
  );
}
