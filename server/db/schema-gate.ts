import fs from 'node:fs';
import path from 'node:path';
import type { RequestHandler } from 'express';
import type { Orm } from './orm.js';
import { HttpError } from '../http/errors.js';
import { MIGRATIONS_PATH } from './mikro-orm.config.js';

/** The migrations this version of the code ships (file names without extension, as the migrations log records them). */
export function shippedMigrations(dir = MIGRATIONS_PATH): string[] {
  return fs
    .readdirSync(dir)
    .filter((f) => /\.(ts|js)$/.test(f) && !f.endsWith('.d.ts'))
    .map((f) => path.basename(f, path.extname(f)))
    .sort();
}

/** The schema is behind the code: an administrator runs the migrations (`npm run db:migrate`). */
export class SchemaBehind extends HttpError {
  constructor(pending: readonly string[]) {
    super(
      503,
      'schema_behind',
      `The database is ${pending.length} migration(s) behind this version of Trayline: an administrator runs "npm run db:migrate".`,
      { pending },
    );
  }
}

export interface SchemaGate {
  /** Migrations shipped but not applied; null while unknown (the database could not be read). */
  pending(): Promise<string[] | null>;
  /** Answers 503 (SchemaBehind) while migrations are pending, before the request touches a table. */
  middleware: RequestHandler;
}

/**
 * Keeps requests off a database whose schema is older than the code (a new version started before its migrations
 * ran): each would fail on a missing table or column with a 500. The migrations log is read on the first request;
 * once every shipped migration is applied that stays true (migrations only go forward while an instance runs) and
 * the gate costs nothing more. While some are pending it reads the log again at most every `recheckMs`, so an
 * instance recovers by itself once someone migrates. What it keeps is PostgreSQL's answer, not state of its own:
 * every instance reads the same log.
 */
export function schemaGate(orm: Orm, opts: { recheckMs?: number; shipped?: readonly string[] } = {}): SchemaGate {
  const recheckMs = opts.recheckMs ?? 5000;
  const shipped = opts.shipped ?? shippedMigrations();
  let current = false;
  let behind: { pending: string[]; at: number } | null = null;
  /** When the log last could not be read (the database away): requests go on without asking again until recheckMs. */
  let unreadAt: number | null = null;
  let reading: Promise<string[] | null> | null = null;

  async function readPending(): Promise<string[] | null> {
    let applied: Set<string>;
    try {
      const rows: { name: string }[] = await orm.em.getConnection().execute('select name from mikro_orm_migrations');
      applied = new Set(rows.map((r) => r.name));
    } catch (err) {
      // No migrations log at all: an empty database, nothing applied.
      if ((err as { code?: string }).code === '42P01') applied = new Set();
      else {
        // The database is away: unknown. Health says so; requests meet the database's own error, not a second wait.
        unreadAt = Date.now();
        return null;
      }
    }
    unreadAt = null;
    const pending = shipped.filter((m) => !applied.has(m));
    if (pending.length === 0) {
      current = true;
      behind = null;
    } else {
      behind = { pending, at: Date.now() };
    }
    return pending;
  }

  async function pending(): Promise<string[] | null> {
    if (current) return [];
    if (behind && Date.now() - behind.at < recheckMs) return behind.pending;
    if (unreadAt !== null && Date.now() - unreadAt < recheckMs) return null;
    reading ??= readPending().finally(() => (reading = null));
    return reading;
  }

  const middleware: RequestHandler = (_req, _res, next) => {
    if (current) return next();
    pending().then((p) => next(p && p.length ? new SchemaBehind(p) : undefined), next);
  };

  return { pending, middleware };
}
