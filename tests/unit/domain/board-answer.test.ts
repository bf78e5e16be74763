import { describe, expect, it } from 'vitest';
import { checkWeek, worded, type CheckCell, type DayCheckInput } from '@shared/domain/week-check';
import { cellAnswer, dayAnswer, expandBoard, type BoardAnswer } from '@shared/schemas/board-answer';
import type { BoardCellDto, BoardDto } from '@shared/schemas/weeks.schema';

// The board answer leaves out cell defaults; the page restores them and words each warning with expandBoard. These
// checks hold the round trip to the full board the week check computes (nothing lost, nothing reworded).
const targets = { targetKcal: 500, netCarbCapG: 10, proteinG: 40, fatG: 40 };
const cell = (over: Partial<CheckCell>): CheckCell => ({ slot: 'breakfast', macros: { kcal: 0, netCarbsG: 0, proteinG: 40, fatG: 0 }, allergens: [], terms: [], portions: [], ...over });
const day = (clientId: string, date: string, cells: CheckCell[], over: Partial<DayCheckInput> = {}): DayCheckInput => ({
  clientId, date, targets, clientAllergens: ['milk', 'egg'], clientDislikes: ['mushroom'], cells, ...over,
});
const fridge = { trayId: '7', prepDate: '2025-01-05', fridgeDays: 4, storage: 'fridge' as const };

// Every kind of warning at least once (values invented for the check; the rules are tested in week-check.test.ts).
const { days } = checkWeek([
  day('1', '2025-01-06', [cell({ macros: { kcal: 600, netCarbsG: 12.5, proteinG: 10, fatG: 50 } })]),
  day('1', '2025-01-07', [cell({ allergens: ['milk'] }), cell({ slot: 'lunch', allergens: ['egg'], allergenOverrides: [{ allergen: 'egg', reason: 'Baked egg only (demo)' }] })]),
  day('2', '2025-01-04', [cell({ terms: ['Mushroom'], portions: [fridge] })]),
  day('2', '2025-01-10', [cell({ portions: [fridge] })]),
  day('2', '2025-03-10', [cell({ portions: [{ ...fridge, storage: 'frozen', freezerWeeks: 8 }] })]),
  day('3', '2025-01-06', [cell({})]),
]);

describe('board answer: day checks', () => {
  const full = days.map((d) => ({ clientId: Number(d.clientId), date: d.date, totals: d.totals, warnings: d.warnings.map((w) => worded(w, 'month-day')) }));
  const answer = days.map((d) => dayAnswer(Number(d.clientId), d.date, d.totals, d.warnings));
  const expanded = expandBoard({ cells: [], checks: answer, dateOrder: 'month-day' } as unknown as BoardAnswer).checks;

  it('covers every warning kind', () => {
    expect(new Set(days.flatMap((d) => d.warnings.map((w) => w.kind)))).toEqual(
      new Set(['net-carbs-over', 'protein-short', 'energy-over', 'allergen', 'dislike', 'before-prep', 'past-eat-by', 'past-freezer-quality']),
    );
  });

  it('expands to exactly the checks the week check computed, each worded', () => {
    expect(expanded).toEqual(full);
  });

  it('sends no sentence, client or day on a warning, and no empty warning list', () => {
    const sent = JSON.stringify(answer);
    expect(sent).not.toContain('"message"');
    for (const d of answer) for (const w of d.warnings ?? []) expect(Object.keys(w)).not.toEqual(expect.arrayContaining(['clientId']));
    expect(answer.find((d) => d.clientId === 3)).toEqual({ clientId: 3, date: '2025-01-06', totals: { kcal: 0, netCarbsG: 0, proteinG: 40, fatG: 0 } });
  });

  it.each([
    ['net-carbs-over', 'Net carbs 12.5 g are over the 10 g cap.'],
    ['protein-short', 'Protein 10 g is below the 36 g floor (target 40 g).'],
    ['energy-over', 'Energy 600 kcal is over 550 kcal (target 500 kcal).'],
    ['dislike', 'The client dislikes mushroom.'],
    ['before-prep', 'Planned on Sat, Jan 4, before its tray is made on Sun, Jan 5.'],
    ['past-eat-by', 'Past its eat-by date: prepped Sun, Jan 5, eat by Thu, Jan 9.'],
    ['past-freezer-quality', 'Frozen portion planned after its freezer quality limit (Sun, Mar 2).'],
  ])('words %s as the board page shows it', (kind, sentence) => {
    expect(expanded.flatMap((d) => d.warnings).find((w) => w.kind === kind)?.message).toBe(sentence);
  });

  it("words dates as the workspace writes them (the answer's dateOrder)", () => {
    const dayFirst = expandBoard({ cells: [], checks: answer, dateOrder: 'day-month' } as unknown as BoardAnswer).checks;
    expect(dayFirst.flatMap((d) => d.warnings).find((w) => w.kind === 'past-eat-by')?.message).toBe('Past its eat-by date: prepped Sun 5 Jan, eat by Thu 9 Jan.');
  });

  it('words allergens blocked and allowed by the coach', () => {
    const allergens = expanded.flatMap((d) => d.warnings).filter((w) => w.kind === 'allergen').map((w) => w.message);
    expect(allergens).toEqual(["Milk is on the client's allergen list.", "Egg is on the client's allergen list; allowed by the coach: Baked egg only (demo)"]);
  });
});

describe('board answer: cells', () => {
  const cells: BoardCellDto[] = [
    { clientId: 1, date: '2025-01-06', slot: 'breakfast', assemblyId: 3, prepDate: null, storage: 'fridge', allergenOverrides: [] },
    { clientId: 1, date: '2025-01-07', slot: 'lunch', assemblyId: 4, prepDate: '2025-01-05', storage: 'frozen', allergenOverrides: [{ allergen: 'egg', reason: 'Baked egg only' }] },
  ];
  it('leaves out fields at their defaults and restores them', () => {
    const sent = cells.map(cellAnswer);
    expect(sent[0]).toEqual({ clientId: 1, date: '2025-01-06', slot: 'breakfast', assemblyId: 3 });
    expect(sent[1]).toEqual(cells[1]);
    const back: BoardDto['cells'] = expandBoard({ cells: sent, checks: [] } as unknown as BoardAnswer).cells;
    expect(back).toEqual(cells);
  });
});
