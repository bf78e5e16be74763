import { vi } from 'vitest';
import { Component as MyPlates } from '@/app/routes/my/my-plates.route';
import { jsonResponse, queryClientFor, renderInApp, signedIn } from './render';

// A client's published plates as GET /api/weeks/mine answers them: invented plates and numbers.
export const client = signedIn({ role: 'client', clientId: 3, email: 'dana@example.test', name: 'Dana' });
export const macros = { kcal: 420, fatG: 33, proteinG: 24, carbsG: 6, fiberG: 2, netCarbsG: 4 };
export const plate = (name: string, over: Record<string, unknown> = {}) => ({
  slot: 'breakfast', name, description: '', macros, allergens: [], trays: [], addOns: [], assemblySteps: [], reheatSteps: [],
  eatBy: '2026-01-14', storage: 'fridge', thawOn: null, prepDate: '2026-01-11', ...over,
});
export const day = (date: string, ...plates: ReturnType<typeof plate>[]) => ({ date, plates, totals: macros });

/** My plates at `now` (the device's clock), every request answered with `body`. */
export function showMyPlates(body: unknown, now: Date) {
  vi.useFakeTimers({ now, toFake: ['Date'] });
  vi.stubGlobal('fetch', vi.fn(async () => jsonResponse(body)));
  renderInApp(<MyPlates />, queryClientFor(client));
}
