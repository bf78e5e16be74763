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
    for (const step of [seedDemoIngredients, seedDemoTrays, seedDemoWeek]) {
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
});
