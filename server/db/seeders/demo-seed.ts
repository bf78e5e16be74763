import type { EntityManager } from '@mikro-orm/postgresql';
import { Workspace, type IWorkspace } from '../../modules/workspaces/workspace.entity.js';
import { Membership, User, type IUser } from '../../modules/auth/user.entity.js';
import { hashPassword } from '../../modules/auth/passwords.js';

/**
 * DEMO DATA — an invented scenario for trying Trayline, not real people or real advice.
 * "Oat & Ember Prep (demo)": a coach running a small low-carb breakfast prep service for eight clients.
 * Seeded only into an empty database, and never when DEMO_SEED=0.
 */
export const DEMO_PASSWORD = 'trayline-demo';
export const DEMO_USERS = {
  coach: { email: 'coach@trayline.test', name: 'Rowan Ashby' },
  assistant: { email: 'assistant@trayline.test', name: 'Kit Moreno' },
  clients: [
    'Dana Whitlock',
    'Priya Raman',
    'Marcus Bell',
    'Ingrid Solberg',
    'Tomás Ferreira',
    'Lena Okafor',
    'Hugo Brandt',
    'Mae Castillo',
  ].map((name, i) => ({ email: `client${i + 1}@trayline.test`, name })),
};

export interface DemoContext {
  em: EntityManager;
  workspace: IWorkspace;
  coach: IUser;
  assistant: IUser;
  clientUsers: IUser[];
}
function createUser(em: EntityManager, email: string, name: string, passwordHash: string): IUser {
  return em.create(User, { email, name, passwordHash });
}

/** Steps that later modules add to the demo (clients, trays, weeks…), run in order after the users exist. */
export type DemoStep = (ctx: DemoContext) => Promise<void>;

export async function databaseIsEmpty(em: EntityManager): Promise<boolean> {
  return (await em.count(Workspace, {})) === 0;
}

export async function seedDemo(em: EntityManager, steps: DemoStep[] = []): Promise<boolean> {
  if (!(await databaseIsEmpty(em))) return false;
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await em.transactional(async (tx) => {
    const workspace = tx.create(Workspace, { name: 'Oat & Ember Prep (demo)', isDemo: true, mealSlots: ['breakfast', 'lunch'] });
    const coach = createUser(tx, DEMO_USERS.coach.email, DEMO_USERS.coach.name, passwordHash);
    const assistant = createUser(tx, DEMO_USERS.assistant.email, DEMO_USERS.assistant.name, passwordHash);
    tx.create(Membership, { user: coach, workspace, role: 'coach' });
    tx.create(Membership, { user: assistant, workspace, role: 'assistant' });
    const clientUsers = DEMO_USERS.clients.map((c) => {
      const u = createUser(tx, c.email, c.name, passwordHash);
      tx.create(Membership, { user: u, workspace, role: 'client' });
      return u;
    });
    await tx.flush();
    for (const step of steps) {
      await step({ em: tx, workspace, coach, assistant, clientUsers });
      await tx.flush();
    }
  });
  return true;
}
