import type { PoolConfig } from 'pg';

/**
 * How long a new connection to PostgreSQL may take. The clock runs in wall time, and a connection's answer is read
 * only when the event loop comes round to it: a few CPU-heavy requests in a row (a 40-tray bake run computes for
 * ~0.2 s) let a 1.5 s limit fire on connections that had already answered, and their requests failed with 503.
 * 5 s leaves room for a busy process and still fails a request when the database is really away; GET /api/health
 * keeps its own 1.8 s limit (health.routes.ts), so it answers within 2 s whatever happens.
 */
export const CONNECT_TIMEOUT_MS = 5000;

/**
 * Idle connections stay open this long: opening one costs a round of authentication (SCRAM hashing on our side),
 * and a connection opened during a burst of work is exactly the one the limit above catches.
 */
export const IDLE_TIMEOUT_MS = 60_000;

/** The session store's pool (connect-pg-simple and the session statement). */
export function sessionPoolConfig(connectionString: string): PoolConfig {
  return { connectionString, max: 5, connectionTimeoutMillis: CONNECT_TIMEOUT_MS, idleTimeoutMillis: IDLE_TIMEOUT_MS };
}
