import type { Express } from 'express';
import { agentFor, type Agent } from './test-app.js';
import type { Role } from '@shared/schemas/auth.schema.js';

let seq = 0;
export const uniq = (p: string) => `${p}-${process.pid}-${++seq}`;
export const PASSWORD = 'correct-horse-battery';

export interface Member {
  agent: Agent;
  email: string;
  userId: number;
  workspaceId: number;
  role: Role;
}

/** Registers a new coach with their own workspace and returns a signed-in agent. */
export async function coachWorkspace(app: Express, name = uniq('coach')): Promise<Member> {
  const agent = agentFor(app);
  const email = `${name}@example.test`;
  const res = await agent
    .post('/api/auth/register')
    .send({ name, email, password: PASSWORD, businessName: `${name} kitchen` })
    .expect(201);
  return { agent, email, userId: res.body.id, workspaceId: res.body.workspaceId, role: 'coach' };
}

/** Invites and signs in an assistant or client member of the coach's workspace. */
export async function member(
  app: Express,
  coach: Member,
  role: 'coach' | 'assistant' | 'client',
  extra: { clientId?: number } = {},
): Promise<Member> {
  const email = `${uniq(role)}@example.test`;
  const inv = await coach.agent.post('/api/invitations').send({ email, role, ...extra }).expect(201);
  const token = String(inv.body.link).split('/invite/')[1];
  const agent = agentFor(app);
  const res = await agent
    .post(`/api/invitations/${token}/accept`)
    .send({ name: `${role} person`, password: PASSWORD })
    .expect(200);
  return { agent, email, userId: res.body.id, workspaceId: res.body.workspaceId, role };
}

/** A client profile in the coach's workspace (API body of POST /api/clients). */
export function clientInput(overrides: Record<string, unknown> = {}) {
  return {
    name: uniq('Client'),
    email: null,
    householdMultiplier: '1',
    sex: 'female',
    ageYears: 40,
    heightCm: '165',
    weightKg: '65',
    activity: 'light',
    goal: 'maintain',
    netCarbCapG: '20',
    proteinGPerKg: '1.5',
    targetMode: 'computed',
    allergens: [],
    dislikes: [],
    healthNotes: '',
    ...overrides,
  };
}

export async function makeClient(coach: Member, overrides: Record<string, unknown> = {}) {
  const res = await coach.agent.post('/api/clients').send(clientInput(overrides)).expect(201);
  return res.body as { id: number; version: number; name: string } & Record<string, unknown>;
}

/** A valid workspace-own ingredient body for POST /api/ingredients (per 100 g; invented test values). */
export function ingredientInput(overrides: Record<string, unknown> = {}) {
  return {
    name: uniq('Test cheese'),
    category: 'dairy',
    kcal: '350',
    fatG: '30',
    satFatG: '18',
    proteinG: '20',
    carbsG: '2',
    fiberG: '0',
    sugarsG: '1',
    sodiumMg: '600',
    densityGPerMl: null,
    pieceWeights: [{ name: 'slice', grams: '21' }],
    allergens: ['milk'],
    purchase: { amount: '8', unit: 'oz', label: '8 oz block' },
    priceCents: 399,
    aisle: 'dairy-eggs',
    source: 'package label (test)',
    ...overrides,
  };
}

/** Eggs bought by the dozen of "large" pieces; 50 g per large egg (USDA FDC 171287 portion "large"). */
export const EGGS_BY_THE_DOZEN = {
  category: 'eggs',
  pieceWeights: [{ name: 'large', grams: '50' }],
  allergens: ['egg'],
  purchase: { amount: '12', unit: 'large', label: 'dozen large eggs' },
  priceCents: 399,
  aisle: 'dairy-eggs',
};

/** Creates a workspace-own ingredient as the coach; returns the response body (IngredientDto). */
export async function makeIngredient(coach: Member, overrides: Record<string, unknown> = {}) {
  const res = await coach.agent.post('/api/ingredients').send(ingredientInput(overrides));
  if (res.status !== 201) throw new Error(`makeIngredient: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; name: string; version: number };
}

/** A valid base-tray body for POST /api/trays (invented test values): one line of the given ingredient. */
export function trayInput(ingredientId: number, overrides: Record<string, unknown> = {}) {
  return {
    name: uniq('Test egg slab'),
    description: 'A test tray',
    lines: [{ ingredientId, amountText: '8', unit: 'oz', note: '' }],
    pan: { code: 'half-sheet' },
    panLining: 'parchment',
    bake: { category: 'egg-slab', tempF: 350, minMinutes: 25, maxMinutes: 30 },
    yieldFactor: 0.9,
    cutPlan: { kind: 'grid', rows: 4, columns: 4 },
    storage: { fridgeDays: 4, freezerWeeks: 8 },
    reheatSteps: ['Microwave covered until hot in the centre'],
    tags: ['breakfast'],
    ...overrides,
  };
}

/** Creates a base tray as the coach (with a fresh ingredient unless one is given); returns the TrayDto body. */
export async function makeTray(coach: Member, overrides: Record<string, unknown> = {}, ingredientId?: number) {
  const ing = ingredientId ?? (await makeIngredient(coach)).id;
  const res = await coach.agent.post('/api/trays').send(trayInput(ing, overrides));
  if (res.status !== 201) throw new Error(`makeTray: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; version: number; name: string } & Record<string, unknown>;
}

/** A plate (POST /api/assemblies) of `portions` of one tray, plus optional add-ons. */
export async function makeAssembly(coach: Member, trayId: number, overrides: Record<string, unknown> = {}) {
  const res = await coach.agent
    .post('/api/assemblies')
    .send({ name: uniq('Plate'), trays: [{ trayId, portions: 1 }], addOns: [], assemblySteps: ['Plate it'], reheatSteps: [], ...overrides });
  if (res.status !== 201) throw new Error(`makeAssembly: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; version: number; name: string } & Record<string, unknown>;
}

/** A prep week (POST /api/weeks); returns the board. Default: board Mon 2026-01-05 … Sun 01-11, prep Sun 01-04. */
export async function makeWeek(coach: Member, overrides: Record<string, unknown> = {}) {
  const res = await coach.agent.post('/api/weeks').send({ startDate: '2026-01-05', prepDate: '2026-01-04', ...overrides });
  if (res.status !== 201) throw new Error(`makeWeek: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { week: { id: number; version: number } } & Record<string, unknown>;
}

/** A valid oven body for POST /api/ovens (invented test values; rates are the defaults). */
export function ovenInput(overrides: Record<string, unknown> = {}) {
  return { name: uniq('Oven'), racks: 2, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500, ...overrides };
}

/** Creates an oven in the coach's workspace; returns the OvenDto body. */
export async function makeOven(coach: Member, overrides: Record<string, unknown> = {}) {
  const res = await coach.agent.post('/api/ovens').send(ovenInput(overrides));
  if (res.status !== 201) throw new Error(`makeOven: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; version: number; name: string } & Record<string, unknown>;
}

/**
 * A coach's workspace with an assistant and a week whose first prep day (Sun Jan 4, 2026) bakes two trays of one
 * base tray: their ids in the run are "<tray id>-1" and "<tray id>-2".
 */
export async function twoTrayWeek(app: Express) {
  const coach = await coachWorkspace(app);
  const assistant = await member(app, coach, 'assistant');
  const tray = await makeTray(coach);
  const { week } = await makeWeek(coach);
  await coach.agent
    .put(`/api/weeks/${week.id}/trays`)
    .send({ version: week.version, trays: [{ trayId: tray.id, prepDate: '2026-01-04', trayCount: 2 }] })
    .expect(200);
  return { coach, assistant, tray, week };
}
