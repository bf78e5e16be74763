import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { testApp, agentFor } from '../support/test-app.js';
import { PASSWORD, coachWorkspace, makeClient, member, type Member } from '../support/factories.js';
import { sql } from '../support/db.js';

let app: Express;
beforeAll(async () => {
  app = (await testApp()).app;
});

describe('the team: who has access, and ending it', () => {
  it('lists the coach, then assistants, then clients (with their profile), and marks who is asking', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const client = await makeClient(coach);
    const clientMember = await member(app, coach, 'client', { clientId: client.id });
    const list = (await coach.agent.get('/api/members').expect(200)).body;
    expect(list.map((m: { role: string }) => m.role)).toEqual(['coach', 'assistant', 'client']);
    expect(list[0]).toMatchObject({ userId: coach.userId, email: coach.email, you: true, clientId: null });
    expect(list[1]).toMatchObject({ userId: assistant.userId, email: assistant.email, you: false });
    expect(list[2]).toMatchObject({ userId: clientMember.userId, clientId: client.id, clientName: client.name });
    expect(Date.parse(list[1].joinedAt)).not.toBeNaN();
    // Another workspace sees only its own people.
    const other = await coachWorkspace(app);
    expect((await other.agent.get('/api/members').expect(200)).body.map((m: { userId: number }) => m.userId)).toEqual([other.userId]);
  });

  it('removes an assistant: their next request is signed out, they cannot sign in, and what they did stays', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    await assistant.agent.get('/api/clients').expect(200);
    const id = (await coach.agent.get('/api/members').expect(200)).body.find((m: { userId: number }) => m.userId === assistant.userId).id;
    await coach.agent.delete(`/api/members/${id}`).expect(204);
    await assistant.agent.get('/api/clients').expect(401);
    expect(await sql(`select count(*)::int as n from session where sess->'passport'->>'user' = $1`, [String(assistant.userId)])).toEqual([{ n: 0 }]);
    const again = agentFor(app);
    const login = await again.post('/api/auth/login').set('x-trayline-csrf', '1').send({ email: assistant.email, password: PASSWORD }).expect(403);
    expect(login.body.detail).toBe('This account has no access to a workspace any more: ask your coach for a new invitation');
    expect(await sql('select count(*)::int as n from app_user where id = $1', [assistant.userId])).toEqual([{ n: 1 }]);
    expect((await coach.agent.get('/api/members').expect(200)).body.map((m: { role: string }) => m.role)).toEqual(['coach']);
    // A second removal, an unknown id and another workspace's member are "not found".
    await coach.agent.delete(`/api/members/${id}`).expect(404);
    const other = await coachWorkspace(app);
    const theirs = await member(app, other, 'assistant');
    const theirId = (await other.agent.get('/api/members').expect(200)).body.find((m: { userId: number }) => m.userId === theirs.userId).id;
    await coach.agent.delete(`/api/members/${theirId}`).expect(404);
    await theirs.agent.get('/api/clients').expect(200);
  });

  it('gives access back through a new invitation: the same account joins with its own password', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    const id = (await coach.agent.get('/api/members').expect(200)).body.find((m: { userId: number }) => m.userId === assistant.userId).id;
    await coach.agent.delete(`/api/members/${id}`).expect(204);
    const inv = await coach.agent.post('/api/invitations').send({ email: assistant.email, role: 'assistant' }).expect(201);
    const token = String(inv.body.link).split('/invite/')[1];
    const back = agentFor(app);
    const wrong = await back.post(`/api/invitations/${token}/accept`).set('x-trayline-csrf', '1').send({ name: 'Someone else', password: 'not-their-password' }).expect(400);
    expect(wrong.body.errors).toEqual({ password: ['This e-mail already has an account: enter its password to join'] });
    const joined = await back.post(`/api/invitations/${token}/accept`).set('x-trayline-csrf', '1').send({ name: 'ignored', password: PASSWORD }).expect(200);
    expect(joined.body).toMatchObject({ id: assistant.userId, role: 'assistant', workspaceId: coach.workspaceId });
    await back.get('/api/clients').expect(200);
  });

  it("refuses to remove one's own access (409) and answers 400 naming the id for a bad one", async () => {
    const coach = await coachWorkspace(app);
    const own = (await coach.agent.get('/api/members').expect(200)).body[0];
    const refused = await coach.agent.delete(`/api/members/${own.id}`).expect(409);
    expect(refused.body.detail).toBe('You cannot remove your own access: another coach of the workspace can');
    await coach.agent.get('/api/members').expect(200);
    const bad = await coach.agent.delete('/api/members/abc').expect(400);
    expect(Object.keys(bad.body.errors)).toEqual(['id']);
  });
});

describe('a second coach, and changing roles', () => {
  const idOf = async (coach: Member, userId: number) =>
    ((await coach.agent.get('/api/members').expect(200)).body as { id: number; userId: number }[]).find((m) => m.userId === userId)!.id;

  it('a coach invited as coach sees what the first sees (health notes too) and can plan', async () => {
    const first = await coachWorkspace(app);
    const client = await makeClient(first, { healthNotes: 'Demo note: takes a blood-pressure medicine' });
    const second = await member(app, first, 'coach');
    expect(second.role).toBe('coach');
    expect((await second.agent.get(`/api/clients/${client.id}`).expect(200)).body.healthNotes).toBe('Demo note: takes a blood-pressure medicine');
    await second.agent.get('/api/members').expect(200);
    const list = (await first.agent.get('/api/members').expect(200)).body as { role: string }[];
    expect(list.map((m) => m.role)).toEqual(['coach', 'coach']);
  });

  it('makes an assistant a coach and back; the change applies from their next request', async () => {
    const coach = await coachWorkspace(app);
    const assistant = await member(app, coach, 'assistant');
    await assistant.agent.get('/api/members').expect(403);
    const id = await idOf(coach, assistant.userId);
    const promoted = await coach.agent.patch(`/api/members/${id}`).send({ role: 'coach' }).expect(200);
    expect(promoted.body).toMatchObject({ id, role: 'coach', userId: assistant.userId });
    await assistant.agent.get('/api/members').expect(200);
    expect((await assistant.agent.get('/api/auth/me').expect(200)).body.role).toBe('coach');
    await coach.agent.patch(`/api/members/${id}`).send({ role: 'assistant' }).expect(200);
    await assistant.agent.get('/api/members').expect(403);
    // The same role again changes nothing and answers the member.
    expect((await coach.agent.patch(`/api/members/${id}`).send({ role: 'assistant' }).expect(200)).body.role).toBe('assistant');
  });

  it('keeps a coach: the last one cannot step down; with two, one steps down or removes the other', async () => {
    const first = await coachWorkspace(app);
    const ownId = await idOf(first, first.userId);
    const alone = await first.agent.patch(`/api/members/${ownId}`).send({ role: 'assistant' }).expect(409);
    expect(alone.body.detail).toBe('The workspace needs a coach: make someone else a coach first');
    const second = await member(app, first, 'coach');
    await first.agent.patch(`/api/members/${ownId}`).send({ role: 'assistant' }).expect(200);
    // The first is now a kitchen assistant; the second, the workspace's only coach, cannot step down either.
    await first.agent.get('/api/members').expect(403);
    const secondId = await idOf(second, second.userId);
    await second.agent.patch(`/api/members/${secondId}`).send({ role: 'assistant' }).expect(409);
    await second.agent.patch(`/api/members/${ownId}`).send({ role: 'coach' }).expect(200);
    await second.agent.delete(`/api/members/${ownId}`).expect(204);
    await first.agent.get('/api/members').expect(401);
    expect(await sql(`select count(*)::int as n from membership where workspace_id = $1 and role = 'coach'`, [first.workspaceId])).toEqual([{ n: 1 }]);
  });

  it("refuses a client's role change, a role it does not know, and another workspace's member", async () => {
    const coach = await coachWorkspace(app);
    const client = await makeClient(coach);
    const clientMember = await member(app, coach, 'client', { clientId: client.id });
    const id = await idOf(coach, clientMember.userId);
    const tied = await coach.agent.patch(`/api/members/${id}`).send({ role: 'coach' }).expect(400);
    expect(Object.keys(tied.body.errors)).toEqual(['role']);
    const unknown = await coach.agent.patch(`/api/members/${id}`).send({ role: 'owner' }).expect(400);
    expect(unknown.body.errors.role).toEqual(['Choose coach or kitchen assistant']);
    expect(await sql('select role from membership where id = $1', [id])).toEqual([{ role: 'client' }]);
    const other = await coachWorkspace(app);
    await other.agent.patch(`/api/members/${id}`).send({ role: 'assistant' }).expect(404);
  });
});

describe('someone who works for two coaches', () => {
  it('lands in the workspace that invited them, lists both, switches between them, and sees only the chosen one', async () => {
    const first = await coachWorkspace(app);
    const second = await coachWorkspace(app);
    const firstClient = await makeClient(first);
    const secondClient = await makeClient(second);
    const helper = await member(app, first, 'assistant');
    await helper.agent.get('/api/clients').expect(200);

    // The second coach invites the same e-mail; the existing account joins with its own password.
    const inv = await second.agent.post('/api/invitations').send({ email: helper.email, role: 'assistant' }).expect(201);
    const token = String(inv.body.link).split('/invite/')[1];
    const joined = await helper.agent.post(`/api/invitations/${token}/accept`).set('x-trayline-csrf', '1').send({ name: 'ignored', password: PASSWORD }).expect(200);
    expect(joined.body.workspaceId).toBe(second.workspaceId);
    const ids = async () => ((await helper.agent.get('/api/clients').expect(200)).body as { id: number }[]).map((c) => c.id);
    expect(await ids()).toEqual([secondClient.id]);

    const list = (await helper.agent.get('/api/auth/workspaces').expect(200)).body as { workspaceId: number; role: string; current: boolean }[];
    expect(list.map((w) => [w.workspaceId, w.role, w.current]).sort()).toEqual(
      [
        [first.workspaceId, 'assistant', false],
        [second.workspaceId, 'assistant', true],
      ].sort(),
    );

    const back = await helper.agent.put('/api/auth/workspace').send({ workspaceId: first.workspaceId }).expect(200);
    expect(back.body).toMatchObject({ workspaceId: first.workspaceId, role: 'assistant' });
    // The choice lives in the session (PostgreSQL): every later request works in the first workspace.
    expect(await ids()).toEqual([firstClient.id]);
    expect((await helper.agent.get('/api/auth/me').expect(200)).body.workspaceId).toBe(first.workspaceId);

    // A new sign-in (another device) works where they chose last.
    const phone = agentFor(app);
    const signedIn = await phone.post('/api/auth/login').set('x-trayline-csrf', '1').send({ email: helper.email, password: PASSWORD }).expect(200);
    expect(signedIn.body.workspaceId).toBe(first.workspaceId);

    // A workspace they do not belong to: 400 naming the field, and nothing changes.
    const stranger = await coachWorkspace(app);
    const refused = await helper.agent.put('/api/auth/workspace').send({ workspaceId: stranger.workspaceId }).expect(400);
    expect(refused.body.errors).toEqual({ workspaceId: ['You are not a member of that workspace'] });
    expect(await ids()).toEqual([firstClient.id]);

    // Removed from the chosen workspace: the next request works in the one left.
    const id = ((await first.agent.get('/api/members').expect(200)).body as { id: number; userId: number }[]).find((m) => m.userId === helper.userId)!.id;
    await first.agent.delete(`/api/members/${id}`).expect(204);
    expect(await ids()).toEqual([secondClient.id]);
    const later = agentFor(app);
    expect((await later.post('/api/auth/login').set('x-trayline-csrf', '1').send({ email: helper.email, password: PASSWORD }).expect(200)).body.workspaceId).toBe(second.workspaceId);
  });
});
