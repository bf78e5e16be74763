import { describe, expect, it, vi } from 'vitest';
import type { Orm } from '@server/db/orm.js';
import { schemaGate, shippedMigrations } from '@server/db/schema-gate.js';

/** An ORM whose one statement (the migrations log) answers as `execute` says. */
function ormWith(execute: () => Promise<{ name: string }[]>) {
  const fn = vi.fn(execute);
  return { orm: { em: { getConnection: () => ({ execute: fn }) } } as unknown as Orm, execute: fn };
}

const SHIPPED = ['Migration1_a', 'Migration2_b', 'Migration3_c'];

describe('schema gate', () => {
  it('reads the log once while current, then never again', async () => {
    const { orm, execute } = ormWith(async () => SHIPPED.map((name) => ({ name })));
    const gate = schemaGate(orm, { shipped: SHIPPED });
    expect(await gate.pending()).toEqual([]);
    expect(await gate.pending()).toEqual([]);
    expect(execute).toHaveBeenCalledTimes(1);
  });

  it('names what is missing, and reads again only after recheckMs', async () => {
    let applied = ['Migration1_a'];
    const { orm, execute } = ormWith(async () => applied.map((name) => ({ name })));
    const gate = schemaGate(orm, { shipped: SHIPPED, recheckMs: 60_000 });
    expect(await gate.pending()).toEqual(['Migration2_b', 'Migration3_c']);
    applied = SHIPPED;
    expect(await gate.pending()).toEqual(['Migration2_b', 'Migration3_c']); // within recheckMs: the last answer
    expect(execute).toHaveBeenCalledTimes(1);
  });

  it('a database that is away: unknown (null), and requests are not held by a second attempt within recheckMs', async () => {
    const { orm, execute } = ormWith(async () => {
      throw Object.assign(new Error('connect ECONNREFUSED'), { code: 'ECONNREFUSED' });
    });
    const gate = schemaGate(orm, { shipped: SHIPPED, recheckMs: 60_000 });
    expect(await gate.pending()).toBeNull();
    expect(await gate.pending()).toBeNull();
    expect(execute).toHaveBeenCalledTimes(1);
    const next = vi.fn();
    gate.middleware({} as never, {} as never, next);
    await vi.waitFor(() => expect(next).toHaveBeenCalledWith(undefined));
  });

  it('an empty database (no log table): every shipped migration is pending', async () => {
    const { orm } = ormWith(async () => {
      throw Object.assign(new Error('relation "mikro_orm_migrations" does not exist'), { code: '42P01' });
    });
    expect(await schemaGate(orm, { shipped: SHIPPED }).pending()).toEqual(SHIPPED);
  });

  it('ships the migration files of server/db/migrations, oldest first', () => {
    const shipped = shippedMigrations();
    expect(shipped.length).toBeGreaterThan(5);
    expect([...shipped].sort()).toEqual(shipped);
    for (const m of shipped) expect(m).toMatch(/^Migration\d{14}_[a-z_]+$/);
  });
});
