import { defineConfig } from '@mikro-orm/postgresql';
import { Migrator } from '@mikro-orm/migrations';
import { SeedManager } from '@mikro-orm/seeder';
import { fileURLToPath } from 'node:url';
import { entities } from './entities.js';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

export function ormConfig(clientUrl: string, opts: { debug?: boolean } = {}) {
  return defineConfig({
    clientUrl,
    entities,
    extensions: [Migrator, SeedManager],
    debug: opts.debug ?? false,
    // Fail fast when the database is away, so /api/health answers within 2 s and requests don't pile up.
    pool: { min: 0, max: 10, acquireTimeoutMillis: 4000, idleTimeoutMillis: 10000 },
    driverOptions: { connection: { connectionTimeoutMillis: 1500 } },
    migrations: {
      path: here('./migrations'),
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
