import http from 'node:http';
import type { AddressInfo } from 'node:net';
import express from 'express';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createHttpServer } from '@server/lib/http-server.js';
import { testApp } from '../support/test-app.js';
import { makeIngredient } from '../support/factories.js';

const servers: http.Server[] = [];
afterAll(async () => {
  for (const s of servers) await new Promise((r) => s.close(r));
});

async function listen(server: http.Server): Promise<string> {
  servers.push(server);
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
  return `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
}

describe('the app’s HTTP server', () => {
  it('creates requests and responses with the app’s prototypes before Express sees them, and Express works as usual', async () => {
    const app = express();
    app.get('/echo', (req, res) => {
      res.locals.seen = true;
      res.status(201).json({ q: req.query.q, ua: req.get('x-test'), sameApp: req.app === app, locals: res.locals.seen });
    });
    const server = createHttpServer(app);
    const born: boolean[] = [];
    // Runs before the app's own listener: what the request is born as.
    server.prependListener('request', (req, res) => born.push(Object.getPrototypeOf(req) === app.request && Object.getPrototypeOf(res) === app.response));
    const base = await listen(server);
    const res = await fetch(`${base}/echo?q=eggs`, { headers: { 'x-test': 'yes' } });
    expect(res.status).toBe(201);
    expect(await res.json()).toEqual({ q: 'eggs', ua: 'yes', sameApp: true, locals: true });
    expect(born).toEqual([true]);
  });

  it('serves the whole API: health, a sign-in with its session cookie, and a recipe calculation', async () => {
    const { app } = await testApp();
    const base = await listen(createHttpServer(app));
    expect(await (await fetch(`${base}/api/health`)).json()).toEqual({ ok: true, db: 'up' });

    const agent = request.agent(base);
    agent.set('x-trayline-csrf', '1');
    const email = `server-${Date.now()}@example.test`;
    await agent.post('/api/auth/register').send({ name: 'Sam Server', email, password: 'a-long-password-1', businessName: 'Server Prep' }).expect(201);
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body).toMatchObject({ email, role: 'coach' });
    const coach = { agent, email, userId: me.body.id, workspaceId: me.body.workspaceId, role: 'coach' as const };
    const ing = await makeIngredient(coach); // 350 kcal per 100 g
    const calc = await agent.post('/api/calc/recipe').send({ items: [{ ingredientId: ing.id, amount: '50', unit: 'g' }], portions: 2 }).expect(200);
    expect(calc.body.total.kcal).toBe(175);
    expect(calc.body.perPortion.kcal).toBe(87.5);
  });
});
