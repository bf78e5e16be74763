import { afterAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import { sessionPoolConfig } from '@server/db/connections.js';
import { TEST_DATABASE_URL } from '../support/db.js';

/** Keeps the event loop busy for `ms`, as a CPU-heavy request does (a large bake run computes for a while). */
function busy(ms: number) {
  const until = performance.now() + ms;
  while (performance.now() < until) {
    /* computing */
  }
}

const closers: (() => Promise<unknown>)[] = [];
afterAll(async () => {
  for (const close of closers) await close();
});

describe('connections opened while the process is busy', () => {
  it('the session pool opens a connection whose answer waited 2 s behind busy work, and the query succeeds', async () => {
    const pool = new pg.Pool(sessionPoolConfig(TEST_DATABASE_URL));
    closers.push(() => pool.end());
    const answer = pool.query<{ one: number }>('select 1 as one');
    busy(2000);
    expect((await answer).rows[0].one).toBe(1);
  });
});
