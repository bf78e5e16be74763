import pg from 'pg';
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';

/**
 * The local mail catcher: an SMTP server on loopback (no auth, no TLS) that parses every message it receives and
 * stores it, attachments included, in PostgreSQL (tables `caught_mail` and `caught_mail_attachment`). The SMTP
 * "250 OK" is answered only after the row is committed, so a message the sender saw accepted is in the database.
 * Every message is stored, duplicates included: the catcher never hides a double send.
 * Used by `npm start` (scripts/mail-catcher.ts), by the end-to-end run and, in process, by the API tests.
 */
export interface MailCatcherOptions {
  port: number;
  databaseUrl: string;
  /** Loopback only by default. */
  host?: string;
  log?: (msg: string) => void;
}

export interface MailCatcher {
  port: number;
  stop(): Promise<void>;
}

const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

function addressText(a: AddressObject | AddressObject[] | undefined): string | null {
  if (!a) return null;
  return (Array.isArray(a) ? a : [a]).map((x) => x.text).join(', ');
}

export async function startMailCatcher(opts: MailCatcherOptions): Promise<MailCatcher> {
  const host = opts.host ?? '127.0.0.1';
  const pool = new pg.Pool({ connectionString: opts.databaseUrl, max: 3, application_name: 'trayline-mail-catcher' });
  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    closeTimeout: 1000,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (mail) => {
          const envelopeTo = session.envelope.rcptTo.map((r) => r.address).join(', ');
          const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : '';
          const client = await pool.connect();
          try {
            await client.query('begin');
            const { rows } = await client.query<{ id: number }>(
              `insert into caught_mail (received_at, message_id, "from", "to", subject, text, html)
               values (now(), $1, $2, $3, $4, $5, $6) returning id`,
              [
                mail.messageId ?? null,
                addressText(mail.from) ?? envelopeFrom,
                envelopeTo || addressText(mail.to) || '',
                mail.subject ?? '',
                mail.text ?? null,
                typeof mail.html === 'string' ? mail.html : null,
              ],
            );
            const mailId = rows[0].id;
            for (const [position, att] of mail.attachments.entries()) {
              await client.query(
                `insert into caught_mail_attachment (mail_id, position, filename, content_type, size, content)
                 values ($1, $2, $3, $4, $5, $6)`,
                [mailId, position, att.filename ?? `attachment-${position + 1}`, att.contentType, att.size, att.content],
              );
            }
            await client.query('commit');
            opts.log?.(`caught #${mailId} to ${envelopeTo}: ${mail.subject ?? ''}`);
          } catch (err) {
            await client.query('rollback').catch(() => undefined);
            throw err;
          } finally {
            client.release();
          }
        })
        .then(() => callback(), (err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(opts.port, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  server.on('error', (err) => opts.log?.(`mail catcher error: ${err.message}`));
  let stopped = false;
  return {
    port: opts.port,
    async stop() {
      if (stopped) return;
      stopped = true;
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await pool.end();
    },
  };
}
