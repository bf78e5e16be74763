import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { cellEatBy, computeBoard, coveringBatches, nextTripOf, tripDatesOf, weekTitle, type BoardInput } from '@shared/domain/week-board';
import { checkWeek, type CheckCell, type DayCheckInput } from '@shared/domain/week-check';
import { portionCount } from '@shared/domain/inventory';
import { addDays } from '@shared/domain/iso-date';

const START = '2026-01-05'; // Monday
const DAYS = Array.from({ length: 7 }, (_, i) => addDays(START, i));

function board(over: Partial<BoardInput> = {}): BoardInput {
  return {
    prepDates: ['2026-01-04'],
    clients: [{ id: 1, householdMultiplier: '1', targets: { targetKcal: 600, netCarbCapG: 6, proteinG: 30, fatG: 45 }, allergens: [], dislikes: [] }],
    plates: new Map([[10, { id: 10, macros: { kcal: 500, netCarbsG: 4, proteinG: 30, fatG: 40 }, allergens: [], terms: ['egg slab'], trays: [{ trayId: 7, portions: '1' }] }]]),
    // 4 fridge days: USDA FSIS FoodKeeper, egg dishes 3–4 days refrigerated (published-values §6b); 16 portions a tray.
    trays: new Map([[7, { id: 7, fridgeDays: 4, freezerWeeks: 8, portionsPerTray: 16 }]]),
    cells: DAYS.map((date) => ({ clientId: 1, date, slot: 'breakfast', assemblyId: 10, prepDate: null, storage: 'fridge' as const, allergenOverrides: [] })),
    batches: [],
    ...over,
  };
}

describe('computeBoard', () => {
  it('eat-by follows the FSIS 3–4 day refrigerator time: Sunday prep is good through Thursday', () => {
    // USDA FSIS FoodKeeper / Cold Food Storage chart: cooked egg dishes 3–4 days at 40 °F or below; prep day = day 0.
    const r = computeBoard(board());
    const byDate = new Map(r.cells.map((c) => [c.date, c.portions[0]]));
    expect(DAYS.map((d) => byDate.get(d)!.status)).toEqual(['ok', 'ok', 'ok', 'ok', 'past-eat-by', 'past-eat-by', 'past-eat-by']);
    expect(byDate.get('2026-01-09')!.eatBy).toBe('2026-01-08');
    expect(byDate.get('2026-01-09')!.remedies.map((x) => x.kind)).toEqual(['freeze-and-thaw']);
    expect(r.warnings.filter((w) => w.kind === 'past-eat-by').map((w) => w.severity)).toEqual(['block', 'block', 'block']);
  });

  it('a second prep date supplies the end of the week', () => {
    const r = computeBoard(board({ prepDates: ['2026-01-04', '2026-01-07'] }));
    expect(r.cells.every((c) => c.portions[0].status === 'ok')).toBe(true);
    // Portions are counted per prep date: Mon–Tue from Sunday (2), Wed–Sun from Wednesday (5).
    expect(r.inventory[0].byPrepDate.map((p) => [p.prepDate, p.needed])).toEqual([
      ['2026-01-04', 2],
      ['2026-01-07', 5],
    ]);
  });

  it('frozen cells carry no eat-by block (freeze on prep day, thaw the evening before)', () => {
    const b = board();
    const r = computeBoard({ ...b, cells: b.cells.map((c) => ({ ...c, storage: 'frozen' as const })) });
    expect(r.warnings.filter((w) => w.severity === 'block')).toEqual([]);
  });

  // Inventory arithmetic (hand-checked): 7 plates × household 3 = 21 portions; 16 a tray → ceil(21/16) = 2 trays.
  it('counts plates × household multiplier and proposes whole trays', () => {
    const b = board({ clients: [{ ...board().clients[0], householdMultiplier: '3' }] });
    expect(computeBoard(b).inventory[0]).toMatchObject({ needed: 21, produced: 0, short: 21, traysToCover: 2 });
    expect(coveringBatches(b)).toEqual([{ trayId: 7, prepDate: '2026-01-04', trayCount: 2 }]);
  });

  it('property: the proposed tray counts always cover the need, with less than one tray spare per prep date', () => {
    fc.assert(
      fc.property(
        fc.array(fc.constantFrom('0.5', '1', '1.5', '2', '3'), { minLength: 1, maxLength: 6 }),
        fc.integer({ min: 1, max: 24 }),
        (households, perTray) => {
          const clients = households.map((h, i) => ({ ...board().clients[0], id: i + 1, householdMultiplier: h }));
          const cells = clients.flatMap((c) => DAYS.slice(0, 4).map((date) => ({ ...board().cells[0], clientId: c.id, date })));
          const input = board({ clients, cells, trays: new Map([[7, { id: 7, fridgeDays: 4, freezerWeeks: 8, portionsPerTray: perTray }]]) });
          const covered = computeBoard({ ...input, batches: coveringBatches(input) }).inventory[0];
          return covered.short === 0 && covered.spare < perTray;
        },
      ),
    );
  });
});

describe('computeBoard shares the work of cells alike without changing any answer', () => {
  // Reference: every cell computed on its own with the same shared functions (cellEatBy for its portions, a day check
  // of its client's cells, the portion count over one row per cell): what the board must equal whatever it shares.
  const TRAYS = new Map([
    [7, { id: 7, fridgeDays: 4, freezerWeeks: 8, portionsPerTray: 16 }],
    [8, { id: 8, fridgeDays: 3, freezerWeeks: 4, portionsPerTray: 12 }],
  ]);
  const PLATES = new Map([
    [10, { id: 10, macros: { kcal: 500, netCarbsG: 4, proteinG: 30, fatG: 40 }, allergens: ['egg' as const], terms: ['egg slab'], trays: [{ trayId: 7, portions: '1' }] }],
    [11, { id: 11, macros: { kcal: 350.5, netCarbsG: 6.2, proteinG: 18.4, fatG: 25 }, allergens: [], terms: ['Onions, raw', 'sweet'], trays: [{ trayId: 7, portions: '0.5' }, { trayId: 8, portions: '2' }] }],
  ]);
  const PREP = ['2026-01-04', '2026-01-07'];
  const cellArb = fc.record({
    clientId: fc.integer({ min: 1, max: 4 }),
    date: fc.constantFrom(...DAYS),
    slot: fc.constantFrom('breakfast', 'lunch'),
    assemblyId: fc.constantFrom(10, 11),
    prepDate: fc.constantFrom(null, ...PREP),
    storage: fc.constantFrom('fridge' as const, 'frozen' as const),
  });
  it('equals the cell-by-cell computation on 200 random boards', () => {
    fc.assert(
      fc.property(fc.uniqueArray(cellArb, { selector: (c) => `${c.clientId}|${c.date}|${c.slot}`, maxLength: 40 }), (cells) => {
        const clients = [1, 2, 3, 4].map((id) => ({
          id,
          householdMultiplier: ['1', '2', '1.5', '0.5'][id - 1],
          targets: { targetKcal: 600, netCarbCapG: 6, proteinG: 30, fatG: 45 },
          allergens: id === 2 ? (['egg'] as const) : [],
          dislikes: id === 3 ? ['onions'] : [],
        }));
        const input: BoardInput = { ...board(), prepDates: PREP, clients, plates: PLATES, trays: TRAYS, cells: cells.map((c) => ({ ...c, allergenOverrides: [] })) };
        const r = computeBoard(input);

        // Portions and eat-by of every cell, as the page computes the selected one.
        expect(r.cells.map((c) => c.portions)).toEqual(
          input.cells.map((c) => cellEatBy(c, PLATES.get(c.assemblyId)!.trays.map((t) => ({ trayId: t.trayId, ...TRAYS.get(t.trayId)! })), PREP)),
        );
        // Day checks over each client's cells, built one by one.
        const byDay = new Map<string, DayCheckInput>();
        for (const [i, c] of input.cells.entries()) {
          const client = clients[c.clientId - 1];
          const plate = PLATES.get(c.assemblyId)!;
          const key = `${c.clientId}|${c.date}`;
          if (!byDay.has(key)) byDay.set(key, { clientId: String(c.clientId), date: c.date, targets: client.targets, clientAllergens: client.allergens, clientDislikes: client.dislikes, cells: [] });
          (byDay.get(key)!.cells as CheckCell[]).push({
            slot: c.slot, macros: plate.macros, allergens: plate.allergens, terms: plate.terms, allergenOverrides: [],
            portions: r.cells[i].portions.map((p) => ({ trayId: String(p.trayId), prepDate: p.prepDate, fridgeDays: TRAYS.get(p.trayId)!.fridgeDays, storage: p.storage, freezerWeeks: TRAYS.get(p.trayId)!.freezerWeeks })),
          });
        }
        expect(r.days).toEqual(checkWeek([...byDay.values()]).days);
        // The portion count over one row per cell.
        const rows = input.cells.map((c, i) => ({
          date: c.date,
          householdMultiplier: clients[c.clientId - 1].householdMultiplier,
          portions: PLATES.get(c.assemblyId)!.trays.map((t) => ({ trayId: String(t.trayId), quantity: t.portions, prepDate: r.cells[i].portions[0].prepDate })),
        }));
        const pairs = [...new Set(rows.flatMap((row) => row.portions.map((p) => `${p.trayId}|${p.prepDate}`)))];
        const batches = pairs.map((k) => ({ trayId: k.split('|')[0], prepDate: k.split('|')[1], trayCount: 0, portionsPerTray: TRAYS.get(Number(k.split('|')[0]))!.portionsPerTray }));
        expect(r.inventory).toEqual(portionCount({ prepDates: PREP, cells: rows, batches }));
      }),
      { numRuns: 200 },
    );
  });
});

describe('weekTitle', () => {
  it('is the week name, or its start day in words when it has none, as the workspace writes dates (2026-12-07 is a Monday)', () => {
    expect(weekTitle({ name: 'Holiday week', startDate: '2026-12-07' }, 'day-month')).toBe('Holiday week');
    expect(weekTitle({ name: '', startDate: '2026-12-07' }, 'month-day')).toBe('Week of Mon, Dec 7');
    expect(weekTitle({ name: null, startDate: '2026-12-07' }, 'day-month')).toBe('Week of Mon 7 Dec');
  });
});

describe('shopping trips', () => {
  // Invented dates: a week prepped on Sun 4 Jan and Wed 7 Jan 2026.
  const two = { prepDate: '2026-01-04', secondPrepDate: '2026-01-07' };
  it('a week with two prep days has a trip for each, in date order; one prep day has none (its list is the week)', () => {
    expect(tripDatesOf(two)).toEqual(['2026-01-04', '2026-01-07']);
    expect(tripDatesOf({ prepDate: '2026-01-07', secondPrepDate: '2026-01-04' })).toEqual(['2026-01-04', '2026-01-07']);
    expect(tripDatesOf({ prepDate: '2026-01-04', secondPrepDate: null })).toEqual([]);
  });
  it('the next trip is the first on or after today; none once both are past or with one prep day', () => {
    expect(nextTripOf(two, '2026-01-03')).toBe('2026-01-04');
    expect(nextTripOf(two, '2026-01-04')).toBe('2026-01-04');
    expect(nextTripOf(two, '2026-01-05')).toBe('2026-01-07');
    expect(nextTripOf(two, '2026-01-08')).toBeNull();
    expect(nextTripOf({ prepDate: '2026-01-04' }, '2026-01-03')).toBeNull();
  });
});
