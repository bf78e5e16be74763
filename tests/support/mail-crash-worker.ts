// A mail worker in its own process for tests/api/mail.api.test.ts: it claims a job, prints "SENDING <outboxId>"
// and then hangs inside the send (holding the row lock), so the test can kill it with SIGKILL "mid-send".
import { createOrm } from '../../server/db/orm.js';
import { startMail } from '../../server/modules/mail/mail-runtime.js';

const databaseUrl = process.env.DATABASE_URL!;
const orm = await createOrm(databaseUrl);
await startMail({
  databaseUrl,
  publicUrl: 'http://127.0.0.1:5173',
  orm,
  smtp: { host: '127.0.0.1', port: 9, secure: false, from: 'Trayline <no-reply@trayline.test>' },
  retry: { retryLimit: 5, retryDelay: 1, retryBackoff: false, expireInSeconds: 3 },
  pollingIntervalSeconds: 0.5,
  applicationName: 'trayline-mail-crash',
  sender: async (mail) => {
    process.stdout.write(`SENDING ${mail.headers?.['X-Trayline-Outbox']}\n`);
    await new Promise(() => undefined);
  },
});
process.stdout.write('READY\n');
