/**
 * Default bake rules (plain data): one per food category of a low-carb prep day. A coach starts from these and
 * edits them in settings; a base tray picks a category and may override any value.
 *
 * Sources and status of each field:
 * - Set temperature, bake-time range (one half-sheet tray alone in a preheated conventional oven), hands-on
 *   minutes, doneness cue and rack preference: common practice, no source. Check and adjust for your ovens.
 * - Minimum internal temperature: USDA FSIS "Safe Minimum Internal Temperatures" chart (FoodSafety.gov):
 *   egg dishes 160 °F, ground meats 160 °F, all poultry 165 °F, fresh pork 145 °F with a 3-minute rest.
 *   `null` where the chart gives no number for the food (e.g. vegetables, cheese crisps).
 */
import type { RackPreference } from './bake-run-types';

export const FSIS_SAFE_MINIMUM_SOURCE = 'USDA FSIS Safe Minimum Internal Temperatures chart';
export const COMMON_PRACTICE = 'common practice, no source';

export type BakeRuleCategory =
  | 'egg-slab'
  | 'batter-slab'
  | 'roasted-vegetables'
  | 'bacon'
  | 'ground-meat-patties'
  | 'ground-poultry-patties'
  | 'poultry-pieces'
  | 'pork-chops'
  | 'cheese-crisps'
  | 'fat-head-dough';

export interface BakeRuleDefault {
  category: BakeRuleCategory;
  label: string;
  tempF: number;
  minMinutes: number;
  maxMinutes: number;
  /** Typical hands-on prep for one half-sheet tray, minutes. */
  handsOnMinutes: number;
  toleranceF: number;
  donenessCue: string;
  /** Minimum internal temperature where food safety needs one, °F; null when the chart has none. */
  minInternalF: number | null;
  /** Rest after reaching the internal temperature, minutes (fresh pork). */
  restMinutes: number;
  minInternalSource: string | null;
  rackPreference: RackPreference;
  /** Source of the temperature and time values. */
  bakeSource: string;
  note?: string;
}

export const DEFAULT_BAKE_RULES: readonly BakeRuleDefault[] = Object.freeze([
  {
    category: 'egg-slab',
    label: 'Egg slab (frittata, crustless quiche)',
    tempF: 350,
    minMinutes: 25,
    maxMinutes: 30,
    handsOnMinutes: 10,
    toleranceF: 10,
    donenessCue: 'Centre set and no liquid egg when the pan is tilted; a knife in the centre comes out clean.',
    minInternalF: 160,
    restMinutes: 0,
    minInternalSource: FSIS_SAFE_MINIMUM_SOURCE,
    rackPreference: 'middle',
    bakeSource: COMMON_PRACTICE,
  },
  {
    category: 'batter-slab',
    label: 'Batter slab / sheet-pan pancake',
    tempF: 350,
    minMinutes: 15,
    maxMinutes: 20,
    handsOnMinutes: 8,
    toleranceF: 10,
    donenessCue: 'Top springs back when pressed, edges golden, a toothpick comes out clean.',
    minInternalF: 160,
    restMinutes: 0,
    minInternalSource: FSIS_SAFE_MINIMUM_SOURCE,
    rackPreference: 'middle',
    bakeSource: COMMON_PRACTICE,
    note: 'Egg-based batter: held to the egg-dish temperature (an assumption; the chart lists egg dishes).',
  },
  {
    category: 'roasted-vegetables',
    label: 'Roasted low-carb vegetables',
    tempF: 425,
    minMinutes: 20,
    maxMinutes: 30,
    handsOnMinutes: 8,
    toleranceF: 10,
    donenessCue: 'Tender when pierced, edges browned; stir or turn once halfway.',
    minInternalF: null,
    restMinutes: 0,
    minInternalSource: null,
    rackPreference: 'upper',
    bakeSource: COMMON_PRACTICE,
  },
  {
    category: 'bacon',
    label: 'Bacon and cured meats',
    tempF: 400,
    minMinutes: 18,
    maxMinutes: 22,
    handsOnMinutes: 4,
    toleranceF: 10,
    donenessCue: 'Fat rendered and strips crisp to taste; drain on a rack or paper.',
    minInternalF: null,
    restMinutes: 0,
    minInternalSource: null,
    rackPreference: 'middle',
    bakeSource: COMMON_PRACTICE,
    note: 'Cook raw bacon until crisp; the chart gives no single number for it.',
  },
  {
    category: 'ground-meat-patties',
    label: 'Sausage / ground meat patties (beef, pork, lamb)',
    tempF: 400,
    minMinutes: 18,
    maxMinutes: 22,
    handsOnMinutes: 10,
    toleranceF: 10,
    donenessCue: 'No pink in the centre, juices clear; check the thickest patty with a thermometer.',
    minInternalF: 160,
    restMinutes: 0,
    minInternalSource: FSIS_SAFE_MINIMUM_SOURCE,
    rackPreference: 'middle',
    bakeSource: COMMON_PRACTICE,
  },
  {
    category: 'ground-poultry-patties',
    label: 'Ground chicken / turkey patties',
    tempF: 400,
    minMinutes: 18,
    maxMinutes: 24,
    handsOnMinutes: 10,
    toleranceF: 10,
    donenessCue: 'Firm, juices clear; check the thickest patty with a thermometer.',
    minInternalF: 165,
    restMinutes: 0,
    minInternalSource: FSIS_SAFE_MINIMUM_SOURCE,
    rackPreference: 'middle',
    bakeSource: COMMON_PRACTICE,
  },
  {
    category: 'poultry-pieces',
    label: 'Chicken thighs / poultry pieces',
    tempF: 425,
    minMinutes: 35,
    maxMinutes: 45,
    handsOnMinutes: 8,
    toleranceF: 10,
    donenessCue: 'Juices clear, skin browned; check the thickest piece away from the bone.',
    minInternalF: 165,
    restMinutes: 0,
    minInternalSource: FSIS_SAFE_MINIMUM_SOURCE,
    rackPreference: 'middle',
    bakeSource: COMMON_PRACTICE,
  },
  {
    category: 'pork-chops',
    label: 'Pork chops / fresh pork',
    tempF: 400,
    minMinutes: 15,
    maxMinutes: 20,
    handsOnMinutes: 6,
    toleranceF: 10,
    donenessCue: 'Firm with a slight give; check the thickest chop, then rest 3 minutes.',
    minInternalF: 145,
    restMinutes: 3,
    minInternalSource: FSIS_SAFE_MINIMUM_SOURCE,
    rackPreference: 'middle',
    bakeSource: COMMON_PRACTICE,
  },
  {
    category: 'cheese-crisps',
    label: 'Cheese crisps',
    tempF: 400,
    minMinutes: 6,
    maxMinutes: 8,
    handsOnMinutes: 5,
    toleranceF: 10,
    donenessCue: 'Lacy and golden at the edges, bubbling has slowed; they crisp as they cool.',
    minInternalF: null,
    restMinutes: 0,
    minInternalSource: null,
    rackPreference: 'middle',
    bakeSource: COMMON_PRACTICE,
  },
  {
    category: 'fat-head-dough',
    label: 'Fat-head style dough (mozzarella and almond flour), par-baked',
    tempF: 425,
    minMinutes: 10,
    maxMinutes: 14,
    handsOnMinutes: 15,
    toleranceF: 10,
    donenessCue: 'Surface dry and lightly golden, no raw sheen in the centre.',
    minInternalF: null,
    restMinutes: 0,
    minInternalSource: null,
    rackPreference: 'lower',
    bakeSource: COMMON_PRACTICE,
  },
] satisfies BakeRuleDefault[]);

export function findBakeRule(category: BakeRuleCategory): BakeRuleDefault | undefined {
  return DEFAULT_BAKE_RULES.find((r) => r.category === category);
}
