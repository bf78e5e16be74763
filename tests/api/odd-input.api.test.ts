import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import express from 'express';
import request from 'supertest';
import { readdirSync, readFileSync } from 'node:fs';
import { UniqueConstraintViolationException } from '@mikro-orm/core';
import { Oven } from '@server/modules/bake-runs/bake-run.entity.js';
import { DUPLICATE_WORDS, errorHandler } from '@server/http/error-handler.js';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, makeClient, makeIngredient, type Member } from '../support/factories.js';
import { listApiRoutes } from '../support/routes.js';

// 2^31 − 1 is the largest PostgreSQL `integer` (PostgreSQL manual, "Numeric Types": integer, −2147483648 to
// +2147483647); ids and versions are such integers.
const PAST_INTEGER = 2_147_483_648;

let app: Express;
let coach: Member;
beforeAll(async () => {
  app = (await testApp()).app;
  coach = await coachWorkspace(app);
});

describe('numbers past the database integer range', () => {
  it('every route with an id in its path answers 400 naming it (or 404), never 500', async () => {
    const routes = listApiRoutes(app).filter((r) => /:(\w*[iI]d)\b/.test(r.path));
    expect(routes.length).toBeGreaterThan(20);
    const answers: string[] = [];
    for (const r of routes) {
      const path = r.path.replace(/:(\w*[iI]d)\b/g, String(PAST_INTEGER));
      const m = r.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
      const res = await coach.agent[m](path).set('x-trayline-csrf', '1').send({});
      answers.push(`${r.method} ${r.path} ${res.status}`);
      if (res.status === 400) expect(Object.keys(res.body.errors ?? {}).length, `${r.method} ${r.path}`).toBeGreaterThan(0);
    }
    expect(answers.filter((a) => !/ (400|403|404)$/.test(a))).toEqual([]);
  });

  it('ids and versions in bodies are 400s naming the field', async () => {
    const calc = await coach.agent
      .post('/api/calc/recipe')
      .set('x-trayline-csrf', '1')
      .send({ items: [{ ingredientId: PAST_INTEGER, amount: '5', unit: 'g' }], portions: 1 })
      .expect(400);
    expect(Object.keys(calc.body.errors)).toEqual(['items.0.ingredientId']);
    const week = (await coach.agent.post('/api/weeks').set('x-trayline-csrf', '1').send({ name: 'Range week', startDate: '2027-01-04', prepDate: '2027-01-03' }).expect(201)).body;
    const stale = await coach.agent.patch(`/api/weeks/${week.week.id}`).set('x-trayline-csrf', '1').send({ version: PAST_INTEGER, name: 'x' }).expect(400);
    expect(Object.keys(stale.body.errors)).toEqual(['version']);
  });

  it('an edit without the version it started from is a 400 naming version, in words (JSON or text, any route)', async () => {
    const said = ['Send the version you started from (the record’s "version", a whole number from 1)'];
    const week = (await coach.agent.post('/api/weeks').set('x-trayline-csrf', '1').send({ name: 'No version', startDate: '2027-02-01', prepDate: '2027-01-31' }).expect(201)).body;
    const client = await makeClient(coach);
    const edits = [
      coach.agent.patch('/api/workspace/settings').send({ dateOrder: 'day-month' }),
      coach.agent.patch(`/api/weeks/${week.week.id}`).send({ name: 'x' }),
      coach.agent.patch(`/api/weeks/${week.week.id}`).send({ name: 'x', version: 'two' }),
      coach.agent.patch(`/api/clients/${client.id}`).send({ name: 'No version' }),
    ];
    for (const edit of edits) {
      const res = await edit.set('x-trayline-csrf', '1').expect(400);
      expect(res.body.errors.version).toEqual(said);
    }
  });

  it("the error handler answers PostgreSQL's out-of-range error (22003) with a 400, as a last line behind the schemas", async () => {
    const probe = express();
    probe.get('/boom', () => {
      throw Object.assign(new Error('value "99999999999" is out of range for type integer'), { code: '22003' });
    });
    probe.use(errorHandler());
    const res = await request(probe).get('/boom').expect(400);
    expect(res.body).toMatchObject({ status: 400, code: 'out_of_range', detail: 'A number in the request is out of range' });
  });
});

describe('two saves of the same thing crossing (a unique key clash past the services\' own checks)', () => {
  it('answers 409 naming what clashed and the field, from the constraint PostgreSQL reports', async () => {
    const { orm } = await testApp();
    await coach.agent.post('/api/ovens').send({ name: 'Clash oven', racks: 2, traysPerRack: 1, maxC: 260 }).expect(201);
    // The row a second request would write had it read before the first committed: the database refuses it.
    const em = orm.em.fork();
    const clash = await em
      .insert(Oven, { workspace: coach.workspaceId, name: 'Clash oven', racks: 2, traysPerRack: 1, createdAt: new Date(), updatedAt: new Date() })
      .then(
        () => null,
        (e: unknown) => e,
      );
    expect(clash).toBeInstanceOf(UniqueConstraintViolationException);
    const probe = express();
    probe.post('/ovens', () => {
      throw clash;
    });
    probe.use(errorHandler());
    const res = await request(probe).post('/ovens').expect(409);
    expect(res.body).toMatchObject({ code: 'duplicate', detail: 'An oven with this name already exists', errors: { name: ['An oven with this name already exists'] } });

    // A clash on a key without words of its own still answers 409 (never a 500).
    const unnamed = new UniqueConstraintViolationException(Object.assign(new Error('duplicate key'), { code: '23505', constraint: 'some_new_unique' }));
    const other = express();
    other.post('/x', () => {
      throw unnamed;
    });
    other.use(errorHandler());
    expect((await request(other).post('/x').expect(409)).body).toMatchObject({ code: 'duplicate', detail: 'That already exists' });
  });

  it('every constraint given words exists in the migrations (a renamed one would fall back silently)', () => {
    const migrations = readdirSync('server/db/migrations')
      .map((f) => readFileSync(`server/db/migrations/${f}`, 'utf8'))
      .join('\n');
    for (const name of Object.keys(DUPLICATE_WORDS)) expect(migrations, name).toContain(`"${name}"`);
  });
});

describe('text, amounts and dates the database or the calendar cannot hold', () => {
  it('a NUL character in a query, a body or a nested field is a 400 naming it', async () => {
    const q = await coach.agent.get('/api/ingredients?q=egg%00').expect(400);
    expect(q.body.errors).toEqual({ q: ['Text cannot hold a NUL character'] });
    const body = await coach.agent.post('/api/clients').set('x-trayline-csrf', '1').send({ name: 'Nul\u0000 client' }).expect(400);
    expect(body.body.errors).toEqual({ name: ['Text cannot hold a NUL character'] });
    const nested = await coach.agent
      .post('/api/calc/recipe')
      .set('x-trayline-csrf', '1')
      .send({ items: [{ ingredientId: 1, amount: '5', unit: 'g\u0000' }], portions: 1 })
      .expect(400);
    expect(Object.keys(nested.body.errors)).toEqual(['items.0.unit']);
  });

  it('an amount past 1,000,000 (in any unit) is a 400 naming it, typed or canonical', async () => {
    const ingredient = await makeIngredient(coach);
    for (const amount of ['9'.repeat(400), '1000000.5', '2 000 000']) {
      const res = await coach.agent
        .post('/api/calc/recipe')
        .set('x-trayline-csrf', '1')
        .send({ items: [{ ingredientId: ingredient.id, amount, unit: 'g' }], portions: 1 });
      expect(res.status, amount).toBe(400);
      expect(Object.keys(res.body.errors), amount).toEqual(['items.0.amount']);
    }
    // The largest allowed amount still computes.
    await coach.agent.post('/api/calc/recipe').set('x-trayline-csrf', '1').send({ items: [{ ingredientId: ingredient.id, amount: '1000000', unit: 'g' }], portions: 1 }).expect(200);
  });

  it('a week dated in year 9999 or year 0 is a 400 naming the date', async () => {
    for (const [startDate, prepDate] of [['9999-12-27', '9999-12-26'], ['0000-01-03', '0000-01-02']]) {
      const res = await coach.agent.post('/api/weeks').set('x-trayline-csrf', '1').send({ name: 'Odd week', startDate, prepDate }).expect(400);
      expect(Object.keys(res.body.errors).sort()).toEqual(['prepDate', 'startDate']);
    }
  });
});


describe('bodies of the wrong shape', () => {
  it('no route answers 5xx to an empty, a list, a text or a deeply nested body', async () => {
    const deep: Record<string, unknown> = {};
    let at = deep;
    for (let i = 0; i < 60; i++) at = (at.x = {}) as Record<string, unknown>;
    const bodies: unknown[] = [{}, [], 'text', 42, null, deep, { version: 'x', id: -1, name: 7, items: {}, cells: 'x', trays: [null] }];
    const failures: string[] = [];
    for (const r of listApiRoutes(app).filter((x) => x.method !== 'GET' && x.method !== 'DELETE')) {
      // Signing out or in would change the session the other calls use.
      if (r.path.startsWith('/api/auth/')) continue;
      const path = r.path.replace(/:(\w*[iI]d)\b/g, '1').replace(/:token\b/, 'unknown-token-unknown-token');
      const m = r.method.toLowerCase() as 'post' | 'put' | 'patch';
      for (const body of bodies) {
        const req = coach.agent[m](path).set('x-trayline-csrf', '1').set('content-type', 'application/json');
        const res = await req.send(JSON.stringify(body));
        if (res.status >= 500) failures.push(`${r.method} ${r.path} ${JSON.stringify(body).slice(0, 40)} → ${res.status} ${res.body?.detail ?? ''}`);
      }
    }
    expect(failures).toEqual([]);
  });
});
