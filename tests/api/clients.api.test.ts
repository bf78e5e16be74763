import { beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, makeClient, member, clientInput } from '../support/factories.js';
import { sql } from '../support/db.js';

let app: Express;
beforeAll(async () => {
  app = (await testApp()).app;
});


describe('client profiles and targets', () => {
  // Worked examples of the Mifflin–St Jeor equation: Mifflin MD, St Jeor ST, Hill LA, Scott BJ, Daugherty SA,
  // Koh YO. "A new predictive equation for resting energy expenditure in healthy individuals."
  // Am J Clin Nutr 1990;51(2):241–247 (women: 10·W + 6.25·H − 5·A − 161; men: … + 5). Activity factors
  // 1.375 (lightly active) and 1.55 (moderately active) from the clinical reference summary of the equation
  // (published-values §7). Arithmetic: 650 + 1031.25 − 200 − 161 = 1320.25; × 1.375 = 1815.34375.
  it.each([
    {
      body: { sex: 'female', weightKg: '65', heightCm: '165', ageYears: 40, activity: 'light', goal: 'maintain' },
      ree: 1320, tdee: 1815, target: 1815,
      // Keto split: 20 g net carbs (Yancy et al. 2005), protein 1.5 g/kg (Phinney) = 97.5 → 98 g,
      // fat = (1815.34375 − 97.5·4 − 20·4) / 9 = 149.48 → 149 g (general Atwater factors, USDA AH-74).
      protein: 98, fat: 149,
    },
    {
      // 800 + 1125 − 150 + 5 = 1780; × 1.55 = 2759 (published-values §7 table).
      body: { sex: 'male', weightKg: '80', heightCm: '180', ageYears: 30, activity: 'moderate', goal: 'maintain' },
      ree: 1780, tdee: 2759, target: 2759,
      // protein 1.5 × 80 = 120 g; fat = (2759 − 480 − 80) / 9 = 244.33 → 244 g.
      protein: 120, fat: 244,
    },
  ])('computes $ree kcal resting energy and the keto split for a coach', async ({ body, ree, tdee, target, protein, fat }) => {
    const coach = await coachWorkspace(app);
    const res = await coach.agent.post('/api/clients').send(clientInput(body)).expect(201);
    expect(res.body.targets).toMatchObject({
      mode: 'computed',
      reeKcal: ree,
      tdeeKcal: tdee,
      targetKcal: target,
      netCarbCapG: 20,
      proteinG: protein,
      fatG: fat,
    });
    const [row] = await sql<{ weight_kg: string; workspace_id: number }>('select weight_kg, workspace_id from client where id = $1', [res.body.id]);
    expect(row).toEqual({ weight_kg: Number(body.weightKg).toFixed(2), workspace_id: coach.workspaceId });
  });

  it('splits the day per meal slot (breakfast 30 % by default: common practice, no source)', async () => {
    const coach = await coachWorkspace(app);
    const c = await makeClient(coach, { sex: 'female', weightKg: '65', heightCm: '165', ageYears: 40, activity: 'light' });
    const targets = c.targets as { targetKcal: number; slots: Record<string, { share: number; targetKcal: number }> };
    expect(Object.keys(targets.slots)).toEqual(['breakfast']);
    expect(targets.slots.breakfast.share).toBe(0.3);
    expect(targets.slots.breakfast.targetKcal).toBe(Math.round(0.3 * targets.targetKcal));
  });

  it('keeps targets typed by hand, and refuses manual mode without them', async () => {
    const coach = await coachWorkspace(app);
    const manual = { targetKcal: 1600, netCarbCapG: 25, proteinG: 100, fatG: 120 };
    const c = await makeClient(coach, { targetMode: 'manual', manualTargets: manual });
    expect(c.targets).toMatchObject({ mode: 'manual', reeKcal: null, ...manual });
    const bad = await coach.agent.post('/api/clients').send(clientInput({ targetMode: 'manual' })).expect(400);
    expect(bad.body.errors).toHaveProperty('manualTargets');
  });

  it('answers 400 naming the field for bad input', async () => {
    const coach = await coachWorkspace(app);
    const res = await coach.agent.post('/api/clients').send(clientInput({ weightKg: 'heavy', allergens: ['gluten'] })).expect(400);
    expect(res.body.code).toBe('validation');
    expect(Object.keys(res.body.errors)).toEqual(expect.arrayContaining(['weightKg', 'allergens.0']));
  });

  it("an e-mail past SMTP's 254 characters is a 400 naming it (RFC 5321 §4.5.3.1.3); 254 is accepted", async () => {
    const coach = await coachWorkspace(app);
    const at = (n: number) => `${'a'.repeat(n - '@example.test'.length)}@example.test`;
    const res = await coach.agent.post('/api/clients').send(clientInput({ email: at(255) })).expect(400);
    expect(res.body.errors).toEqual({ email: ['Use at most 254 characters'] });
    const wrong = await coach.agent.post('/api/clients').send(clientInput({ email: 'not-an-address' })).expect(400);
    expect(wrong.body.errors).toEqual({ email: ['Enter a valid e-mail address'] });
    const none = await coach.agent.post('/api/clients').send(clientInput({ email: '  ' })).expect(201);
    expect(none.body.email).toBeNull();
    const ok = await coach.agent.post('/api/clients').send(clientInput({ email: at(254) })).expect(201);
    expect(ok.body.email).toBe(at(254));
  });

  it('gives assistants names and portions per plate only', async () => {
    const coach = await coachWorkspace(app);
    await makeClient(coach, { name: 'Ada', householdMultiplier: '3', healthNotes: 'private' });
    const assistant = await member(app, coach, 'assistant');
    const res = await assistant.agent.get('/api/clients').expect(200);
    expect(res.body).toEqual([{ id: expect.any(Number), name: 'Ada', householdMultiplier: '3', archivedAt: null }]);
    const one = await assistant.agent.get(`/api/clients/${res.body[0].id}`);
    expect(one.status).toBe(403);
  });

  it('lets a linked client read their own profile without health notes, and nobody else’s', async () => {
    const coach = await coachWorkspace(app);
    const own = await makeClient(coach, { healthNotes: 'takes metformin' });
    const other = await makeClient(coach);
    const client = await member(app, coach, 'client', { clientId: own.id });
    const me = await client.agent.get('/api/auth/me').expect(200);
    expect(me.body.clientId).toBe(own.id);
    const res = await client.agent.get(`/api/clients/${own.id}`).expect(200);
    expect(res.body).not.toHaveProperty('healthNotes');
    expect(res.body.targets.targetKcal).toBeGreaterThan(0);
    await client.agent.get(`/api/clients/${other.id}`).expect(404);
    await client.agent.get('/api/clients').expect(403);
    // The coach sees the linked account.
    const coachView = await coach.agent.get(`/api/clients/${own.id}`).expect(200);
    expect(coachView.body.account).toMatchObject({ email: client.email });
    expect(coachView.body.healthNotes).toBe('takes metformin');
  });

  it('shows the coach an open invitation until the client joins', async () => {
    const coach = await coachWorkspace(app);
    const c = await makeClient(coach);
    const before = await coach.agent.get(`/api/clients/${c.id}`).expect(200);
    expect(before.body).toMatchObject({ account: null, invitation: null });
    const email = `invited-${c.id}@example.test`;
    await coach.agent.post('/api/invitations').send({ email, role: 'client', clientId: c.id }).expect(201);
    const invited = await coach.agent.get(`/api/clients/${c.id}`).expect(200);
    expect(invited.body.account).toBeNull();
    expect(invited.body.invitation).toMatchObject({ email });
    // Valid for 14 days from now (the invitation's own rule).
    expect(new Date(invited.body.invitation.expiresAt).getTime()).toBeGreaterThan(Date.now() + 13 * 86_400_000);
    expect((await coach.agent.get('/api/clients').expect(200)).body.find((x: { id: number }) => x.id === c.id).invitation).toMatchObject({ email });
    // An expired invitation is not open.
    await sql("update invitation set expires_at = now() - interval '1 minute' where client_id = $1", [c.id]);
    expect((await coach.agent.get(`/api/clients/${c.id}`).expect(200)).body.invitation).toBeNull();
    // Joined: the account, no invitation.
    await member(app, coach, 'client', { clientId: c.id });
    const joined = await coach.agent.get(`/api/clients/${c.id}`).expect(200);
    expect(joined.body.invitation).toBeNull();
    expect(joined.body.account).not.toBeNull();
  });

  it('two edits from the same version: the second gets 409 with the current record, never a silent overwrite', async () => {
    const coach = await coachWorkspace(app);
    const c = await makeClient(coach);
    const first = await coach.agent.patch(`/api/clients/${c.id}`).send({ version: c.version, name: 'First' }).expect(200);
    expect(first.body.version).toBe(c.version + 1);
    const second = await coach.agent.patch(`/api/clients/${c.id}`).send({ version: c.version, name: 'Second' }).expect(409);
    expect(second.body).toMatchObject({ code: 'stale_version', currentVersion: c.version + 1, current: { name: 'First' } });
    const [row] = await sql<{ name: string }>('select name from client where id = $1', [c.id]);
    expect(row.name).toBe('First');
  });

  it('hides another workspace’s clients (404) and deletes unlinking the account', async () => {
    const a = await coachWorkspace(app);
    const b = await coachWorkspace(app);
    const c = await makeClient(a);
    await b.agent.get(`/api/clients/${c.id}`).expect(404);
    await b.agent.patch(`/api/clients/${c.id}`).send({ version: 1, name: 'x' }).expect(404);
    await b.agent.delete(`/api/clients/${c.id}`).expect(404);
    const linked = await member(app, a, 'client', { clientId: c.id });
    await a.agent.delete(`/api/clients/${c.id}`).expect(204);
    expect(await sql('select id from client where id = $1', [c.id])).toEqual([]);
    const [m] = await sql<{ client_id: number | null }>('select client_id from membership where user_id = $1', [linked.userId]);
    expect(m.client_id).toBeNull();
  });

  it('archives a client with the version read (409 on a stale one) and restores them; an archived client cannot be invited', async () => {
    const coach = await coachWorkspace(app);
    const c = await makeClient(coach, { name: 'Pia' });
    const before = Date.now();
    const archived = await coach.agent.patch(`/api/clients/${c.id}`).send({ archived: true, version: c.version }).expect(200);
    expect(Date.parse(archived.body.archivedAt)).toBeGreaterThanOrEqual(before - 1000);
    expect(archived.body.version).toBe(c.version + 1);
    // The list keeps them, marked (the page shows them on request); the home's count leaves them out.
    const list = await coach.agent.get('/api/clients').expect(200);
    expect(list.body.find((x: { id: number }) => x.id === c.id).archivedAt).toBe(archived.body.archivedAt);
    const glance = await coach.agent.get('/api/weeks/glance').expect(200);
    expect(glance.body.setup.clients).toBe(0);
    // Archiving again keeps the first date.
    const again = await coach.agent.patch(`/api/clients/${c.id}`).send({ archived: true, version: archived.body.version }).expect(200);
    expect(again.body.archivedAt).toBe(archived.body.archivedAt);
    // A stale version is refused, and changes nothing.
    const stale = await coach.agent.patch(`/api/clients/${c.id}`).send({ archived: false, version: c.version }).expect(409);
    expect(stale.body.current.archivedAt).toBe(archived.body.archivedAt);
    const invite = await coach.agent.post('/api/invitations').send({ email: 'pia@example.test', role: 'client', clientId: c.id }).expect(400);
    expect(invite.body.errors).toEqual({ clientId: ['Pia is archived: restore them before inviting them'] });
    expect(await sql('select id from invitation where client_id = $1', [c.id])).toEqual([]);
    const restored = await coach.agent.patch(`/api/clients/${c.id}`).send({ archived: false, version: again.body.version }).expect(200);
    expect(restored.body.archivedAt).toBeNull();
    expect((await coach.agent.get('/api/weeks/glance').expect(200)).body.setup.clients).toBe(1);
    const bad = await coach.agent.patch(`/api/clients/${c.id}`).send({ archived: 'yes', version: restored.body.version }).expect(400);
    expect(Object.keys(bad.body.errors)).toEqual(['archived']);
  });
});
