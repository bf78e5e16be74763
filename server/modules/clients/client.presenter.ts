import Decimal from 'decimal.js';
import { computeTargets, DEFAULT_SLOT_SHARES, slotTargets, type ActivityLevel, type Goal, type MacroTargets, type Sex } from '@shared/domain/targets.js';
import type { AllergenCode } from '@shared/domain/allergens.js';
import type {
  ClientDto,
  ClientSelfDto,
  ClientSummaryDto,
  ClientTargetsDto,
  TargetMode,
} from '@shared/schemas/clients.schema.js';
import type { ClientFacts, IClient } from './client.entity.js';
import { pureMemo } from '../../lib/pure-memo.js';

/** Default share of the day for a slot the defaults do not name (common practice, no source). */
const OTHER_SLOT_SHARE = '0.1';

/** Each meal slot's share of the day: the client's own, else the default; scaled down when they exceed the day. */
export function slotShares(client: Pick<IClient, 'slotShares'>, mealSlots: readonly string[]): Record<string, Decimal> {
  const raw = mealSlots.map((slot) => {
    const own = client.slotShares?.[slot];
    return [slot, new Decimal(own ?? DEFAULT_SLOT_SHARES[slot] ?? OTHER_SLOT_SHARE)] as const;
  });
  const total = raw.reduce((s, [, v]) => s.plus(v), new Decimal(0));
  const scale = total.gt(1) ? new Decimal(1).div(total) : new Decimal(1);
  return Object.fromEntries(raw.map(([slot, v]) => [slot, v.times(scale)]));
}

/** The client's daily targets: typed by hand, or Mifflin–St Jeor × activity with the keto split. */
export function dayTargets(client: ClientFacts): Omit<ClientTargetsDto, 'slots'> {
  if (client.targetMode === 'manual' && client.manualTargets) {
    return { mode: 'manual', reeKcal: null, tdeeKcal: null, notes: [], ...client.manualTargets };
  }
  const t = computeTargets({
    sex: client.sex as Sex,
    weightKg: client.weightKg,
    heightCm: client.heightCm,
    ageYears: client.ageYears,
    activity: client.activity as ActivityLevel,
    goal: client.goal as Goal,
    goalAdjustment: client.goalAdjustment ?? undefined,
    netCarbCapG: client.netCarbCapG,
    proteinGPerKg: client.proteinGPerKg,
  });
  return {
    mode: 'computed',
    reeKcal: t.reeKcal,
    tdeeKcal: t.tdeeKcal,
    targetKcal: t.targetKcal,
    netCarbCapG: t.netCarbCapG,
    proteinG: t.proteinG,
    fatG: t.fatG,
    notes: t.notes,
  };
}

export function clientTargets(client: ClientFacts, mealSlots: readonly string[]): ClientTargetsDto {
  const day = dayTargets(client);
  const shares = slotShares(client, mealSlots);
  const perSlot = slotTargets(day, shares);
  const slots: ClientTargetsDto['slots'] = {};
  for (const slot of mealSlots) slots[slot] = { ...perSlot[slot], share: shares[slot].toDecimalPlaces(4).toNumber() };
  return { ...day, slots };
}

/**
 * Targets for the planned part of a day: the sum of the slot targets of the week board's meal slots. A board that
 * plans breakfast only is compared against breakfast's share of the day, not the whole day. Memoized on the inputs it
 * reads (a board computes every client's on each load; see server/lib/pure-memo.ts).
 */
export const plannedTargets: (client: ClientFacts, mealSlots: readonly string[]) => MacroTargets = pureMemo(
  computePlannedTargets,
  (c, mealSlots) =>
    JSON.stringify([
      c.targetMode, c.manualTargets, c.sex, String(c.weightKg), String(c.heightCm), c.ageYears, c.activity, c.goal,
      c.goalAdjustment == null ? null : String(c.goalAdjustment), String(c.netCarbCapG), String(c.proteinGPerKg),
      c.slotShares, mealSlots,
    ]),
);

export function computePlannedTargets(client: ClientFacts, mealSlots: readonly string[]): MacroTargets {
  const day = dayTargets(client);
  const shares = slotShares(client, mealSlots);
  const share = Object.values(shares).reduce((s, v) => s.plus(v), new Decimal(0));
  const r = (v: number, places: number) => share.times(v).toDecimalPlaces(places, Decimal.ROUND_HALF_UP).toNumber();
  return { targetKcal: r(day.targetKcal, 0), netCarbCapG: r(day.netCarbCapG, 1), proteinG: r(day.proteinG, 1), fatG: r(day.fatG, 1) };
}

export function presentClientSummary(c: Pick<ClientFacts, 'id' | 'name' | 'householdMultiplier' | 'archivedAt'>): ClientSummaryDto {
  return {
    id: c.id,
    name: c.name,
    householdMultiplier: new Decimal(c.householdMultiplier).toString(),
    archivedAt: c.archivedAt ? new Date(c.archivedAt).toISOString() : null,
  };
}

export function presentClientSelf(c: IClient, mealSlots: readonly string[]): ClientSelfDto {
  return {
    ...presentClientSummary(c),
    email: c.email ?? null,
    sex: c.sex as Sex,
    ageYears: c.ageYears,
    heightCm: new Decimal(c.heightCm).toString(),
    weightKg: new Decimal(c.weightKg).toString(),
    activity: c.activity as ActivityLevel,
    goal: c.goal as Goal,
    goalAdjustment: c.goalAdjustment === null || c.goalAdjustment === undefined ? null : Number(c.goalAdjustment),
    netCarbCapG: new Decimal(c.netCarbCapG).toString(),
    proteinGPerKg: new Decimal(c.proteinGPerKg).toString(),
    targetMode: c.targetMode as TargetMode,
    manualTargets: c.manualTargets ?? null,
    slotShares: c.slotShares ?? {},
    allergens: (c.allergens ?? []) as AllergenCode[],
    dislikes: c.dislikes ?? [],
    targets: clientTargets(c, mealSlots),
    version: c.version,
  };
}

export function presentClient(
  c: IClient,
  mealSlots: readonly string[],
  account: { email: string; name: string } | null,
  invitation: { email: string; expiresAt: Date } | null = null,
): ClientDto {
  return {
    ...presentClientSelf(c, mealSlots),
    healthNotes: c.healthNotes ?? '',
    account,
    invitation: account || !invitation ? null : { email: invitation.email, expiresAt: invitation.expiresAt.toISOString() },
    createdAt: c.createdAt.toISOString(),
    updatedAt: c.updatedAt.toISOString(),
  };
}
