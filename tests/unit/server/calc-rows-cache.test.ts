import { describe, expect, it } from 'vitest';
import { stampedRowsCache } from '@server/modules/ingredients/calc-rows-cache.js';

const rule = { kind: 'half-other-polyols' } as const;
const row = (id: number) => ({ id, kcal: String(100 + id) });

describe('library rows kept under a nutrition stamp', () => {
  it('answers only for the stamp the rows were read under, and only when it knows every id asked', () => {
    const cache = stampedRowsCache<{ id: number; kcal: string }>();
    expect(cache.get(1, '100', [1])).toBeNull();
    cache.set(1, '100', rule, [1, 2, 3], new Map([[1, row(1)], [2, row(2)]]));
    const got = cache.get(1, '100', [2, 1, 3]);
    expect(got?.rule).toEqual(rule);
    expect([...got!.found.keys()].sort()).toEqual([1, 2]); // 3 was read and is not in the library
    expect(got!.found.get(1)).toEqual(row(1));
    expect(Object.isFrozen(got!.found.get(1))).toBe(true);
    expect(cache.get(1, '100', [1, 4])).toBeNull(); // 4 never read
    expect(cache.get(1, '101', [1])).toBeNull(); // another stamp
    expect(cache.get(1, null, [1])).toBeNull(); // no stamp read with the session
    expect(cache.get(2, '100', [1])).toBeNull(); // another workspace
  });

  it('rows read under the same stamp add up; a new stamp starts again', () => {
    const cache = stampedRowsCache<{ id: number; kcal: string }>();
    cache.set(1, '100', rule, [1], new Map([[1, row(1)]]));
    cache.set(1, '100', rule, [2], new Map([[2, row(2)]]));
    expect(cache.get(1, '100', [1, 2])?.found.size).toBe(2);
    cache.set(1, '102', { kind: 'full' }, [2], new Map([[2, { id: 2, kcal: '999' }]]));
    expect(cache.get(1, '100', [2])).toBeNull();
    expect(cache.get(1, '102', [1])).toBeNull();
    expect(cache.get(1, '102', [2])).toEqual({ found: new Map([[2, { id: 2, kcal: '999' }]]), rule: { kind: 'full' } });
    cache.set(1, undefined, rule, [1], new Map([[1, row(1)]])); // nothing is kept without a stamp
    expect(cache.get(1, '102', [2])).not.toBeNull();
    cache.clear();
    expect(cache.get(1, '102', [2])).toBeNull();
  });
});
