import { dropWorkerDatabases, TEST_TEMPLATE_URL } from './db.js';

/**
 * Once per API test run: a fresh test database, migrated with the committed migrations (no schema sync): the
 * template each worker copies into a database of its own (tests/support/db.ts), the last run's copies dropped.
 */
export default async function setup() {
  // MikroORM loads the migration files with Node's own import(): let it read TypeScript.
  const { register } = await import('tsx/esm/api');
  register();
  const { freshDatabase } = await import('../../server/db/fresh-database.js');
  await dropWorkerDatabases();
  await freshDatabase(TEST_TEMPLATE_URL, { seed: 'none' });
}
