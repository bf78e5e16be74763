import pg from 'pg';
import { afterAll, beforeAll, expect } from 'vitest';
import { truncateAll, workerDatabase } from './db.js';
import { closeTestApp } from './test-app.js';

// Each worker has a database of its own (a copy of the migrated template), and runs its files one after another:
// the tables are truncated before each file.
beforeAll(async () => {
  await workerDatabase();
  await truncateAll();
});

// No statement may be sent on a connection that is still running one: pg 8 queues it and warns, pg 9 refuses it
// (node_modules/pg/lib/client.js). Statements a transaction starts side by side must take turns (server/db/prepared.ts).
const overlapping: string[] = [];
const query = pg.Client.prototype.query;
pg.Client.prototype.query = function (this: pg.Client, ...args: unknown[]) {
  if ((this as unknown as { _queryQueue: unknown[] })._queryQueue.length > 0) overlapping.push(expect.getState().currentTestName ?? '(outside a test)');
  return (query as (...a: unknown[]) => unknown).apply(this, args);
} as typeof query;

afterAll(async () => {
  await closeTestApp();
  pg.Client.prototype.query = query;
  expect(overlapping, 'statements sent on a busy connection, by test').toEqual([]);
});
