import { spawn, type ChildProcess } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { PDFParse } from 'pdf-parse';
import type { Orm } from '@server/db/orm.js';
import { startMailCatcher, type MailCatcher } from '@server/modules/mail/mail-catcher.js';
import { startMail, type MailRuntime } from '@server/modules/mail/mail-runtime.js';
import { MAIL_QUEUE, RESET_QUEUE, queueMail } from '@server/modules/mail/mail.service.js';
import { issuePasswordReset } from '@server/modules/auth/auth.service.js';
import { registerAttachment } from '@server/modules/mail/attachment-registry.js';
import { renderWeekPlanPdf } from '@server/modules/pdf/week-plan.pdf.js';
import { agentFor, testApp } from '../support/test-app.js';
import { coachWorkspace, PASSWORD, uniq } from '../support/factories.js';
import { TEST_DATABASE_URL } from '../support/db.js';
import { freePort, sql, until } from '../support/mail-support.js';

/**
 * E-mail through the real pieces: the API queues (outbox row + pg-boss job in one transaction), a pg-boss worker
 * sends with nodemailer over SMTP to the in-process catcher (smtp-server + mailparser), which stores each message in
 * PostgreSQL. Retry delays are shortened through the queue settings (1 s, expiry of a lost job after 3 s).
 */
let app: Express;
let orm: Orm;
let queue: MailRuntime;
let port: number;
let catcher: MailCatcher | null = null;
let worker: MailRuntime | null = null;
const FROM = 'Trayline <no-reply@trayline.test>';
const RETRY = { retryLimit: 5, retryDelay: 1, retryBackoff: true, expireInSeconds: 3 };

const startWorker = () =>
  startMail({
    databaseUrl: TEST_DATABASE_URL,
    publicUrl: 'http://127.0.0.1:5173',
    orm,
    smtp: { host: '127.0.0.1', port, secure: false, from: FROM },
    retry: RETRY,
    pollingIntervalSeconds: 0.5,
    maintenanceIntervalSeconds: 1,
    applicationName: 'trayline-mail-test',
  });

beforeAll(async () => {
  const t = await testApp();
  app = t.app;
  orm = t.orm;
  queue = t.mail;
  port = await freePort();
  catcher = await startMailCatcher({ port, databaseUrl: TEST_DATABASE_URL });
  worker = await startWorker();
});

afterAll(async () => {
  await worker?.stop();
  await catcher?.stop();
});

type OutboxRow = { id: number; status: string; attempts: number; last_error: string | null; idempotency_key: string; text: string };
const outboxRow = async (id: number) => (await sql<OutboxRow>('select * from outbox where id = $1', [id]))[0];
const caughtFor = (key: string) =>
  sql<{ id: number; to: string; subject: string; text: string; message_id: string }>(
    'select id, "to", subject, text, message_id from caught_mail where message_id = $1 order by id',
    [`<${key}@trayline>`],
  );
const sentRow = (id: number, timeout = 20_000) =>
  until(async () => {
    const r = await outboxRow(id);
    return r.status === 'sent' ? r : null;
  }, timeout, `outbox ${id} sent`);

describe('invitation e-mail', () => {
  it('creating an invitation queues an e-mail that reaches the invited address with the same link', async () => {
    const coach = await coachWorkspace(app);
    const email = `${uniq('invitee')}@example.test`;
    const res = await coach.agent.post('/api/invitations').send({ email, role: 'assistant' }).expect(201);
    expect(res.body.link).toMatch(/\/invite\/[\w-]{20,}$/);
    const [row] = await sql<OutboxRow & { kind: string; workspace_id: number; to: string }>(
      'select * from outbox where workspace_id = $1 and "to" = $2',
      [coach.workspaceId, email],
    );
    expect(row).toMatchObject({ kind: 'invitation', to: email });
    const sent = await sentRow(row.id);
    const caught = await caughtFor(row.idempotency_key);
    expect(caught).toHaveLength(1);
    expect(caught[0].to).toBe(email);
    expect(caught[0].subject).toContain(`${coach.email.split('@')[0]} kitchen`);
    expect(caught[0].text).toContain(res.body.link);
    // The one-time link does not stay in the outbox once sent.
    expect(sent.text).not.toContain(res.body.link);

    const list = await coach.agent.get('/api/outbox').expect(200);
    expect(list.body.items[0]).toMatchObject({ id: row.id, kind: 'invitation', to: email, status: 'sent', attempts: 1 });
    expect(list.body.counts.sent).toBeGreaterThanOrEqual(1);

    // The dev mail page shows it to this coach only.
    const dev = await coach.agent.get('/api/dev/mail').expect(200);
    expect(dev.body.items.map((m: { to: string }) => m.to)).toContain(email);
    const other = await coachWorkspace(app);
    const devOther = await other.agent.get('/api/dev/mail').expect(200);
    expect(devOther.body.items.map((m: { to: string }) => m.to)).not.toContain(email);
    await other.agent.get(`/api/dev/mail/${caught[0].id}`).expect(404);
    const one = await coach.agent.get(`/api/dev/mail/${caught[0].id}`).expect(200);
    expect(one.body.text).toContain(res.body.link);
  });

  it('an invitation that cannot be created queues no e-mail (one transaction)', async () => {
    const coach = await coachWorkspace(app);
    const before = await sql<{ n: string }>('select count(*) as n from outbox where workspace_id = $1', [coach.workspaceId]);
    const res = await coach.agent.post('/api/invitations').send({ email: coach.email, role: 'assistant' }).expect(400);
    expect(res.body.errors.email).toBeDefined();
    const after = await sql<{ n: string }>('select count(*) as n from outbox where workspace_id = $1', [coach.workspaceId]);
    expect(after[0].n).toBe(before[0].n);
  });
});

describe('PDF attachments', () => {
  it('a week-plan e-mail carries the PDF rendered at send time, to the right recipient', async () => {
    registerAttachment('test-week-plan', async (_em, payload) =>
      renderWeekPlanPdf({
        businessName: 'Oat & Ember Prep',
        clientName: String(payload.clientName),
        weekStart: '2026-12-07',
        targets: { kcal: 1800, netCarbsG: 20 },
        days: [
          {
            date: '2026-12-07',
            slots: [
              {
                slot: 'breakfast',
                plateName: 'Zucchini egg bake',
                portions: 1,
                assemblySteps: ['Plate one square.'],
                reheat: [{ trays: [], steps: ['Microwave until 165 °F.'] }],
                macros: { kcal: 388, fatG: '29.5', proteinG: '22.1', netCarbsG: '5.2', carbsG: '7.0' },
                eatBy: '2026-12-09',
              },
            ],
            totals: { kcal: 388, fatG: '29.5', proteinG: '22.1', netCarbsG: '5.2', carbsG: '7.0' },
          },
        ],
      }),
    );
    const coach = await coachWorkspace(app);
    const to = `${uniq('client')}@example.test`;
    const row = await queueMail(orm.em.fork(), queue, {
      workspaceId: coach.workspaceId,
      kind: 'week-plan',
      to,
      subject: 'Your plates for the week of Mon, Dec 7',
      text: 'Attached.',
      clientId: null,
      note: 'Enjoy!',
      attachments: [{ pdf: 'test-week-plan', payload: { clientName: 'Sam Ortiz' } }],
    });
    await sentRow(row.id);
    const [caught] = await caughtFor(row.idempotencyKey);
    expect(caught.to).toBe(to);
    const atts = await sql<{ filename: string; content_type: string; size: number; content: Buffer }>(
      'select filename, content_type, size, content from caught_mail_attachment where mail_id = $1',
      [caught.id],
    );
    expect(atts).toHaveLength(1);
    expect(atts[0]).toMatchObject({ filename: 'week-2026-12-07-sam-ortiz.pdf', content_type: 'application/pdf' });
    const parser = new PDFParse({ data: new Uint8Array(atts[0].content) });
    const text = (await parser.getText()).text.replace(/\s+/g, ' ');
    await parser.destroy();
    expect(text).toContain('Sam Ortiz');
    expect(text).toContain('Zucchini egg bake');
    expect(text).toContain('29.5');
    expect(text).toContain('Page 1 of');

    // The attachment is served by the dev mail page to the coach.
    const pdf = await coach.agent.get(`/api/dev/mail/${caught.id}/attachments/0`).expect(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect(Buffer.from(pdf.body).subarray(0, 5).toString()).toBe('%PDF-');
  });
});

describe('delivery guarantees', () => {
  it('SMTP down: the job fails, retries with backoff, and succeeds once the server is back', async () => {
    await catcher!.stop();
    catcher = null;
    const coach = await coachWorkspace(app);
    const row = await queueMail(orm.em.fork(), queue, {
      workspaceId: coach.workspaceId,
      kind: 'shopping-list',
      to: 'assistant@example.test',
      subject: 'Shopping list',
      text: 'See the list.',
    });
    const retrying = await until(async () => {
      const r = await outboxRow(row.id);
      return r.status === 'retrying' ? r : null;
    }, 15_000, 'retrying');
    expect(retrying.attempts).toBeGreaterThanOrEqual(1);
    expect(retrying.last_error).toMatch(/ECONNREFUSED|connect/i);
    catcher = await startMailCatcher({ port, databaseUrl: TEST_DATABASE_URL });
    const sent = await sentRow(row.id, 30_000);
    expect(sent.attempts).toBeGreaterThanOrEqual(2);
    expect(sent.last_error).toBeNull();
    expect(await caughtFor(row.idempotencyKey)).toHaveLength(1);
  }, 60_000);

  it('a server killed mid-send (before the SMTP server took the message): a new instance sends it exactly once', async () => {
    await worker!.stop();
    worker = null;
    const coach = await coachWorkspace(app);
    const row = await queueMail(orm.em.fork(), queue, {
      workspaceId: coach.workspaceId,
      kind: 'bake-run',
      to: 'kitchen@example.test',
      subject: 'Bake run',
      text: 'Sheet attached.',
    });
    let child: ChildProcess | null = null;
    try {
      // node itself with tsx's loader (not the tsx launcher, which forks): SIGKILL hits the process that sends.
      child = spawn(process.execPath, ['--import', 'tsx', 'tests/support/mail-crash-worker.ts'], {
        env: { ...process.env, DATABASE_URL: TEST_DATABASE_URL },
        stdio: ['ignore', 'pipe', 'inherit'],
      });
      let out = '';
      child.stdout!.on('data', (d: Buffer) => (out += d.toString()));
      await until(async () => out.includes(`SENDING ${row.id}`), 30_000, 'the child to start sending');
      expect((await outboxRow(row.id)).status).toBe('sending');
      child.kill('SIGKILL');
      await new Promise((r) => child!.once('exit', r));
      child = null;
    } finally {
      child?.kill('SIGKILL');
    }
    expect(await caughtFor(row.idempotencyKey)).toHaveLength(0);
    // A new instance (new pg-boss, new worker): pg-boss expires the lost active job and retries it.
    worker = await startWorker();
    const sent = await sentRow(row.id, 40_000);
    expect(sent.attempts).toBe(2);
    expect(await caughtFor(row.idempotencyKey)).toHaveLength(1);
  }, 90_000);

  it('a job delivered again after the row was sent (at-least-once queue) sends nothing', async () => {
    const coach = await coachWorkspace(app);
    const row = await queueMail(orm.em.fork(), queue, {
      workspaceId: coach.workspaceId,
      kind: 'shopping-list',
      to: 'again@example.test',
      subject: 'Shopping list',
      text: 'See the list.',
    });
    await sentRow(row.id);
    // As if the process died after committing `sent` but before pg-boss recorded the job as completed.
    const jobId = await worker!.boss.send(MAIL_QUEUE, { outboxId: row.id });
    await until(async () => (await worker!.boss.getJobById(MAIL_QUEUE, jobId!))?.state === 'completed', 20_000, 'second job');
    expect(await caughtFor(row.idempotencyKey)).toHaveLength(1);
    expect((await outboxRow(row.id)).attempts).toBe(1);
  }, 40_000);

  it('a second sender backs off while another holds the row lock, then finds it sent and sends nothing', async () => {
    await worker!.stop();
    worker = null;
    const coach = await coachWorkspace(app);
    const row = await queueMail(orm.em.fork(), queue, { workspaceId: coach.workspaceId, kind: 'invitation', to: 'locked@example.test', subject: 'Hi', text: 'Hi' });
    const pg = (await import('pg')).default;
    const locker = new pg.Client({ connectionString: TEST_DATABASE_URL });
    await locker.connect();
    try {
      // "Another sender" holds the row lock, as sendOutboxRow does while talking to the SMTP server.
      await locker.query('begin');
      await locker.query('select id from outbox where id = $1 for update', [row.id]);
      worker = await startWorker();
      await new Promise((r) => setTimeout(r, 2500));
      expect(await caughtFor(row.idempotencyKey)).toHaveLength(0);
      expect((await outboxRow(row.id)).status).toBe('queued');
      // The other sender finishes: it marks the row sent and releases the lock.
      await locker.query(`update outbox set status = 'sent', sent_at = now() where id = $1`, [row.id]);
      await locker.query('commit');
      await new Promise((r) => setTimeout(r, 3500));
      expect(await caughtFor(row.idempotencyKey)).toHaveLength(0);
      expect((await outboxRow(row.id)).status).toBe('sent');
    } finally {
      await locker.end();
    }
  }, 30_000);
});

describe('outbox API', () => {
  it('retry: only a failed message, and it is then sent', async () => {
    const coach = await coachWorkspace(app);
    const row = await queueMail(orm.em.fork(), queue, { workspaceId: coach.workspaceId, kind: 'shopping-list', to: 'r@example.test', subject: 'S', text: 'T' });
    await sentRow(row.id);
    const conflict = await coach.agent.post(`/api/outbox/${row.id}/retry`).expect(409);
    expect(conflict.body).toMatchObject({ code: 'conflict', status: 409, currentStatus: 'sent' });
    await sql(`update outbox set status = 'failed', last_error = 'gave up' where id = $1`, [row.id]);
    const res = await coach.agent.post(`/api/outbox/${row.id}/retry`).expect(200);
    expect(res.body).toMatchObject({ id: row.id, status: 'queued', lastError: null });
    // It was already sent once; sent again on the coach's request (a new Message-ID is not made: same key).
    await sentRow(row.id);
    expect(await caughtFor(row.idempotencyKey)).toHaveLength(2);
    const other = await coachWorkspace(app);
    await other.agent.post(`/api/outbox/${row.id}/retry`).expect(404);
  }, 40_000);

  it('lists by client and batch with counts; bad filters are 400 naming the field', async () => {
    const coach = await coachWorkspace(app);
    const batchId = crypto.randomUUID();
    for (const clientId of [11, 12, 13]) {
      await queueMail(orm.em.fork(), queue, { workspaceId: coach.workspaceId, kind: 'week-plan', to: `c${clientId}@example.test`, subject: 'W', text: 'T', clientId, batchId });
    }
    const byClient = await coach.agent.get('/api/outbox?clientId=12').expect(200);
    expect(byClient.body.items.map((i: { to: string }) => i.to)).toEqual(['c12@example.test']);
    const byBatch = await coach.agent.get(`/api/outbox?batchId=${batchId}&pageSize=2`).expect(200);
    expect(byBatch.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(byBatch.body.items).toHaveLength(2);
    expect(byBatch.body.batches[0]).toMatchObject({ batchId, total: 3 });
    const bad = await coach.agent.get('/api/outbox?status=lost').expect(400);
    expect(JSON.stringify(bad.body)).toContain('status');
  });
});

describe('password reset', () => {
  it('e-mails a one-time link; the link sets a new password once; an unknown e-mail gets the same 204', async () => {
    const coach = await coachWorkspace(app);
    await agentFor(app).post('/api/auth/password-reset').send({ email: coach.email }).expect(204);
    // The request only queued a job; the worker issues the token and queues the e-mail.
    const row = await until(async () => {
      const [r] = await sql<OutboxRow & { workspace_id: number | null; kind: string }>(
        `select * from outbox where "to" = $1 and kind = 'password-reset'`,
        [coach.email],
      );
      return r ?? null;
    }, 20_000, 'reset e-mail queued');
    expect(row.workspace_id).toBeNull();
    await sentRow(row.id);
    const [caught] = await caughtFor(row.idempotency_key);
    expect(caught.to).toBe(coach.email);
    const token = /\/reset-password\/([\w-]+)/.exec(caught.text)![1];

    const newPassword = 'a-brand-new-password';
    await agentFor(app).post('/api/auth/password-reset/confirm').send({ token, newPassword }).expect(204);
    await agentFor(app).post('/api/auth/login').send({ email: coach.email, password: PASSWORD }).expect(401);
    await agentFor(app).post('/api/auth/login').send({ email: coach.email, password: newPassword }).expect(200);
    // The old session ended with the reset.
    await coach.agent.get('/api/auth/me').expect(401);
    const again = await agentFor(app).post('/api/auth/password-reset/confirm').send({ token, newPassword: 'another-password-1' }).expect(400);
    expect(again.body.errors.token).toBeDefined();
    // The owner is told it changed (once: the refused second use sends nothing); that e-mail holds no secret.
    const told = await sql<{ text: string }>(`select text from outbox where "to" = $1 and kind = 'password-changed'`, [coach.email]);
    expect(told).toHaveLength(1);
    expect(told[0].text).toContain('was just changed with a reset link sent to this address.');
    expect(told[0].text).toContain('Every device that was signed in has been signed out.');
    expect(told[0].text).not.toContain(token);

    const ghost = `${uniq('ghost')}@example.test`;
    await agentFor(app).post('/api/auth/password-reset').send({ email: ghost }).expect(204);
    // The same work as for an account (one job), done by the worker: no e-mail, no token.
    await until(async () => {
      const jobs = await sql<{ state: string }>(`select state from pgboss.job where name = $1 and data->>'email' = $2`, [RESET_QUEUE, ghost]);
      return jobs.length === 1 && jobs[0].state === 'completed' ? jobs : null;
    }, 20_000, 'ghost reset job completed');
    expect(await sql('select id from outbox where "to" = $1', [ghost])).toHaveLength(0);
    // A reset e-mail is never in any coach's outbox (its link would let the coach take over the account).
    const again2 = agentFor(app);
    await again2.post('/api/auth/login').send({ email: coach.email, password: newPassword }).expect(200);
    const list = await again2.get('/api/outbox').expect(200);
    expect(list.body.items.map((i: { kind: string }) => i.kind)).not.toContain('password-reset');
  }, 40_000);

  it('a retried reset job queues its e-mail once (idempotent per job)', async () => {
    const coach = await coachWorkspace(app);
    const jobId = crypto.randomUUID();
    await issuePasswordReset(orm.em.fork(), coach.email, 'http://127.0.0.1:5173', queue, jobId);
    await issuePasswordReset(orm.em.fork(), coach.email, 'http://127.0.0.1:5173', queue, jobId);
    const rows = await sql<{ idempotency_key: string }>(`select idempotency_key from outbox where "to" = $1 and kind = 'password-reset'`, [coach.email]);
    expect(rows).toEqual([{ idempotency_key: `password-reset:${jobId}` }]);
    const resets = await sql('select r.id from password_reset r join app_user u on u.id = r.user_id where u.email = $1', [coach.email]);
    expect(resets).toHaveLength(1);
  });

  it('is rate-limited per e-mail (5 in 15 minutes) and validates its input', async () => {
    const email = `${uniq('limit')}@example.test`;
    for (let i = 0; i < 5; i++) await agentFor(app).post('/api/auth/password-reset').send({ email }).expect(204);
    const res = await agentFor(app).post('/api/auth/password-reset').send({ email }).expect(429);
    expect(res.body.code).toBe('too_many_requests');
    const bad = await agentFor(app).post('/api/auth/password-reset').send({ email: 'nope' }).expect(400);
    expect(JSON.stringify(bad.body.errors)).toContain('email');
  });
});
