import { MikroORM } from '@mikro-orm/postgresql';
import { ormConfig } from './mikro-orm.config.js';

export type Orm = MikroORM;

export async function createOrm(url: string): Promise<Orm> {
  // connect: false — the server starts (and answers 503 on /api/health) even when the database is away.
  return MikroORM.init({ ...ormConfig(url), connect: false });
}
