import pg from 'pg';
import { MikroORM } from '@mikro-orm/postgresql';
import { ormConfig } from './mikro-orm.config.js';
import { seedAll } from './seeders/index.js';

/**
 * Drops and re-creates a database, applies the committed migrations and, when asked, seeds reference data and the
 * demo workspace. Used by the test, end-to-end and benchmark runs (never by the app itself).
 */
export async function freshDatabase(url: string, opts: { seed: 'none' | 'demo' }): Promise<void> {
  const name = new URL(url).pathname.slice(1);
  const admin = new pg.Client({ connectionString: url.replace(/\/[^/]+$/, '/postgres') });
  await admin.connect();
  try {
    await admin.query(`drop database if exists "${name}" with (force)`);
    await admin.query(`create database "${name}"`);
  } finally {
    await admin.end();
  }
  const orm = await MikroORM.init(ormConfig(url));
  try {
    await orm.getMigrator().up();
    if (opts.seed === 'demo') await seedAll(orm.em.fork(), { demo: true });
  } finally {
    await orm.close(true);
  }
}
