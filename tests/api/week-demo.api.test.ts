import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Express } from 'express';
import { flatWarnings, type WordedWarning } from '@shared/domain/week-check.js';
import type { BoardDto } from '@shared/schemas/weeks.schema.js';
import { expandBoard, type BoardAnswer } from '@shared/schemas/board-answer.js';
import { testApp } from '../support/test-app.js';
import { coachWorkspace, uniq, type Member } from '../support/factories.js';
import { seedReferenceIngredients } from '@server/db/seeders/ingredient-seed.js';
import { seedDemoIngredients } from '@server/db/seeders/ingredient-demo.js';
import { seedDemoTrays } from '@server/db/seeders/tray-demo.js';
import { seedDemoWeek } from '@server/db/seeders/week-demo.js';
import { seedDemoOvens } from '@server/db/seeders/bake-run-demo.js';
import { seedDemoCooling } from '@server/db/seeders/cooling-demo.js';
import { parseLocalMinutes } from '@shared/domain/bake-run-time.js';
import { DEMO_USERS } from '@server/db/seeders/demo-seed.js';
import { Membership, User } from '@server/modules/auth/user.entity.js';
import { Workspace } from '@server/modules/workspaces/workspace.entity.js';

/**
 * The demo prep week must read as a well-planned week: the demo step leaves only the few warnings it puts there on
 * purpose (one dislike, one allergen allowed by the coach with a reason) and one frozen-and-thawed portion.
 * These are checks of our own demo data (common practice, no source); the arithmetic behind the warnings is tested
 * in tests/unit/domain/week-check.test.ts against its references.
 */
let app: Express;
let closeOwn: () => Promise<void>;
let coach: Member;

type Board = BoardDto;

beforeAll(async () => {
  const own = await testApp();
  app = own.app;
  closeOwn = async () => {
    await Promise.allSettled([own.orm.close(true), own.pool.end()]);
  };
  await seedReferenceIngredients(own.orm.em.fork());
  coach = await coachWorkspace(app);
  await own.orm.em.fork().transactional(async (tx) => {
    const workspace = await tx.findOneOrFail(Workspace, coach.workspaceId);
    workspace.mealSlots = ['breakfast', 'lunch'];
    const user = await tx.findOneOrFail(User, coach.userId);
    const clientUsers = DEMO_USERS.clients.map((c) => {
      const u = tx.create(User, { email: `${uniq('demo-client')}@example.test`, name: c.name, passwordHash: 'x' });
      tx.create(Membership, { user: u, workspace, role: 'client' });
      return u;
    });
    await tx.flush();
    const ctx = { em: tx, workspace, coach: user, assistant: user, clientUsers };
    for (const step of [seedDemoIngredients, seedDemoTrays, seedDemoOvens, seedDemoWeek, seedDemoCooling]) {
      await step(ctx);
      await tx.flush();
    }
  });
});

afterAll(async () => {
  await closeOwn();
});

describe('demo prep week', () => {
  it('is published with eight clients, six demo plates and only the deliberate warnings', async () => {
    const list = (await coach.agent.get('/api/weeks').expect(200)).body as { id: number }[] | { items: { id: number }[] };
    const weeks = Array.isArray(list) ? list : list.items;
    expect(weeks).toHaveLength(1);
    const board: Board = expandBoard((await coach.agent.get(`/api/weeks/${weeks[0].id}`).expect(200)).body as BoardAnswer);

    expect(board.clients).toHaveLength(8);
    expect(board.plates).toHaveLength(6);
    expect(board.plates.every((p) => p.description.startsWith('Demo plate'))).toBe(true);

    const warnings = flatWarnings(board.checks);
    const kinds = warnings.map((w) => w.kind).sort();
    expect(kinds).toEqual(['allergen', 'dislike']);
    const allergen = warnings.find((w): w is Extract<WordedWarning, { kind: 'allergen' }> => w.kind === 'allergen')!;
    expect(allergen.overridden).toBe(true);
    expect(allergen.reason).toMatch(/demo/);
    expect(board.cells.filter((c) => c.storage === 'frozen')).toHaveLength(1);
  });

  it('has its first prep day\'s cooling record written down: every tray of the run, each cooled in time', async () => {
    const [week] = (await coach.agent.get('/api/weeks').expect(200)).body as { id: number; prepDate: string }[];
    const run = (await coach.agent.get(`/api/weeks/${week.id}/bake-run?prepDate=${week.prepDate}`).expect(200)).body as { run: { trays: { id: string; outAt: string }[] } };
    const cooling = (await coach.agent.get(`/api/weeks/${week.id}/bake-run/cooling?prepDate=${week.prepDate}`).expect(200)).body as {
      records: { runTrayId: string; outAt: string; readings: { at: string; tempF: number }[]; discarded: boolean }[];
    };
    expect(run.run.trays.length).toBeGreaterThan(0);
    expect(cooling.records.map((r) => r.runTrayId).sort()).toEqual(run.run.trays.map((t) => t.id).sort());
    // FDA Food Code §3-501.14: from 135 °F to 70 °F within 2 hours, and to 41 °F within 6 hours in total, from the
    // time out (each record's own arithmetic, worked from its times).
    for (const r of cooling.records) {
      expect(r.outAt).toBe(run.run.trays.find((t) => t.id === r.runTrayId)!.outAt);
      expect(r.discarded).toBe(false);
      const after = (at: string) => parseLocalMinutes(at)! - parseLocalMinutes(r.outAt)!;
      expect(r.readings.some((x) => x.tempF <= 70 && after(x.at) <= 120)).toBe(true);
      expect(r.readings.some((x) => x.tempF <= 41 && after(x.at) <= 360)).toBe(true);
    }
    // The home glance finds nothing thrown away and nothing missed; the log counts them all cooled in time.
    expect((await coach.agent.get('/api/weeks/glance').expect(200)).body.cooling).toEqual({ thrownAway: [], missed: [] });
    const log = (await coach.agent.get(`/api/cooling-log?from=${week.prepDate}&to=${week.prepDate}`).expect(200)).body;
    expect(log.rows).toHaveLength(cooling.records.length);
    expect(log.rows.map((r: { state: string; result: string }) => [r.state, r.result])).toEqual(cooling.records.map(() => ['cooled', 'Cooled in time']));
  });
});
