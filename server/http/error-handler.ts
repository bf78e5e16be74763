import type { NextFunction, Request, Response } from 'express';
import { ZodError } from 'zod';
import {
  NotFoundError,
  OptimisticLockError,
  UniqueConstraintViolationException,
  ForeignKeyConstraintViolationException,
  ConnectionException,
} from '@mikro-orm/core';
import type { Problem } from '@shared/problem.js';
import { HttpError } from './errors.js';

const TITLES: Record<number, string> = {
  400: 'Bad request',
  401: 'Not signed in',
  403: 'Forbidden',
  404: 'Not found',
  409: 'Conflict',
  413: 'Payload too large',
  415: 'Unsupported media type',
  429: 'Too many requests',
  500: 'Internal server error',
  503: 'Service unavailable',
};

/**
 * What a unique key clash means, by constraint (server/db/migrations): the words a person reads when two saves of
 * the same thing cross. A constraint missing here answers "That already exists".
 */
export const DUPLICATE_WORDS: Record<string, { detail: string; field?: string }> = {
  app_user_email_unique: { detail: 'An account with this e-mail already exists', field: 'email' },
  ingredient_slug_unique: { detail: 'Your library already has an ingredient with this name', field: 'name' },
  ingredient_workspace_id_name_unique: { detail: 'Your library already has an ingredient with this name (saved at the same time): reload to see it', field: 'name' },
  oven_workspace_id_name_unique: { detail: 'An oven with this name already exists', field: 'name' },
  bake_rule_workspace_id_category_unique: { detail: 'This kind of tray already has a bake rule: reload to see it', field: 'category' },
  pantry_item_workspace_id_ingredient_id_unique: { detail: 'This ingredient is already in the pantry: reload to see it', field: 'ingredientId' },
  membership_user_id_workspace_id_unique: { detail: 'This person is already on the team' },
  week_tray_week_id_tray_id_prep_date_unique: { detail: 'This tray is already counted on that prep day: reload the week and try again' },
  week_cell_week_id_client_id_date_slot_unique: { detail: 'Someone else filled this plate at the same time: reload the week and try again' },
  week_publication_week_id_number_unique: { detail: 'Someone else published this week at the same time: reload it to see the version clients have' },
  bake_run_setting_week_id_prep_date_unique: { detail: 'Someone else saved this bake run at the same time: reload it and try again' },
  cooling_record_week_id_prep_date_run_tray_id_unique: { detail: 'Someone else started this tray’s cooling record at the same time: reload it and add your reading' },
  shopping_check_week_id_ingredient_id_unique: { detail: 'Someone else ticked this item at the same time: reload the list' },
  shopping_check_week_id_trip_ingredient_id_unique: { detail: 'Someone else ticked this item at the same time: reload the list' },
  shopping_purchase_week_id_unique: { detail: 'Someone else wrote down this shopping trip at the same time: reload the list' },
  shopping_purchase_week_id_trip_unique: { detail: 'Someone else wrote down this shopping trip at the same time: reload the list' },
  tray_photo_tray_id_unique: { detail: 'Someone else put a photo on this tray at the same time: reload it' },
};

function problem(status: number, code: string, detail: string, extra: Partial<Problem> = {}): Problem {
  return { type: `https://trayline.test/problems/${code}`, title: TITLES[status] ?? 'Error', status, code, detail, ...extra };
}

export function zodToErrors(err: ZodError, where?: string): Record<string, string[]> {
  const errors: Record<string, string[]> = {};
  for (const issue of err.issues) {
    const path = issue.path.length ? issue.path.join('.') : (where ?? 'body');
    (errors[path] ??= []).push(issue.message);
  }
  return errors;
}

/** The one error middleware: every failure becomes an RFC 9457 problem; no stack in any body. */
export function errorHandler() {
  return (err: unknown, req: Request, res: Response, _next: NextFunction) => {
    const requestId = String(req.id ?? '');
    let body: Problem;
    if (err instanceof ZodError) {
      const errors = zodToErrors(err, (err as unknown as { where?: string }).where);
      const fields = Object.keys(errors);
      body = problem(400, 'validation', `Check ${fields.join(', ')}: ${Object.values(errors)[0]?.[0] ?? ''}`.trim(), {
        errors,
      });
    } else if (err instanceof HttpError) {
      body = problem(err.status, err.code, err.message, err.extra as Partial<Problem>);
    } else if (err instanceof OptimisticLockError) {
      const entity = (err as unknown as { entity?: { version?: number } }).entity;
      body = problem(409, 'stale_version', 'Someone else changed this since you opened it', {
        currentVersion: entity?.version ?? null,
      });
    } else if (err instanceof NotFoundError) {
      body = problem(404, 'not_found', 'Not found');
    } else if (err instanceof UniqueConstraintViolationException) {
      // The services check for a duplicate first; reaching here is two people saving the same thing at once, or a
      // check missing (a defect): say what clashed, and log it so the second kind gets fixed.
      const constraint = (err as unknown as { constraint?: string }).constraint;
      const known = constraint ? DUPLICATE_WORDS[constraint] : undefined;
      req.log?.warn({ constraint, table: (err as unknown as { table?: string }).table }, 'unique key clash');
      body = problem(409, 'duplicate', known?.detail ?? 'That already exists', known?.field ? { errors: { [known.field]: [known.detail] } } : {});
    } else if (err instanceof ForeignKeyConstraintViolationException) {
      body = problem(409, 'in_use', 'This is still used elsewhere');
    } else if (isBodyParserError(err)) {
      const status = err.status ?? 400;
      const detail =
        err.type === 'entity.parse.failed'
          ? 'The request body is not valid JSON'
          : err.type === 'entity.too.large'
            ? 'The request body is too large'
            : 'The request body could not be read';
      body = problem(status, err.type === 'entity.too.large' ? 'too_large' : 'bad_body', detail);
    } else if (pgCode(err) === '22003') {
      // The schemas bound ids and versions (shared/schemas/ids.ts); a number that still reaches a column too small
      // for it is the request's fault, not the server's.
      body = problem(400, 'out_of_range', 'A number in the request is out of range');
    } else if (pgCode(err) === '22021' || pgCode(err) === '22P05') {
      // Text PostgreSQL cannot store (validated() refuses NUL characters first, naming the field).
      body = problem(400, 'bad_text', 'Some text in the request cannot be stored');
    } else if (err instanceof ConnectionException || isConnectionError(err)) {
      req.log?.warn({ err }, 'database unavailable');
      body = problem(503, 'db_unavailable', 'The database is not reachable; try again shortly', { requestId });
    } else {
      req.log?.error({ err }, 'unhandled error');
      body = problem(500, 'internal', `Something went wrong. Quote request id ${requestId} when reporting it.`, {
        requestId,
      });
    }
    if (body.status >= 500) body.requestId = requestId;
    res.status(body.status).type('application/problem+json').json(body);
  };
}

function isBodyParserError(err: unknown): err is { status?: number; type?: string } {
  return !!err && typeof err === 'object' && 'type' in err && typeof (err as { type: unknown }).type === 'string' &&
    String((err as { type: string }).type).startsWith('entity.');
}

/** A PostgreSQL error code (SQLSTATE), as the driver or MikroORM's wrapper carries it. */
function pgCode(err: unknown): string | undefined {
  const e = err as { code?: unknown; cause?: { code?: unknown } } | null;
  const code = e?.code ?? e?.cause?.code;
  return typeof code === 'string' ? code : undefined;
}

function isConnectionError(err: unknown): boolean {
  const code = (err as { code?: string })?.code;
  const msg = (err as { message?: string })?.message ?? '';
  return code === 'ECONNREFUSED' || code === '57P01' || /Knex: Timeout acquiring a connection|Connection terminated/.test(msg);
}
