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

export const benchCases: ((ctx: BenchContext) => Promise<BenchCase | null>)[] = [calcRecipe];
