/**
 * Types of the bake run (the prep-day oven schedule): the input the API accepts after validation and the plan it
 * returns. The scheduler itself lives in bake-run.ts; the model (what a schedule must satisfy) is documented there.
 */

/** Which rack a tray would like when several are free. Rack 1 is the top rack. Never changes timing. */
export type RackPreference = 'upper' | 'middle' | 'lower' | 'any';

/**
 * How a convection oven is accounted for (apply one, never both):
 * - 'temperature': the oven is set `convectionDeltaF` lower than the tray's temperature, same bake time;
 * - 'time': same temperature, bake times multiplied by `convectionTimeFactor`.
 */
export type ConvectionMode = 'temperature' | 'time';

export interface BakeOven {
  /** Unique within the run; events and trays refer to the oven by this name. */
  name: string;
  racks: number;
  traysPerRack: number;
  convection: boolean;
  /** Heating rate while preheating or raising the set point, °F per minute. */
  heatFPerMin: number;
  /** Cooling rate while lowering the set point, °F per minute. */
  coolFPerMin: number;
  /** Highest set point the oven reaches, °F. */
  maxF: number;
  /**
   * The oven's temperature when the run starts, °F, when it is already on (the rest of a prep day planned again
   * while it is hot); absent: it starts at the kitchen's `ambientF` and is preheated.
   */
  startF?: number;
}

export interface BakeTray {
  /** Unique within the run. */
  id: string;
  name: string;
  /** Set temperature for a conventional oven, °F. */
  tempF: number;
  /** The temperature as entered when it was given in °C (tempF is then converted from it). */
  tempC?: number;
  /** Bake time of one tray alone in a conventional oven, minutes; the plan pulls at the minimum. */
  minMinutes: number;
  maxMinutes: number;
  /** Hands-on prep by one cook before the tray can go in (whole minutes, 0 = ready at the start). */
  handsOnMinutes: number;
  /** Acceptable distance between the oven's set point and `tempF` (after convection adjustment); default rule. */
  toleranceF?: number;
  rackPreference?: RackPreference;
  /** Minimum internal temperature to check at the first check (e.g. USDA FSIS chart), °F. Informational. */
  minInternalF?: number;
}

export interface BakeRunRules {
  /** Extra time per extra tray sharing the oven: progress rate 1 / (1 + c·(k − 1)) with k trays in. Default 0.10. */
  crowdingPerExtraTray: number;
  convectionMode: ConvectionMode;
  /** Set point reduction in a convection oven when `convectionMode` is 'temperature'. Default 25 °F. */
  convectionDeltaF: number;
  /** Time multiplier in a convection oven when `convectionMode` is 'time'. Default 0.75. */
  convectionTimeFactor: number;
  /** Tolerance for trays that give none. Default ±10 °F. */
  defaultToleranceF: number;
}

export interface BakeRunInput {
  /** Local start of the prep day, "YYYY-MM-DDTHH:mm" (no time zone). */
  start: string;
  cooks: number;
  ambientF: number;
  ovens: BakeOven[];
  trays: BakeTray[];
  rules?: Partial<BakeRunRules>;
}

/** Search limits; not part of the API input (a caller cannot buy unbounded CPU). */
export interface BakeRunSearchOptions {
  /** Runs with at most this many trays get the exact branch and bound (default 8). */
  exactMaxTrays: number;
  /** Node budget of the branch and bound; past it the best plan found is returned, not proven optimal. */
  exactNodeLimit: number;
  /** Budget of plan evaluations for the heuristic's local search (deterministic, not wall-clock). */
  heuristicEvaluations: number;
}

export type BakeEventKind =
  | 'preheat'
  | 'setpoint-change'
  | 'ready'
  | 'hands-on-start'
  | 'tray-in'
  | 'first-check'
  | 'tray-out'
  | 'cooling-start'
  | 'cool-to-70-by'
  | 'fridge-41-by';

export interface BakeEvent {
  /** Local time "YYYY-MM-DDTHH:mm". */
  at: string;
  /** Minutes after the start of the run. */
  minute: number;
  kind: BakeEventKind;
  /** Oven name; for hands-on and cooling events, the oven the tray bakes in. */
  oven: string | null;
  trayId: string | null;
  /**
   * Oven events and tray-in / first-check / tray-out / hands-on-start: the oven's set point.
   * Cooling events: the food temperature the Food Code names (135 start, 70, 41).
   */
  tempF: number | null;
  /** 1-based cook number (hands-on-start only). */
  cook?: number;
  /** End of the hands-on task (hands-on-start only). */
  untilAt?: string;
  /** Set point before a change (setpoint-change only). */
  fromF?: number;
  /** Internal temperature to check (first-check only, when the tray gives one). */
  internalF?: number;
  /** Where a food-safety time comes from (cooling events). */
  source?: string;
}

export interface BakeTrayPlan {
  id: string;
  name: string;
  oven: string;
  ovenIndex: number;
  /** 1-based rack, rack 1 at the top. */
  rack: number;
  /** 1-based position on the rack (1..traysPerRack). */
  position: number;
  /** The oven's set point while this tray bakes, °F. */
  tempF: number;
  inAt: string;
  outAt: string;
  inMinute: number;
  outMinute: number;
  /** Wall-clock minutes in the oven (crowding included). */
  bakeMinutes: number;
  /** Minimum bake time after the convection adjustment, uncrowded minutes (the progress the tray needs). */
  minAdjustedMinutes: number;
  maxAdjustedMinutes: number;
  /** Latest pull if the oven load stays as at the planned pull (estimate, for a tray that is not done yet). */
  pullByAt: string;
  pullByMinute: number;
  convectionAdjustment: 'none' | 'temperature' | 'time';
  prep: { cook: number; startAt: string; endAt: string; startMinute: number; endMinute: number } | null;
  /** Minutes between the end of prep and the tray going in. */
  waitMinutes: number;
}

export interface BakeSetPointPlan {
  tempF: number;
  /** The first set point of an oven that was already on (`startF`): the temperature it changed from. */
  fromF?: number;
  /** Preheat or changeover start (local time) and its minute; `ready*` when the oven is at temperature. */
  changeAt: string;
  changeMinute: number;
  readyAt: string;
  readyMinute: number;
  /** When the last tray of this set point comes out. */
  endAt: string;
  endMinute: number;
  trayIds: string[];
}

export interface BakeOvenPlan {
  name: string;
  setPoints: BakeSetPointPlan[];
}

export interface LowerBoundPart {
  name: string;
  minutes: number;
}

export interface BakeRunResult {
  start: string;
  trays: BakeTrayPlan[];
  events: BakeEvent[];
  ovens: BakeOvenPlan[];
  /** From the start until the last tray comes out. */
  sessionMinutes: number;
  endAt: string;
  lowerBoundMinutes: number;
  lowerBoundParts: LowerBoundPart[];
  /** (session − bound) / bound × 100, one decimal; 0 when the bound is 0. */
  gapPct: number;
  method: 'exact' | 'heuristic';
  /** True when the plan is proven shortest among the plans the scheduler considers (see bake-run.ts). */
  provenOptimal: boolean;
  /** Plans simulated while searching (diagnostic). */
  evaluations: number;
  rules: BakeRunRules;
  cautions: string[];
}
