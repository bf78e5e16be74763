import { TEST_DATABASE_URL } from './db.js';

/** Once per API test run: a fresh test database, migrated with the committed migrations (no schema sync). */
export default async function setup() {
  // MikroORM loads the migration files with Node's own import(): let it read TypeScript.
  const { register } = await import('tsx/esm/api');
  register();
  const { freshDatabase } = await import('../../server/db/fresh-database.js');
  await freshDatabase(TEST_DATABASE_URL, { seed: 'none' });
}
