import net from 'node:net';
import { sql } from './db.js';
import type { Member } from './factories.js';

/** The test database's direct reader, here too for the mail tests. */
export { sql };

/** A free TCP port on loopback (for an in-process mail catcher that can be stopped and started on the same port). */
export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const port = (srv.address() as net.AddressInfo).port;
      srv.close(() => resolve(port));
    });
  });
}


/** Polls until `fn` returns a truthy value (or throws after `timeoutMs`). */
export async function until<T>(fn: () => Promise<T | null | undefined | false>, timeoutMs = 20_000, what = 'condition'): Promise<T> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const v = await fn();
    if (v) return v;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

/**
 * Without running a catcher: stores a caught message (with one attachment) for the newest outbox row of the coach's
 * workspace, as the catcher would, and returns the outbox and caught ids.
 */
export async function fakeCaughtMailFor(coach: Member): Promise<{ outboxId: number; caughtId: number }> {
  const [row] = await sql<{ id: number; idempotency_key: string; to: string; subject: string }>(
    'select id, idempotency_key, "to", subject from outbox where workspace_id = $1 order by id desc limit 1',
    [coach.workspaceId],
  );
  const [m] = await sql<{ id: number }>(
    `insert into caught_mail (received_at, message_id, "from", "to", subject, text, html)
     values (now(), $1, 'Trayline <no-reply@trayline.test>', $2, $3, 'body', null) returning id`,
    [`<${row.idempotency_key}@trayline>`, row.to, row.subject],
  );
  await sql(
    `insert into caught_mail_attachment (mail_id, position, filename, content_type, size, content) values ($1, 0, 'a.pdf', 'application/pdf', 4, $2)`,
    [m.id, Buffer.from('%PDF')],
  );
  return { outboxId: row.id, caughtId: m.id };
}
