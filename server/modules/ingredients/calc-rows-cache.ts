import { LRUCache } from 'lru-cache';
import type { NetCarbRule } from '@shared/domain/nutrition.js';

/**
 * Library rows the recipe calculation read, kept per workspace under the workspace's nutrition stamp (the
 * nutrition_stamp migration): a trigger moves the stamp on every write to the workspace's ingredients, the shared
 * ones or its net-carb rule, and every signed-in request reads the stamp with its session. While the stamp a
 * request read equals the one its rows were read under, those rows are what the database holds, so the
 * calculation answers without reading them again; a new stamp drops the workspace's rows.
 *
 * Not state that matters: each request checks its rows against PostgreSQL's stamp, so every instance answers the
 * same, and a restart or an eviction only costs a read. Rows are frozen (callers share them).
 */
export interface StampedRows<R> {
  found: Map<number, R>;
  rule: NetCarbRule;
}

interface Entry<R> {
  version: string;
  rule: NetCarbRule;
  /** id → row, or null: not in this workspace's library (another workspace's, or no such id) under this stamp. */
  rows: Map<number, R | null>;
}

/** Workspaces kept, and rows kept per workspace (past it the workspace's rows start again). */
const MAX_WORKSPACES = 500;
const MAX_ROWS = 5000;

export function stampedRowsCache<R extends object>() {
  const byWorkspace = new LRUCache<number, Entry<R>>({ max: MAX_WORKSPACES });
  return {
    /** The rows for `ids` when every one is known under `version`; otherwise null (read them). */
    get(workspaceId: number, version: string | null | undefined, ids: readonly number[]): StampedRows<R> | null {
      if (!version) return null;
      const entry = byWorkspace.get(workspaceId);
      if (!entry || entry.version !== version) return null;
      const found = new Map<number, R>();
      for (const id of ids) {
        const row = entry.rows.get(id);
        if (row === undefined) return null;
        if (row !== null) found.set(id, row);
      }
      return { found, rule: entry.rule };
    },
    /**
     * Keeps what one statement read under `version`: the rows found among `ids` (the others are not in the
     * library). A different version than the kept one replaces it (the newer read wins; the next request's stamp
     * tells which is current).
     */
    set(workspaceId: number, version: string | null | undefined, rule: NetCarbRule, ids: readonly number[], found: ReadonlyMap<number, R>): void {
      if (!version) return;
      let entry = byWorkspace.get(workspaceId);
      if (!entry || entry.version !== version || entry.rows.size + ids.length > MAX_ROWS) {
        entry = { version, rule, rows: new Map() };
        byWorkspace.set(workspaceId, entry);
      }
      for (const id of ids) entry.rows.set(id, found.has(id) ? Object.freeze(found.get(id)!) : null);
    },
    clear(): void {
      byWorkspace.clear();
    },
  };
}
