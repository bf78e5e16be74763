import type { NextFunction, Request, Response } from 'express';
import { RequestContext, type EntityManager } from '@mikro-orm/postgresql';
import type { Orm } from '../db/orm.js';

/** A forked EntityManager per request (MikroORM's RequestContext). */
export function requestContext(orm: Orm) {
  return (req: Request, _res: Response, next: NextFunction) => {
    const em = orm.em.fork();
    req.em = em;
    RequestContext.create(em, next);
  };
}

export function emOf(req: Request): EntityManager {
  if (!req.em) throw new Error('request context missing');
  return req.em;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      em?: EntityManager;
    }
  }
}
