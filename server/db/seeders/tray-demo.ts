import type { EntityManager } from '@mikro-orm/postgresql';
import { trayInputSchema, type TrayValues } from '@shared/schemas/trays.schema.js';
import type { Actor } from '../../http/authz.js';
import { Ingredient } from '../../modules/ingredients/ingredient.entity.js';
import { createTray } from '../../modules/trays/trays.service.js';
import type { DemoContext } from './demo-seed.js';

/**
 * DEMO DATA — seven invented base trays for the demo workspace "Oat & Ember Prep (demo)". They are our own
 * recipes, made up for trying Trayline; amounts, times and temperatures are plausible home-kitchen values
 * (common practice, no source) and every tray is stored with `isDemo: true`.
 */
type DemoLine = [slug: string, amountText: string, unit: string, note?: string];

interface DemoTray extends Omit<TrayValues, 'lines'> {
  lines: DemoLine[];
}

const REHEAT_EGG = [
  'Microwave one portion, covered, 45–75 seconds; turn it halfway.',
  'Let it stand 2 minutes, then check the centre reaches 165 °F (74 °C).',
];
const REHEAT_OVEN = [
  'Reheat in a 350 °F oven or toaster oven for 8–10 minutes, covered loosely with foil.',
  'Check the centre reaches 165 °F (74 °C).',
];

export const DEMO_TRAYS: DemoTray[] = [
  {
    name: 'Spinach and feta sheet-pan egg slab',
    description: 'A soft, savoury egg slab with wilted spinach and salty feta. Cut while warm for clean edges.',
    lines: [
      ['egg-whole', '18', 'large'],
      ['heavy-cream', '1/2', 'cup'],
      ['spinach', '5', 'oz', 'roughly chopped'],
      ['feta', '4', 'oz', 'crumbled'],
      ['salt', '1', 'tsp'],
      ['black-pepper', '1/2', 'tsp'],
    ],
    pan: { code: 'half-sheet', unit: 'in' },
    panLining: 'parchment',
    bake: { category: 'egg-slab', tempF: 350, minMinutes: 25, maxMinutes: 30 },
    yieldFactor: 0.9,
    cutPlan: { kind: 'grid', rows: 4, columns: 5 },
    storage: { fridgeDays: 4, freezerWeeks: 8 },
    reheatSteps: REHEAT_EGG,
    tags: ['breakfast', 'vegetarian', 'egg slab'],
  },
  {
    name: 'Cream-cheese almond batter slab',
    description: 'A sheet-pan pancake: tender, lightly sweet, cut into squares. Serve with berries or butter.',
    lines: [
      ['cream-cheese', '8', 'oz', 'softened'],
      ['egg-whole', '8', 'large'],
      ['almond-flour', '1', 'cup'],
      ['butter-unsalted', '4', 'tbsp', 'melted'],
      ['erythritol', '2', 'tbsp'],
      ['baking-powder', '2', 'tsp'],
      ['vanilla-extract', '1', 'tsp'],
      ['cinnamon', '1', 'tsp'],
    ],
    pan: { code: 'half-sheet', unit: 'in' },
    panLining: 'parchment',
    bake: { category: 'batter-slab', tempF: 350, minMinutes: 15, maxMinutes: 20 },
    yieldFactor: 0.92,
    cutPlan: { kind: 'grid', rows: 4, columns: 4 },
    storage: { fridgeDays: 4, freezerWeeks: 8 },
    reheatSteps: REHEAT_EGG,
    tags: ['breakfast', 'sweet', 'vegetarian'],
  },
  {
    name: 'Roasted radish and red pepper tray',
    description: 'Halved radishes lose their bite in a hot oven and turn sweet; red pepper strips char at the edges.',
    lines: [
      ['radishes', '1 1/2', 'lb', 'halved'],
      ['bell-pepper-red', '2', 'medium', 'in strips'],
      ['olive-oil', '3', 'tbsp'],
      ['garlic-powder', '1', 'tsp'],
      ['salt', '3/4', 'tsp'],
    ],
    pan: { code: 'half-sheet', unit: 'in' },
    panLining: 'foil',
    bake: { category: 'roasted-vegetables', tempF: 425, minMinutes: 20, maxMinutes: 30 },
    yieldFactor: 0.75,
    cutPlan: { kind: 'pieces', pieces: 8 },
    storage: { fridgeDays: 4, freezerWeeks: 4 },
    reheatSteps: REHEAT_OVEN,
    tags: ['side', 'vegetables', 'egg-free', 'dairy-free'],
  },
  {
    name: 'Oven bacon',
    description:
      'Strips laid flat, not touching, on a rack over the pan. Drain on paper and cool quickly. The numbers use raw bacon, so they still count the fat that renders out: a cautious, high figure.',
    lines: [['bacon-raw', '16', 'strips', 'thick-cut works too; add a few minutes']],
    pan: { code: 'half-sheet', unit: 'in' },
    panLining: 'foil',
    bake: { category: 'bacon', tempF: 400, minMinutes: 18, maxMinutes: 22 },
    yieldFactor: 0.35,
    cutPlan: { kind: 'pieces', pieces: 8 },
    storage: { fridgeDays: 4, freezerWeeks: 4 },
    reheatSteps: ['Reheat in a dry pan or the microwave between paper towels, 20–40 seconds, until sizzling (165 °F / 74 °C).'],
    tags: ['breakfast', 'egg-free', 'dairy-free'],
  },
  {
    name: 'Sausage and cheddar egg slab',
    description: 'Brown and drain the sausage first, spread it over the pan, pour the eggs over, top with cheddar.',
    lines: [
      ['pork-sausage-raw', '1', 'lb', 'browned and drained before baking'],
      ['egg-whole', '18', 'large'],
      ['cheddar', '6', 'oz', 'shredded'],
      ['heavy-cream', '1/2', 'cup'],
      ['scallions', '4', 'stalks', 'sliced'],
      ['black-pepper', '1/2', 'tsp'],
    ],
    pan: { code: 'half-sheet', unit: 'in' },
    panLining: 'parchment',
    bake: { category: 'egg-slab', tempF: 350, minMinutes: 28, maxMinutes: 35 },
    yieldFactor: 0.88,
    cutPlan: { kind: 'grid', rows: 4, columns: 5 },
    storage: { fridgeDays: 4, freezerWeeks: 8 },
    reheatSteps: REHEAT_EGG,
    tags: ['breakfast', 'egg slab', 'high protein'],
  },
  {
    name: 'Egg-free coconut-flax slab',
    description: 'For clients who avoid egg: a sliceable savoury slab bound with flax and psyllium. Rest 10 minutes before cutting.',
    lines: [
      ['flaxseed-meal', '1', 'cup'],
      ['coconut-flour', '1/2', 'cup'],
      ['psyllium-husk', '2', 'tbsp'],
      ['baking-powder', '2', 'tsp'],
      ['salt', '1/2', 'tsp'],
      ['coconut-milk-canned', '1', 'cup'],
      ['coconut-oil', '1/4', 'cup', 'melted'],
    ],
    pan: { code: 'quarter-sheet', unit: 'in' },
    panLining: 'parchment',
    bake: { category: 'batter-slab', tempF: 350, minMinutes: 25, maxMinutes: 30 },
    yieldFactor: 0.9,
    cutPlan: { kind: 'grid', rows: 3, columns: 4 },
    storage: { fridgeDays: 4, freezerWeeks: 4 },
    reheatSteps: REHEAT_OVEN,
    tags: ['egg-free', 'dairy-free', 'breakfast'],
  },
  {
    name: 'Dairy-free chive egg slab',
    description: 'Eggs whisked with coconut milk and plenty of green onion tops (or fresh chives). No dairy at all.',
    lines: [
      ['egg-whole', '18', 'large'],
      ['coconut-milk-canned', '1/2', 'cup'],
      ['scallions', '1', 'bunch', 'green tops finely sliced, or fresh chives'],
      ['avocado-oil', '1', 'tbsp', 'for the pan'],
      ['onion-powder', '1/2', 'tsp'],
      ['salt', '1', 'tsp'],
    ],
    pan: { code: 'half-sheet', unit: 'in' },
    panLining: 'greased',
    bake: { category: 'egg-slab', tempF: 350, minMinutes: 22, maxMinutes: 28 },
    yieldFactor: 0.9,
    cutPlan: { kind: 'grid', rows: 4, columns: 5 },
    storage: { fridgeDays: 4, freezerWeeks: 8 },
    reheatSteps: REHEAT_EGG,
    tags: ['breakfast', 'dairy-free', 'egg slab'],
  },
];

async function idsBySlug(em: EntityManager, slugs: string[]): Promise<Map<string, number>> {
  const rows = await em.find(Ingredient, { slug: { $in: [...new Set(slugs)] }, workspace: null });
  return new Map(rows.map((r) => [r.slug!, r.id]));
}

/** Demo step: the seven base trays above, in the demo workspace, marked as demo. */
export async function seedDemoTrays(ctx: DemoContext): Promise<void> {
  const { em, workspace, coach } = ctx;
  const ids = await idsBySlug(em, DEMO_TRAYS.flatMap((t) => t.lines.map((l) => l[0])));
  const actor: Actor = {
    userId: coach.id,
    email: coach.email,
    name: coach.name,
    role: 'coach',
    workspaceId: workspace.id,
    clientId: null,
  };
  for (const t of DEMO_TRAYS) {
    const lines = t.lines.map(([slug, amountText, unit, note]) => {
      const ingredientId = ids.get(slug);
      if (!ingredientId) throw new Error(`Demo tray "${t.name}": reference ingredient "${slug}" is not seeded`);
      return { ingredientId, amountText, unit, note: note ?? '' };
    });
    await createTray(em, actor, trayInputSchema.parse({ ...t, lines }), { isDemo: true });
  }
}
