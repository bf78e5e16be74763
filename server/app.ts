import express, { type Express, Router } from 'express';
import helmet from 'helmet';
import compression from 'compression';
import session from 'express-session';
import { pinoHttp } from 'pino-http';
import pino from 'pino';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import type { Pool } from 'pg';
import type { Env } from './config/env.js';
import type { Orm } from './db/orm.js';
import { schemaGate, type SchemaGate } from './db/schema-gate.js';
import { errorHandler } from './http/error-handler.js';
import { NotFound, Forbidden } from './http/errors.js';
import { requestContext } from './http/request-context.js';
import { configurePassport } from './modules/auth/passport.js';
import { createSessionStore } from './modules/auth/session-store.js';
import { SESSION_MAX_AGE_MS } from './modules/auth/devices.js';
import { authRoutes } from './modules/auth/auth.routes.js';
import { healthRoutes } from './modules/health/health.routes.js';
import { apiModules } from './modules/index.js';
import type { MailQueue } from './modules/mail/mail.service.js';

export interface AppDeps {
  orm: Orm;
  pool: Pool;
  env: Env;
  /** pg-boss mail queue (server/modules/mail/mail-runtime.ts), started by main.ts and the test app. */
  mail: MailQueue;
  logger?: pino.Logger;
  /** Keeps requests off a database whose schema is behind the code (made here when not given). */
  schema?: SchemaGate;
}

/** CSRF: cookie-authenticated writes must carry this header (a cross-site form cannot set it; SameSite=Lax too). */
export const CSRF_HEADER = 'x-trayline-csrf';

/** Builds the app without listening (tests use it through supertest). */
export function createApp({ orm, pool, env, mail, logger, schema = schemaGate(orm) }: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', env.TRUST_PROXY);

  const log = logger ?? pino({ level: env.LOG_LEVEL });
  app.use(
    pinoHttp({
      logger: log,
      genReqId: (req, res) => {
        const id = (req.headers['x-request-id'] as string) || randomUUID();
        res.setHeader('x-request-id', id);
        return id;
      },
      autoLogging: { ignore: (req) => req.url === '/api/health' },
      // A request line says what was asked and how it went; never a header (the session cookie is a credential).
      serializers: {
        req: (req) => ({ id: req.id, method: req.method, url: req.url }),
        res: (res) => ({ statusCode: res.statusCode }),
      },
    }),
  );
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: null,
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );

  // gzip or deflate for whoever asks (Accept-Encoding): a 60-client week board is ~180 KB of JSON and ~13 KB
  // gzipped, the client bundle shrinks about threefold. Answers under 1 KB and PDFs (already compressed) go as they are.
  app.use(compression());

  const api = Router();
  // Before anything reads a table: a schema older than the code is a 503 that says to migrate, not a 500 per route.
  api.use(schema.middleware);
  api.use(express.json({ limit: '1mb' }));
  api.use(requestContext(orm));

  api.use(
    session({
      name: 'trayline.sid',
      secret: env.SESSION_SECRET,
      store: createSessionStore(pool, SESSION_MAX_AGE_MS),
      resave: false,
      saveUninitialized: false,
      rolling: true,
      proxy: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: env.COOKIE_SECURE === 'auto' ? 'auto' : env.COOKIE_SECURE === 'true',
        maxAge: SESSION_MAX_AGE_MS,
      },
    }),
  );
  const passport = configurePassport();
  api.use(passport.initialize());
  api.use(passport.session());
  api.use((req, _res, next) => {
    if (req.user) req.actor = req.user;
    next();
  });
  // The API's answers are someone's data: never kept by a shared cache (private), and a browser asks again each time
  // (no-cache; its copy still saves a transfer when the ETag matches). On a device not kept signed in (a shared
  // computer) the browser keeps no copy at all (no-store; noteSignIn sets it on the sign-in's own answer). A route
  // that says otherwise (a tray photo, a plan PDF) sets its own.
  api.use((req, res, next) => {
    res.setHeader('cache-control', req.session?.staySignedIn === false ? 'no-store' : 'private, no-cache');
    next();
  });
  api.use((req, _res, next) => {
    const safe = req.method === 'GET' || req.method === 'HEAD' || req.method === 'OPTIONS';
    if (!safe && req.get(CSRF_HEADER) !== '1') return next(new Forbidden(`Missing ${CSRF_HEADER} header`));
    next();
  });

  api.use(authRoutes({ pool, loginLimit: env.LOGIN_RATE_LIMIT, publicUrl: env.PUBLIC_URL, mail }));
  for (const mod of apiModules({ orm, pool, env, mail })) api.use(mod);
  api.use((req, _res, next) => next(new NotFound(`No API route ${req.method} ${req.originalUrl}`)));

  // Health must answer even when the session store (PostgreSQL) is down: mount it before the session too.
  app.use('/api', healthRoutes(orm, schema));
  app.use('/api', api);

  if (env.SERVE_CLIENT === '1') {
    const dist = path.resolve(env.CLIENT_DIST);
    if (fs.existsSync(path.join(dist, 'index.html'))) {
      app.use(express.static(dist, { index: false, maxAge: '1h' }));
      // A build's file that is not there (a page of an earlier build asking for its code after a deploy) is a 404,
      // never the app's page in its place: the page says it could not load, and a browser keeps no HTML as code.
      app.use('/assets', (_req, res) => res.status(404).type('text/plain').send('Not found'));
      app.get('/{*splat}', (_req, res) => res.sendFile(path.join(dist, 'index.html')));
    }
  }
  app.use(errorHandler());
  return app;
}
