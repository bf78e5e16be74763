import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { agentFor } from '../support/test-app.js';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, clientInput, member, PASSWORD, uniq, type Member } from '../support/factories.js';
import { sql } from '../support/db.js';

let app: Express;
beforeAll(async () => {
  app = (await testApp()).app;
});

const addClient = async (coach: Member, over: Record<string, unknown> = {}) =>
  (await coach.agent.post('/api/clients').send(clientInput(over)).expect(201)).body as { id: number; name: string };

/** The client invitations' e-mails (an assistant's invitation, made by a test's set-up, is not one). */
const invitationMails = (workspaceId: number) =>
  sql<{ to: string; batch_id: string | null; client_id: number; text: string }>(
    `select "to", batch_id, client_id, text from outbox where workspace_id = $1 and kind = 'invitation' and client_id is not null order by id`,
    [workspaceId],
  );

describe('POST /api/invitations/clients (client profiles invited at once)', () => {
  it('invites each client at their profile’s e-mail in one batch, and skips, saying why, those it cannot', async () => {
    const coach = await coachWorkspace(app);
    const mail = (n: string) => `${uniq(n)}@example.test`;
    const ana = await addClient(coach, { name: 'A Ana', email: mail('ana') });
    const ben = await addClient(coach, { name: 'B Ben', email: mail('ben') });
    const cleo = await addClient(coach, { name: 'C Cleo', email: null });
    const dana = await addClient(coach, { name: 'D Dana', email: mail('dana') });
    await coach.agent.patch(`/api/clients/${dana.id}`).send({ version: 1, archived: true }).expect(200);
    const eve = await addClient(coach, { name: 'E Eve', email: mail('eve') });
    await coach.agent.post('/api/invitations').send({ email: mail('eve-other'), role: 'client', clientId: eve.id }).expect(201);
    const finn = await addClient(coach, { name: 'F Finn', email: mail('finn') });
    await member(app, coach, 'client', { clientId: finn.id });
    const assistant = await member(app, coach, 'assistant');
    const gus = await addClient(coach, { name: 'G Gus', email: assistant.email });

    const ids = [gus.id, finn.id, eve.id, dana.id, cleo.id, ben.id, ana.id];
    const before = (await invitationMails(coach.workspaceId)).length;
    const res = await coach.agent.post('/api/invitations/clients').send({ clientIds: ids }).expect(201);
    expect(res.body.invited).toEqual([
      { clientId: ana.id, name: 'A Ana', email: expect.stringMatching(/^ana/) },
      { clientId: ben.id, name: 'B Ben', email: expect.stringMatching(/^ben/) },
    ]);
    expect(res.body.skipped).toEqual([
      { clientId: cleo.id, name: 'C Cleo', reason: 'no-email' },
      { clientId: dana.id, name: 'D Dana', reason: 'archived' },
      { clientId: eve.id, name: 'E Eve', reason: 'invited' },
      { clientId: finn.id, name: 'F Finn', reason: 'joined' },
      { clientId: gus.id, name: 'G Gus', reason: 'member' },
    ]);
    const mails = (await invitationMails(coach.workspaceId)).slice(before);
    expect(mails.map((m) => [m.client_id, m.to, m.batch_id])).toEqual([
      [ana.id, res.body.invited[0].email, res.body.batchId],
      [ben.id, res.body.invited[1].email, res.body.batchId],
    ]);
    // The profiles now show the open invitation.
    const list = await coach.agent.get('/api/clients').expect(200);
    expect(list.body.find((c: { id: number }) => c.id === ana.id).invitation).toMatchObject({ email: res.body.invited[0].email });

    // Pressed again: nobody is invited twice.
    const again = await coach.agent.post('/api/invitations/clients').send({ clientIds: [ana.id, ben.id] }).expect(200);
    expect(again.body).toEqual({ invited: [], skipped: [expect.objectContaining({ reason: 'invited' }), expect.objectContaining({ reason: 'invited' })], batchId: null });
    expect(await invitationMails(coach.workspaceId)).toHaveLength(before + 2);

    // The e-mail's link joins Ana to her own profile.
    const token = /\/invite\/([A-Za-z0-9_-]+)/.exec(mails[0].text)![1];
    const anaAgent = agentFor(app);
    await anaAgent.post(`/api/invitations/${token}/accept`).send({ name: 'Ana', password: PASSWORD }).expect(200);
    await anaAgent.get(`/api/clients/${ana.id}`).expect(200);
    await anaAgent.get(`/api/clients/${ben.id}`).expect(404);
  });

  it('sends one invitation when the button is pressed twice at the same instant (the profiles are locked)', async () => {
    const coach = await coachWorkspace(app);
    // Five rounds of two presses, each on ten fresh profiles: without the lock, both presses read "not invited".
    for (let round = 0; round < 5; round += 1) {
      const ids: number[] = [];
      for (let i = 0; i < 10; i += 1) ids.push((await addClient(coach, { email: `${uniq('hal')}@example.test` })).id);
      const both = await Promise.all([0, 1].map(() => coach.agent.post('/api/invitations/clients').send({ clientIds: ids })));
      expect(both.map((r) => r.body.invited.length).sort((a, b) => a - b)).toEqual([0, 10]);
      expect(await sql('select client_id from invitation where client_id = any($1)', [ids])).toHaveLength(10);
    }
  });

  it('answers 400 naming clientIds for another workspace’s client or none, sending nothing; 403 to an assistant', async () => {
    const coachA = await coachWorkspace(app);
    const coachB = await coachWorkspace(app);
    const mine = await addClient(coachA, { email: `${uniq('ida')}@example.test` });
    const theirs = await addClient(coachB, { email: `${uniq('jon')}@example.test` });
    const cross = await coachA.agent.post('/api/invitations/clients').send({ clientIds: [mine.id, theirs.id] }).expect(400);
    expect(cross.body.errors.clientIds).toEqual([`No such client in your workspace: ${theirs.id}`]);
    // Nobody to invite is not an error: a profile without an e-mail is skipped, and said why.
    const noEmail = await addClient(coachA, { email: null });
    const skipped = await coachA.agent.post('/api/invitations/clients').send({ clientIds: [noEmail.id] }).expect(200);
    expect(skipped.body).toEqual({ invited: [], skipped: [{ clientId: noEmail.id, name: noEmail.name, reason: 'no-email' }], batchId: null });
    const none = await coachA.agent.post('/api/invitations/clients').send({ clientIds: [] }).expect(400);
    expect(none.body.errors.clientIds).toBeDefined();
    const assistant = await member(app, coachA, 'assistant');
    await assistant.agent.post('/api/invitations/clients').send({ clientIds: [mine.id] }).expect(403);
    expect(await invitationMails(coachA.workspaceId)).toEqual([]);
    expect(await invitationMails(coachB.workspaceId)).toEqual([]);
  });
});
