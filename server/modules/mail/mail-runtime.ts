import pg from 'pg';
import PgBoss from 'pg-boss';
import type { MikroORM } from '@mikro-orm/postgresql';
import type { Logger } from 'pino';
import { MAIL_QUEUE, RESET_QUEUE, type MailJobData, type MailQueue, type ResetJobData } from './mail.service.js';
import { issuePasswordReset } from '../auth/auth.service.js';
import { smtpSender, type MailSender, type SmtpSettings } from './mail-transport.js';
import { sendOutboxRow } from './mail-worker.js';
import { COOLING_WATCH_CRON, COOLING_WATCH_QUEUE, watchCooling } from '../bake-runs/cooling-watch.js';

/**
 * pg-boss for e-mail, in the app's own database (schema `pgboss`): the `mail.send` queue, its worker and a
 * reconciler, and the `auth.password-reset` queue whose jobs turn a reset request into a token and an e-mail.
 * Also the cooling watch (server/modules/bake-runs/cooling-watch.ts): a pg-boss schedule puts one `cooling.watch` job
 * in the queue a minute, whichever instance's clock monitor gets there first, and one worker runs it.
 * Started by server/main.ts (with the workers) and by the API tests (queues only, or with workers pointed at an
 * in-process catcher). Every piece of state is in PostgreSQL; several instances can run at once.
 */
export interface MailRetryOptions {
  retryLimit: number;
  /** Seconds before the first retry; doubled each time when `retryBackoff` (pg-boss adds jitter). */
  retryDelay: number;
  retryBackoff: boolean;
  /** An active job older than this is taken as lost (its process died) and retried. */
  expireInSeconds: number;
}

export const DEFAULT_RETRY: MailRetryOptions = { retryLimit: 5, retryDelay: 5, retryBackoff: true, expireInSeconds: 120 };

export interface StartMailOptions {
  databaseUrl: string;
  orm: MikroORM;
  smtp: SmtpSettings;
  /** The app's address, for the links in e-mails the worker writes (password reset). */
  publicUrl: string;
  /** Start the send worker in this process (default true). */
  work?: boolean;
  retry?: Partial<MailRetryOptions>;
  /** pg-boss timers: polling of the worker, maintenance (expiry of lost jobs). Tests make them short. */
  pollingIntervalSeconds?: number;
  maintenanceIntervalSeconds?: number;
  /** Seconds between reconciler runs (rows whose job ended without a result). */
  reconcileEverySeconds?: number;
  /** Replaces SMTP (tests simulate a crash mid-send with it). */
  sender?: MailSender;
  logger?: Logger;
  /** PostgreSQL application_name of this runtime's connections. */
  applicationName?: string;
}

export interface MailRuntime extends MailQueue {
  retry: MailRetryOptions;
  /** Starts pg-boss (creates schema `pgboss` and the queue when missing) and, unless `work: false`, the worker. */
  start(): Promise<void>;
  stop(): Promise<void>;
}

/** Rows still waiting whose job is gone (e.g. the process died during the last attempt) become `failed`. */
async function reconcile(pool: pg.Pool, retry: MailRetryOptions) {
  await pool.query(
    `update outbox o set status = 'failed', updated_at = now(),
       last_error = coalesce(o.last_error, 'The send job ended without a result (the server stopped while sending)')
     where o.status in ('queued', 'sending', 'retrying')
       and o.updated_at < now() - make_interval(secs => $1)
       and not exists (
         select 1 from pgboss.job j
         where j.name = $2 and (j.data->>'outboxId')::int = o.id and j.state in ('created', 'retry', 'active'))`,
    [retry.expireInSeconds + 60, MAIL_QUEUE],
  );
}

/**
 * Builds the mail runtime without connecting. Queueing works before `start()` once the `pgboss` schema and the
 * queue exist (any earlier start made them); the server starts even when PostgreSQL is away and retries.
 */
export function createMailRuntime(opts: StartMailOptions): MailRuntime {
  const retry = { ...DEFAULT_RETRY, ...opts.retry };
  const work = opts.work ?? true;
  const appName = opts.applicationName ?? 'trayline-mail';
  const boss = new PgBoss({
    connectionString: opts.databaseUrl,
    schema: 'pgboss',
    application_name: appName,
    max: 4,
    supervise: work,
    // The cooling watch's once-a-minute schedule is kept by the instances that work.
    schedule: work,
    migrate: true,
    ...(opts.maintenanceIntervalSeconds ? { maintenanceIntervalSeconds: opts.maintenanceIntervalSeconds } : {}),
  });
  boss.on('error', (err) => opts.logger?.warn({ err }, 'pg-boss error'));
  // Retry and expiry come from the queue's settings (createQueue/updateQueue above), not from each job, so every
  // instance sending into the queue uses the one configuration.
  const jobOptions: PgBoss.SendOptions = {};
  let pool: pg.Pool | null = null;
  let timer: NodeJS.Timeout | null = null;
  let started = false;
  let stopped = false;
  return {
    boss,
    jobOptions,
    retry,
    async start() {
      if (started) return;
      await boss.start();
      await boss.createQueue(MAIL_QUEUE, { name: MAIL_QUEUE, ...retry });
      await boss.updateQueue(MAIL_QUEUE, { name: MAIL_QUEUE, ...retry });
      await boss.createQueue(RESET_QUEUE, { name: RESET_QUEUE, ...retry });
      await boss.updateQueue(RESET_QUEUE, { name: RESET_QUEUE, ...retry });
      // A watch job older than a minute is replaced by the next one: no retries piling up behind a slow run.
      const watchQueue = { name: COOLING_WATCH_QUEUE, retryLimit: 1, retryDelay: 10, expireInSeconds: 60, deleteAfterSeconds: 3600 };
      await boss.createQueue(COOLING_WATCH_QUEUE, watchQueue);
      await boss.updateQueue(COOLING_WATCH_QUEUE, watchQueue);
      started = true;
      if (!work) return;
      pool = new pg.Pool({ connectionString: opts.databaseUrl, max: 3, application_name: appName });
      pool.on('error', (err) => opts.logger?.warn({ err }, 'mail pool error'));
      const deps = { pool, orm: opts.orm, send: opts.sender ?? smtpSender(opts.smtp), from: opts.smtp.from };
      await boss.work<MailJobData>(
        MAIL_QUEUE,
        { batchSize: 1, includeMetadata: true, pollingIntervalSeconds: opts.pollingIntervalSeconds ?? 2 },
        async ([job]) => {
          const final = job.retryCount >= job.retryLimit;
          try {
            const out = await sendOutboxRow(deps, job.data.outboxId, { final });
            opts.logger?.info({ outboxId: job.data.outboxId, ...out }, 'mail job done');
          } catch (err) {
            opts.logger?.warn({ err, outboxId: job.data.outboxId, retryCount: job.retryCount }, 'mail send failed');
            throw err;
          }
        },
      );
      const runtime: MailQueue = { boss, jobOptions };
      await boss.work<ResetJobData>(
        RESET_QUEUE,
        { batchSize: 1, includeMetadata: true, pollingIntervalSeconds: opts.pollingIntervalSeconds ?? 2 },
        async ([job]) => {
          // The job names the e-mail only; the log says nothing about whether it has an account.
          await issuePasswordReset(opts.orm.em.fork(), job.data.email, opts.publicUrl, runtime, job.id);
        },
      );
      await boss.work(COOLING_WATCH_QUEUE, { batchSize: 1, pollingIntervalSeconds: opts.pollingIntervalSeconds ?? 2 }, async () => {
        const out = await watchCooling(opts.orm.em.fork(), { mail: runtime, publicUrl: opts.publicUrl });
        if (out.queued) opts.logger?.info(out, 'cooling watch: missed deadlines e-mailed');
      });
      await boss.schedule(COOLING_WATCH_QUEUE, COOLING_WATCH_CRON, {}, { tz: 'UTC' });
      const p = pool;
      const every = (opts.reconcileEverySeconds ?? 60) * 1000;
      timer = setInterval(() => void reconcile(p, retry).catch((err) => opts.logger?.warn({ err }, 'reconcile failed')), every);
      timer.unref();
    },
    async stop() {
      if (stopped) return;
      stopped = true;
      if (timer) clearInterval(timer);
      if (started) await boss.stop({ graceful: true, timeout: 5000, wait: true });
      if (pool) await pool.end();
    },
  };
}

/** Creates and starts the runtime (throws when PostgreSQL is away). */
export async function startMail(opts: StartMailOptions): Promise<MailRuntime> {
  const rt = createMailRuntime(opts);
  await rt.start();
  return rt;
}
