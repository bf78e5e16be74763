import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, member, type Member } from '../support/factories.js';
import { listApiRoutes } from '../support/routes.js';
import { MATRIX, type MatrixContext } from '../support/authorization-matrix.js';

/**
 * The authorization matrix: every API route, enumerated from the Express router itself, must have a row here.
 * A row states who may call the route; the test checks the route's guard says the same, then calls it as each role:
 * allowed roles get past the guard (not 401/403), others get 403 (401 when signed out), and a coach of a second
 * workspace asking for the first workspace's ids gets 404 (never 200, never 403: ids cannot be probed).
 */
let app: Express;
let a: { coach: Member; assistant: Member; client: Member };
let b: { coach: Member };
let ctx: MatrixContext;

beforeAll(async () => {
  app = (await testApp()).app;
  const coach = await coachWorkspace(app);
  a = { coach, assistant: await member(app, coach, 'assistant'), client: await member(app, coach, 'client') };
  b = { coach: await coachWorkspace(app) };
  ctx = { app, coachA: a.coach, coachB: b.coach, ids: {} };
  for (const row of Object.values(MATRIX)) if (row.prepare) await row.prepare(ctx);
});

const sendAs = (agent: request.Agent | null, method: string, path: string, body: unknown) => {
  const base = agent ?? request(app);
  const m = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  let req = (base as unknown as Record<string, (p: string) => request.Test>)[m](path).set('x-trayline-csrf', '1');
  if (m !== 'get' && m !== 'delete') req = req.send(body as object);
  return req;
};

describe('authorization matrix', () => {
  it('every API route has a matrix row, and every row is a route', () => {
    const routes = listApiRoutes(app).map((r) => `${r.method} ${r.path}`);
    const missing = routes.filter((r) => !(r in MATRIX));
    const stale = Object.keys(MATRIX).filter((k) => !routes.includes(k));
    expect(missing, 'routes without a matrix row').toEqual([]);
    expect(stale, 'matrix rows without a route').toEqual([]);
  });

  it('every route starts with the one authorization guard, and the guard matches its row', () => {
    for (const r of listApiRoutes(app)) {
      const row = MATRIX[`${r.method} ${r.path}`];
      expect(r.access, `${r.method} ${r.path} has no allow() guard`).toBeDefined();
      const want = row.access;
      expect(Array.isArray(r.access) ? [...r.access].sort() : r.access, `${r.method} ${r.path}`).toEqual(
        Array.isArray(want) ? [...want].sort() : want,
      );
    }
  });

  for (const [key, row] of Object.entries(MATRIX)) {
    const [method, pattern] = key.split(' ');
    it(`${key}: each role gets the status its row says`, async () => {
      const path = row.path ? row.path(ctx) : pattern;
      const body = row.body ? row.body(ctx) : {};
      // First, before any allowed call could change the row.
      if (row.crossWorkspace) {
        const res = await sendAs(b.coach.agent, method, path, body);
        expect(res.status, `coach of another workspace on ${key}`).toBe(404);
      }
      const roles: [string, request.Agent | null][] = [
        ['anonymous', null],
        ['coach', a.coach.agent],
        ['assistant', a.assistant.agent],
        ['client', a.client.agent],
      ];
      for (const [role, agent] of roles) {
        if (row.skipRoles?.includes(role)) continue;
        const res = await sendAs(agent, method, path, body);
        const allowed =
          row.access === 'public' ||
          (row.access === 'signed-in' && role !== 'anonymous') ||
          (Array.isArray(row.access) && row.access.includes(role as never));
        if (allowed) {
          // Past the guard: whatever the route answers, it is not the guard's refusal.
          expect(['unauthorized', 'forbidden'], `${role} ${key} → ${res.status} ${JSON.stringify(res.body)}`).not.toContain(
            res.body?.code,
          );
        } else {
          expect(res.status, `${role} ${key}`).toBe(role === 'anonymous' ? 401 : 403);
        }
      }
    });
  }
});
