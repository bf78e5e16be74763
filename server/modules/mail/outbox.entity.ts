import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { Workspace } from '../workspaces/workspace.entity.js';

/** A PDF the send job renders at send time: the renderer registered for `pdf` gets `payload` (ids, not bytes). */
export interface OutboxAttachmentSpec {
  pdf: string;
  payload: Record<string, unknown>;
}

/**
 * One e-mail to send. The row is the record of truth; a pg-boss job (queue `mail.send`) only carries its id.
 * Rows are written by the machine (queueMail, the send worker, the coach's retry through a status transition), so
 * there is no `version` column: the coach never edits a row's fields.
 * `workspace` is null for mail that belongs to no workspace's outbox (password reset).
 */
export const Outbox = defineEntity({
  name: 'Outbox',
  tableName: 'outbox',
  indexes: [{ properties: ['workspace', 'status'] }, { properties: ['workspace', 'clientId'] }, { properties: ['batchId'] }],
  properties: {
    id: p.integer().primary().autoincrement(),
    workspace: () => p.manyToOne(Workspace).ref().nullable(),
    kind: p.string().length(30),
    to: p.string().length(254),
    subject: p.string().length(300),
    text: p.text(),
    html: p.text().nullable(),
    status: p.string().length(20).default('queued'),
    attempts: p.integer().default(0),
    lastError: p.text().nullable(),
    /** Also the Message-ID: `<idempotencyKey@trayline>`. */
    idempotencyKey: p.string().length(64).unique(),
    clientId: p.integer().nullable(),
    weekId: p.integer().nullable(),
    /** Rows queued together (a week sent to all clients) share a batch id: the outbox shows their progress. */
    batchId: p.string().length(36).nullable(),
    note: p.text().nullable(),
    attachments: p.json<OutboxAttachmentSpec[]>().default(JSON.stringify([])),
    createdAt: p.datetime().onCreate(() => new Date()),
    updatedAt: p.datetime().onCreate(() => new Date()).onUpdate(() => new Date()),
    sentAt: p.datetime().nullable(),
  },
});
export type IOutbox = InferEntity<typeof Outbox>;
