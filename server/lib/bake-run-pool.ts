import os from 'node:os';
import { Tinypool } from 'tinypool';
import { LRUCache } from 'lru-cache';
import type { BakeRunInput, BakeRunResult } from '@shared/domain/bake-run-types.js';

/**
 * The bake-run scheduler off the request thread. A 40-tray, 3-oven run computes for ~0.2 s; on the thread that
 * answers requests, every other request (other people's pages, health checks) waited behind it. Worker threads
 * (tinypool) take it: one less than the machine's cores, at least one; a thread idle for 10 minutes ends (starting
 * one takes ~0.5 s). Each thread registers tsx itself (bake-run-worker.mjs). Input and result are plain data (no
 * classes to lose on the way).
 */
let pool: Tinypool | null = null;

function workers(): Tinypool {
  pool ??= new Tinypool({
    filename: new URL('./bake-run-worker.mjs', import.meta.url).href,
    minThreads: 0,
    maxThreads: Math.max(1, os.availableParallelism() - 1),
    idleTimeout: 10 * 60_000,
  });
  return pool;
}

/**
 * Plans already made, by their whole input. The scheduler is deterministic (a fixed-seed search with a budget of
 * evaluations, not of time), so a plan is a function of its input alone: the bake-run page read again, and the
 * cooling watch reading a prep day under way once a minute, reuse it instead of computing it again. Not state that
 * matters (a restart or an eviction only costs the computation); each caller gets its own copy.
 */
const planned = new LRUCache<string, Promise<BakeRunResult>>({ max: 200 });

export async function planBakeRunOffThread(input: BakeRunInput): Promise<BakeRunResult> {
  const key = JSON.stringify(input);
  let plan = planned.get(key);
  if (!plan) {
    plan = workers().run(input) as Promise<BakeRunResult>;
    planned.set(key, plan);
    // A failed computation is not kept.
    plan.catch(() => planned.delete(key));
  }
  return structuredClone(await plan);
}

/** Ends the worker threads (server shutdown, test teardown). */
export async function closeBakeRunPool(): Promise<void> {
  planned.clear();
  const p = pool;
  pool = null;
  await p?.destroy();
}
