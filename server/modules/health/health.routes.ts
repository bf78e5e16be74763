import { Router } from 'express';
import type { Orm } from '../../db/orm.js';
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

export function healthRoutes(orm: Orm) {
  const r = Router();
  r.get('/health', allow('public'), async (_req, res) => {
    const up = await databaseUp(orm);
    res.status(up ? 200 : 503).json(up ? { ok: true, db: 'up' } : { ok: false, db: 'down' });
  });
  return r;
}
