import { defineConfig } from '@mikro-orm/postgresql';
import { Migrator } from '@mikro-orm/migrations';
import { SeedManager } from '@mikro-orm/seeder';
import { fileURLToPath } from 'node:url';
import { entities } from './entities.js';
import { CONNECT_TIMEOUT_MS, IDLE_TIMEOUT_MS } from './connections.js';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

/** Where the committed migrations are (the migrator's folder; the schema gate lists the same files). */
export const MIGRATIONS_PATH = here('./migrations');

export function ormConfig(clientUrl: string, opts: { debug?: boolean } = {}) {
  return defineConfig({
    clientUrl,
    entities,
    extensions: [Migrator, SeedManager],
    debug: opts.debug ?? false,
    // Connection limits as the session pool's (connections.ts: wall time runs while the process is busy); a request
    // waits at most acquireTimeoutMillis for a connection. /api/health keeps its own 1.8 s limit.
    pool: { min: 0, max: 10, acquireTimeoutMillis: CONNECT_TIMEOUT_MS + 1000, idleTimeoutMillis: IDLE_TIMEOUT_MS },
    driverOptions: { connection: { connectionTimeoutMillis: CONNECT_TIMEOUT_MS } },
    migrations: {
      path: MIGRATIONS_PATH,
      glob: '!(*.d).{js,ts}',
      emit: 'ts',
      transactional: true,
      allOrNothing: true,
      snapshot: false,
    },
    seeder: { path: here('./seeders'), glob: '!(*.d).{js,ts}' },
    // connect-pg-simple's session table, the login counters and the nutrition stamps are created by our own migrations.
    schemaGenerator: { skipTables: ['session', 'rate_limit_hit', 'nutrition_stamp'] },
    forceUtcTimezone: true,
    allowGlobalContext: false,
  });
}
