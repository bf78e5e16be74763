import type { EntityManager } from '@mikro-orm/postgresql';
import type { Actor } from '../../http/authz.js';
import { NotFound } from '../../http/errors.js';
import type { CaughtMailDto, CaughtMailPageDto, CaughtMailSummaryDto } from '@shared/schemas/mail.schema.js';

/**
 * The dev mail page: what the local catcher caught. A coach sees only messages whose Message-ID belongs to an
 * outbox row of their workspace (so several workspaces on one development database stay apart, and password
 * reset mail, which has no workspace, is never shown to anyone).
 */
const SCOPE = `from caught_mail m
  join outbox o on m.message_id = '<' || o.idempotency_key || '@trayline>'
  where o.workspace_id = ?`;

interface MailRow {
  id: number;
  received_at: Date;
  message_id: string | null;
  from: string;
  to: string;
  subject: string;
  text?: string | null;
  html?: string | null;
}

async function attachmentsOf(em: EntityManager, ids: number[]) {
  if (ids.length === 0) return new Map<number, CaughtMailSummaryDto['attachments']>();
  const rows = await em
    .getConnection()
    .execute<{ mail_id: number; position: number; filename: string; content_type: string; size: number }[]>(
      `select mail_id, position, filename, content_type, size from caught_mail_attachment where mail_id in (${ids.map(() => '?').join(',')}) order by mail_id, position`,
      ids,
    );
  const out = new Map<number, CaughtMailSummaryDto['attachments']>();
  for (const r of rows) {
    const list = out.get(r.mail_id) ?? [];
    list.push({ index: r.position, filename: r.filename, contentType: r.content_type, size: r.size });
    out.set(r.mail_id, list);
  }
  return out;
}

function summary(r: MailRow, atts: CaughtMailSummaryDto['attachments']): CaughtMailSummaryDto {
  return {
    id: r.id,
    receivedAt: new Date(r.received_at).toISOString(),
    messageId: r.message_id,
    from: r.from,
    to: r.to,
    subject: r.subject,
    attachments: atts,
  };
}

export async function listCaughtMail(em: EntityManager, actor: Actor, page: number, pageSize: number): Promise<CaughtMailPageDto> {
  const conn = em.getConnection();
  const [{ n }] = await conn.execute<{ n: string }[]>(`select count(*) as n ${SCOPE}`, [actor.workspaceId]);
  const rows = await conn.execute<MailRow[]>(
    `select m.id, m.received_at, m.message_id, m."from", m."to", m.subject ${SCOPE} order by m.id desc limit ? offset ?`,
    [actor.workspaceId, pageSize, (page - 1) * pageSize],
  );
  const atts = await attachmentsOf(em, rows.map((r) => r.id));
  return { items: rows.map((r) => summary(r, atts.get(r.id) ?? [])), total: Number(n), page, pageSize };
}

export async function getCaughtMail(em: EntityManager, actor: Actor, id: number): Promise<CaughtMailDto> {
  const rows = await em
    .getConnection()
    .execute<MailRow[]>(`select m.id, m.received_at, m.message_id, m."from", m."to", m.subject, m.text, m.html ${SCOPE} and m.id = ?`, [actor.workspaceId, id]);
  if (rows.length === 0) throw new NotFound('Caught message');
  const atts = await attachmentsOf(em, [id]);
  return { ...summary(rows[0], atts.get(id) ?? []), text: rows[0].text ?? null, html: rows[0].html ?? null };
}

export async function caughtAttachment(em: EntityManager, actor: Actor, id: number, index: number) {
  await getCaughtMail(em, actor, id); // scope check
  const rows = await em
    .getConnection()
    .execute<{ filename: string; content_type: string; content: Buffer }[]>(
      'select filename, content_type, content from caught_mail_attachment where mail_id = ? and position = ?',
      [id, index],
    );
  if (rows.length === 0) throw new NotFound('Attachment');
  return { filename: rows[0].filename, contentType: rows[0].content_type, content: rows[0].content };
}
