import type { Pool } from 'pg';
import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';

/**
 * express-rate-limit store kept in PostgreSQL, so several app instances share one count (nothing in process memory).
 * Table `rate_limit_hit` is created by a migration.
 */
export class PgRateLimitStore implements Store {
  windowMs = 60_000;
  prefix: string;
  localKeys = false;
  constructor(private readonly pool: Pool, prefix: string) {
    this.prefix = prefix;
  }
  init(options: Options): void {
    this.windowMs = options.windowMs;
  }
  private key(k: string) {
    return `${this.prefix}:${k}`;
  }
  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const r = await this.pool.query<{ hits: number; reset_at: Date }>(
      'select hits, reset_at from rate_limit_hit where key = $1 and reset_at > now()',
      [this.key(key)],
    );
    const row = r.rows[0];
    return row ? { totalHits: row.hits, resetTime: row.reset_at } : undefined;
  }
  async increment(key: string): Promise<ClientRateLimitInfo> {
    const r = await this.pool.query<{ hits: number; reset_at: Date }>(
      `insert into rate_limit_hit (key, hits, reset_at) values ($1, 1, now() + ($2 || ' milliseconds')::interval)
       on conflict (key) do update set
         hits = case when rate_limit_hit.reset_at <= now() then 1 else rate_limit_hit.hits + 1 end,
         reset_at = case when rate_limit_hit.reset_at <= now() then excluded.reset_at else rate_limit_hit.reset_at end
       returning hits, reset_at`,
      [this.key(key), String(this.windowMs)],
    );
    return { totalHits: r.rows[0].hits, resetTime: r.rows[0].reset_at };
  }
  async decrement(key: string): Promise<void> {
    await this.pool.query('update rate_limit_hit set hits = greatest(hits - 1, 0) where key = $1', [this.key(key)]);
  }
  async resetKey(key: string): Promise<void> {
    await this.pool.query('delete from rate_limit_hit where key = $1', [this.key(key)]);
  }
}
