import { defineEntity, p, type InferEntity } from '@mikro-orm/core';

/** A coach's business. Every row of the product belongs to one workspace. */
export const Workspace = defineEntity({
  name: 'Workspace',
  tableName: 'workspace',
  properties: {
    id: p.integer().primary().autoincrement(),
    name: p.string().length(120),
    /** Net-carb rule: 'half-other-polyols' (default), 'full', 'fiber-only'. */
    netCarbRule: p.string().length(40).default('half-other-polyols'),
    /** How dates are written in words (shared/domain/iso-date.ts DATE_ORDERS): 'month-day' (default) or 'day-month'. */
    dateOrder: p.string().length(10).default('month-day'),
    /** How a time of day is written (shared/domain/clock.ts CLOCK_STYLES): '24h' (default) or '12h'. */
    clock: p.string().length(4).default('24h'),
    /** The kitchen's IANA time zone (shared/domain/time-zone.ts), or null while not set: cooling deadlines are watched in it. */
    timeZone: p.string().length(64).nullable(),
    /** Meal slots of the week board, in order. */
    mealSlots: p.json<string[]>().default(JSON.stringify(['breakfast'])),
    isDemo: p.boolean().default(false),
    version: p.integer().version(),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
  },
});
export type IWorkspace = InferEntity<typeof Workspace>;
