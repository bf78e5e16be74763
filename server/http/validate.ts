import type { NextFunction, Request, Response } from 'express';
import type { z } from 'zod';
import { ValidationError } from './errors.js';

type Schemas = { body?: z.ZodType; params?: z.ZodType; query?: z.ZodType };
type Out<S, K extends keyof S> = S[K] extends z.ZodType ? z.output<S[K]> : undefined;
export type Valid<S extends Schemas> = { body: Out<S, 'body'>; params: Out<S, 'params'>; query: Out<S, 'query'> };

/**
 * The path of the first text holding a NUL character (U+0000), or null. PostgreSQL's text cannot store it, so such a
 * request would fail in the database; it is a 400 naming the field instead.
 */
function nulPath(value: unknown, path: string[] = []): string[] | null {
  if (!hasNul(value)) return null;
  if (typeof value === 'string') return path;
  for (const [k, v] of Object.entries(value as object)) {
    const found = nulPath(v, [...path, k]);
    if (found) return found;
  }
  return null;
}

/** The quick test (every request's input passes here): no paths built, no arrays copied. */
function hasNul(value: unknown): boolean {
  if (typeof value === 'string') return value.indexOf('\u0000') !== -1;
  if (value === null || typeof value !== 'object') return false;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) if (hasNul(value[i])) return true;
    return false;
  }
  for (const k in value) if (hasNul((value as Record<string, unknown>)[k])) return true;
  return false;
}

/** Marks a zod error with where it came from, so the 400 names `body.field` etc. */
function parseIn<T extends z.ZodType>(where: 'body' | 'params' | 'query', schema: T, value: unknown): z.output<T> {
  const nul = nulPath(value);
  if (nul) throw ValidationError.field(nul.length ? nul.join('.') : where, 'Text cannot hold a NUL character');
  const result = schema.safeParse(value);
  if (!result.success) {
    (result.error as unknown as { where: string }).where = where;
    throw result.error;
  }
  return result.data;
}

/**
 * The one way a route reads its input: parse body, params and query with the shared zod schemas, then call the
 * handler with typed values. A returned value is sent as JSON with status 200 (a creating handler sets 201
 * itself); `undefined` answers 204.
 * Raw `req.body` never reaches a service. Express 5 forwards rejections to the error handler.
 */
export function validated<S extends Schemas>(
  schemas: S,
  fn: (input: Valid<S>, req: Request, res: Response) => Promise<unknown> | unknown,
) {
  return async (req: Request, res: Response, _next: NextFunction) => {
    const input = {
      body: schemas.body ? parseIn('body', schemas.body, req.body ?? {}) : undefined,
      params: schemas.params ? parseIn('params', schemas.params, req.params) : undefined,
      query: schemas.query ? parseIn('query', schemas.query, req.query) : undefined,
    } as Valid<S>;
    const out = await fn(input, req, res);
    if (res.headersSent) return;
    if (out === undefined) {
      res.status(res.statusCode === 200 ? 204 : res.statusCode).end();
      return;
    }
    res.json(out);
  };
}
