import pg from 'pg';
import { TEST_DATABASE_URL } from './db.js';

/** Once per API test run: a fresh test database, migrated with the committed migrations (no schema sync). */
export default async function setup() {
  const { register } = await import('tsx/esm/api');
  register();
  const admin = new pg.Client({ connectionString: TEST_DATABASE_URL.replace(/\/[^/]+$/, '/postgres') });
  await admin.connect();
  const name = new URL(TEST_DATABASE_URL).pathname.slice(1);
  try {
    await admin.query(`drop database if exists "${name}" with (force)`);
    await admin.query(`create database "${name}"`);
  } finally {
    await admin.end();
  }
  const { MikroORM } = await import('@mikro-orm/postgresql');
  const { ormConfig } = await import('../../server/db/mikro-orm.config.js');
  const orm = await MikroORM.init(ormConfig(TEST_DATABASE_URL));
  try {
    await orm.getMigrator().up();
  } finally {
    await orm.close(true);
  }
}
