import type { EntityManager } from '@mikro-orm/postgresql';
import { addDays, weekdayOf } from '@shared/domain/iso-date.js';
import { createClientSchema, type CreateClientInput } from '@shared/schemas/clients.schema.js';
import { createAssemblySchema, type AssemblyDto, type AssemblyInput } from '@shared/schemas/assemblies.schema.js';
import type { CellInput } from '@shared/schemas/weeks.schema.js';
import { cellInputSchema } from '@shared/schemas/weeks.schema.js';
import type { Actor } from '../../http/authz.js';
import { Membership } from '../../modules/auth/user.entity.js';
import { Ingredient } from '../../modules/ingredients/ingredient.entity.js';
import { Tray } from '../../modules/trays/tray.entity.js';
import { createClient } from '../../modules/clients/client.service.js';
import { createAssembly } from '../../modules/assemblies/assembly.service.js';
import { coverTrays, createWeek, putCells } from '../../modules/weeks/week.service.js';
import { publishWeek } from '../../modules/weeks/week-publish.service.js';
import { flatWarnings } from '@shared/domain/week-check.js';
import { expandBoard } from '@shared/schemas/board-answer.js';
import type { DemoContext } from './demo-seed.js';

/**
 * DEMO DATA — eight invented clients of "Oat & Ember Prep (demo)" (one dairy-free, one egg-free, one household of
 * three), six invented plates made from the demo base trays, and one published prep week (this week, prep on the
 * Sunday before and on Wednesday). The week is tuned to read as well planned: the only warnings left are one dislike and
 * one allergen allowed with a reason, plus one frozen-and-thawed portion. Body measurements and notes are made up; they
 * are not advice.
 */
const DEMO_CLIENTS: (Partial<CreateClientInput> & Pick<CreateClientInput, 'sex' | 'ageYears' | 'heightCm' | 'weightKg' | 'activity' | 'goal'>)[] = [
  { sex: 'female', ageYears: 42, heightCm: '168', weightKg: '74', activity: 'moderate', goal: 'lose' },
  {
    sex: 'female', ageYears: 35, heightCm: '160', weightKg: '62', activity: 'moderate', goal: 'maintain', allergens: ['milk'],
    healthNotes: 'Dairy-free; tolerates aged sheep-milk feta in small amounts (demo).',
  },
  {
    sex: 'male', ageYears: 48, heightCm: '182', weightKg: '95', activity: 'light', goal: 'lose', allergens: ['egg'],
    slotShares: { breakfast: 0.21, lunch: 0.21 }, healthNotes: 'Egg allergy. Cooks his own dinner and snacks (demo).',
  },
  {
    sex: 'female', ageYears: 39, heightCm: '172', weightKg: '68', activity: 'active', goal: 'maintain', householdMultiplier: '3',
    healthNotes: 'Plates feed a household of three (demo).',
  },
  {
    sex: 'male', ageYears: 29, heightCm: '178', weightKg: '82', activity: 'very-active', goal: 'gain', dislikes: ['sweet'],
    proteinGPerKg: '1.4', netCarbCapG: '40', slotShares: { breakfast: 0.2, lunch: 0.2 },
    healthNotes: 'Trains mornings; big dinners at home (demo).',
  },
  {
    sex: 'female', ageYears: 55, heightCm: '165', weightKg: '80', activity: 'light', goal: 'maintain', slotShares: { breakfast: 0.24, lunch: 0.24 },
    healthNotes: 'Type 2 diabetes: medication reviewed with her clinician before starting (demo).',
  },
  {
    sex: 'male', ageYears: 61, heightCm: '175', weightKg: '88', activity: 'light', goal: 'maintain', netCarbCapG: '40',
    slotShares: { breakfast: 0.22, lunch: 0.23 },
  },
  { sex: 'female', ageYears: 27, heightCm: '158', weightKg: '57', activity: 'moderate', goal: 'maintain', targetMode: 'manual', manualTargets: { targetKcal: 1900, netCarbCapG: 35, proteinG: 90, fatG: 150 },
    slotShares: { breakfast: 0.25, lunch: 0.25 } },
];

/**
 * The prepped breakfast and lunch cover a share of a client's day (the rest is their own cooking): 25 % + 25 % by
 * default, less for clients who eat big dinners at home. Low-carb (35 g net carbs a day), 1.2 g protein per kg unless
 * said otherwise. Demo values chosen so the demo week reads as well planned; they are not advice.
 */
const CLIENT_DEFAULTS = {
  householdMultiplier: '1', netCarbCapG: '35', proteinGPerKg: '1.2', targetMode: 'computed' as const,
  slotShares: { breakfast: 0.25, lunch: 0.25 },
};

type Part = [tray: string, portions: number] | [slug: string, amountText: string, unit: string, note?: string];
const DEMO_PLATES: { name: string; description: string; parts: Part[]; assemblySteps: string[]; reheatSteps: string[] }[] = [
  {
    name: 'Spinach-feta slab wrap',
    description: 'Demo plate: two warm egg slab squares rolled in a low-carb tortilla with sliced turkey and a dash of hot sauce.',
    parts: [
      ['Spinach and feta sheet-pan egg slab', 2], ['low-carb-tortilla', '1', 'tortilla'], ['deli-turkey', '2', 'oz'],
      ['hot-sauce', '1', 'tsp', 'to taste'],
    ],
    assemblySteps: ['Reheat the slab portions.', 'Lay them on the tortilla with the turkey, add hot sauce, roll tightly.'],
    reheatSteps: ['Warm the wrap in a dry pan 30 seconds a side if you like it crisp.'],
  },
  {
    name: 'Sausage-cheddar plate with avocado',
    description: 'Demo plate: two squares of sausage and cheddar slab with sliced avocado and a spoon of sour cream.',
    parts: [['Sausage and cheddar egg slab', 2], ['avocado', '1/4', 'avocado', 'sliced'], ['sour-cream', '1', 'Tbsp']],
    assemblySteps: ['Reheat the slab portions.', 'Slice the avocado beside them; add the sour cream cold.'],
    reheatSteps: [],
  },
  {
    name: 'Almond batter squares with Greek yogurt',
    description: 'Demo plate: two lightly sweet batter squares with a pot of whole-milk Greek yogurt and cinnamon.',
    parts: [['Cream-cheese almond batter slab', 2], ['greek-yogurt-whole', '1/2', 'cup'], ['cinnamon', '1/4', 'tsp', 'on the yogurt']],
    assemblySteps: ['Reheat the squares (below).', 'Pack the yogurt cold, apart, dusted with cinnamon.'],
    reheatSteps: ['Microwave the squares 20–30 seconds, until hot all the way through; let them stand a minute.'],
  },
  {
    name: 'Bacon, ham and roasted radish plate',
    description: 'Demo plate: oven bacon, roasted radishes and peppers and folded ham over a handful of arugula.',
    parts: [['Oven bacon', 1], ['Roasted radish and red pepper tray', 1], ['ham-deli', '3', 'oz', 'folded'], ['arugula', '1', 'cup', 'a handful']],
    assemblySteps: ['Reheat bacon and radishes together.', 'Serve over the arugula with the ham cold.'],
    reheatSteps: [],
  },
  {
    name: 'Coconut-flax slab with smoked salmon',
    description: 'Demo plate, egg-free and dairy-free: two coconut-flax squares with smoked salmon, avocado and hot sauce.',
    parts: [['Egg-free coconut-flax slab', 2], ['smoked-salmon', '3', 'oz'], ['avocado', '1/4', 'avocado'], ['hot-sauce', '1', 'tsp']],
    assemblySteps: ['Reheat the squares.', 'Top with the salmon, sliced avocado and hot sauce.'],
    reheatSteps: [],
  },
  {
    name: 'Chive slab and ham in a coconut wrap',
    description: 'Demo plate, dairy-free: two chive egg slab squares folded into a coconut wrap with ham and salsa.',
    parts: [['Dairy-free chive egg slab', 2], ['coconut-wrap', '1', 'wrap'], ['ham-deli', '2', 'oz'], ['salsa', '2', 'Tbsp']],
    assemblySteps: ['Reheat the slab portions.', 'Fold them into the wrap with the ham and salsa.'],
    reheatSteps: [],
  },
];

/** Monday of the current week (UTC calendar). */
function thisMonday(): string {
  const today = new Date().toISOString().slice(0, 10);
  return addDays(today, -((weekdayOf(today) + 6) % 7));
}

async function plates(em: EntityManager, actor: Actor): Promise<AssemblyDto[]> {
  const trays = await em.find(Tray, { workspace: actor.workspaceId });
  const trayId = new Map(trays.map((t) => [t.name, t.id]));
  const slugs = DEMO_PLATES.flatMap((p) => p.parts.filter((x) => x.length > 2).map((x) => x[0]));
  const ings = await em.find(Ingredient, { slug: { $in: slugs }, workspace: null });
  const ingId = new Map(ings.map((i) => [i.slug!, i.id]));
  const out: AssemblyDto[] = [];
  for (const p of DEMO_PLATES) {
    const input: AssemblyInput = {
      name: p.name,
      description: p.description,
      trays: p.parts.filter((x) => x.length === 2).map(([name, portions]) => ({ trayId: trayId.get(name as string) ?? 0, portions: portions as number })),
      addOns: p.parts
        .filter((x) => x.length > 2)
        .map(([slug, amountText, unit, note]) => ({ ingredientId: ingId.get(slug as string) ?? 0, amountText: String(amountText), unit: String(unit), note: note ?? '' })),
      assemblySteps: p.assemblySteps,
      reheatSteps: p.reheatSteps,
    };
    out.push(await createAssembly(em, actor, createAssemblySchema.parse(input)));
  }
  return out;
}

/** Demo step (after the demo trays): clients linked to client1..8@trayline.test, plates, one published week. */
export async function seedDemoWeek(ctx: DemoContext): Promise<void> {
  const { em, workspace, coach, clientUsers } = ctx;
  const actor: Actor = { userId: coach.id, email: coach.email, name: coach.name, role: 'coach', workspaceId: workspace.id, clientId: null };

  const clients: Awaited<ReturnType<typeof createClient>>[] = [];
  for (const [i, c] of DEMO_CLIENTS.entries()) {
    const user = clientUsers[i];
    const dto = await createClient(em, actor, createClientSchema.parse({ ...CLIENT_DEFAULTS, name: user.name, email: user.email, ...c }));
    await em.nativeUpdate(Membership, { user: user.id, workspace: workspace.id }, { clientId: dto.id });
    clients.push(dto);
  }

  const plateList = await plates(em, actor);
  const start = thisMonday();
  let board = await createWeek(em, actor, { name: 'Demo week', startDate: start, prepDate: addDays(start, -1), secondPrepDate: addDays(start, 2) });
  const slots = board.slots;
  const cells: CellInput[] = [];
  clients.forEach((client, ci) => {
    const fits = plateList.filter(
      (p) => !p.allergens.some((a) => client.allergens.includes(a)) && !(client.dislikes.includes('sweet') && p.name.startsWith('Almond')),
    );
    board.days.forEach((date, di) => {
      slots.forEach((slot, si) => {
        const plate = fits[(di + ci + si * (fits.length > 2 ? 2 : 1)) % fits.length];
        cells.push(cellInputSchema.parse({ clientId: client.id, date, slot, assemblyId: plate.id }));
      });
    });
  });
  // Two deliberate, meaningful warnings a coach would leave on the board (demo):
  // the client who dislikes sweet food gets the almond squares once (the board says so), and the dairy-free client
  // gets the spinach-feta wrap on Thursday, allowed by the coach with a reason.
  const plateNamed = (start: string) => plateList.find((p) => p.name.startsWith(start))!;
  const setCell = (ci: number, di: number, slot: string, extra: Partial<CellInput>) => {
    const at = cells.findIndex((c) => c.clientId === clients[ci].id && c.date === board.days[di] && c.slot === slot);
    cells[at] = cellInputSchema.parse({ ...cells[at], ...extra });
  };
  setCell(4, 2, slots[0], { assemblyId: plateNamed('Almond').id });
  setCell(1, 3, slots[0], {
    assemblyId: plateNamed('Spinach-feta').id,
    allergenOverrides: [{ allergen: 'milk', reason: 'Small amount of baked dairy; she tolerates it, confirmed with her in writing (demo).' }],
  });
  // One eat-by remedy: Dana's Sunday breakfast comes from the first prep day, frozen and thawed in the fridge.
  setCell(0, 6, slots[0], { prepDate: addDays(start, -1), storage: 'frozen' });
  board = await putCells(em, actor, board.week.id, { version: board.week.version, cells: cells as never });
  // Apply the eat-by remedy the board proposes (freeze and thaw) wherever a portion would be past its date.
  const read = expandBoard(board);
  const past = flatWarnings(read.checks).filter((w) => w.kind === 'past-eat-by');
  if (past.length) {
    const frozen = read.cells
      .filter((c) => past.some((w) => w.clientId === String(c.clientId) && w.date === c.date && 'slot' in w && w.slot === c.slot))
      .map((c) => ({ ...c, storage: 'frozen' as const }));
    board = await putCells(em, actor, board.week.id, { version: board.week.version, cells: frozen });
  }
  board = await coverTrays(em, actor, board.week.id, board.week.version);
  await publishWeek(em, actor, board.week.id, board.week.version);
}
