import { addDays } from '../../shared/domain/iso-date.js';

export interface BenchContext {
  base: string;
  cookie: string;
  /** The benchmark's database (for a measure taken in the bench process itself). */
  databaseUrl: string;
  /** Median latency of n sequential GET /api/health, measured as the table measures it. */
  healthMedian: (n: number) => Promise<number>;
}

export interface BenchCase {
  name: string;
  method: 'GET' | 'POST';
  path: string;
  body?: unknown;
  goal?: string;
  /** The goal as a median latency ratio to health (the result column says met or not). */
  goalRatio?: number;
  /** Sequential requests for the latency measure, when the case is slow (default BENCH_SEQUENTIAL). */
  sequential?: number;
  notes?: string;
  /** Extra lines for the results file (quality numbers such as a gap to a lower bound). */
  report?: () => Promise<string[]>;
}

async function getJson<T>(ctx: BenchContext, p: string): Promise<T> {
  const r = await fetch(ctx.base + p, { headers: { cookie: ctx.cookie } });
  if (!r.ok) throw new Error(`${p}: ${r.status}`);
  return (await r.json()) as T;
}

/**
 * The floor of a signed-in request that reads something: GET /api/auth/me reads the session with its user (one
 * statement), then one small row (the person's preferences and workspace name, a second statement). No goal; it
 * shows how much of a signed-in case's ratio is the session and one read alone.
 */
async function signedInFloor(): Promise<BenchCase | null> {
  return {
    name: 'GET /api/auth/me (signed-in floor)',
    method: 'GET',
    path: '/api/auth/me',
    notes: 'session read with its user, then one small read (two statements)',
  };
}

/** POST /api/calc/recipe with 40 lines from the reference library. */
async function calcRecipe(ctx: BenchContext): Promise<BenchCase | null> {
  const list = await getJson<{ items: { id: number; densityGPerMl: number | null }[] }>(ctx, '/api/ingredients?pageSize=100');
  const items = list.items.slice(0, 40).map((i, n) => ({ ingredientId: i.id, amount: String(10 + n), unit: 'g' }));
  return {
    name: 'POST /api/calc/recipe (40 lines)',
    method: 'POST',
    path: '/api/calc/recipe',
    body: { items, portions: 12 },
    goal: '≤ 2×',
    goalRatio: 2,
    // What a keystroke in the recipe form costs: the library rows are kept under the workspace's nutrition stamp, and
    // each line's products under its exact inputs, after the first request (the warm-up).
    notes: 'library rows kept under the nutrition stamp (read again after any library change)',
  };
}

/**
 * Bake run (issue 6): a 40-tray, 3-oven, 2-cook run through POST /api/calc/bake-run. The report gives the gap to
 * the scheduler's lower bound (goal ≤ 5 %) and checks an 8-tray, one-oven run against bruteForceBakeRun (every
 * tray sequence simulated, 8! = 40 320 plans): the API's session must equal the brute force's.
 * Temperatures, times and rates are invented test values (common practice, no source).
 */
const BENCH_OVEN = { racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500 };
const BENCH_TRAYS = [
  { tempF: 350, minMinutes: 25, maxMinutes: 30, handsOnMinutes: 10 },
  { tempF: 400, minMinutes: 18, maxMinutes: 22, handsOnMinutes: 4 },
  { tempF: 425, minMinutes: 20, maxMinutes: 30, handsOnMinutes: 8 },
  { tempF: 400, minMinutes: 6, maxMinutes: 8, handsOnMinutes: 5 },
  { tempF: 350, minMinutes: 15, maxMinutes: 20, handsOnMinutes: 8 },
];
const benchRun = (trays: number, ovens: { name: string; racks?: number; convection?: boolean }[], cooks: number) => ({
  start: '2026-12-06T07:00',
  cooks,
  ambientF: 70,
  ovens: ovens.map((o) => ({ ...BENCH_OVEN, ...o })),
  trays: Array.from({ length: trays }, (_, i) => ({ id: `t${i + 1}`, name: `Tray ${i + 1}`, ...BENCH_TRAYS[i % BENCH_TRAYS.length] })),
});

async function postJson<T>(ctx: BenchContext, p: string, body: unknown): Promise<T> {
  const r = await fetch(ctx.base + p, {
    method: 'POST',
    headers: { cookie: ctx.cookie, 'content-type': 'application/json', 'x-trayline-csrf': '1' },
    body: JSON.stringify(body),
  });
  if (!r.ok) throw new Error(`${p}: ${r.status} ${await r.text()}`);
  return (await r.json()) as T;
}

async function calcBakeRun(ctx: BenchContext): Promise<BenchCase | null> {
  const body = benchRun(40, [{ name: 'Left' }, { name: 'Right', racks: 3, convection: true }, { name: 'Back' }], 2);
  return {
    name: 'POST /api/calc/bake-run (40 trays, 3 ovens, 2 cooks)',
    method: 'POST',
    path: '/api/calc/bake-run',
    body,
    sequential: 30,
    goal: 'gap to the lower bound ≤ 5 %',
    report: async () => {
      type Run = { sessionMinutes: number; lowerBoundMinutes: number; gapPct: number; method: string };
      const big = await postJson<Run>(ctx, '/api/calc/bake-run', body);
      const small = benchRun(8, [{ name: 'Left' }], 2);
      const api = await postJson<Run>(ctx, '/api/calc/bake-run', small);
      const { bruteForceBakeRun } = await import('../../shared/domain/bake-run-brute.js');
      const { bakeRunInputSchema } = await import('../../shared/schemas/bake-run.schema.js');
      const brute = bruteForceBakeRun(bakeRunInputSchema.parse(small));
      return [
        `40 trays: session ${big.sessionMinutes} min, lower bound ${big.lowerBoundMinutes} min, gap ${big.gapPct} % (goal ≤ 5 %) — ${big.gapPct <= 5 ? 'met' : 'NOT met'}`,
        `8 trays, 1 oven: API ${api.sessionMinutes} min (${api.method}), brute force ${brute.sessionMinutes} min over ${brute.plansTried} plans — ${api.sessionMinutes === brute.sessionMinutes ? 'equal' : 'DIFFERENT'}`,
      ];
    },
  };
}

/**
 * A big prep week (issue goals): 60 clients × 7 days × 2 slots over 12 base trays, made through the API as the coach
 * (the 7 demo trays plus 5 duplicates, one plate per tray, one PUT of all 840 cells, then the cover action for the
 * tray counts). Body measurements are invented test values. Made once and shared by the week and shopping cases.
 */
let bigWeek: Promise<number> | null = null;
async function makeBigWeek(ctx: BenchContext): Promise<number> {
  const sexes = ['female', 'male'] as const;
  const activities = ['sedentary', 'light', 'moderate', 'active', 'very-active'] as const;
  const goals = ['lose', 'maintain', 'gain'] as const;
  const clientIds = await Promise.all(
    Array.from({ length: 60 }, async (_, i) => {
      const c = await postJson<{ id: number }>(ctx, '/api/clients', {
        name: `Bench client ${i + 1}`,
        householdMultiplier: i % 10 === 0 ? '2' : '1',
        sex: sexes[i % 2],
        ageYears: 25 + (i % 40),
        heightCm: String(155 + (i % 30)),
        weightKg: String(55 + (i % 45)),
        activity: activities[i % activities.length],
        goal: goals[i % goals.length],
        netCarbCapG: '20',
        proteinGPerKg: '1.5',
        targetMode: 'computed',
      });
      return c.id;
    }),
  );
  const trays = await getJson<{ items: { id: number }[] } | { id: number }[]>(ctx, '/api/trays?pageSize=100');
  const trayIds = (Array.isArray(trays) ? trays : trays.items).map((t) => t.id);
  for (let i = 0; trayIds.length < 12; i++) trayIds.push((await postJson<{ id: number }>(ctx, `/api/trays/${trayIds[i]}/duplicate`, {})).id);
  const plateIds: number[] = [];
  for (const [i, trayId] of trayIds.slice(0, 12).entries()) {
    const p = await postJson<{ id: number }>(ctx, '/api/assemblies', { name: `Bench plate ${i + 1}`, trays: [{ trayId, portions: 1 }] });
    plateIds.push(p.id);
  }
  type Board = { week: { id: number; version: number }; days: string[]; slots: string[] };
  // The day after the workspace's last week (a day is on one board only; the demo week moves with the calendar).
  const existing = await getJson<{ endDate: string }[]>(ctx, '/api/weeks');
  const startDate = addDays(existing.map((w) => w.endDate).sort().at(-1) ?? '2026-12-06', 1);
  const board = await postJson<Board>(ctx, '/api/weeks', {
    name: 'Bench week',
    startDate,
    prepDate: addDays(startDate, -1),
    secondPrepDate: addDays(startDate, 2),
  });
  const slots = board.slots.slice(0, 2);
  const cells = clientIds.flatMap((clientId, ci) =>
    board.days.flatMap((date, di) => slots.map((slot, si) => ({ clientId, date, slot, assemblyId: plateIds[(ci + di * 2 + si) % plateIds.length] }))),
  );
  const send = async (method: string, p: string, body: unknown) => {
    const r = await fetch(ctx.base + p, {
      method,
      headers: { cookie: ctx.cookie, 'content-type': 'application/json', 'x-trayline-csrf': '1' },
      body: JSON.stringify(body),
    });
    if (!r.ok) throw new Error(`${p}: ${r.status} ${await r.text()}`);
    return (await r.json()) as Board;
  };
  const filled = await send('PUT', `/api/weeks/${board.week.id}/cells`, { version: board.week.version, cells });
  await postJson<Board>(ctx, `/api/weeks/${board.week.id}/trays/cover`, { version: filled.week.version });
  return board.week.id;
}
const bigWeekId = (ctx: BenchContext) => (bigWeek ??= makeBigWeek(ctx));

async function weekRecompute(ctx: BenchContext): Promise<BenchCase | null> {
  const id = await bigWeekId(ctx);
  const board = await getJson<{ cells: unknown[]; clients: unknown[]; trays: unknown[] }>(ctx, `/api/weeks/${id}`);
  return {
    name: 'week recompute (60 clients × 7 days × 2 slots, 12 tray recipes)',
    method: 'GET',
    path: `/api/weeks/${id}`,
    goal: '≤ 3×',
    goalRatio: 3,
    notes: `GET /api/weeks/:id: ${board.clients.length} clients, ${board.cells.length} cells, ${board.trays.length} tray counts`,
    report: () => recomputeAlone(ctx, id),
  };
}

/**
 * Diagnostic beside the GET line: the recompute alone (targets, plate macros, day checks, portion count, eat-by) from
 * the week's rows already read, timed in this process with the server's own functions, memos warm as in a running
 * server, in rounds alternating with health requests; and the GET's reads alone (the same statements, rows parsed).
 * They show how much of the GET is the computation, how much reading the rows and what is left for sending the
 * answer; the goal's verdict stays on the GET line.
 */
async function recomputeAlone(ctx: BenchContext, weekId: number): Promise<string[]> {
  const { createOrm } = await import('../../server/db/orm.js');
  const { boardInput, loadBoardById } = await import('../../server/modules/weeks/week-board.service.js');
  const { computeBoard } = await import('../../shared/domain/week-board.js');
  const me = await getJson<{ id: number; email: string; name: string; workspaceId: number }>(ctx, '/api/auth/me');
  const orm = await createOrm(ctx.databaseUrl);
  try {
    const actor = { userId: me.id, email: me.email, name: me.name, role: 'coach' as const, workspaceId: me.workspaceId, clientId: null };
    const data = await loadBoardById(orm.em.fork(), actor, weekId);
    // A new plate context each time, as each request has: per-request memos start empty, process memos are warm.
    const recompute = () => computeBoard(boardInput({ ...data, ctx: { ...data.ctx } }));
    for (let i = 0; i < 100; i++) recompute();
    const times: number[] = [];
    const reads: number[] = [];
    const health: number[] = [];
    for (let round = 0; round < 5; round++) {
      health.push(await ctx.healthMedian(60));
      for (let i = 0; i < 60; i++) {
        const t = performance.now();
        recompute();
        times.push(performance.now() - t);
      }
      // The same GET's reads alone: every statement of one board load (one round, side by side), rows parsed.
      for (let i = 0; i < 20; i++) {
        const t = performance.now();
        await loadBoardById(orm.em.fork(), actor, weekId);
        reads.push(performance.now() - t);
      }
    }
    const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
    const ms = median(times);
    const read = median(reads);
    const h = median(health);
    return [
      `Week recompute alone (diagnostic, in the bench process, memos warm): ${ms.toFixed(2)} ms against health ${h.toFixed(2)} ms = ${(ms / h).toFixed(2)}× ` +
        `(the rest of the GET is reading ${data.cells.length} cells and the other rows, and sending the answer).`,
      `Reading the week's rows alone (diagnostic, the GET's statements from the bench process): ${read.toFixed(2)} ms = ${(read / h).toFixed(2)}× health.`,
    ];
  } finally {
    await orm.close();
  }
}

async function weekShopping(ctx: BenchContext): Promise<BenchCase | null> {
  const id = await bigWeekId(ctx);
  await getJson(ctx, `/api/weeks/${id}/shopping`);
  return { name: 'shopping list (the 60-client week)', method: 'GET', path: `/api/weeks/${id}/shopping`, sequential: 60 };
}

/**
 * One client's week-plan PDF (issue 9): GET /api/weeks/:weekId/clients/:clientId/plan.pdf for the demo's published
 * week, rendered from the stored snapshot. The ids are found through the API as the coach.
 */
async function clientPlanPdf(ctx: BenchContext): Promise<BenchCase | null> {
  type Summary = { id: number; name: string; publishedVersion: number | null };
  const weeks = await getJson<Summary[]>(ctx, '/api/weeks');
  const week = weeks.find((w) => w.publishedVersion !== null);
  if (!week) return null;
  const board = await getJson<{ cells: { clientId: number }[] }>(ctx, `/api/weeks/${week.id}`);
  for (const clientId of [...new Set(board.cells.map((c) => c.clientId))]) {
    const path = `/api/weeks/${week.id}/clients/${clientId}/plan.pdf`;
    const r = await fetch(ctx.base + path, { headers: { cookie: ctx.cookie } });
    const bytes = (await r.arrayBuffer()).byteLength;
    if (r.ok) return { name: "one client's PDF (week plan)", method: 'GET', path, sequential: 60, notes: `${week.name}, client ${clientId}: ${bytes} bytes` };
  }
  return null;
}

export const benchCases: ((ctx: BenchContext) => Promise<BenchCase | null>)[] = [signedInFloor, calcRecipe, calcBakeRun, weekRecompute, weekShopping, clientPlanPdf];
