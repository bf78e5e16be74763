import { Oven } from '../../modules/bake-runs/bake-run.entity.js';
import { ensureBakeRules } from '../../modules/bake-runs/bake-setup.service.js';
import type { DemoContext } from './demo-seed.js';

/**
 * DEMO DATA — two invented ovens for the demo workspace "Oat & Ember Prep (demo)": a conventional "Left oven" with
 * 2 racks and a convection "Right oven" with 3 racks, one half-sheet tray per rack. Heating 25 °F/min, cooling
 * 15 °F/min with the door ajar and a 500 °F maximum are the form's defaults (common practice, no source).
 * The demo workspace also gets the default bake rules (DEFAULT_BAKE_RULES) straight away.
 */
export const DEMO_OVENS = [
  { name: 'Left oven', racks: 2, traysPerRack: 1, convection: false },
  { name: 'Right oven', racks: 3, traysPerRack: 1, convection: true },
] as const;

export async function seedDemoOvens({ em, workspace }: DemoContext): Promise<void> {
  for (const o of DEMO_OVENS) {
    em.create(Oven, { workspace, ...o, heatFPerMin: '25', coolFPerMin: '15', maxF: '500', isDemo: true });
  }
  await em.flush();
  await ensureBakeRules(em, workspace.id);
}
