import type { MeDto } from '@shared/schemas/auth.schema';
import type { MyWeekDto } from '@shared/schemas/weeks.schema';

/**
 * A client's plan saved on their own device (localStorage), so "My plates" opens without a network: the last answer
 * of GET /api/weeks/mine, with the person it belongs to. One plan, one person: signing out, or anyone else signing in
 * on the device, forgets it (src/app/offline-plan.ts). Coaches' and assistants' pages keep nothing.
 */
export interface SavedPlan {
  version: typeof VERSION;
  me: MeDto;
  /** null: the server said there was no published week (so nothing stale shows offline either). */
  week: MyWeekDto | null;
  /** When the server gave this answer (ms since the epoch). */
  savedAt: number;
}

const KEY = 'trayline.saved-plan';
/** Raised whenever MeDto or MyWeekDto changes shape: a plan saved by an older build is then not read. */
const VERSION = 1;
/** A plan older than this is not shown: a week and the next one are two weeks. */
export const SAVED_PLAN_DAYS = 14;

function storage(): Storage | null {
  try {
    return typeof window === 'undefined' ? null : window.localStorage;
  } catch {
    return null; // storage refused (a browser setting): nothing is saved, nothing breaks
  }
}

/** Keeps the client's latest plan (only a client's: a linked client profile is what GET /weeks/mine answers for). */
export function savePlan(me: MeDto, week: MyWeekDto | null, savedAt = Date.now()): void {
  if (me.role !== 'client') return;
  const plan: SavedPlan = { version: VERSION, me, week, savedAt };
  try {
    storage()?.setItem(KEY, JSON.stringify(plan));
  } catch {
    // Full or refused: the page works as before, only not offline.
  }
}

/** The saved plan, if there is one of this build's shape, under SAVED_PLAN_DAYS old, and (given) of this person. */
export function savedPlan(personId?: number, now = Date.now()): SavedPlan | null {
  let plan: SavedPlan;
  try {
    const text = storage()?.getItem(KEY);
    if (!text) return null;
    plan = JSON.parse(text) as SavedPlan;
  } catch {
    return null;
  }
  if (plan?.version !== VERSION || typeof plan.savedAt !== 'number' || plan.me?.role !== 'client') return null;
  if (now - plan.savedAt > SAVED_PLAN_DAYS * 86_400_000 || plan.savedAt > now + 86_400_000) return null;
  if (personId !== undefined && plan.me.id !== personId) return null;
  if (plan.week !== null && !Array.isArray(plan.week?.days)) return null;
  return plan;
}

export function forgetSavedPlan(): void {
  try {
    storage()?.removeItem(KEY);
  } catch {
    // nothing to do
  }
}
