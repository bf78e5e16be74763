import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import Decimal from 'decimal.js';
import { portionCount, traysToCover, type BoardCell, type TrayBatch } from '@shared/domain/inventory';

// The portion count is plain arithmetic (ceiling division, sums); the checks below are arithmetic
// worked by hand in each comment, plus properties of the ceiling (definition of ⌈x⌉).

describe('traysToCover', () => {
  it.each([
    { needed: 0, perTray: 8, trays: 0 },
    { needed: 1, perTray: 8, trays: 1 },
    { needed: 8, perTray: 8, trays: 1 },
    { needed: 9, perTray: 8, trays: 2 },
    { needed: 24, perTray: 12, trays: 2 },
    { needed: 25, perTray: 12, trays: 3 },
    { needed: '7.5', perTray: 8, trays: 1 },
  ])('$needed portions at $perTray per tray → $trays trays', ({ needed, perTray, trays }) => {
    expect(traysToCover(needed, perTray)).toBe(trays);
  });

  it('is the smallest whole count that covers the need: t·p ≥ n and (t − 1)·p < n', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 100_000 }), fc.integer({ min: 1, max: 200 }), (n, p) => {
        const t = traysToCover(n, p);
        expect(Number.isInteger(t)).toBe(true);
        expect(t * p).toBeGreaterThanOrEqual(n);
        expect((t - 1) * p).toBeLessThan(n);
      }),
    );
  });

  it('holds for needs in tenths of a portion as well', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 100_000 }), fc.integer({ min: 1, max: 200 }), (tenths, p) => {
        const n = `${Math.floor(tenths / 10)}.${tenths % 10}`;
        const t = traysToCover(n, p);
        expect(t * p * 10).toBeGreaterThanOrEqual(tenths);
        expect((t - 1) * p * 10).toBeLessThan(tenths);
      }),
    );
  });

  it.each([
    { needed: -1, perTray: 8 },
    { needed: 4, perTray: 0 },
  ])('rejects needed $needed, per tray $perTray', ({ needed, perTray }) => {
    expect(() => traysToCover(needed, perTray)).toThrow(RangeError);
  });
});

describe('portionCount: one prep date', () => {
  const sunday = '2025-01-05';
  const cells: BoardCell[] = [
    // client A, household ×1: Mon–Fri one egg-tray portion → 5
    ...['2025-01-06', '2025-01-07', '2025-01-08', '2025-01-09', '2025-01-10'].map((date) => ({
      date, householdMultiplier: 1, portions: [{ trayId: 'egg', quantity: 1 }],
    })),
    // client B, household ×1.5: Mon–Wed one portion → 4.5, plus half a portion at lunch Monday → 0.75
    ...['2025-01-06', '2025-01-07', '2025-01-08'].map((date) => ({
      date, householdMultiplier: '1.5', portions: [{ trayId: 'egg', quantity: 1 }, { trayId: 'slaw', quantity: 2 }],
    })),
    { date: '2025-01-06', householdMultiplier: '1.5', portions: [{ trayId: 'egg', quantity: '0.5' }] },
  ];
  const batches: TrayBatch[] = [
    { trayId: 'egg', prepDate: sunday, trayCount: 1, portionsPerTray: 12 },
    { trayId: 'slaw', prepDate: sunday, trayCount: 1, portionsPerTray: 6 },
    { trayId: 'spare-only', prepDate: sunday, trayCount: 2, portionsPerTray: 4 },
  ];
  const result = portionCount({ prepDates: [sunday], cells, batches });
  const byId = Object.fromEntries(result.map((t) => [t.trayId, t]));

  it('egg: 5 + 4.5 + 0.75 = 10.25 → 11 needed, 12 produced, 1 spare', () => {
    expect(byId.egg).toMatchObject({ neededExact: 10.25, needed: 11, produced: 12, spare: 1, short: 0, traysToCover: 1 });
  });

  it('slaw: 3 days × 2 × 1.5 = 9 needed, 6 produced, 3 short, 2 trays would cover it', () => {
    expect(byId.slaw).toMatchObject({ needed: 9, produced: 6, spare: 0, short: 3, traysToCover: 2 });
  });

  it('a tray baked but on no plate is all spare', () => {
    expect(byId['spare-only']).toMatchObject({ needed: 0, produced: 8, spare: 8, short: 0, traysToCover: 0 });
  });

  it('sums decimals exactly: thirty plates of 0.1 portion need 3 portions (binary floats give 3.0000000000000013 → 4)', () => {
    const tenths = Array.from({ length: 30 }, () => ({ date: '2025-01-06', householdMultiplier: 1, portions: [{ trayId: 'dip', quantity: 0.1 }] }));
    const [dip] = portionCount({ prepDates: [sunday], cells: tenths, batches: [] });
    expect(dip).toMatchObject({ neededExact: 3, needed: 3, produced: 0, short: 3, traysToCover: null });
  });
});

describe('portionCount: trays thrown away', () => {
  const sunday = '2025-01-05';
  // 40 portions of one tray needed (20 days × 2 portions), 3 trays of 16 baked, one thrown away (cooling missed).
  const cells: BoardCell[] = Array.from({ length: 20 }, () => ({ date: '2025-01-06', householdMultiplier: 1, portions: [{ trayId: 'egg', quantity: 2 }] }));

  it('3 trays of 16 with 1 thrown away: 2 × 16 = 32 baked for 40 needed, 8 short; covering takes ⌈40 / 16⌉ + 1 = 4 trays', () => {
    const [egg] = portionCount({ prepDates: [sunday], cells, batches: [{ trayId: 'egg', prepDate: sunday, trayCount: 3, portionsPerTray: 16, lostTrays: 1 }] });
    expect(egg).toMatchObject({ needed: 40, produced: 32, short: 8, spare: 0, lostTrays: 1, traysToCover: 4 });
    expect(egg.byPrepDate[0]).toMatchObject({ produced: 32, short: 8, lostTrays: 1, traysToCover: 4 });
  });

  it('never counts more trays thrown away than were baked, nor fewer than none', () => {
    const [egg] = portionCount({ prepDates: [sunday], cells, batches: [{ trayId: 'egg', prepDate: sunday, trayCount: 1, portionsPerTray: 16, lostTrays: 3 }] });
    expect(egg).toMatchObject({ produced: 0, short: 40, lostTrays: 1 });
    expect(() => portionCount({ prepDates: [sunday], cells, batches: [{ trayId: 'egg', prepDate: sunday, trayCount: 1, portionsPerTray: 16, lostTrays: -1 }] })).toThrow(RangeError);
  });
});

describe('portionCount: two prep dates (Sunday and Wednesday)', () => {
  const prepDates = ['2025-01-08', '2025-01-05'];
  const cell = (date: string, quantity: number, prepDate?: string): BoardCell => ({
    date, householdMultiplier: 2, portions: [{ trayId: 'egg', quantity, ...(prepDate ? { prepDate } : {}) }],
  });
  const cells = [
    cell('2025-01-04', 1), // before both prep dates → booked on Sunday (the week check blocks it)
    cell('2025-01-06', 1), // Sunday
    cell('2025-01-07', 1), // Sunday
    cell('2025-01-08', 1), // Wednesday (prep day itself)
    cell('2025-01-10', 1), // Wednesday
    cell('2025-01-11', 1, '2025-01-05'), // coach chose Sunday's prep (e.g. frozen portion)
  ];
  const batches: TrayBatch[] = [
    { trayId: 'egg', prepDate: '2025-01-05', trayCount: 1, portionsPerTray: 6 },
    { trayId: 'egg', prepDate: '2025-01-08', trayCount: 1, portionsPerTray: 6 },
  ];
  const [egg] = portionCount({ prepDates, cells, batches });

  it('splits needs by prep date: Sunday 4 cells × 2 = 8, Wednesday 2 cells × 2 = 4', () => {
    expect(egg.byPrepDate).toEqual([
      { prepDate: '2025-01-05', neededExact: 8, needed: 8, produced: 6, spare: 0, short: 2, lostTrays: 0, traysToCover: 2 },
      { prepDate: '2025-01-08', neededExact: 4, needed: 4, produced: 6, spare: 2, short: 0, lostTrays: 0, traysToCover: 1 },
    ]);
  });

  it('totals: short on Sunday is not covered by Wednesday’s spares', () => {
    expect(egg).toMatchObject({ needed: 12, produced: 12, short: 2, spare: 2, traysToCover: 3 });
  });

  it('rounds up per prep date: 0.5 on each prep date needs 1 + 1 portions', () => {
    const [t] = portionCount({
      prepDates,
      cells: [
        { date: '2025-01-06', householdMultiplier: 1, portions: [{ trayId: 't', quantity: 0.5 }] },
        { date: '2025-01-09', householdMultiplier: 1, portions: [{ trayId: 't', quantity: 0.5 }] },
      ],
      batches: [],
    });
    expect(t.byPrepDate.map((b) => b.needed)).toEqual([1, 1]);
    expect(t).toMatchObject({ neededExact: 1, needed: 2 });
  });
});

describe('portionCount: input checks', () => {
  const cell = (over: Partial<BoardCell>): BoardCell => ({ date: '2025-01-06', householdMultiplier: 1, portions: [{ trayId: 'x', quantity: 1 }], ...over });
  it.each([
    { why: 'no prep date', input: { prepDates: [], cells: [cell({})], batches: [] } },
    { why: 'zero multiplier', input: { prepDates: ['2025-01-05'], cells: [cell({ householdMultiplier: 0 })], batches: [] } },
    { why: 'negative quantity', input: { prepDates: ['2025-01-05'], cells: [cell({ portions: [{ trayId: 'x', quantity: -1 }] })], batches: [] } },
    { why: 'fractional tray count', input: { prepDates: ['2025-01-05'], cells: [], batches: [{ trayId: 'x', prepDate: '2025-01-05', trayCount: 1.5, portionsPerTray: 6 }] } },
    { why: 'zero portions per tray', input: { prepDates: ['2025-01-05'], cells: [], batches: [{ trayId: 'x', prepDate: '2025-01-05', trayCount: 1, portionsPerTray: 0 }] } },
  ])('rejects $why', ({ input }) => {
    expect(() => portionCount(input)).toThrow(RangeError);
  });
});

describe('portionCount: the sum per tray and prep date is exact whatever the order and repetition of cells', () => {
  // Reference: the definition computed directly with decimal.js (a general-purpose arbitrary-precision library from
  // npm), one product per portion, no grouping: needed = ceil(Σ quantity × multiplier) per tray and prep date.
  const quantity = fc.constantFrom('0.25', '0.5', '1', '1.5', '2', '3', '0.1', '0.3333');
  const multiplier = fc.constantFrom('1', '1.5', '2', '2.25', '3', '0.5', '0.1');
  const prepDate = fc.constantFrom('2025-01-05', '2025-01-08');
  const cells = fc.array(
    fc.record({
      householdMultiplier: multiplier,
      portions: fc.array(fc.record({ trayId: fc.constantFrom('a', 'b', 'c'), quantity, prepDate }), { maxLength: 3 }),
    }),
    { maxLength: 120 },
  );
  it('equals ceil of the plain decimal.js sum for every tray and prep date (300 random boards)', () => {
    fc.assert(
      fc.property(cells, (cs) => {
        const input = { prepDates: ['2025-01-05', '2025-01-08'], cells: cs.map((c) => ({ date: '2025-01-09', ...c })), batches: [] };
        const expected = new Map<string, Decimal>();
        for (const c of input.cells) {
          for (const p of c.portions) {
            const k = `${p.trayId}|${p.prepDate}`;
            expected.set(k, (expected.get(k) ?? new Decimal(0)).plus(new Decimal(p.quantity).times(c.householdMultiplier)));
          }
        }
        const got = new Map<string, { needed: number; neededExact: number }>();
        for (const t of portionCount(input)) for (const b of t.byPrepDate) got.set(`${t.trayId}|${b.prepDate}`, b);
        expect([...got.keys()].sort()).toEqual([...expected.keys()].sort());
        for (const [k, sum] of expected) {
          expect(got.get(k)!.needed).toBe(sum.ceil().toNumber());
          expect(got.get(k)!.neededExact).toBe(sum.toNumber());
        }
      }),
      { numRuns: 300 },
    );
  });
});
