import type { EntityManager } from '@mikro-orm/postgresql';
import { isIsoDate } from '@shared/domain/iso-date.js';
import { tripDatesOf } from '@shared/domain/week-board.js';
import type { Actor } from '../../http/authz.js';
import { registerAttachment, type RenderedAttachment } from '../mail/attachment-registry.js';
import { loadActor } from '../auth/auth.service.js';
import { findWeek } from '../weeks/week-board.service.js';
import { shoppingPdf } from '../shopping/shopping-pdf.js';
import { bakeRunPdf } from '../bake-runs/bake-run-files.js';

/**
 * A prep day's papers for one kitchen assistant: the mail job renders them at send time from
 * `{ workspaceId, weekId, prepDate, userId }`, as that person reads them (their US or metric amounts), from the
 * week as it is then. Someone no longer in the workspace gets nothing (the render fails, the mail is marked failed).
 */
export interface PrepDayPayload {
  workspaceId: number;
  weekId: number;
  prepDate: string;
  userId: number;
}

export const PREP_DAY_SHOPPING_PDF = 'prep-day-shopping';
export const PREP_DAY_BAKE_RUN_PDF = 'prep-day-bake-run';

function payloadOf(raw: Record<string, unknown>): PrepDayPayload {
  const n = (k: string) => {
    const v = Number(raw[k]);
    if (!Number.isInteger(v) || v <= 0) throw new Error(`prep-day papers: bad ${k} in the payload`);
    return v;
  };
  const prepDate = String(raw.prepDate);
  if (!isIsoDate(prepDate)) throw new Error('prep-day papers: bad prepDate in the payload');
  return { workspaceId: n('workspaceId'), weekId: n('weekId'), prepDate, userId: n('userId') };
}

/** The recipient as the reader of the papers, still a member of the workspace the mail was queued for. */
async function readerOf(em: EntityManager, p: PrepDayPayload): Promise<Actor> {
  const actor = await loadActor(em, p.userId);
  if (!actor || actor.workspaceId !== p.workspaceId) throw new Error('prep-day papers: the recipient is no longer in this workspace');
  return actor;
}

/** The prep day's shopping list: its own trip's list in a week with two prep days, else the whole week's. */
export async function renderPrepDayShopping(em: EntityManager, raw: Record<string, unknown>): Promise<RenderedAttachment> {
  const p = payloadOf(raw);
  const actor = await readerOf(em, p);
  const week = await findWeek(em, actor, p.weekId);
  return shoppingPdf(em, actor, week.id, tripDatesOf(week).includes(p.prepDate) ? p.prepDate : undefined);
}

export async function renderPrepDayBakeRun(em: EntityManager, raw: Record<string, unknown>): Promise<RenderedAttachment> {
  const p = payloadOf(raw);
  return bakeRunPdf(em, await readerOf(em, p), p.weekId, p.prepDate);
}

// Wiring at import time (the routes import this file): the mail job finds the renderer by kind.
registerAttachment(PREP_DAY_SHOPPING_PDF, (em, payload) => renderPrepDayShopping(em as EntityManager, payload));
registerAttachment(PREP_DAY_BAKE_RUN_PDF, (em, payload) => renderPrepDayBakeRun(em as EntityManager, payload));
