import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import type request from 'supertest';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, member, type Member } from '../support/factories.js';
import { MATRIX, type MatrixContext } from '../support/authorization-matrix.js';
import { listApiRoutes } from '../support/routes.js';

/**
 * Every route, called by a role its matrix row allows, with bodies and queries no form would send: the answer is
 * never a 5xx, and a 400 always says what was wrong (a field's errors or a detail). The bodies are the matrix row's
 * own body with each field (to three levels down) replaced in turn by an odd value, plus whole bodies of the wrong
 * shape. Found this way: a 5 000-character e-mail at sign-in was a 500 (the rate-limit key outgrew its column).
 */
let app: Express;
let ctx: MatrixContext;
let roles: Record<'coach' | 'assistant' | 'client', Member>;
beforeAll(async () => {
  app = (await testApp()).app;
  const coach = await coachWorkspace(app);
  roles = { coach, assistant: await member(app, coach, 'assistant'), client: await member(app, coach, 'client') };
  ctx = { app, coachA: coach, coachB: await coachWorkspace(app), ids: {} };
  for (const row of Object.values(MATRIX)) if (row.prepare) await row.prepare(ctx);
}, 120_000);

const WHOLE_BODIES: unknown[] = [[], 'text', 42, null, { version: 'x' }, { version: -1 }, { version: 1.5 }, { __proto__: { admin: true } }];
const ODD_VALUES: unknown[] = [
  null, '', ' ', 'x'.repeat(20_000), '\u0000', -1, 0.1, 1e20, -1e20, '1e999', '９', true, [], [1, 2], {}, { a: [{}] },
  Array.from({ length: 2_000 }, () => ({})), '2026-02-29',
];
const ODD_QUERIES = ['?q=%00', '?page=-1', '?page=abc&pageSize=1e9', '?q[]=1&q[]=2', '?date=2026-02-30', '?from=x&to=y', '?sort=__proto__'];

/** The body with each field, to three levels down, replaced by each odd value in turn. */
function oddVariants(body: unknown): unknown[] {
  const out: unknown[] = [];
  const walk = (node: unknown, rebuild: (v: unknown) => unknown, depth: number) => {
    if (depth > 3 || node === null || typeof node !== 'object') return;
    for (const key of Object.keys(node)) {
      const at = (v: unknown) => rebuild(Array.isArray(node) ? Object.assign([...node], { [key]: v }) : { ...node, [key]: v });
      for (const odd of ODD_VALUES) out.push(at(odd));
      walk((node as Record<string, unknown>)[key], at, depth + 1);
    }
  };
  walk(body, (v) => v, 0);
  return out;
}

function allowedRole(access: unknown): Member | null {
  if (access === 'public' || access === 'signed-in') return roles.coach;
  const list = access as ('coach' | 'assistant' | 'client')[];
  return list.length ? roles[list[0]] : null;
}

describe('odd bodies and queries', () => {
  for (const [key, row] of Object.entries(MATRIX)) {
    const [method, pattern] = key.split(' ');
    // Logging out would end the session the other calls use (logout has its own tests).
    if (key === 'POST /api/auth/logout') continue;
    it(`${key}: never a 5xx, every 400 says what`, async () => {
      const who = allowedRole(row.access)!;
      const path = row.path ? row.path(ctx) : pattern;
      const m = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
      const calls: [string, unknown][] =
        m === 'get' || m === 'delete'
          ? ODD_QUERIES.map((q) => [path + q, undefined])
          : [...WHOLE_BODIES, ...oddVariants(row.body ? row.body(ctx) : {})].map((b) => [path, b]);
      const wrong: string[] = [];
      for (const [p, body] of calls) {
        let req: request.Test = who.agent[m](p).set('x-trayline-csrf', '1');
        if (body !== undefined) {
          req = body !== null && typeof body === 'object' && !Array.isArray(body) ? req.send(body) : req.type('json').send(JSON.stringify(body));
        }
        const res = await req;
        const said = `${res.status} ${p} ${JSON.stringify(body)?.slice(0, 120)} → ${JSON.stringify(res.body).slice(0, 200)}`;
        if (res.status >= 500) wrong.push(said);
        if (res.status === 400 && !(res.body?.errors && Object.keys(res.body.errors).length) && !res.body?.detail) wrong.push(said);
      }
      expect(calls.length).toBeGreaterThan(0);
      expect(wrong).toEqual([]);
    }, 60_000);
  }
});

describe('odd path parameters', () => {
  // Each ":param" of every route replaced by tokens no link makes: never a 5xx, and a 400 says what.
  const ODD_PARAMS = ['abc', '1.5', '-1', '0', '%00', '1e3', '%F0%9F%8D%B3', 'x'.repeat(300), '01'];
  it('every route with a path parameter answers 400, 403 or 404 (never a 5xx) to them', async () => {
    const routes = listApiRoutes(app).filter((r) => r.path.includes(':') && r.path !== '/api/auth/logout');
    expect(routes.length).toBeGreaterThan(20);
    const wrong: string[] = [];
    for (const r of routes) {
      const row = MATRIX[`${r.method} ${r.path}`];
      const who = allowedRole(row.access)!;
      const m = r.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
      for (const odd of ODD_PARAMS) {
        const p = r.path.replace(/:\w+/g, odd);
        const res = await who.agent[m](p).set('x-trayline-csrf', '1').send({});
        if (res.status >= 500 || (res.status === 400 && !res.body?.errors && !res.body?.detail)) wrong.push(`${res.status} ${r.method} ${p}`);
      }
    }
    expect(wrong).toEqual([]);
  }, 120_000);
});
