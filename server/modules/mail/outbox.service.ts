import type { EntityManager } from '@mikro-orm/postgresql';
import type { Actor } from '../../http/authz.js';
import { Conflict, NotFound } from '../../http/errors.js';
import {
  OUTBOX_STATUSES,
  type MailKind,
  type OutboxBatchDto,
  type OutboxCounts,
  type OutboxItemDto,
  type OutboxListQuery,
  type OutboxPageDto,
  type OutboxStatus,
} from '@shared/schemas/mail.schema.js';
import { Outbox, type IOutbox } from './outbox.entity.js';
import { enqueueSend, type MailQueue } from './mail.service.js';

export function presentOutbox(row: IOutbox): OutboxItemDto {
  return {
    id: row.id,
    kind: row.kind as MailKind,
    to: row.to,
    subject: row.subject,
    status: row.status as OutboxStatus,
    attempts: row.attempts,
    lastError: row.lastError ?? null,
    clientId: row.clientId ?? null,
    weekId: row.weekId ?? null,
    batchId: row.batchId ?? null,
    note: row.note ?? null,
    attachments: (row.attachments ?? []).map((a) => a.pdf),
    createdAt: row.createdAt.toISOString(),
    sentAt: row.sentAt ? row.sentAt.toISOString() : null,
  };
}

const RECENT_BATCHES = 5;

/** The coach's outbox: a page of rows (newest first), counts by status and the recent batches' progress. */
export async function listOutbox(em: EntityManager, actor: Actor, q: OutboxListQuery): Promise<OutboxPageDto> {
  const where = {
    workspace: actor.workspaceId,
    ...(q.status ? { status: q.status } : {}),
    ...(q.kind ? { kind: q.kind } : {}),
    ...(q.clientId ? { clientId: q.clientId } : {}),
    ...(q.batchId ? { batchId: q.batchId } : {}),
  };
  const [rows, total] = await em.findAndCount(Outbox, where, {
    orderBy: { id: 'desc' },
    limit: q.pageSize,
    offset: (q.page - 1) * q.pageSize,
  });
  const conn = em.getConnection();
  const countRows = await conn.execute<{ status: string; n: string }[]>(
    `select status, count(*) as n from outbox where workspace_id = ?
       and (?::text is null or kind = ?) and (?::int is null or client_id = ?) and (?::text is null or batch_id = ?)
     group by status`,
    [actor.workspaceId, q.kind ?? null, q.kind ?? null, q.clientId ?? null, q.clientId ?? null, q.batchId ?? null, q.batchId ?? null],
  );
  const counts = Object.fromEntries(OUTBOX_STATUSES.map((s) => [s, 0])) as OutboxCounts;
  for (const r of countRows) if (r.status in counts) counts[r.status as OutboxStatus] = Number(r.n);
  const batchRows = await conn.execute<{ batch_id: string; total: string; sent: string; failed: string; created_at: Date }[]>(
    `select batch_id, count(*) as total,
            count(*) filter (where status = 'sent') as sent,
            count(*) filter (where status = 'failed') as failed,
            min(created_at) as created_at
     from outbox where workspace_id = ? and batch_id is not null
     group by batch_id order by min(created_at) desc limit ?`,
    [actor.workspaceId, RECENT_BATCHES],
  );
  const batches: OutboxBatchDto[] = batchRows.map((b) => ({
    batchId: b.batch_id,
    total: Number(b.total),
    sent: Number(b.sent),
    failed: Number(b.failed),
    pending: Number(b.total) - Number(b.sent) - Number(b.failed),
    createdAt: new Date(b.created_at).toISOString(),
  }));
  return { items: rows.map(presentOutbox), total, page: q.page, pageSize: q.pageSize, counts, batches };
}

/** Sends a failed message again: `failed → queued` and a new job, in one transaction. */
export async function retryOutbox(em: EntityManager, queue: MailQueue, actor: Actor, id: number): Promise<OutboxItemDto> {
  return em.transactional(async (tx) => {
    const row = await tx.findOne(Outbox, { id, workspace: actor.workspaceId });
    if (!row) throw new NotFound('Message');
    const moved = await tx
      .getConnection()
      .execute<{ id: number }[]>(
        `update outbox set status = 'queued', last_error = null, updated_at = now() where id = ? and status = 'failed' returning id`,
        [id],
        'all',
        tx.getTransactionContext(),
      );
    if (moved.length === 0) throw new Conflict(`Only a failed message can be sent again; this one is ${row.status}`, { currentStatus: row.status });
    await enqueueSend(tx, queue, id);
    await tx.refresh(row);
    return presentOutbox(row);
  });
}
