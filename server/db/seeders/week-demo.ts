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
import type { DemoContext } from './demo-seed.js';

/**
 * DEMO DATA — eight invented clients of "Oat & Ember Prep (demo)" (one dairy-free, one egg-free, one household of
 * three), six invented plates made from the demo base trays, and one published prep week (this week, prep on the
 * Sunday before and on Wednesday). Body measurements and notes are made up; they are not advice.
 */
const DEMO_CLIENTS: (Partial<CreateClientInput> & Pick<CreateClientInput, 'sex' | 'ageYears' | 'heightCm' | 'weightKg' | 'activity' | 'goal'>)[] = [
  { sex: 'female', ageYears: 42, heightCm: '168', weightKg: '74', activity: 'light', goal: 'lose' },
  { sex: 'female', ageYears: 35, heightCm: '160', weightKg: '62', activity: 'moderate', goal: 'maintain', allergens: ['milk'], healthNotes: 'Dairy-free (demo).' },
  { sex: 'male', ageYears: 48, heightCm: '182', weightKg: '95', activity: 'sedentary', goal: 'lose', allergens: ['egg'], healthNotes: 'Egg allergy (demo).' },
  { sex: 'female', ageYears: 39, heightCm: '172', weightKg: '68', activity: 'active', goal: 'maintain', householdMultiplier: '3', healthNotes: 'Plates feed a household of three (demo).' },
  { sex: 'male', ageYears: 29, heightCm: '178', weightKg: '82', activity: 'very-active', goal: 'gain', dislikes: ['sweet'], proteinGPerKg: '1.8' },
  { sex: 'female', ageYears: 55, heightCm: '165', weightKg: '80', activity: 'light', goal: 'lose', healthNotes: 'Type 2 diabetes: medication reviewed with her clinician before starting (demo).' },
  { sex: 'male', ageYears: 61, heightCm: '175', weightKg: '88', activity: 'sedentary', goal: 'lose', netCarbCapG: '25' },
  { sex: 'female', ageYears: 27, heightCm: '158', weightKg: '57', activity: 'moderate', goal: 'maintain', targetMode: 'manual', manualTargets: { targetKcal: 1900, netCarbCapG: 25, proteinG: 90, fatG: 150 } },
];

const CLIENT_DEFAULTS = { householdMultiplier: '1', netCarbCapG: '20', proteinGPerKg: '1.5', targetMode: 'computed' as const };

type Part = [tray: string, portions: number] | [slug: string, amountText: string, unit: string, note?: string];
const DEMO_PLATES: { name: string; description: string; parts: Part[]; assemblySteps: string[]; reheatSteps: string[] }[] = [
  {
    name: 'Spinach-feta slab wrap',
    description: 'A warm egg slab square rolled in a low-carb tortilla with a dash of hot sauce.',
    parts: [['Spinach and feta sheet-pan egg slab', 1], ['low-carb-tortilla', '1', 'tortilla'], ['hot-sauce', '1', 'tsp', 'to taste']],
    assemblySteps: ['Reheat the slab portion.', 'Lay it on the tortilla, add hot sauce, roll tightly.'],
    reheatSteps: ['Warm the wrap in a dry pan 30 seconds a side if you like it crisp.'],
  },
  {
    name: 'Sausage-cheddar plate with avocado',
    description: 'Sausage and cheddar slab with sliced avocado and a spoon of sour cream.',
    parts: [['Sausage and cheddar egg slab', 1], ['avocado', '1/4', 'avocado', 'sliced'], ['sour-cream', '1', 'Tbsp']],
    assemblySteps: ['Reheat the slab portion.', 'Slice the avocado beside it; add the sour cream cold.'],
    reheatSteps: [],
  },
  {
    name: 'Almond batter slab with cream cheese',
    description: 'A sweet batter square spread with cream cheese.',
    parts: [['Cream-cheese almond batter slab', 1], ['cream-cheese', '1', 'Tbsp']],
    assemblySteps: ['Warm the square briefly, then spread the cream cheese on top.'],
    reheatSteps: ['Microwave 20–30 seconds; it should be warm, not hot.'],
  },
  {
    name: 'Bacon and roasted radish plate',
    description: 'Oven bacon with roasted radishes and peppers over a handful of arugula.',
    parts: [['Oven bacon', 2], ['Roasted radish and red pepper tray', 1], ['arugula', '1', 'cup', 'a handful']],
    assemblySteps: ['Reheat bacon and radishes together.', 'Serve over the arugula.'],
    reheatSteps: [],
  },
  {
    name: 'Coconut-flax slab with avocado',
    description: 'Egg-free, dairy-free: the coconut-flax square with avocado and hot sauce.',
    parts: [['Egg-free coconut-flax slab', 1], ['avocado', '1/4', 'avocado'], ['hot-sauce', '1', 'tsp']],
    assemblySteps: ['Reheat the square.', 'Top with sliced avocado and hot sauce.'],
    reheatSteps: [],
  },
  {
    name: 'Chive slab in a coconut wrap',
    description: 'Dairy-free chive egg slab folded into a coconut wrap with salsa.',
    parts: [['Dairy-free chive egg slab', 1], ['coconut-wrap', '1', 'wrap'], ['salsa', '2', 'Tbsp']],
    assemblySteps: ['Reheat the slab portion.', 'Fold it into the wrap with the salsa.'],
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

  const clients = [];
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
        if (si > 0 && (di + ci) % 3 === 0) return; // not every lunch is planned
        const plate = fits[(di + ci + si * 2) % fits.length];
        cells.push(cellInputSchema.parse({ clientId: client.id, date, slot, assemblyId: plate.id }));
      });
    });
  });
  board = await putCells(em, actor, board.week.id, { version: board.week.version, cells: cells as never });
  // Apply the eat-by remedy the board proposes (freeze and thaw) wherever a portion would be past its date.
  const past = board.warnings.filter((w) => w.kind === 'past-eat-by');
  if (past.length) {
    const frozen = board.cells
      .filter((c) => past.some((w) => w.clientId === String(c.clientId) && w.date === c.date && 'slot' in w && w.slot === c.slot))
      .map((c) => ({ ...c, storage: 'frozen' as const }));
    board = await putCells(em, actor, board.week.id, { version: board.week.version, cells: frozen });
  }
  board = await coverTrays(em, actor, board.week.id, board.week.version);
  await publishWeek(em, actor, board.week.id, board.week.version);
}
