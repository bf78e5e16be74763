import pg from 'pg';
import type { MikroORM } from '@mikro-orm/postgresql';
import type { OutboxAttachmentSpec } from './outbox.entity.js';
import { MissingAttachmentRenderer, attachmentRenderer } from './attachment-registry.js';
import type { MailSender } from './mail-transport.js';
import { messageIdOf } from './mail.service.js';

/**
 * Sends one outbox row. Called by the `mail.send` job; safe to call twice for the same row, at once or later.
 *
 * 1. Claim: `status → sending`, attempts + 1, committed (the outbox page shows it). A row already `sent` is
 *    skipped: a job delivered again after the row was marked sent (pg-boss is at-least-once) sends nothing.
 * 2. Lock: `select … for update skip locked` in a transaction held while sending. A second sender of the same row
 *    (a job that expired while the first was slow, a coach's retry) finds it locked and backs off (the job retries
 *    later, then sees `sent`). Render the PDFs, send over SMTP with Message-ID `<idempotencyKey@trayline>`.
 * 3. Mark `sent` in the same transaction and commit, which releases the lock.
 *
 * A crash (or restart) before the SMTP server accepted the message rolls the transaction back; the row stays
 * `sending`, pg-boss expires the active job and retries it, and the message is sent once.
 * The window that remains: the SMTP server accepted the message (250) and the process died before the commit of
 * `sent` (one round trip to PostgreSQL). Then the retry sends it again: delivery is at-least-once there, not
 * exactly-once, because SMTP has no way to ask "did you already take this one?". The second copy carries the same
 * Message-ID, which mail stores and clients commonly use to drop duplicates.
 */
export interface SendOutcome {
  result: 'sent' | 'skipped';
}

export class OutboxBusy extends Error {
  constructor(id: number) {
    super(`Outbox row ${id} is being sent by another worker; trying again later`);
    this.name = 'OutboxBusy';
  }
}

interface OutboxRow {
  id: number;
  kind: string;
  to: string;
  subject: string;
  text: string;
  html: string | null;
  status: string;
  idempotency_key: string;
  attachments: OutboxAttachmentSpec[];
}

/** One-time links are removed from the stored body once the message is out. */
const SCRUB_KINDS = ['invitation', 'password-reset'];
const SCRUBBED = '(This message held a one-time link. Its text was removed from the outbox after sending.)';

export interface WorkerDeps {
  pool: pg.Pool;
  orm: MikroORM;
  send: MailSender;
  from: string;
}

export async function sendOutboxRow(deps: WorkerDeps, id: number, attempt: { final: boolean }): Promise<SendOutcome> {
  const claimed = await deps.pool.query(
    `update outbox set status = 'sending', attempts = attempts + 1, updated_at = now()
     where id = (select id from outbox where id = $1 and status <> 'sent' for update skip locked)
     returning id`,
    [id],
  );
  if (claimed.rowCount === 0) {
    const { rows } = await deps.pool.query<{ status: string }>('select status from outbox where id = $1', [id]);
    if (rows.length === 0 || rows[0].status === 'sent') return { result: 'skipped' };
    throw new OutboxBusy(id);
  }
  const client = await deps.pool.connect();
  try {
    await client.query('begin');
    const { rows } = await client.query<OutboxRow>('select * from outbox where id = $1 for update skip locked', [id]);
    if (rows.length === 0) throw new OutboxBusy(id);
    const row = rows[0];
    if (row.status === 'sent') {
      await client.query('commit');
      return { result: 'skipped' };
    }
    const attachments = [];
    for (const spec of row.attachments ?? []) {
      const render = attachmentRenderer(spec.pdf);
      if (!render) throw new MissingAttachmentRenderer(spec.pdf);
      const file = await render(deps.orm.em.fork(), spec.payload);
      attachments.push({ filename: file.filename, content: file.buffer, contentType: file.contentType ?? 'application/pdf' });
    }
    await deps.send({
      from: deps.from,
      to: row.to,
      subject: row.subject,
      text: row.text,
      html: row.html ?? undefined,
      messageId: messageIdOf(row.idempotency_key),
      headers: { 'X-Trayline-Outbox': String(row.id) },
      attachments,
    });
    const scrub = SCRUB_KINDS.includes(row.kind);
    await client.query(
      `update outbox set status = 'sent', sent_at = now(), last_error = null, updated_at = now(),
         text = case when $2 then $3 else text end, html = case when $2 then null else html end
       where id = $1`,
      [id, scrub, SCRUBBED],
    );
    await client.query('commit');
    return { result: 'sent' };
  } catch (err) {
    await client.query('rollback').catch(() => undefined);
    if (!(err instanceof OutboxBusy)) {
      const message = err instanceof Error ? err.message : String(err);
      await deps.pool.query(
        `update outbox set status = $2, last_error = $3, updated_at = now() where id = $1 and status <> 'sent'`,
        [id, attempt.final ? 'failed' : 'retrying', message.slice(0, 2000)],
      );
    }
    throw err;
  } finally {
    client.release();
  }
}
