import pg from 'pg';
import pino from 'pino';
import { env } from './config/env.js';
import { createOrm } from './db/orm.js';
import { sessionPoolConfig } from './db/connections.js';
import { closeBakeRunPool } from './lib/bake-run-pool.js';
import { gracefulClose } from './lib/graceful-close.js';
import { createHttpServer } from './lib/http-server.js';
import { createApp } from './app.js';
import { schemaGate } from './db/schema-gate.js';
import { createMailRuntime } from './modules/mail/mail-runtime.js';
import { smtpFromEnv } from './modules/mail/mail-transport.js';

const log = pino({ level: env.LOG_LEVEL });
const orm = await createOrm(env.DATABASE_URL);
const pool = new pg.Pool(sessionPoolConfig(env.DATABASE_URL));
pool.on('error', (err) => log.warn({ err }, 'session pool error'));
// E-mail jobs (pg-boss, schema `pgboss` of the same database) and their send worker. Started in the background
// so the server answers (503 on /api/health) even while PostgreSQL is away; it keeps trying until it starts.
const mail = createMailRuntime({ databaseUrl: env.DATABASE_URL, orm, smtp: smtpFromEnv(env), publicUrl: env.PUBLIC_URL, logger: log });
let mailTimer: NodeJS.Timeout | null = null;
const startMail = () => {
  mail.start().then(
    () => log.info('mail queue started'),
    (err) => {
      log.warn({ err }, 'mail queue not started yet; trying again in 5 s');
      mailTimer = setTimeout(startMail, 5000);
    },
  );
};
startMail();
// Says at start-up when the database is behind this version (requests get a 503 saying so until it is migrated).
const schema = schemaGate(orm);
schema.pending().then(
  (p) => p?.length && log.error({ pending: p }, `the database is ${p.length} migration(s) behind this version: run "npm run db:migrate"`),
  () => undefined,
);
const app = createApp({ orm, pool, env, mail, logger: log, schema });
const server = createHttpServer(app);
server.listen(env.PORT, env.HOST, () => {
  log.info(`Trayline listening on http://${env.HOST}:${env.PORT}`);
});

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  log.info(`${signal}: closing`);
  // Requests in flight finish (up to 10 s) before the pools they use are closed.
  const { cut } = await gracefulClose(server, 10_000);
  if (cut) log.warn('requests still running after 10 s were cut');
  if (mailTimer) clearTimeout(mailTimer);
  await mail.stop().catch((err) => log.warn({ err }, 'mail stop failed'));
  await Promise.allSettled([orm.close(true), pool.end(), closeBakeRunPool()]);
  process.exit(0);
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('unhandledRejection', (err) => log.error({ err }, 'unhandled rejection'));
