/**
 * An independent checker of a bake-run plan against the model (shared/domain/bake-run-model.ts), written from
 * the rules and not from the scheduler's code: it rebuilds every oven's set-point timeline from the
 * events, walks each minute, and returns every violation it finds (an empty list means the plan is valid).
 */
import type { BakeRunInput, BakeRunResult } from '@shared/domain/bake-run-types';

const EPS = 1e-6;

function minutesOf(start: string, at: string): number {
  const parse = (s: string) => Date.parse(`${s}:00Z`) / 60_000;
  return parse(at) - parse(start);
}

export function checkBakeRun(input: BakeRunInput, result: BakeRunResult): string[] {
  const problems: string[] = [];
  const crowding = input.rules?.crowdingPerExtraTray ?? 0.1;
  const mode = input.rules?.convectionMode ?? 'temperature';
  const delta = input.rules?.convectionDeltaF ?? 25;
  const factor = input.rules?.convectionTimeFactor ?? 0.75;
  const defaultTol = input.rules?.defaultToleranceF ?? 10;
  const trayById = new Map(input.trays.map((t) => [t.id, t]));
  const ovenByName = new Map(input.ovens.map((o) => [o.name, o]));

  // Every tray planned exactly once.
  const planned = result.trays.map((t) => t.id).sort();
  const given = input.trays.map((t) => t.id).sort();
  if (JSON.stringify(planned) !== JSON.stringify(given)) problems.push('trays planned ≠ trays given');

  // Events: ordered by time, `at` consistent with `minute`.
  result.events.forEach((e, k) => {
    if (k > 0 && e.minute < result.events[k - 1].minute) problems.push(`event ${k} out of order`);
    if (minutesOf(input.start, e.at) !== e.minute) problems.push(`event ${k} at ${e.at} ≠ minute ${e.minute}`);
  });

  // Oven set-point segments from the events: [ready, next change) at tempF, with a long enough change.
  interface Segment {
    tempF: number;
    ready: number;
    until: number;
  }
  const segments = new Map<string, Segment[]>();
  for (const oven of input.ovens) {
    const evs = result.events.filter((e) => e.oven === oven.name && e.trayId === null);
    const list: Segment[] = [];
    // An oven already on (startF) starts there and is never "preheated"; the others start at the kitchen's temperature.
    let current = oven.startF ?? input.ambientF;
    let changeAt = -1;
    let target = NaN;
    if (oven.startF !== undefined && evs[0]?.kind === 'preheat') problems.push(`${oven.name}: preheated, but it was on at ${oven.startF}`);
    if (oven.startF !== undefined && evs[0]?.kind === 'setpoint-change' && evs[0].fromF !== oven.startF)
      problems.push(`${oven.name}: first change from ${evs[0].fromF}, but it was at ${oven.startF}`);
    for (const e of evs) {
      if (e.kind === 'preheat' || e.kind === 'setpoint-change') {
        if (e.kind === 'preheat' && list.length > 0) problems.push(`${oven.name}: second preheat`);
        if (list.length > 0) list[list.length - 1].until = e.minute;
        changeAt = e.minute;
        target = e.tempF!;
      } else if (e.kind === 'ready') {
        const need =
          target > current ? (target - current) / oven.heatFPerMin : (current - target) / oven.coolFPerMin;
        if (e.minute - changeAt < need - EPS) problems.push(`${oven.name}: ready at ${e.minute} too soon for ${target}`);
        if (target > oven.maxF + EPS) problems.push(`${oven.name}: set point ${target} above max`);
        list.push({ tempF: target, ready: e.minute, until: Infinity });
        current = target;
      }
    }
    segments.set(oven.name, list);
  }

  // Trays: inside one segment, set point within tolerance, capacity, progress, pulled at the first minute.
  for (const plan of result.trays) {
    const tray = trayById.get(plan.id)!;
    const oven = ovenByName.get(plan.oven)!;
    const adj = oven.convection && mode === 'temperature' ? tray.tempF - delta : tray.tempF;
    const need = tray.minMinutes * (oven.convection && mode === 'time' ? factor : 1);
    const tol = tray.toleranceF ?? defaultTol;
    const seg = segments.get(plan.oven)!.find((s) => s.ready <= plan.inMinute && plan.outMinute <= s.until);
    if (!seg) problems.push(`${plan.id}: not within one ready set point`);
    else {
      if (seg.tempF !== plan.tempF) problems.push(`${plan.id}: reported ${plan.tempF} but oven at ${seg.tempF}`);
      if (Math.abs(seg.tempF - adj) > tol + EPS) problems.push(`${plan.id}: set point ${seg.tempF} outside ${adj}±${tol}`);
    }
    const sameOven = result.trays.filter((t) => t.oven === plan.oven);
    let progress = 0;
    let before = 0;
    for (let t = plan.inMinute; t < plan.outMinute; t++) {
      const k = sameOven.filter((x) => x.inMinute <= t && t < x.outMinute).length;
      if (k > oven.racks * oven.traysPerRack) problems.push(`${plan.oven}: ${k} trays at minute ${t}`);
      before = progress;
      progress += 1 / (1 + crowding * (k - 1));
    }
    if (progress < need - EPS) problems.push(`${plan.id}: baked ${progress.toFixed(3)} < ${need}`);
    if (plan.outMinute > plan.inMinute && before >= need - 1e-9) problems.push(`${plan.id}: pulled late`);
    if (plan.bakeMinutes !== plan.outMinute - plan.inMinute) problems.push(`${plan.id}: bakeMinutes`);
    const rack = plan.rack;
    if (rack < 1 || rack > oven.racks) problems.push(`${plan.id}: rack ${rack}`);
    const clash = sameOven.find(
      (x) => x.id !== plan.id && x.rack === plan.rack && x.position === plan.position && x.inMinute < plan.outMinute && plan.inMinute < x.outMinute,
    );
    if (clash) problems.push(`${plan.id} and ${clash.id} share a place`);
  }

  // Cooks: one task at a time; each tray's prep before it goes in.
  const tasks = result.events.filter((e) => e.kind === 'hands-on-start');
  for (const tray of input.trays) {
    const mine = tasks.filter((e) => e.trayId === tray.id);
    const plan = result.trays.find((t) => t.id === tray.id)!;
    if (tray.handsOnMinutes === 0) {
      if (mine.length !== 0) problems.push(`${tray.id}: hands-on task without hands-on minutes`);
      continue;
    }
    if (mine.length !== 1) {
      problems.push(`${tray.id}: ${mine.length} hands-on tasks`);
      continue;
    }
    const end = minutesOf(input.start, mine[0].untilAt!);
    if (end - mine[0].minute !== tray.handsOnMinutes) problems.push(`${tray.id}: hands-on length`);
    if (plan.inMinute < end) problems.push(`${tray.id}: in before prep is done`);
    if (mine[0].minute < 0 || mine[0].cook! < 1 || mine[0].cook! > input.cooks) problems.push(`${tray.id}: cook`);
  }
  for (let c = 1; c <= input.cooks; c++) {
    const spans = tasks
      .filter((e) => e.cook === c)
      .map((e) => [e.minute, minutesOf(input.start, e.untilAt!)] as const)
      .sort((a, b) => a[0] - b[0]);
    for (let k = 1; k < spans.length; k++) if (spans[k][0] < spans[k - 1][1]) problems.push(`cook ${c} double-booked`);
  }

  const lastOut = Math.max(...result.trays.map((t) => t.outMinute));
  if (result.sessionMinutes !== lastOut) problems.push(`session ${result.sessionMinutes} ≠ last out ${lastOut}`);
  if (result.sessionMinutes < result.lowerBoundMinutes) problems.push('session below the lower bound');
  return problems;
}
