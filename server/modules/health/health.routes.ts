import { Router } from 'express';
import type { Orm } from '../../db/orm.js';
import type { SchemaGate } from '../../db/schema-gate.js';
import { allow } from '../../http/authz.js';

/** Answers within 2 s whatever the database does: 200 up, 503 down. */
export async function databaseUp(orm: Orm, timeoutMs = 1800): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined;
  try {
    const ping = orm.em.getConnection().execute('select 1').then(() => true);
    const timeout = new Promise<boolean>((resolve) => (timer = setTimeout(() => resolve(false), timeoutMs)));
    return await Promise.race([ping, timeout]);
  } catch {
    return false;
  } finally {
    if (timer) clearTimeout(timer);
  }
}

/**
 * 200 `{ok: true, db: 'up'}`; 503 `{ok: false, db: 'down'}` when PostgreSQL does not answer, and
 * `{ok: false, db: 'up', schema: 'behind', pending}` when migrations this version ships are not applied (a load
 * balancer keeps such an instance out until someone migrates).
 */
export function healthRoutes(orm: Orm, schema: SchemaGate) {
  const r = Router();
  r.get('/health', allow('public'), async (_req, res) => {
    const up = await databaseUp(orm);
    if (!up) return void res.status(503).json({ ok: false, db: 'down' });
    const pending = await schema.pending();
    if (pending && pending.length) return void res.status(503).json({ ok: false, db: 'up', schema: 'behind', pending });
    res.json({ ok: true, db: 'up' });
  });
  return r;
}
