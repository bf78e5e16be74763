import { DEFAULT_DATE_ORDER, type DateOrder } from '@shared/domain/iso-date.js';
import { DEFAULT_CLOCK, type ClockStyle } from '@shared/domain/clock.js';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { Forbidden, NotFound, Unauthorized } from './errors.js';
import type { Role } from '@shared/schemas/auth.schema.js';
import type { TempScale } from '@shared/domain/temperature.js';

/**
 * The one authorization layer. Every route's first handler is `allow(...)`: a role check, plus the workspace scope
 * taken from the session (never from the request). Services receive the Actor and filter by `actor.workspaceId`;
 * an id from another workspace is simply not found (404), so ids cannot be probed.
 */
export interface Actor {
  userId: number;
  email: string;
  name: string;
  /**
   * The person's measure preference, read with them: server-written amounts (shopping list, pantry, PDFs) follow it.
   * Absent where an actor is made without it (US customary then).
   */
  unitSystem?: 'us' | 'metric';
  /** The person's temperature scale, read with them: the papers they download put it first. Absent: °F. */
  tempScale?: TempScale;
  role: Role;
  workspaceId: number;
  /** For a client member: their client profile id (their own plan data only). */
  clientId: number | null;
  /**
   * The workspace's nutrition stamp, read in the same statement as the person (see the nutrition_stamp migration):
   * library rows a process read under this stamp are still what the database holds. Absent when not read.
   */
  nutritionVersion?: string | null;
  /** How the workspace writes dates in words, read with the person (absent where an actor is made without it). */
  dateOrder?: DateOrder;
  /** How the workspace writes a time of day, read with the person (absent where an actor is made without it). */
  clock?: ClockStyle;
}

/** How the actor's workspace writes dates (month-day unless the coach chose day-month). */
export const datesOf = (actor: Pick<Actor, 'dateOrder'>): DateOrder => actor.dateOrder ?? DEFAULT_DATE_ORDER;

/** How the actor's workspace writes a time of day (24-hour unless the coach chose 12-hour). */
export const clockOf = (actor: Pick<Actor, 'clock'>): ClockStyle => actor.clock ?? DEFAULT_CLOCK;

/** The person's temperature scale (°F where an actor is made without it). */
export const scaleOf = (actor: Pick<Actor, 'tempScale'>): TempScale => actor.tempScale ?? 'F';

/** The measure system the actor's amounts are written in (US customary unless they chose metric). */
export const measureOf = (actor: Pick<Actor, 'unitSystem'>): 'us' | 'metric' => actor.unitSystem ?? 'us';

export type Access = 'public' | 'signed-in' | readonly Role[];
export const ACCESS = Symbol('trayline.access');
export type Guard = RequestHandler & { [ACCESS]: Access };

export function allow(...roles: Role[]): Guard;
export function allow(access: 'public' | 'signed-in'): Guard;
export function allow(...args: (Role | 'public' | 'signed-in')[]): Guard {
  const access: Access =
    args.length === 1 && (args[0] === 'public' || args[0] === 'signed-in') ? args[0] : (args as Role[]);
  const guard = ((req: Request, _res: Response, next: NextFunction) => {
    if (access === 'public') return next();
    const actor = req.actor;
    if (!actor) return next(new Unauthorized());
    if (access === 'signed-in' || access.includes(actor.role)) return next();
    next(new Forbidden());
  }) as Guard;
  guard[ACCESS] = access;
  return guard;
}

export function actorOf(req: Request): Actor {
  if (!req.actor) throw new Unauthorized();
  return req.actor;
}

/** Loads a row and checks it belongs to the actor's workspace; otherwise "not found". */
export function inWorkspace<T extends { workspace: unknown }>(actor: Actor, row: T | null, what: string): T {
  if (!row) throw new NotFound(what);
  const ws = row.workspace as { id?: number } | number;
  const id = typeof ws === 'number' ? ws : ws?.id;
  if (id !== actor.workspaceId) throw new NotFound(what);
  return row;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      actor?: Actor;
      id?: string | number | object;
    }
  }
}
