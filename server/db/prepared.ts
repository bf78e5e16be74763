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
    return (await conn.query({ name, text, values })).rows as T[];
  } finally {
    await client.releaseConnection(conn);
  }
}
