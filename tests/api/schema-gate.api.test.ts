import pg from 'pg';
import pino from 'pino';
import request from 'supertest';
import { MikroORM } from '@mikro-orm/postgresql';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadEnv } from '@server/config/env.js';
import { createOrm, type Orm } from '@server/db/orm.js';
import { ormConfig } from '@server/db/mikro-orm.config.js';
import { sessionPoolConfig } from '@server/db/connections.js';
import { schemaGate, shippedMigrations } from '@server/db/schema-gate.js';
import { createApp } from '@server/app.js';
import type { MailQueue } from '@server/modules/mail/mail.service.js';
import { TEST_DATABASE_URL } from '../support/db.js';

// A database of its own (the shared test database stays migrated): empty at first, as a new version finds one whose
// migrations were not run yet.
const NAME = `trayline_test_schema_${process.pid}`;
const URL_ = TEST_DATABASE_URL.replace(/\/[^/]+$/, `/${NAME}`);
const admin = () => new pg.Client({ connectionString: TEST_DATABASE_URL.replace(/\/[^/]+$/, '/postgres') });

async function adminQuery(q: string) {
  const c = admin();
  await c.connect();
  try {
    await c.query(q);
  } finally {
    await c.end();
  }
}

const opened: { orm: Orm; pool: pg.Pool }[] = [];
async function appOn(recheckMs: number) {
  const env = loadEnv({ NODE_ENV: 'test', DATABASE_URL: URL_, LOG_LEVEL: 'silent', SERVE_CLIENT: '0', DEMO_SEED: '0' });
  const orm = await createOrm(URL_);
  const pool = new pg.Pool(sessionPoolConfig(URL_));
  opened.push({ orm, pool });
  // The gate is read before any route, so no mail queue is needed; one that is asked for anything fails the test.
  const mail = new Proxy({}, { get: () => () => Promise.reject(new Error('mail is not used here')) }) as unknown as MailQueue;
  const schema = schemaGate(orm, { recheckMs });
  return { app: createApp({ orm, pool, env, mail, logger: pino({ level: 'silent' }), schema }), schema };
}

beforeAll(async () => {
  await adminQuery(`drop database if exists "${NAME}" with (force)`);
  await adminQuery(`create database "${NAME}"`);
});

afterAll(async () => {
  for (const o of opened) await Promise.allSettled([o.orm.close(true), o.pool.end()]);
  await adminQuery(`drop database if exists "${NAME}" with (force)`);
});

describe('schema gate: a database behind the code', () => {
  it('names every shipped migration as pending on an empty database, as MikroORM’s migrator does', async () => {
    const { schema } = await appOn(0);
    const orm = await MikroORM.init(ormConfig(URL_));
    try {
      // MikroORM's own list (its migrator reads the same folder) is the reference for the names and their order.
      const migrator = (await orm.getMigrator().getPendingMigrations()).map((m) => m.name);
      expect(await schema.pending()).toEqual(migrator);
      expect(shippedMigrations()).toEqual(migrator);
    } finally {
      await orm.close(true);
    }
  });

  it('health is 503 naming the pending migrations, and a request is a 503 that says to migrate (not a 500)', async () => {
    const { app } = await appOn(0);
    const health = await request(app).get('/api/health').expect(503);
    expect(health.body).toEqual({ ok: false, db: 'up', schema: 'behind', pending: shippedMigrations() });

    const login = await request(app)
      .post('/api/auth/login')
      .set('x-trayline-csrf', '1')
      .send({ email: 'coach@trayline.test', password: 'trayline-demo' })
      .expect(503);
    expect(login.headers['content-type']).toMatch(/application\/problem\+json/);
    expect(login.body).toMatchObject({ status: 503, code: 'schema_behind', pending: shippedMigrations() });
    expect(login.body.detail).toContain('npm run db:migrate');
  });

  it('recovers by itself once the migrations are applied, and a later gate sees one missing migration', async () => {
    const { app } = await appOn(0);
    await request(app).get('/api/health').expect(503);
    // MikroORM loads the migration files with Node's own import() (as tests/support/global-setup.ts does).
    const { register } = await import('tsx/esm/api');
    const unregister = register();
    const orm = await MikroORM.init(ormConfig(URL_));
    try {
      await orm.getMigrator().up();
    } finally {
      await orm.close(true);
      await unregister();
    }
    expect((await request(app).get('/api/health').expect(200)).body).toEqual({ ok: true, db: 'up' });
    // Past the gate: the route answers for itself (no session: 401).
    await request(app).get('/api/auth/me').expect(401);

    const last = shippedMigrations().at(-1)!;
    const c = new pg.Client({ connectionString: URL_ });
    await c.connect();
    try {
      await c.query('delete from mikro_orm_migrations where name = $1', [last]);
    } finally {
      await c.end();
    }
    const later = await appOn(5000);
    expect((await request(later.app).get('/api/health').expect(503)).body).toMatchObject({ schema: 'behind', pending: [last] });
  });
});
