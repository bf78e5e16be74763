import type { Express } from 'express';
import type { Access } from '@server/http/authz.js';
import { clientInput, ingredientInput, makeAssembly, makeIngredient, makeTray, makeWeek, member, trayInput, type Member } from './factories.js';
import { fakeCaughtMailFor } from './mail-support.js';

/**
 * One row per API route ("METHOD /api/path" exactly as the router declares it).
 * - access: who may call it (must equal the route's allow() guard).
 * - path: a concrete path for the request (ids from workspace A, made in `prepare`); default: the pattern itself.
 * - body: a request body (allowed roles may still get 400/404/409: the matrix only checks the guard).
 * - crossWorkspace: the coach of workspace B asking for this path gets 404.
 * - skipRoles: roles whose call would change state the other calls need (e.g. logout), checked elsewhere.
 */
export interface MatrixContext {
  app: Express;
  coachA: Member;
  coachB: Member;
  ids: Record<string, number | string>;
}

export interface MatrixRow {
  access: Access;
  path?: (ctx: MatrixContext) => string;
  body?: (ctx: MatrixContext) => unknown;
  prepare?: (ctx: MatrixContext) => Promise<void>;
  crossWorkspace?: boolean;
  skipRoles?: string[];
}

const R = (access: Access, more: Omit<MatrixRow, 'access'> = {}): MatrixRow => ({ access, ...more });

export const MATRIX: Record<string, MatrixRow> = {
  'GET /api/health': R('public'),
  'POST /api/auth/login': R('public', { body: () => ({ email: 'nobody@example.test', password: 'x' }) }),
  'POST /api/auth/register': R('public'),
  // Logging out would end the shared sessions the other rows use; logout is tested in auth.api.test.ts.
  'POST /api/auth/logout': R('public', { skipRoles: ['coach', 'assistant', 'client'] }),
  'GET /api/auth/me': R('signed-in'),
  'PATCH /api/auth/me': R('signed-in'),
  'POST /api/auth/password': R('signed-in'),
  'GET /api/auth/devices': R('signed-in'),
  // A handle that names no session: allowed roles get past the guard to a 404 (auth.api.test.ts ends real ones).
  'DELETE /api/auth/devices/:id': R('signed-in', { path: () => `/api/auth/devices/${'0'.repeat(24)}` }),
  // Each matrix member has one session (the one calling), so there is nothing else to end.
  'POST /api/auth/devices/sign-out-others': R('signed-in'),
  'POST /api/auth/password-reset': R('public', { body: () => ({ email: `matrix-reset-${Date.now()}@example.test` }) }),
  'POST /api/auth/password-reset/confirm': R('public', {
    body: () => ({ token: 'unknown-token-unknown-token', newPassword: 'a-new-password-123' }),
  }),
  'GET /api/outbox': R(['coach']),
  'POST /api/outbox/:id/retry': R(['coach'], {
    prepare: async (ctx) => {
      // The invitations made for the matrix's members queued e-mails in workspace A; a caught copy of the newest.
      const made = await fakeCaughtMailFor(ctx.coachA);
      ctx.ids.outbox = made.outboxId;
      ctx.ids.caughtMail = made.caughtId;
    },
    path: (ctx) => `/api/outbox/${ctx.ids.outbox}/retry`,
    crossWorkspace: true,
  }),
  'GET /api/dev/mail': R(['coach']),
  'GET /api/dev/mail/:id': R(['coach'], { path: (ctx) => `/api/dev/mail/${ctx.ids.caughtMail}`, crossWorkspace: true }),
  'GET /api/dev/mail/:id/attachments/:index': R(['coach'], {
    path: (ctx) => `/api/dev/mail/${ctx.ids.caughtMail}/attachments/0`,
    crossWorkspace: true,
  }),
  'GET /api/invitations': R(['coach']),
  'POST /api/invitations': R(['coach']),
  'DELETE /api/invitations/:id': R(['coach'], {
    prepare: async (ctx) => {
      const res = await ctx.coachA.agent
        .post('/api/invitations')
        .send({ email: `matrix-${Date.now()}@example.test`, role: 'assistant' });
      ctx.ids.invitation = res.body.id;
    },
    // A DELETE that succeeds for the coach would make later calls 404; the coach runs last among allowed roles.
    path: (ctx) => `/api/invitations/${ctx.ids.invitation}`,
    crossWorkspace: true,
  }),
  // The team (who has access; ending someone's access)
  // Someone in several workspaces chooses one (any signed-in person; their own memberships only)
  'GET /api/auth/workspaces': R('signed-in'),
  'PUT /api/auth/workspace': R('signed-in', { body: () => ({ workspaceId: 1 }) }),
  'GET /api/members': R(['coach']),
  'PATCH /api/members/:id': R(['coach'], {
    path: (ctx) => `/api/members/${ctx.ids.member}`,
    body: () => ({ role: 'assistant' }),
    crossWorkspace: true,
  }),
  'DELETE /api/members/:id': R(['coach'], {
    prepare: async (ctx) => {
      const extra = await member(ctx.app, ctx.coachA, 'assistant');
      const list = await ctx.coachA.agent.get('/api/members');
      ctx.ids.member = (list.body as { id: number; userId: number }[]).find((m) => m.userId === extra.userId)!.id;
    },
    path: (ctx) => `/api/members/${ctx.ids.member}`,
    crossWorkspace: true,
  }),
  'GET /api/invitations/:token': R('public', { path: () => '/api/invitations/unknown-token-unknown-token' }),
  'POST /api/invitations/:token/accept': R('public', {
    path: () => '/api/invitations/unknown-token-unknown-token/accept',
  }),
  // Clients (issue 7)
  'GET /api/clients': R(['coach', 'assistant']),
  'POST /api/clients': R(['coach']),
  'GET /api/clients/:id': R(['coach', 'client'], {
    prepare: async (ctx) => {
      const res = await ctx.coachA.agent.post('/api/clients').send(clientInput());
      ctx.ids.client = res.body.id;
    },
    path: (ctx) => `/api/clients/${ctx.ids.client}`,
    crossWorkspace: true,
  }),
  'POST /api/clients/import': R(['coach']),
  'GET /api/clients.csv': R(['coach']),
  'GET /api/clients/:id/published-allergens': R(['coach'], {
    path: (ctx) => `/api/clients/${ctx.ids.client}/published-allergens`,
    crossWorkspace: true,
  }),
  'PATCH /api/clients/:id': R(['coach'], {
    path: (ctx) => `/api/clients/${ctx.ids.client}`,
    body: () => ({ version: 1, name: 'Matrix client' }),
    crossWorkspace: true,
  }),
  'DELETE /api/clients/:id': R(['coach'], {
    prepare: async (ctx) => {
      const res = await ctx.coachA.agent.post('/api/clients').send(clientInput());
      ctx.ids.clientToDelete = res.body.id;
    },
    path: (ctx) => `/api/clients/${ctx.ids.clientToDelete}`,
    crossWorkspace: true,
  }),
  // Another workspace's client id is a 400 naming clientIds (client-invitations.api.test.ts), as for POST /api/invitations.
  'POST /api/invitations/clients': R(['coach'], { body: (ctx) => ({ clientIds: [ctx.ids.client] }) }),
  // Plates (issue 7)
  'GET /api/assemblies': R(['coach', 'assistant']),
  'POST /api/assemblies': R(['coach']),
  'POST /api/assemblies/preview': R(['coach'], { body: (ctx) => ({ trays: [], addOns: [{ ingredientId: ctx.ids.ingredient, amountText: '1', unit: 'oz' }] }) }),
  'GET /api/assemblies/:id': R(['coach', 'assistant'], {
    prepare: async (ctx) => {
      const tray = await makeTray(ctx.coachA);
      ctx.ids.tray7 = tray.id;
      ctx.ids.assembly = (await makeAssembly(ctx.coachA, tray.id)).id;
      ctx.ids.assemblyToDelete = (await makeAssembly(ctx.coachA, tray.id)).id;
    },
    path: (ctx) => `/api/assemblies/${ctx.ids.assembly}`,
    crossWorkspace: true,
  }),
  'PUT /api/assemblies/:id': R(['coach'], {
    path: (ctx) => `/api/assemblies/${ctx.ids.assembly}`,
    body: (ctx) => ({ version: 1, name: 'Matrix plate', trays: [{ trayId: ctx.ids.tray7, portions: 1 }] }),
    crossWorkspace: true,
  }),
  'PUT /api/assemblies/:id/archived': R(['coach'], {
    path: (ctx) => `/api/assemblies/${ctx.ids.assembly}/archived`,
    body: () => ({ archived: false, version: 1 }),
    crossWorkspace: true,
  }),
  'DELETE /api/assemblies/:id': R(['coach'], { path: (ctx) => `/api/assemblies/${ctx.ids.assemblyToDelete}`, crossWorkspace: true }),
  // Prep weeks and the week board (issue 7)
  'GET /api/weeks/mine': R(['client']),
  'GET /api/weeks/glance': R(['coach']),
  'GET /api/weeks': R(['coach', 'assistant']),
  'POST /api/weeks': R(['coach'], { body: () => ({ startDate: '2026-03-02', prepDate: '2026-03-01' }) }),
  'GET /api/weeks/:id': R(['coach'], {
    prepare: async (ctx) => {
      // A day is on one board only: the matrix's weeks start on different Mondays (the bake-run week has Jan 5).
      ctx.ids.week = (await makeWeek(ctx.coachA, { startDate: '2026-01-19', prepDate: '2026-01-18' })).week.id;
      ctx.ids.weekToDelete = (await makeWeek(ctx.coachA, { startDate: '2026-01-12', prepDate: '2026-01-11' })).week.id;
    },
    path: (ctx) => `/api/weeks/${ctx.ids.week}`,
    crossWorkspace: true,
  }),
  'PATCH /api/weeks/:id': R(['coach'], { path: (ctx) => `/api/weeks/${ctx.ids.week}`, body: () => ({ version: 999 }), crossWorkspace: true }),
  'DELETE /api/weeks/:id': R(['coach'], { path: (ctx) => `/api/weeks/${ctx.ids.weekToDelete}`, crossWorkspace: true }),
  'PUT /api/weeks/:id/cells': R(['coach'], {
    path: (ctx) => `/api/weeks/${ctx.ids.week}/cells`,
    body: () => ({ version: 999, cells: [{ clientId: 1, date: '2026-01-19', slot: 'breakfast', assemblyId: null }] }),
    crossWorkspace: true,
  }),
  'PUT /api/weeks/:id/trays': R(['coach'], { path: (ctx) => `/api/weeks/${ctx.ids.week}/trays`, body: () => ({ version: 999, trays: [] }), crossWorkspace: true }),
  'POST /api/weeks/:id/trays/cover': R(['coach'], { path: (ctx) => `/api/weeks/${ctx.ids.week}/trays/cover`, body: () => ({ version: 999 }), crossWorkspace: true }),
  'POST /api/weeks/:id/copy-day': R(['coach'], {
    path: (ctx) => `/api/weeks/${ctx.ids.week}/copy-day`,
    body: () => ({ version: 999, fromDate: '2026-01-19', toDate: '2026-01-20' }),
    crossWorkspace: true,
  }),
  'POST /api/weeks/:id/copy': R(['coach'], {
    path: (ctx) => `/api/weeks/${ctx.ids.week}/copy`,
    body: () => ({ startDate: '2026-02-16', prepDate: '2026-02-15' }),
    crossWorkspace: true,
  }),
  'POST /api/weeks/:id/publish': R(['coach'], { path: (ctx) => `/api/weeks/${ctx.ids.week}/publish`, body: () => ({ version: 999 }), crossWorkspace: true }),
  'GET /api/weeks/:id/publications': R(['coach'], { path: (ctx) => `/api/weeks/${ctx.ids.week}/publications`, crossWorkspace: true }),
  'GET /api/weeks/:id/published-allergens': R(['coach'], { path: (ctx) => `/api/weeks/${ctx.ids.week}/published-allergens`, crossWorkspace: true }),
  // Sending a week, delivery log, week-plan PDFs (issue 9)
  'GET /api/weeks/mine/plan.pdf': R(['client']),
  'GET /api/weeks/mine/thaw-reminders.ics': R(['client']),
  'POST /api/weeks/:weekId/send': R(['coach'], { path: (ctx) => `/api/weeks/${ctx.ids.week}/send`, body: () => ({ note: 'Matrix' }), crossWorkspace: true }),
  'POST /api/weeks/:weekId/prep-day-mail': R(['coach'], {
    path: (ctx) => `/api/weeks/${ctx.ids.week}/prep-day-mail`,
    body: () => ({ prepDate: '1999-01-04' }),
    crossWorkspace: true,
  }),
  'GET /api/weeks/:weekId/clients/:clientId/plan.pdf': R(['coach'], {
    path: (ctx) => `/api/weeks/${ctx.ids.week}/clients/${ctx.ids.client}/plan.pdf`,
    crossWorkspace: true,
  }),
  'GET /api/clients/:clientId/deliveries': R(['coach'], { path: (ctx) => `/api/clients/${ctx.ids.client}/deliveries`, crossWorkspace: true }),
  // Ingredients, recipe calculation, workspace settings (issue 4)
  'GET /api/ingredients': R(['coach', 'assistant']),
  'POST /api/ingredients': R(['coach'], { body: () => ingredientInput() }),
  'POST /api/ingredients/import': R(['coach']),
  'GET /api/ingredients.csv': R(['coach']),
  'GET /api/ingredients/:id': R(['coach', 'assistant'], {
    prepare: async (ctx) => {
      const res = await ctx.coachA.agent.post('/api/ingredients').send(ingredientInput());
      ctx.ids.ingredient = res.body.id;
    },
    path: (ctx) => `/api/ingredients/${ctx.ids.ingredient}`,
    crossWorkspace: true,
  }),
  'PATCH /api/ingredients/:id': R(['coach'], {
    path: (ctx) => `/api/ingredients/${ctx.ids.ingredient}`,
    body: () => ({ ...ingredientInput(), version: 1 }),
    crossWorkspace: true,
  }),
  'DELETE /api/ingredients/:id': R(['coach'], {
    prepare: async (ctx) => {
      const res = await ctx.coachA.agent.post('/api/ingredients').send(ingredientInput());
      ctx.ids.ingredientToDelete = res.body.id;
    },
    path: (ctx) => `/api/ingredients/${ctx.ids.ingredientToDelete}`,
    crossWorkspace: true,
  }),
  'POST /api/ingredients/:id/copy': R(['coach'], {
    path: (ctx) => `/api/ingredients/${ctx.ids.ingredient}/copy`,
    crossWorkspace: true,
  }),
  'POST /api/calc/recipe': R(['coach', 'assistant'], {
    body: (ctx) => ({ items: [{ ingredientId: ctx.ids.ingredient, amount: '1 1/2', unit: 'oz' }], portions: 2 }),
  }),
  'GET /api/workspace/settings': R(['coach']),
  'PATCH /api/workspace/settings': R(['coach'], { body: () => ({ netCarbRule: 'half-other-polyols', version: 1 }) }),
  // Pantry and shopping list (issue 8): coach and assistant; clients never.
  'GET /api/pantry': R(['coach', 'assistant']),
  'POST /api/pantry': R(['coach', 'assistant'], {
    body: (ctx) => ({ ingredientId: ctx.ids.pantryIngredient, amount: '1', unit: 'g' }),
  }),
  'GET /api/pantry/:id': R(['coach', 'assistant'], {
    prepare: async (ctx) => {
      ctx.ids.pantryIngredient = (await makeIngredient(ctx.coachA)).id;
      const other = (await makeIngredient(ctx.coachA)).id;
      const res = await ctx.coachA.agent.post('/api/pantry').send({ ingredientId: other, amount: '100', unit: 'g' });
      ctx.ids.pantryItem = res.body.id;
      const gone = (await makeIngredient(ctx.coachA)).id;
      const del = await ctx.coachA.agent.post('/api/pantry').send({ ingredientId: gone, amount: '100', unit: 'g' });
      ctx.ids.pantryItemToDelete = del.body.id;
    },
    path: (ctx) => `/api/pantry/${ctx.ids.pantryItem}`,
    crossWorkspace: true,
  }),
  'PATCH /api/pantry/:id': R(['coach', 'assistant'], {
    path: (ctx) => `/api/pantry/${ctx.ids.pantryItem}`,
    body: () => ({ amount: '50', unit: 'g', version: 1 }),
    crossWorkspace: true,
  }),
  'DELETE /api/pantry/:id': R(['coach', 'assistant'], {
    path: (ctx) => `/api/pantry/${ctx.ids.pantryItemToDelete}`,
    crossWorkspace: true,
  }),
  'POST /api/shopping/preview': R(['coach', 'assistant'], {
    body: (ctx) => ({ addOns: [{ ingredientId: ctx.ids.pantryIngredient, amount: '100', unit: 'g' }] }),
  }),
  'GET /api/weeks/current': R(['coach', 'assistant']),
  'GET /api/weeks/:weekId/shopping': R(['coach', 'assistant'], {
    prepare: async (ctx) => {
      ctx.ids.shoppingWeek = (await makeWeek(ctx.coachA, { startDate: '2026-02-02', prepDate: '2026-02-01' })).week.id;
    },
    path: (ctx) => `/api/weeks/${ctx.ids.shoppingWeek}/shopping`,
    crossWorkspace: true,
  }),
  'GET /api/weeks/:weekId/shopping.csv': R(['coach', 'assistant'], {
    path: (ctx) => `/api/weeks/${ctx.ids.shoppingWeek}/shopping.csv`,
    crossWorkspace: true,
  }),
  'GET /api/weeks/:weekId/shopping.pdf': R(['coach', 'assistant'], {
    path: (ctx) => `/api/weeks/${ctx.ids.shoppingWeek}/shopping.pdf`,
    crossWorkspace: true,
  }),
  'PUT /api/weeks/:weekId/shopping/checks/:ingredientId': R(['coach', 'assistant'], {
    path: (ctx) => `/api/weeks/${ctx.ids.shoppingWeek}/shopping/checks/${ctx.ids.pantryIngredient}`,
    body: () => ({ checked: true }),
    crossWorkspace: true,
  }),
  'POST /api/weeks/:weekId/shopping/bought': R(['coach', 'assistant'], {
    path: (ctx) => `/api/weeks/${ctx.ids.shoppingWeek}/shopping/bought`,
    crossWorkspace: true,
  }),
  'GET /api/weeks/:weekId/labels': R(['coach', 'assistant'], {
    path: (ctx) => `/api/weeks/${ctx.ids.shoppingWeek}/labels`,
    crossWorkspace: true,
  }),
  // Base trays (issue 5): coach writes; assistant reads; a client reads only trays in their own plan (none yet: 404).
  'GET /api/trays': R(['coach', 'assistant', 'client']),
  'POST /api/trays': R(['coach'], {
    prepare: async (ctx) => {
      ctx.ids.trayIngredient = (await makeIngredient(ctx.coachA)).id;
      ctx.ids.tray = (await makeTray(ctx.coachA, {}, Number(ctx.ids.trayIngredient))).id;
      ctx.ids.trayToDelete = (await makeTray(ctx.coachA, {}, Number(ctx.ids.trayIngredient))).id;
    },
    body: (ctx) => trayInput(Number(ctx.ids.trayIngredient)),
  }),
  'GET /api/trays/:id': R(['coach', 'assistant', 'client'], { path: (ctx) => `/api/trays/${ctx.ids.tray}`, crossWorkspace: true }),
  'PUT /api/trays/:id': R(['coach'], {
    path: (ctx) => `/api/trays/${ctx.ids.tray}`,
    body: (ctx) => ({ ...trayInput(Number(ctx.ids.trayIngredient)), version: 1 }),
    crossWorkspace: true,
  }),
  'DELETE /api/trays/:id': R(['coach'], { path: (ctx) => `/api/trays/${ctx.ids.trayToDelete}`, crossWorkspace: true }),
  'GET /api/trays/:id/portion-card': R(['coach', 'assistant', 'client'], {
    path: (ctx) => `/api/trays/${ctx.ids.tray}/portion-card`,
    crossWorkspace: true,
  }),
  'POST /api/trays/:id/scale': R(['coach', 'assistant', 'client'], {
    path: (ctx) => `/api/trays/${ctx.ids.tray}/scale`,
    body: () => ({ factor: 2 }),
    crossWorkspace: true,
  }),
  'POST /api/trays/:id/duplicate': R(['coach'], { path: (ctx) => `/api/trays/${ctx.ids.tray}/duplicate`, crossWorkspace: true }),
  'POST /api/trays/:id/photo': R(['coach'], { path: (ctx) => `/api/trays/${ctx.ids.tray}/photo`, crossWorkspace: true }),
  'GET /api/trays/:id/photo': R(['coach', 'assistant', 'client'], { path: (ctx) => `/api/trays/${ctx.ids.tray}/photo`, crossWorkspace: true }),
  'GET /api/trays/:id/thumbnail': R(['coach', 'assistant', 'client'], {
    path: (ctx) => `/api/trays/${ctx.ids.tray}/thumbnail`,
    crossWorkspace: true,
  }),
  // Bake rules, ovens and the bake run (issue 6): coach writes, assistant reads; clients never.
  'GET /api/bake-rules': R(['coach', 'assistant']),
  'POST /api/bake-rules': R(['coach'], {
    body: () => ({ category: `matrix-${Date.now()}`, label: 'Matrix rule', tempF: 375, minMinutes: 10, maxMinutes: 12, handsOnMinutes: 5 }),
  }),
  'GET /api/bake-rules/:id': R(['coach', 'assistant'], {
    prepare: async (ctx) => {
      const rules = (await ctx.coachA.agent.get('/api/bake-rules')).body as { id: number }[];
      ctx.ids.bakeRule = rules[0].id;
      ctx.ids.bakeRuleToDelete = rules[1].id;
    },
    path: (ctx) => `/api/bake-rules/${ctx.ids.bakeRule}`,
    crossWorkspace: true,
  }),
  'PUT /api/bake-rules/:id': R(['coach'], {
    path: (ctx) => `/api/bake-rules/${ctx.ids.bakeRule}`,
    body: () => ({ label: 'Matrix rule', tempF: 350, minMinutes: 20, maxMinutes: 25, handsOnMinutes: 5, version: 999 }),
    crossWorkspace: true,
  }),
  'DELETE /api/bake-rules/:id': R(['coach'], { path: (ctx) => `/api/bake-rules/${ctx.ids.bakeRuleToDelete}`, crossWorkspace: true }),
  'GET /api/ovens': R(['coach', 'assistant']),
  'POST /api/ovens': R(['coach'], { body: () => ({ name: `Matrix oven ${Date.now()}`, racks: 2, traysPerRack: 1 }) }),
  'GET /api/ovens/:id': R(['coach', 'assistant'], {
    prepare: async (ctx) => {
      ctx.ids.oven = (await ctx.coachA.agent.post('/api/ovens').send({ name: 'Matrix left', racks: 2, traysPerRack: 1 })).body.id;
      ctx.ids.ovenToDelete = (await ctx.coachA.agent.post('/api/ovens').send({ name: 'Matrix gone', racks: 1, traysPerRack: 1 })).body.id;
    },
    path: (ctx) => `/api/ovens/${ctx.ids.oven}`,
    crossWorkspace: true,
  }),
  'PUT /api/ovens/:id': R(['coach'], {
    path: (ctx) => `/api/ovens/${ctx.ids.oven}`,
    body: () => ({ name: 'Matrix left', racks: 2, traysPerRack: 1, version: 999 }),
    crossWorkspace: true,
  }),
  'DELETE /api/ovens/:id': R(['coach'], { path: (ctx) => `/api/ovens/${ctx.ids.ovenToDelete}`, crossWorkspace: true }),
  'POST /api/calc/bake-run': R(['coach', 'assistant'], {
    body: () => ({
      start: '2026-12-06T08:00',
      cooks: 1,
      ovens: [{ name: 'Left', racks: 1, traysPerRack: 1, convection: false, heatFPerMin: 25, coolFPerMin: 15, maxF: 500 }],
      trays: [{ id: 't1', name: 'Tray', tempF: 350, minMinutes: 14, maxMinutes: 16, handsOnMinutes: 5 }],
    }),
  }),
  'GET /api/weeks/:weekId/bake-run': R(['coach', 'assistant'], {
    prepare: async (ctx) => {
      ctx.ids.bakeWeek = (await makeWeek(ctx.coachA)).week.id;
    },
    path: (ctx) => `/api/weeks/${ctx.ids.bakeWeek}/bake-run`,
    crossWorkspace: true,
  }),
  'PUT /api/weeks/:weekId/bake-run/settings': R(['coach'], {
    path: (ctx) => `/api/weeks/${ctx.ids.bakeWeek}/bake-run/settings`,
    body: () => ({ start: '2026-01-04T08:00', cooks: 1, version: 999 }),
    crossWorkspace: true,
  }),
  'PUT /api/weeks/:weekId/bake-run/start': R(['coach', 'assistant'], {
    path: (ctx) => `/api/weeks/${ctx.ids.bakeWeek}/bake-run/start`,
    body: () => ({ start: '2026-01-04T08:30', version: 999 }),
    crossWorkspace: true,
  }),
  'PUT /api/weeks/:weekId/bake-run/kitchen': R(['coach', 'assistant'], {
    path: (ctx) => `/api/weeks/${ctx.ids.bakeWeek}/bake-run/kitchen`,
    body: () => ({ cooks: 1, ovenIds: [1], version: 999 }),
    crossWorkspace: true,
  }),
  // The cooling log reads the caller's own workspace only (another workspace's records are never in it: see
  // tests/api/cooling-log.api.test.ts).
  'GET /api/cooling-log': R(['coach', 'assistant'], { path: () => '/api/cooling-log?from=2026-01-01&to=2026-01-31' }),
  'GET /api/cooling-log.csv': R(['coach', 'assistant'], { path: () => '/api/cooling-log.csv?from=2026-01-01&to=2026-01-31' }),
  'GET /api/weeks/:weekId/bake-run/cooling': R(['coach', 'assistant'], {
    path: (ctx) => `/api/weeks/${ctx.ids.bakeWeek}/bake-run/cooling`,
    crossWorkspace: true,
  }),
  // A version no record has: allowed roles get a 409 and nothing is written.
  'PUT /api/weeks/:weekId/bake-run/cooling/:runTrayId': R(['coach', 'assistant'], {
    path: (ctx) => `/api/weeks/${ctx.ids.bakeWeek}/bake-run/cooling/1-1`,
    body: () => ({ outAt: '2026-01-04T10:00', version: 999 }),
    crossWorkspace: true,
  }),
  'DELETE /api/weeks/:weekId/bake-run/cooling/:runTrayId': R(['coach', 'assistant'], {
    path: (ctx) => `/api/weeks/${ctx.ids.bakeWeek}/bake-run/cooling/1-1?version=999`,
    crossWorkspace: true,
  }),
  'GET /api/weeks/:weekId/bake-run.pdf': R(['coach', 'assistant'], {
    path: (ctx) => `/api/weeks/${ctx.ids.bakeWeek}/bake-run.pdf`,
    crossWorkspace: true,
  }),
  'GET /api/weeks/:weekId/bake-run.ics': R(['coach', 'assistant'], {
    path: (ctx) => `/api/weeks/${ctx.ids.bakeWeek}/bake-run.ics`,
    crossWorkspace: true,
  }),
};
