import type { EntityManager } from '@mikro-orm/postgresql';
import { seedDemo, type DemoStep } from './demo-seed.js';
import { seedDemoTrays } from './tray-demo.js';
import { seedDemoOvens } from './bake-run-demo.js';
import { seedReferenceIngredients } from './ingredient-seed.js';
import { seedDemoIngredients } from './ingredient-demo.js';
import { seedDemoPantry } from './pantry-demo.js';
import { seedDemoWeek } from './week-demo.js';
import { seedDemoCooling } from './cooling-demo.js';

/**
 * Reference data every workspace can use (idempotent, run on every start), then the demo workspace.
 * Modules add their reference seeds and demo steps here.
 */
export const referenceSeeds: ((em: EntityManager) => Promise<void>)[] = [seedReferenceIngredients];
export const demoSteps: DemoStep[] = [seedDemoIngredients, seedDemoTrays, seedDemoOvens, seedDemoPantry, seedDemoWeek, seedDemoCooling];

export async function seedAll(em: EntityManager, opts: { demo: boolean }) {
  for (const seed of referenceSeeds) await seed(em.fork());
  if (!opts.demo) return { demo: false };
  return { demo: await seedDemo(em.fork(), demoSteps) };
}
