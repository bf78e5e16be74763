import { createHash, randomUUID } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { Knex } from '@mikro-orm/knex';
import type PgBoss from 'pg-boss';
import type { MailKind } from '@shared/schemas/mail.schema.js';
import { Outbox, type IOutbox, type OutboxAttachmentSpec } from './outbox.entity.js';

export const MAIL_QUEUE = 'mail.send';

export interface MailJobData {
  outboxId: number;
}

/**
 * Password-reset requests, as jobs: the request only queues `{ email }` (the same work whether or not the e-mail has
 * an account, so the answer's timing tells nothing); the mail worker issues the token and queues the e-mail.
 */
export const RESET_QUEUE = 'auth.password-reset';

export interface ResetJobData {
  email: string;
}

/** What a module gives to queue one e-mail. The body is final text; PDFs are described, rendered at send time. */
export interface QueueMailInput {
  /** The outbox it shows in; null for mail no coach should see (password reset). */
  workspaceId: number | null;
  kind: MailKind;
  to: string;
  subject: string;
  text: string;
  html?: string | null;
  clientId?: number | null;
  weekId?: number | null;
  /** Rows queued together (one week to all clients) share it; the outbox shows a progress bar per batch. */
  batchId?: string | null;
  /** The coach's personal note (already part of text/html; kept for the delivery log). */
  note?: string | null;
  attachments?: OutboxAttachmentSpec[];
  /**
   * Optional caller key: queueing twice with the same key returns the first row and queues nothing (a double
   * click, a retried request). Default: a fresh UUID. It is also the Message-ID: `<key@trayline>`.
   */
  idempotencyKey?: string;
}

/** Something that can put a `mail.send` job in PostgreSQL (the started pg-boss of the app). */
export interface MailQueue {
  boss: PgBoss;
  jobOptions: PgBoss.SendOptions;
}

/**
 * pg-boss's `db` option runs its INSERT on our connection: the job row is written in the same transaction as the
 * outbox row (and as the caller's rows, e.g. the invitation), so either all are committed or none is.
 * pg-boss writes `$n` placeholders; knex wants `?` (the pg client turns them back into real parameters).
 */
function transactionDb(trx: Knex.Transaction): PgBoss.Db {
  return {
    async executeSql(text: string, values: unknown[] = []) {
      const bindings: unknown[] = [];
      const sql = text.replace(/\?/g, '\\?').replace(/\$(\d+)/g, (_m, n: string) => {
        const v = values[Number(n) - 1];
        bindings.push(v === undefined ? null : v);
        return '?';
      });
      const res = (await trx.raw(sql, bindings as Knex.RawBinding[])) as unknown as { rows: unknown[] };
      return { rows: res.rows };
    },
  };
}

/** Adds a send job for an outbox row, inside the em's current transaction. */
export async function enqueueSend(em: EntityManager, queue: MailQueue, outboxId: number): Promise<void> {
  const trx = em.getTransactionContext<Knex.Transaction>();
  if (!trx) throw new Error('enqueueSend must run inside em.transactional');
  const data: MailJobData = { outboxId };
  const id = await queue.boss.send(MAIL_QUEUE, data, { ...queue.jobOptions, db: transactionDb(trx) });
  if (!id) throw new Error(`The ${MAIL_QUEUE} queue does not exist: start pg-boss (startMail) before queueing mail`);
}

/**
 * Queues one e-mail: an outbox row and its pg-boss job, in one transaction (the caller's, when it is in one).
 * Nothing is sent here; the worker sends it (see mail-worker.ts).
 */
export async function queueMail(em: EntityManager, queue: MailQueue, input: QueueMailInput): Promise<IOutbox> {
  if (!em.isInTransaction()) return em.transactional((tx) => queueMail(tx, queue, input));
  if (input.idempotencyKey) {
    const existing = await em.findOne(Outbox, { idempotencyKey: input.idempotencyKey });
    if (existing) return existing;
  }
  const row = em.create(Outbox, {
    workspace: input.workspaceId,
    kind: input.kind,
    to: input.to,
    subject: input.subject.slice(0, 300),
    text: input.text,
    html: input.html ?? null,
    status: 'queued',
    attempts: 0,
    idempotencyKey: input.idempotencyKey ?? randomUUID(),
    clientId: input.clientId ?? null,
    weekId: input.weekId ?? null,
    batchId: input.batchId ?? null,
    note: input.note ?? null,
    attachments: input.attachments ?? [],
  });
  await em.flush();
  await enqueueSend(em, queue, row.id);
  return row;
}

/** A batch id for mails queued together (e.g. a week sent to every client). */
export const newBatchId = (): string => randomUUID();

const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

/** A UUID-shaped batch id derived from what identifies a request (the same request → the same batch). */
export function requestBatchId(identity: string): string {
  const h = sha256(identity);
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-5${h.slice(13, 16)}-a${h.slice(17, 20)}-${h.slice(20, 32)}`;
}

/** An idempotency key from what identifies one e-mail: `prefix-` and 48 hex digits. */
export const mailKey = (prefix: string, identity: string): string => `${prefix}-${sha256(identity).slice(0, 48)}`;

/** A link into the app for an e-mail: `appLink('https://x.test/', '/my-plates')` → "https://x.test/my-plates". */
export const appLink = (publicUrl: string, path: string): string => `${publicUrl.replace(/\/$/, '')}${path}`;

export const messageIdOf = (idempotencyKey: string) => `<${idempotencyKey}@trayline>`;
