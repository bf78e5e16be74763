import pg from 'pg';
import pino from 'pino';
import request from 'supertest';
import type { Express } from 'express';
import { loadEnv } from '@server/config/env.js';
import { createOrm, type Orm } from '@server/db/orm.js';
import { sessionPoolConfig } from '@server/db/connections.js';
import { closeBakeRunPool } from '@server/lib/bake-run-pool.js';
import { createApp } from '@server/app.js';
import { createMailRuntime, type MailRuntime } from '@server/modules/mail/mail-runtime.js';
import { smtpFromEnv } from '@server/modules/mail/mail-transport.js';
import { TEST_DATABASE_URL } from './db.js';

let state: { app: Express; orm: Orm; pool: pg.Pool; mail: MailRuntime } | null = null;

export async function testApp(overrides: Record<string, string> = {}) {
  if (state && Object.keys(overrides).length === 0) return state;
  const env = loadEnv({
    NODE_ENV: 'test',
    DATABASE_URL: TEST_DATABASE_URL,
    LOG_LEVEL: 'silent',
    SERVE_CLIENT: '0',
    DEMO_SEED: '0',
    PUBLIC_URL: 'http://127.0.0.1:8080',
    ...overrides,
  });
  const orm = await createOrm(env.DATABASE_URL);
  const pool = new pg.Pool(sessionPoolConfig(env.DATABASE_URL));
  // pg-boss queue only (no send worker): mail tests start their own worker and catcher (tests/api/mail.api.test.ts).
  const mail = createMailRuntime({ databaseUrl: env.DATABASE_URL, orm, smtp: smtpFromEnv(env), publicUrl: env.PUBLIC_URL, work: false });
  await mail.start().catch(() => undefined); // a test of a database that is away still gets an app
  const app = createApp({ orm, pool, env, mail, logger: pino({ level: 'silent' }) });
  const s = { app, orm, pool, mail };
  if (Object.keys(overrides).length === 0) state = s;
  return s;
}

export async function closeTestApp() {
  if (!state) return;
  const { orm, pool, mail } = state;
  state = null;
  await mail.stop().catch(() => undefined);
  await Promise.allSettled([orm.close(true), pool.end(), closeBakeRunPool()]);
}

/** A supertest agent that keeps cookies and sends the CSRF header on writes. */
export function agentFor(app: Express) {
  const agent = request.agent(app);
  agent.set('x-trayline-csrf', '1');
  return agent;
}

export type Agent = ReturnType<typeof agentFor>;
