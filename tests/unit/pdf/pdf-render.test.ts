import { describe, expect, it } from 'vitest';
import { PDFParse } from 'pdf-parse';
import { buildShoppingList, type ShoppingIngredient } from '@shared/domain/shopping';
import { planBakeRun } from '@shared/domain/bake-run';
import { CAUTIONS } from '@shared/domain/eat-by';
import type { WeekPlanPdfData } from '@shared/schemas/pdf.schema';
import { renderWeekPlanPdf } from '@server/modules/pdf/week-plan.pdf';
import { renderShoppingListPdf } from '@server/modules/pdf/shopping-list.pdf';
import { renderBakeRunPdf } from '@server/modules/pdf/bake-run.pdf';

/**
 * The PDFs are read back with an independent parser (pdf-parse, built on Mozilla's pdf.js): what a client's PDF
 * reader extracts must hold the plate names, the macros, the page numbers and the business name, so the PDFs carry
 * real text in the embedded fonts/ TTFs (not images, not system fonts).
 */
async function textOf(buffer: Buffer): Promise<{ text: string; pages: number }> {
  const parser = new PDFParse({ data: new Uint8Array(buffer) });
  try {
    const result = await parser.getText();
    return { text: result.text, pages: result.pages.length };
  } finally {
    await parser.destroy();
  }
}

// Sample week: macros are invented sample numbers for layout (no nutrition claim is checked here).
const week: WeekPlanPdfData = {
  businessName: 'Oat & Ember Prep',
  clientName: 'Dana Reyes',
  weekStart: '2026-12-07',
  targets: { kcal: 1800, fatG: 140, proteinG: 95, netCarbsG: 20 },
  note: 'Half a portion of the frittata on Tuesday: ½ square.',
  days: Array.from({ length: 7 }, (_v, i) => ({
    date: `2026-12-${String(7 + i).padStart(2, '0')}`,
    slots: [
      {
        slot: 'breakfast',
        plateName: `Spinach frittata square ${i + 1}`,
        portions: 1,
        assemblySteps: ['Take one frittata square from the fridge.', 'Add ¼ avocado, sliced.'],
        reheat: [{ trays: [], steps: ['Microwave covered 60 s, turn, 30 s more, until 165 °F (74 °C).'] }],
        macros: { kcal: '412.4', fatG: '33.25', proteinG: '21.6', netCarbsG: '4.35', carbsG: '7.9' },
        eatBy: '2026-12-10',
      },
      {
        slot: 'lunch',
        plateName: `Sheet-pan chicken thighs ${i + 1}`,
        portions: '1.5',
        assemblySteps: ['Two thighs with ¾ cup roasted broccoli.'],
        // A plate of two trays without steps of its own: each tray's steps under its name.
        reheat: [
          { trays: ['Chicken thighs'], steps: ['Oven 350 °F for 12 minutes.'] },
          { trays: ['Roasted broccoli'], steps: ['Toss in a hot pan for 2 minutes.'] },
        ],
        macros: { kcal: '655', fatG: '48.1', proteinG: '47.4', netCarbsG: '6.2', carbsG: '9.8' },
        eatBy: '2026-12-11',
      },
    ],
    totals: { kcal: '1067.4', fatG: '81.35', proteinG: '69.0', netCarbsG: '10.55', carbsG: '17.7' },
  })),
};

describe('client week PDF', () => {
  it('reads back the plate names, macros, totals against targets, eat-by dates, cautions and page numbers', async () => {
    const { buffer, filename } = await renderWeekPlanPdf(week);
    expect(filename).toBe('week-2026-12-07-dana-reyes.pdf');
    expect(buffer.subarray(0, 5).toString()).toBe('%PDF-');
    const { text, pages } = await textOf(buffer);
    const flat = text.replace(/\s+/g, ' ');
    expect(pages).toBeGreaterThan(1);
    for (let i = 1; i <= 7; i++) {
      expect(flat).toContain(`Spinach frittata square ${i}`);
      expect(flat).toContain(`Sheet-pan chicken thighs ${i}`);
    }
    // Macros as rounded for presentation: kcal to whole numbers, grams to one decimal (round half up).
    for (const v of ['412', '33.3', '21.6', '4.4', '7.9', '655', '48.1', '47.4', '1,067', '81.4', '10.6']) expect(flat).toContain(v);
    // Difference against the targets: 1067.4 − 1800 = −732.6 → "−733"; net carbs 10.55 ≤ 20 → "within".
    expect(flat).toContain('−733');
    expect(flat).toContain('within');
    // Reheating in groups: one plate's own steps under "Reheat"; two trays' under their names, then the 165 °F line.
    expect(flat).toContain('Reheat 1. Microwave covered 60 s');
    expect(flat).toContain('Reheat: Chicken thighs 1. Oven 350 °F for 12 minutes. Reheat: Roasted broccoli 1. Toss in a hot pan for 2 minutes.');
    expect(flat).toContain('Heat until every part reaches 165 °F (74 °C).');
    // Dates as the workspace writes them: month first unless it chose day first.
    expect(flat).toContain('Eat by Thursday, December 10, 2026');
    expect(flat).toContain('Week of Monday, December 7, 2026');
    // Glyphs present in Atkinson Hyperlegible come through as themselves.
    expect(flat).toContain('½ square');
    expect(flat).toContain('¼ avocado');
    expect(flat).toContain('165 °F');
    for (const c of CAUTIONS) expect(flat).toContain(c.source);
    for (let p = 1; p <= pages; p++) expect(flat).toContain(`Page ${p} of ${pages}`);
    expect(flat.split('Oat & Ember Prep').length - 1).toBeGreaterThanOrEqual(pages);
  });

  it('writes dates day first for a workspace that chose it', async () => {
    const { buffer } = await renderWeekPlanPdf({ ...week, dateOrder: 'day-month', days: week.days.slice(0, 4) });
    const flat = (await textOf(buffer)).text.replace(/\s+/g, ' ');
    expect(flat).toContain('Eat by Thursday 10 December 2026');
    expect(flat).toContain('Week of Monday 7 December 2026');
    expect(flat).not.toContain('December 7, 2026');
  });

  it('falls back to ASCII words for a glyph the font lacks (→ is not in Atkinson Hyperlegible)', async () => {
    const { buffer } = await renderWeekPlanPdf({ ...week, days: week.days.slice(0, 1), note: 'Fridge → plate' });
    const flat = (await textOf(buffer)).text.replace(/\s+/g, ' ');
    expect(flat).toContain('Fridge -> plate');
  });
});

describe('shopping list PDF', () => {
  // Egg piece weight: USDA FoodData Central 171287, egg, whole, raw, large = 50 g; 1 lb = 453.59237 g (NIST).
  const ingredients: ShoppingIngredient[] = [
    { id: 'egg', name: 'Eggs, large', aisle: 'Dairy', buyBy: 'count', countPiece: 'large', pieceWeights: { large: 50 }, purchase: { label: 'dozen', size: 12, unit: 'large', price: '4.29' } },
    { id: 'cheddar', name: 'Cheddar', aisle: 'Dairy', purchase: { label: '8 oz package', size: 8, unit: 'oz', price: '3.49' } },
    { id: 'spinach', name: 'Baby spinach', aisle: 'Produce' },
  ];

  it('reads back items grouped by aisle, packages rounded up, costs and page numbers', async () => {
    const list = buildShoppingList({
      ingredients,
      needs: [
        { ingredientId: 'egg', amount: 30, unit: 'large' },
        { ingredientId: 'cheddar', amount: 1, unit: 'lb' },
        { ingredientId: 'spinach', amount: 300, unit: 'g' },
      ],
      pantry: [{ ingredientId: 'egg', amount: 6, unit: 'large' }],
    });
    const { buffer } = await renderShoppingListPdf(list, { businessName: 'Oat & Ember Prep', title: 'Shopping list, week of Mon 7 Dec' });
    const flat = (await textOf(buffer)).text.replace(/\s+/g, ' ');
    for (const s of ['Dairy', 'Produce', 'Eggs, large', 'Cheddar', 'Baby spinach', 'Page 1 of 1', 'Oat & Ember Prep']) expect(flat).toContain(s);
    // 30 eggs − 6 in the pantry = 24 → 2 dozen at 4.29 = 8.58; 1 lb = 453.6 g = 16 oz → 2 × 8 oz at 3.49 = 6.98.
    expect(flat).toContain('2 × dozen');
    expect(flat).toContain('$8.58');
    expect(flat).toContain('2 × 8 oz package');
    expect(flat).toContain('$6.98');
    expect(flat).toContain('454 g');
    expect(flat).toContain('Total: $15.56 (at least: some items have no price)');
  });
});

describe('bake-run sheet PDF', () => {
  // One invented oven on an invented prep day (common practice rates, no source).
  const oneOvenDay = {
    start: '2026-12-06T08:00',
    cooks: 1,
    ambientF: 70,
    ovens: [{ name: 'Left oven', racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 10, maxF: 500 }],
  };
  it('reads back ovens, trays, the timeline and the cooling cautions', async () => {
    const run = planBakeRun({
      ...oneOvenDay,
      trays: [
        { id: 'fr', name: 'Spinach frittata', tempF: 350, minMinutes: 25, maxMinutes: 30, handsOnMinutes: 10, minInternalF: 160 },
        { id: 'ch', name: 'Chicken thighs', tempF: 425, minMinutes: 35, maxMinutes: 40, handsOnMinutes: 10, minInternalF: 165 },
      ],
    });
    const { buffer } = await renderBakeRunPdf(run, { businessName: 'Oat & Ember Prep', title: 'Bake run, Sun 6 Dec' });
    const flat = (await textOf(buffer)).text.replace(/\s+/g, ' ');
    for (const s of ['Left oven', 'Spinach frittata', 'Chicken thighs', 'Timeline', 'Spinach frittata in', 'Chicken thighs out', 'Page 1 of']) expect(flat).toContain(s);
    // 350 °F = 177 °C (rounded; (350 − 32) × 5/9 = 176.7) and 425 °F = 218 °C.
    expect(flat).toContain('350 °F (177 °C)');
    expect(flat).toContain('425 °F (218 °C)');
    expect(flat).toContain('FDA Food Code §3-501.14');
  });

  it('carries the cooling record: what was written down, judged on its readings, and lines to write on for the rest', async () => {
    const run = planBakeRun({
      ...oneOvenDay,
      trays: [
        { id: 'a', name: 'Egg slab', tempF: 350, minMinutes: 25, maxMinutes: 30, handsOnMinutes: 0 },
        { id: 'b', name: 'Radish tray', tempF: 350, minMinutes: 25, maxMinutes: 30, handsOnMinutes: 0 },
        { id: 'c', name: 'Almond slab', tempF: 350, minMinutes: 25, maxMinutes: 30, handsOnMinutes: 0 },
      ],
    });
    const record = (runTrayId: string, outAt: string, readings: { at: string; tempF: number }[]) => ({
      runTrayId,
      outAt: `2026-12-06T${outAt}`,
      restartedAt: null,
      readings: readings.map((r) => ({ ...r, at: `2026-12-06T${r.at}` })),
      discarded: false,
      recordedBy: 'Kit Moreno',
    });
    const cooling = [
      // Made-up readings. FDA Food Code §3-501.14: 70 °F within 2 h of 08:40 (10:40), 41 °F within 6 h (14:40).
      record('a', '08:40', [{ at: '10:20', tempF: 68 }, { at: '13:50', tempF: 40 }]),
      // 74 °F at 10:50, past 10:45: the first stage is missed.
      record('b', '08:45', [{ at: '10:50', tempF: 74 }]),
    ];
    const { buffer } = await renderBakeRunPdf(run, { businessName: 'Oat & Ember Prep', title: 'Bake run, Sun 6 Dec', cooling });
    const flat = (await textOf(buffer)).text.replace(/\s+/g, ' ');
    expect(flat).toContain('Cooling record');
    // Readings in both scales (a kitchen may write them in either): 68 °F = 20 °C, 40 °F = 4.4 °C, 74 °F = 23.3 °C (NIST SP 811).
    expect(flat).toMatch(/Egg slab 08:40 10:40 14:40 10:20 68 °F \(20 °C\), 13:50 40 °F \(4 °C\) Cooled in time KM/);
    expect(flat).toMatch(/Radish tray 08:45 10:45 14:45 10:50 74 °F \(23 °C\) Missed 70 °F: reheat or throw away KM/);
    // Not written down yet: its planned time out, and room to write.
    expect(flat).toMatch(/Almond slab \(planned out \d\d:\d\d\)/);
    expect(flat).toContain('70 °F by 41 °F by');

    // Printed by someone who reads °C: °C first in every pair, the columns' heads and results in °C (FDA Food Code
    // §3-501.14 pairs 70 °F with 21 °C and 41 °F with 5 °C; 350 °F = 177 °C, NIST SP 811).
    const celsius = (await textOf((await renderBakeRunPdf(run, { businessName: 'Oat & Ember Prep', title: 'Bake run, Sun 6 Dec', cooling, tempScale: 'C' })).buffer)).text.replace(/\s+/g, ' ');
    expect(celsius).toContain('21 °C by 5 °C by');
    expect(celsius).toMatch(/Egg slab 08:40 10:40 14:40 10:20 20 °C \(68 °F\), 13:50 4 °C \(40 °F\) Cooled in time KM/);
    expect(celsius).toMatch(/Radish tray 08:45 10:45 14:45 10:50 23 °C \(74 °F\) Missed 21 °C: reheat or throw away KM/);
    expect(celsius).toContain('Preheat to 177 °C (350 °F)');
    expect(celsius).toContain('to 21 °C (70 °F) within 2 hours and to 5 °C (41 °F) or below within 6 hours');
    expect(celsius).not.toMatch(/\d °F \(/);
  });
});
