import http from 'node:http';
import pg from 'pg';
import pino from 'pino';
import { env } from './config/env.js';
import { createOrm } from './db/orm.js';
import { createApp } from './app.js';

const log = pino({ level: env.LOG_LEVEL });
const orm = await createOrm(env.DATABASE_URL);
const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 5, connectionTimeoutMillis: 1500 });
pool.on('error', (err) => log.warn({ err }, 'session pool error'));
const app = createApp({ orm, pool, env, logger: log });
const server = http.createServer(app);
server.listen(env.PORT, env.HOST, () => {
  log.info(`Trayline listening on http://${env.HOST}:${env.PORT}`);
});

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  log.info(`${signal}: closing`);
  server.close();
  await Promise.allSettled([orm.close(true), pool.end()]);
  process.exit(0);
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('unhandledRejection', (err) => log.error({ err }, 'unhandled rejection'));
