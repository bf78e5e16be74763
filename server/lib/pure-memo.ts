import { LRUCache } from 'lru-cache';

/**
 * A bounded memo of a pure function, keyed by a string that names its whole input: what every request recomputes
 * from the same facts (a client's targets on each board load) is computed once per process.
 *
 * Not state that matters: a value is a function of its key alone, so every instance answers the same and a restart
 * or an eviction only costs the computation again. The key must cover every input the function reads; values are
 * frozen, as callers share them.
 */
export function pureMemo<A extends unknown[], R extends object>(fn: (...args: A) => R, keyOf: (...args: A) => string, max = 5000): (...args: A) => R {
  const cache = new LRUCache<string, R>({ max });
  return (...args: A): R => {
    const key = keyOf(...args);
    let value = cache.get(key);
    if (value === undefined) cache.set(key, (value = Object.freeze(fn(...args))));
    return value;
  };
}
