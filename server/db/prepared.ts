import type { EntityManager } from '@mikro-orm/postgresql';
import type { Knex } from 'knex';

interface PgConnection {
  query(config: { name: string; text: string; values: readonly unknown[] }): Promise<{ rows: unknown[] }>;
}

/**
 * Runs a named (prepared) statement on the entity manager's connection, inside its transaction when it has one.
 * PostgreSQL plans a named statement once per connection; for a small query run on every request, planning costs
 * more than running it. `text` uses PostgreSQL placeholders ($1, $2, …) and must be the same for a given name
 * (pass lists as one array parameter: `id = any($1::int[])`).
 * Values come back as the ORM's connection gives them: jsonb parsed, numeric and timestamptz as strings.
 */
export async function preparedRows<T>(em: EntityManager, name: string, text: string, values: readonly unknown[]): Promise<T[]> {
  const knex: Knex = em.getTransactionContext<Knex.Transaction>() ?? em.getKnex();
  const client = knex.client as { acquireConnection(): Promise<PgConnection>; releaseConnection(c: PgConnection): Promise<unknown> };
  const conn = await client.acquireConnection();
  try {
    return (await inTurn(conn, () => conn.query({ name, text, values }))).rows as T[];
  } finally {
    await client.releaseConnection(conn);
  }
}

/** The statement each connection is running, if any (see inTurn). */
const running = new WeakMap<PgConnection, Promise<unknown>>();

/**
 * Runs `run` on `conn` once the statement before it there has finished. Outside a transaction every call has a
 * connection of its own and runs at once; inside one, statements a caller starts side by side (Promise.all) share
 * the transaction's connection and take turns here, instead of being queued inside pg (deprecated, gone in pg 9).
 */
function inTurn<R>(conn: PgConnection, run: () => Promise<R>): Promise<R> {
  const before = running.get(conn);
  const mine = before ? before.then(run, run) : run();
  const settled = mine.then(
    () => undefined,
    () => undefined,
  );
  running.set(conn, settled);
  void settled.then(() => {
    if (running.get(conn) === settled) running.delete(conn);
  });
  return mine;
}
