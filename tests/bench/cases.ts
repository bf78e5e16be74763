import type { Orm } from '../../server/db/orm.js';

export interface BenchContext {
  base: string;
  orm: Orm;
  cookie: string;
}

export interface BenchCase {
  name: string;
  method: 'GET' | 'POST';
  path: string;
  body?: unknown;
  goal?: string;
  notes?: string;
  /** Extra lines for the results file (quality numbers such as a gap to a lower bound). */
  report?: () => Promise<string[]>;
}

async function getJson<T>(ctx: BenchContext, p: string): Promise<T> {
  const r = await fetch(ctx.base + p, { headers: { cookie: ctx.cookie } });
  if (!r.ok) throw new Error(`${p}: ${r.status}`);
  return (await r.json()) as T;
}

/** POST /api/calc/recipe with 40 lines from the reference library. */
async function calcRecipe(ctx: BenchContext): Promise<BenchCase | null> {
  const list = await getJson<{ items: { id: number; densityGPerMl: number | null }[] }>(ctx, '/api/ingredients?pageSize=100');
  const items = list.items.slice(0, 40).map((i, n) => ({ ingredientId: i.id, amount: String(10 + n), unit: 'g' }));
  return { name: 'POST /api/calc/recipe (40 lines)', method: 'POST', path: '/api/calc/recipe', body: { items, portions: 12 }, goal: '≤ 2×' };
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

export const benchCases: ((ctx: BenchContext) => Promise<BenchCase | null>)[] = [calcRecipe, calcBakeRun];
