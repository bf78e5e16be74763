import { createHash } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import { verify } from '@node-rs/argon2';
import { agentFor, testApp } from '../support/test-app.js';
import { coachWorkspace, makeClient, member, PASSWORD, uniq } from '../support/factories.js';
import { sql } from '../support/db.js';

let app: Express;
beforeAll(async () => {
  app = (await testApp()).app;
});


describe('sign-in', () => {
  it('register makes a coach with a workspace, and /me answers the documented shape', async () => {
    const coach = await coachWorkspace(app);
    const me = await coach.agent.get('/api/auth/me').expect(200);
    expect(me.body).toMatchObject({ email: coach.email, role: 'coach', workspaceId: coach.workspaceId });
    expect(Object.keys(me.body)).toEqual(expect.arrayContaining(['id', 'email', 'name', 'role', 'workspaceId']));
  });

  it('stores an argon2id hash, never the password', async () => {
    const coach = await coachWorkspace(app);
    const [row] = await sql<{ password_hash: string }>('select password_hash from app_user where email = $1', [coach.email]);
    // PHC string format of argon2id (RFC 9106 names the variant; the PHC format is the library's documented output).
    expect(row.password_hash).toMatch(/^\$argon2id\$v=19\$m=\d+,t=\d+,p=\d+\$/);
    expect(row.password_hash).not.toContain(PASSWORD);
    expect(await verify(row.password_hash, PASSWORD)).toBe(true);
  });

  it('the same message for an unknown e-mail and a wrong password', async () => {
    const coach = await coachWorkspace(app);
    const wrong = await agentFor(app).post('/api/auth/login').send({ email: coach.email, password: 'nope-nope-nope' });
    const unknown = await agentFor(app)
      .post('/api/auth/login')
      .send({ email: `${uniq('ghost')}@example.test`, password: 'nope-nope-nope' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.detail).toBe(unknown.body.detail);
  });

  it('rotates the session id at sign-in (no session fixation)', async () => {
    const coach = await coachWorkspace(app);
    const agent = agentFor(app);
    // An anonymous session first: a failed login does not create one, so make one with a wrong password then read cookie.
    const first = await agent.post('/api/auth/login').send({ email: coach.email, password: PASSWORD }).expect(200);
    const cookie1 = String(first.headers['set-cookie']);
    await agent.post('/api/auth/logout').expect(204);
    const second = await agent.post('/api/auth/login').send({ email: coach.email, password: PASSWORD }).expect(200);
    const cookie2 = String(second.headers['set-cookie']);
    const sid = (c: string) => /trayline\.sid=([^;]+)/.exec(c)?.[1];
    expect(sid(cookie1)).toBeTruthy();
    expect(sid(cookie2)).toBeTruthy();
    expect(sid(cookie1)).not.toBe(sid(cookie2));
    // A planted (fixated) session id is not accepted as signed in after login with another id.
    const planted = request(app).get('/api/auth/me').set('cookie', `trayline.sid=${sid(cookie1)}`);
    expect((await planted).status).toBe(401);
  });

  it('sets the cookie httpOnly and SameSite=Lax', async () => {
    const coach = await coachWorkspace(app);
    const res = await agentFor(app).post('/api/auth/login').send({ email: coach.email, password: PASSWORD }).expect(200);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('logout ends the session', async () => {
    const coach = await coachWorkspace(app);
    await coach.agent.post('/api/auth/logout').expect(204);
    await coach.agent.get('/api/auth/me').expect(401);
  });

  it('sessions live in PostgreSQL', async () => {
    await coachWorkspace(app);
    const [row] = await sql<{ n: string }>('select count(*)::text as n from session');
    expect(Number(row.n)).toBeGreaterThan(0);
  });

  it('reads the role from PostgreSQL with the session: a changed membership applies on the next request', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    await assistant.agent.get('/api/ingredients').expect(200);
    await sql("update membership set role = 'client' where user_id = $1", [assistant.userId]);
    const me = await assistant.agent.get('/api/auth/me').expect(200);
    expect(me.body.role).toBe('client');
    await assistant.agent.get('/api/ingredients').expect(403);
    // A session whose user has lost every membership is signed out, not an error.
    await sql('delete from membership where user_id = $1', [assistant.userId]);
    await assistant.agent.get('/api/auth/me').expect(401);
  });

  it('slides the stored expiry without a write per request (rewritten only when it lags by over a minute)', async () => {
    const coach = await coachWorkspace(app);
    const sessionOf = async () =>
      (await sql<{ sid: string; expire: Date }>(`select sid, expire from session where (sess->'passport'->>'user') = $1`, [String(coach.userId)]))[0];
    const before = await sessionOf();
    await coach.agent.get('/api/auth/me').expect(200);
    expect((await sessionOf()).expire.getTime()).toBe(before.expire.getTime());
    // Lagging by ten minutes: the next request moves it to within a minute of the cookie's 14 days.
    await sql("update session set expire = expire - interval '10 minutes' where sid = $1", [before.sid]);
    await coach.agent.get('/api/auth/me').expect(200);
    const after = await sessionOf();
    const fourteenDays = Date.now() + 14 * 86_400_000;
    expect(Math.abs(after.expire.getTime() - fourteenDays)).toBeLessThan(60_000 + 5_000);
    // An expired session is not read at all.
    await sql("update session set expire = now() - interval '1 second' where sid = $1", [before.sid]);
    await coach.agent.get('/api/auth/me').expect(401);
  });
});

describe('abuse protection', () => {
  it('answers 429 after 10 failed sign-ins for one e-mail in 15 minutes (counted in PostgreSQL)', async () => {
    const coach = await coachWorkspace(app);
    for (let i = 0; i < 10; i++) {
      await agentFor(app).post('/api/auth/login').send({ email: coach.email, password: 'wrong-password' }).expect(401);
    }
    const blocked = await agentFor(app).post('/api/auth/login').send({ email: coach.email, password: PASSWORD });
    expect(blocked.status).toBe(429);
    // Keyed by the address's SHA-256, not the address: the table holds no e-mail addresses.
    const hashed = createHash('sha256').update(coach.email.toLowerCase()).digest('hex');
    const [row] = await sql<{ hits: number }>("select hits from rate_limit_hit where key = $1", [`login-email:${hashed}`]);
    expect(row.hits).toBeGreaterThanOrEqual(10);
    const addresses = await sql<{ n: number }>("select count(*)::int as n from rate_limit_hit where key like '%@%'");
    expect(addresses[0].n).toBe(0);
  });

  it('an e-mail of thousands of characters is a 400 naming it at sign-in, sign-up and password reset, never a 500', async () => {
    // RFC 5321 §4.5.3.1.3: a path is at most 256 octets, so an address at most 254 characters.
    const long = `${'a'.repeat(5000)}@example.test`;
    const justOver = `${'a'.repeat(255 - '@example.test'.length)}@example.test`;
    expect(justOver).toHaveLength(255);
    for (const address of [long, justOver]) {
      const login = await agentFor(app).post('/api/auth/login').send({ email: address, password: 'wrong-password' }).expect(400);
      expect(Object.keys(login.body.errors)).toEqual(['email']);
      const reset = await agentFor(app).post('/api/auth/password-reset').set('x-trayline-csrf', '1').send({ email: address }).expect(400);
      expect(Object.keys(reset.body.errors)).toEqual(['email']);
      const register = await agentFor(app)
        .post('/api/auth/register')
        .set('x-trayline-csrf', '1')
        .send({ email: address, password: 'a-long-password-1', name: 'Long', businessName: 'Long' })
        .expect(400);
      expect(Object.keys(register.body.errors)).toEqual(['email']);
    }
  });

  it('refuses a cookie-authenticated write without the CSRF header', async () => {
    const coach = await coachWorkspace(app);
    const res = await coach.agent
      .post('/api/invitations')
      .set('x-trayline-csrf', '')
      .send({ email: 'x@example.test', role: 'assistant' });
    expect(res.status).toBe(403);
    expect(res.body.detail).toMatch(/x-trayline-csrf/);
  });

  it('sends a CSP that allows scripts from self only', async () => {
    const res = await request(app).get('/api/health');
    expect(res.headers['content-security-policy']).toMatch(/script-src 'self'(;|$)/);
  });
});

describe('invitations', () => {
  it('a coach invites an assistant; the link works once; the token is stored hashed', async () => {
    const coach = await coachWorkspace(app);
    const inv = await coach.agent.post('/api/invitations').send({ email: `${uniq('a')}@example.test`, role: 'assistant' }).expect(201);
    const token = String(inv.body.link).split('/invite/')[1];
    const rows = await sql<{ token_hash: string }>('select token_hash from invitation where id = $1', [inv.body.id]);
    expect(rows[0].token_hash).not.toBe(token);
    expect(rows[0].token_hash).toMatch(/^[0-9a-f]{64}$/);
    const peek = await request(app).get(`/api/invitations/${token}`).expect(200);
    expect(peek.body.role).toBe('assistant');
    const agent = agentFor(app);
    const me = await agent.post(`/api/invitations/${token}/accept`).send({ name: 'Sam', password: PASSWORD }).expect(200);
    expect(me.body).toMatchObject({ role: 'assistant', workspaceId: coach.workspaceId });
    await agentFor(app).post(`/api/invitations/${token}/accept`).send({ name: 'Sam', password: PASSWORD }).expect(404);
  });

  it('an assistant cannot invite', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    await assistant.agent.post('/api/invitations').send({ email: 'z@example.test', role: 'client' }).expect(403);
  });

  it('password change needs the current password', async () => {
    const coach = await coachWorkspace(app);
    const bad = await coach.agent.post('/api/auth/password').send({ currentPassword: 'nope', newPassword: 'another-long-password' });
    expect(bad.status).toBe(400);
    expect(bad.body.errors.currentPassword).toBeDefined();
    const ok = await coach.agent.post('/api/auth/password').send({ currentPassword: PASSWORD, newPassword: 'another-long-password' }).expect(200);
    expect(ok.body).toEqual({ otherDevicesSignedOut: 0 });
    await agentFor(app).post('/api/auth/login').send({ email: coach.email, password: 'another-long-password' }).expect(200);
  });
});

// User-Agent headers as two real browsers send them (Chrome on Android, Safari on macOS: the browsers' own formats).
const PHONE_UA = 'Mozilla/5.0 (Linux; Android 14; Pixel 7) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/120.0.0.0 Mobile Safari/537.36';
const LAPTOP_UA = 'Mozilla/5.0 (Macintosh; Intel Mac OS X 10_15_7) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.1 Safari/605.1.15';

async function signedInOn(email: string, userAgent: string, password = PASSWORD) {
  const agent = agentFor(app).set('user-agent', userAgent);
  await agent.post('/api/auth/login').send({ email, password }).expect(200);
  return agent;
}

describe('the devices signed in as a person', () => {
  it('lists each sign-in with its device, this one first; nobody else’s; the session id never leaves the server', async () => {
    const coach = await coachWorkspace(app);
    const other = await coachWorkspace(app);
    const phone = await signedInOn(coach.email, PHONE_UA);
    const before = Date.now();
    const laptop = await signedInOn(coach.email, LAPTOP_UA);
    const list = (await laptop.get('/api/auth/devices').expect(200)).body as { id: string; current: boolean; device: string | null; signedInAt: string | null; lastActiveAt: string }[];
    expect(list).toHaveLength(3); // the sign-up's session, the phone, the laptop
    expect(list[0]).toMatchObject({ current: true, device: 'Safari on a macOS computer' });
    expect(Date.parse(list[0].signedInAt!)).toBeGreaterThanOrEqual(before - 1000);
    expect(list.filter((d) => d.current)).toHaveLength(1);
    expect(list.map((d) => d.device)).toContain('Chrome on an Android phone');
    for (const d of list) expect(d.id).toMatch(/^[0-9a-f]{24}$/);
    const sids = (await sql<{ sid: string }>(`select sid from "session" where (sess->'passport'->>'user') = $1`, [String(coach.userId)])).map((r) => r.sid);
    expect(sids).toHaveLength(3);
    expect(JSON.stringify(list)).not.toMatch(new RegExp(sids.join('|')));
    // Only the words are kept, not the header.
    const [stored] = await sql<{ sess: string }>(`select sess::text from "session" where (sess->>'device') = 'Chrome on an Android phone' and (sess->'passport'->>'user') = $1`, [String(coach.userId)]);
    expect(stored.sess).not.toContain('Pixel 7');
    // The phone sees the same devices, itself first; another person sees only their own.
    const fromPhone = (await phone.get('/api/auth/devices').expect(200)).body as typeof list;
    expect(fromPhone[0]).toMatchObject({ current: true, device: 'Chrome on an Android phone' });
    expect(new Set(fromPhone.map((d) => d.id))).toEqual(new Set(list.map((d) => d.id)));
    const theirs = (await other.agent.get('/api/auth/devices').expect(200)).body as typeof list;
    expect(theirs).toHaveLength(1);
    expect(list.map((d) => d.id)).not.toContain(theirs[0].id);
  });

  it('signs out one other device: its next request is 401; this device cannot be signed out here; another person’s is 404', async () => {
    const coach = await coachWorkspace(app);
    const other = await coachWorkspace(app);
    const phone = await signedInOn(coach.email, PHONE_UA);
    const list = (await coach.agent.get('/api/auth/devices').expect(200)).body as { id: string; current: boolean; device: string }[];
    const phoneId = list.find((d) => d.device === 'Chrome on an Android phone')!.id;
    const mine = list.find((d) => d.current)!.id;
    // Someone else cannot end it, nor learn that it exists (404, as for a handle that names nothing).
    await other.agent.delete(`/api/auth/devices/${phoneId}`).expect(404);
    await phone.get('/api/auth/me').expect(200);
    const self = await coach.agent.delete(`/api/auth/devices/${mine}`).expect(400);
    expect(self.body.errors.id).toBeDefined();
    await coach.agent.get('/api/auth/me').expect(200);
    await coach.agent.delete(`/api/auth/devices/${phoneId}`).expect(204);
    await phone.get('/api/auth/me').expect(401);
    await coach.agent.delete(`/api/auth/devices/${phoneId}`).expect(404);
    const bad = await coach.agent.delete('/api/auth/devices/not-a-handle').expect(400);
    expect(bad.body.errors.id).toBeDefined();
  });

  it('"sign out everywhere else" ends every other session of the person in every workspace, not this one', async () => {
    const coach = await coachWorkspace(app);
    const stranger = await coachWorkspace(app);
    const phone = await signedInOn(coach.email, PHONE_UA);
    const laptop = await signedInOn(coach.email, LAPTOP_UA);
    const res = await laptop.post('/api/auth/devices/sign-out-others').expect(200);
    expect(res.body).toEqual({ signedOut: 2 });
    await phone.get('/api/auth/me').expect(401);
    await coach.agent.get('/api/auth/me').expect(401);
    await laptop.get('/api/auth/me').expect(200);
    await stranger.agent.get('/api/auth/me').expect(200);
    expect((await laptop.post('/api/auth/devices/sign-out-others').expect(200)).body).toEqual({ signedOut: 0 });
  });

  it('changing the password signs out the other devices and e-mails the owner, in the same transaction as the new password', async () => {
    const coach = await coachWorkspace(app);
    const phone = await signedInOn(coach.email, PHONE_UA);
    const laptop = await signedInOn(coach.email, LAPTOP_UA);
    const res = await laptop.post('/api/auth/password').send({ currentPassword: PASSWORD, newPassword: 'a-brand-new-password' }).expect(200);
    expect(res.body).toEqual({ otherDevicesSignedOut: 2 });
    await phone.get('/api/auth/me').expect(401);
    await coach.agent.get('/api/auth/me').expect(401);
    await laptop.get('/api/auth/me').expect(200);
    const mails = await sql<{ workspace_id: number | null; subject: string; text: string }>(
      `select workspace_id, subject, text from outbox where "to" = $1 and kind = 'password-changed'`,
      [coach.email],
    );
    expect(mails).toHaveLength(1);
    expect(mails[0].workspace_id).toBeNull();
    expect(mails[0].subject).toBe('Your Trayline password was changed');
    expect(mails[0].text).toContain(`The password of your Trayline account (${coach.email}) was just changed in Settings from Safari on a macOS computer.`);
    expect(mails[0].text).toContain('The 2 other devices signed in as you were signed out.');
    expect(mails[0].text).toMatch(/Choose a new password: http\S*\/forgot-password\n/);
    // A wrong current password changes nothing, signs nobody out and sends nothing.
    const again = await signedInOn(coach.email, PHONE_UA, 'a-brand-new-password');
    await laptop.post('/api/auth/password').send({ currentPassword: 'wrong-wrong', newPassword: 'yet-another-password' }).expect(400);
    await again.get('/api/auth/me').expect(200);
    expect(await sql(`select id from outbox where "to" = $1 and kind = 'password-changed'`, [coach.email])).toHaveLength(1);
  });

  it('a session from before devices were noted lists without its device and sign-in time', async () => {
    const coach = await coachWorkspace(app);
    const phone = await signedInOn(coach.email, PHONE_UA);
    await sql(`update "session" set sess = (sess::jsonb - 'device' - 'signedInAt')::json where (sess->>'device') = 'Chrome on an Android phone' and (sess->'passport'->>'user') = $1`, [String(coach.userId)]);
    const list = (await coach.agent.get('/api/auth/devices').expect(200)).body as { current: boolean; device: string | null; signedInAt: string | null; lastActiveAt: string }[];
    const old = list.find((d) => !d.current && d.device === null)!;
    expect(old).toMatchObject({ device: null, signedInAt: null });
    // Active within the last minute (the stored expiry is the last request's plus 14 days, rewritten a minute behind).
    expect(Math.abs(Date.parse(old.lastActiveAt) - Date.now())).toBeLessThan(90_000);
    await phone.get('/api/auth/me').expect(200);
  });
});

describe('keep me signed in', () => {
  const cookieOf = (res: { headers: Record<string, unknown> }) => String(res.headers['set-cookie'] ?? '');
  const expireOf = async (userId: number, kept: boolean) =>
    (
      await sql<{ ms: string }>(
        `select (extract(epoch from expire) * 1000)::bigint::text as ms from "session" where (sess->'passport'->>'user') = $1 and ((sess->>'staySignedIn') is distinct from 'false') = $2`,
        [String(userId), kept],
      )
    ).map((r) => Number(r.ms));

  it('kept (the default): a cookie with an expiry two weeks on; not kept: a cookie without one, and the server ends it after 12 idle hours', async () => {
    const coach = await coachWorkspace(app);
    const kept = agentFor(app);
    const keptRes = await kept.post('/api/auth/login').send({ email: coach.email, password: PASSWORD }).expect(200);
    expect(keptRes.body.staysSignedIn).toBe(true);
    // RFC 6265 §4.1.2.1–4.1.2.2 (from memory): a cookie with Expires (or Max-Age) is kept until then; one without
    // either is a session cookie, which the browser drops when it closes.
    const keptExpiry = /Expires=([^;]+)/i.exec(cookieOf(keptRes))?.[1];
    expect(Date.parse(keptExpiry!) - Date.now()).toBeGreaterThan(13.9 * 86_400_000);

    const shared = agentFor(app);
    const before = Date.now();
    const sharedRes = await shared.post('/api/auth/login').send({ email: coach.email, password: PASSWORD, staySignedIn: false }).expect(200);
    expect(cookieOf(sharedRes)).toMatch(/trayline\.sid=/);
    expect(cookieOf(sharedRes)).not.toMatch(/Expires=|Max-Age=/i);
    expect(sharedRes.body.staysSignedIn).toBe(false);
    // Each later answer renews the cookie, still without an expiry; /me says so too.
    const me = await shared.get('/api/auth/me').expect(200);
    expect(me.body.staysSignedIn).toBe(false);
    expect(cookieOf(me)).not.toMatch(/Expires=|Max-Age=/i);
    expect((await kept.get('/api/auth/me').expect(200)).body.staysSignedIn).toBe(true);
    // RFC 9111 §5.2.2 (from memory): "private" keeps an answer out of shared caches; "no-cache" has the browser ask
    // again before reusing its copy; "no-store" keeps no copy at all, which a shared computer wants.
    expect(keptRes.headers['cache-control']).toBe('private, no-cache');
    expect((await kept.get('/api/clients').expect(200)).headers['cache-control']).toBe('private, no-cache');
    expect(sharedRes.headers['cache-control']).toBe('no-store');
    expect(me.headers['cache-control']).toBe('no-store');
    expect((await shared.get('/api/clients').expect(200)).headers['cache-control']).toBe('no-store');
    // Stored until 12 hours after its last request (the kept one: 14 days).
    const [sharedExpire] = await expireOf(coach.userId, false);
    expect(sharedExpire - before).toBeGreaterThan(12 * 3_600_000 - 60_000);
    expect(sharedExpire - Date.now()).toBeLessThanOrEqual(12 * 3_600_000 + 1000);
    for (const ms of await expireOf(coach.userId, true)) expect(ms - Date.now()).toBeGreaterThan(13.9 * 86_400_000);

    // Eleven hours without a request: the next one renews it to 12 hours from now.
    await sql(`update "session" set expire = now() + interval '1 hour' where (sess->'passport'->>'user') = $1 and (sess->>'staySignedIn') = 'false'`, [String(coach.userId)]);
    await shared.get('/api/auth/me').expect(200);
    const [renewed] = await expireOf(coach.userId, false);
    expect(renewed - Date.now()).toBeGreaterThan(12 * 3_600_000 - 120_000);
    // Past its 12 hours: ended.
    await sql(`update "session" set expire = now() - interval '1 second' where (sess->'passport'->>'user') = $1 and (sess->>'staySignedIn') = 'false'`, [String(coach.userId)]);
    await shared.get('/api/auth/me').expect(401);
    await kept.get('/api/auth/me').expect(200);
  });

  it('the device list says which devices sign out when their browser closes; a bad value is a 400 naming the field', async () => {
    const coach = await coachWorkspace(app);
    const shared = agentFor(app).set('user-agent', LAPTOP_UA);
    await shared.post('/api/auth/login').send({ email: coach.email, password: PASSWORD, staySignedIn: false }).expect(200);
    const list = (await coach.agent.get('/api/auth/devices').expect(200)).body as { current: boolean; device: string; untilBrowserCloses: boolean; lastActiveAt: string }[];
    expect(list.find((d) => d.current)).toMatchObject({ untilBrowserCloses: false });
    const laptop = list.find((d) => !d.current)!;
    expect(laptop).toMatchObject({ device: 'Safari on a macOS computer', untilBrowserCloses: true });
    // Its last request was just now (the stored expiry minus its own 12 hours, not 14 days).
    expect(Math.abs(Date.parse(laptop.lastActiveAt) - Date.now())).toBeLessThan(90_000);

    const bad = await agentFor(app).post('/api/auth/login').send({ email: coach.email, password: PASSWORD, staySignedIn: 'yes' }).expect(400);
    expect(bad.body.errors.staySignedIn).toBeDefined();
  });

  it('joining by an invitation on a shared computer: the same session that ends with the browser', async () => {
    const coach = await coachWorkspace(app);
    const inv = await coach.agent.post('/api/invitations').send({ email: `${uniq('assistant')}@example.test`, role: 'assistant' }).expect(201);
    const token = String(inv.body.link).split('/invite/')[1];
    const laptop = agentFor(app);
    const bad = await laptop.post(`/api/invitations/${token}/accept`).send({ name: 'Kitchen Person', password: PASSWORD, staySignedIn: 1 }).expect(400);
    expect(bad.body.errors.staySignedIn).toBeDefined();
    const res = await laptop.post(`/api/invitations/${token}/accept`).send({ name: 'Kitchen Person', password: PASSWORD, staySignedIn: false }).expect(200);
    expect(res.body.staysSignedIn).toBe(false);
    expect(cookieOf(res)).toMatch(/trayline\.sid=/);
    expect(cookieOf(res)).not.toMatch(/Expires=|Max-Age=/i);
    const [expire] = await expireOf(res.body.id, false);
    expect(expire - Date.now()).toBeLessThanOrEqual(12 * 3_600_000 + 1000);
    expect((await laptop.get('/api/auth/me').expect(200)).body.staysSignedIn).toBe(false);
  });
});

describe('client invitations', () => {
  it('refuses to link a client profile of another workspace (400 naming clientId)', async () => {
    const coachA = await coachWorkspace(app);
    const coachB = await coachWorkspace(app);
    const client = await makeClient(coachB);
    const res = await coachA.agent
      .post('/api/invitations')
      .send({ email: `${uniq('c')}@example.test`, role: 'client', clientId: client.id });
    expect(res.status).toBe(400);
    expect(res.body.errors.clientId).toBeDefined();
    const [row] = await sql<{ n: string }>('select count(*)::text as n from invitation where client_id = $1', [client.id]);
    expect(row.n).toBe('0');
  });
});
