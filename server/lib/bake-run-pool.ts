import os from 'node:os';
import { Tinypool } from 'tinypool';
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

export function planBakeRunOffThread(input: BakeRunInput): Promise<BakeRunResult> {
  return workers().run(input) as Promise<BakeRunResult>;
}

/** Ends the worker threads (server shutdown, test teardown). */
export async function closeBakeRunPool(): Promise<void> {
  const p = pool;
  pool = null;
  await p?.destroy();
}
