import { EGGS_BY_THE_DOZEN, makeAssembly, makeClient, makeIngredient, makeTray, makeWeek, type Member } from './factories.js';

/**
 * A prep week for shopping-list and label tests (invented test values): one tray of 12 large eggs and 10 oz of
 * cheese (cut 4 × 4), a plate of one portion plus 1 oz of cheese, one client with a household multiplier, and
 * the plate on two days. Board Mon 2026-01-05 … Sun 01-11, prep Sun 01-04.
 */
export async function shoppingWeek(
  coach: Member,
  opts: { trayCount?: number; multiplier?: string; tray?: Record<string, unknown>; eggs?: Record<string, unknown> } = {},
) {
  const eggs = await makeIngredient(coach, { ...EGGS_BY_THE_DOZEN, ...opts.eggs });
  const cheese = await makeIngredient(coach);
  const tray = await makeTray(coach, {
    lines: [
      { ingredientId: eggs.id, amountText: '12', unit: 'large', note: '' },
      { ingredientId: cheese.id, amountText: '10', unit: 'oz', note: '' },
    ],
    ...opts.tray,
  });
  const plate = await makeAssembly(coach, tray.id, {
    addOns: [{ ingredientId: cheese.id, amountText: '1', unit: 'oz', note: '' }],
    reheatSteps: ['Microwave covered 60–90 s until 165 °F'],
  });
  const client = await makeClient(coach, { householdMultiplier: opts.multiplier ?? '2' });
  const board = await makeWeek(coach);
  const weekId = board.week.id;
  let version = board.week.version;
  const trays = await coach.agent
    .put(`/api/weeks/${weekId}/trays`)
    .send({ version, trays: [{ trayId: tray.id, prepDate: '2026-01-04', trayCount: opts.trayCount ?? 3 }] });
  if (trays.status !== 200) throw new Error(`shoppingWeek trays: ${trays.status} ${JSON.stringify(trays.body)}`);
  version = trays.body.week.version;
  const cells = await coach.agent.put(`/api/weeks/${weekId}/cells`).send({
    version,
    cells: ['2026-01-05', '2026-01-06'].map((date) => ({ clientId: client.id, date, slot: 'breakfast', assemblyId: plate.id })),
  });
  if (cells.status !== 200) throw new Error(`shoppingWeek cells: ${cells.status} ${JSON.stringify(cells.body)}`);
  return { weekId, eggs, cheese, tray, plate, client };
}
