// preparedRows (server/db/prepared.ts): the named statements hot reads use must run on the request's connection,
// inside its transaction when it has one (they see its uncommitted rows; other connections do not), and answer the
// same as the ORM's own query.
import { beforeAll, describe, expect, it, vi } from 'vitest';
import pg from 'pg';
import type { Orm } from '../../server/db/orm.js';
import { preparedRows } from '../../server/db/prepared.js';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, uniq } from '../support/factories.js';

let orm: Orm;
let workspaceId: number;
beforeAll(async () => {
  const t = await testApp();
  orm = t.orm;
  workspaceId = (await coachWorkspace(t.app)).workspaceId;
});

const NAME_SQL = 'select name from workspace where id = $1';

describe('preparedRows', () => {
  it('reads inside the transaction of its entity manager, and nothing of it leaks before commit', async () => {
    const renamed = uniq('renamed');
    let inside: { name: string }[] = [];
    let outside: { name: string }[] = [];
    await orm.em.fork().transactional(async (tx) => {
      await tx.getConnection().execute('update workspace set name = ? where id = ?', [renamed, workspaceId], 'run', tx.getTransactionContext());
      inside = await preparedRows<{ name: string }>(tx, 'test_workspace_name', NAME_SQL, [workspaceId]);
      outside = await preparedRows<{ name: string }>(orm.em.fork(), 'test_workspace_name', NAME_SQL, [workspaceId]);
    });
    expect(inside).toEqual([{ name: renamed }]);
    expect(outside[0].name).not.toBe(renamed);
    expect(await preparedRows(orm.em.fork(), 'test_workspace_name', NAME_SQL, [workspaceId])).toEqual([{ name: renamed }]);
  });

  it('rolls back with its transaction', async () => {
    const before = (await preparedRows<{ name: string }>(orm.em.fork(), 'test_workspace_name', NAME_SQL, [workspaceId]))[0].name;
    await expect(
      orm.em.fork().transactional(async (tx) => {
        await tx.getConnection().execute('update workspace set name = ? where id = ?', ['never', workspaceId], 'run', tx.getTransactionContext());
        expect((await preparedRows<{ name: string }>(tx, 'test_workspace_name', NAME_SQL, [workspaceId]))[0].name).toBe('never');
        throw new Error('roll back');
      }),
    ).rejects.toThrow('roll back');
    expect((await preparedRows<{ name: string }>(orm.em.fork(), 'test_workspace_name', NAME_SQL, [workspaceId]))[0].name).toBe(before);
  });

  it('takes a list as one array parameter and answers as the ORM query does', async () => {
    const ids = [workspaceId, -1];
    const viaPrepared = await preparedRows<{ id: number }>(orm.em.fork(), 'test_workspace_ids', 'select id from workspace where id = any($1::int[]) order by id', [ids]);
    const viaOrm = await orm.em.fork().getConnection().execute<{ id: number }[]>('select id from workspace where id in (?, ?) order by id', ids);
    expect(viaPrepared).toEqual(viaOrm);
    expect(viaPrepared).toEqual([{ id: workspaceId }]);
  });

  it("takes turns on a transaction's connection when started side by side (pg 9 refuses a query while one runs)", async () => {
    // pg 8 queues a second query on a busy client and warns that pg 9 will not (node_modules/pg/lib/client.js).
    type Queued = { _queryQueue: unknown[]; activeQuery: unknown };
    const overlaps: number[] = [];
    const query = pg.Client.prototype.query;
    const spy = vi.spyOn(pg.Client.prototype, 'query').mockImplementation(function (this: pg.Client, ...args: unknown[]) {
      const self = this as unknown as Queued;
      if (self._queryQueue.length > 0 || self.activeQuery) overlaps.push(self._queryQueue.length);
      return (query as (...a: unknown[]) => unknown).apply(this, args);
    } as typeof query);
    try {
      const names = await orm.em.fork().transactional((tx) =>
        Promise.all(Array.from({ length: 6 }, () => preparedRows<{ name: string }>(tx, 'test_workspace_name', NAME_SQL, [workspaceId]))),
      );
      expect(names).toHaveLength(6);
      expect(new Set(names.map((r) => r[0].name)).size).toBe(1);
    } finally {
      spy.mockRestore();
    }
    expect(overlaps).toEqual([]);
  });
});
