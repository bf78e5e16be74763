import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router-dom';
import { paths } from '@/config/paths';
import { requireRole } from './guards';

/** The signed-in pages. Each page module exports `Component` (and may export a `loader` factory). */
export function appRoutes(qc: QueryClient): RouteObject[] {
  return [
    { index: true, lazy: () => import('./routes/home/home.route') },
    { path: paths.settings, lazy: () => import('./routes/settings/settings.route') },
    { path: paths.team, loader: requireRole(qc, ['coach']), lazy: () => import('./routes/team/team.route') },
    { path: paths.ingredients, loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/ingredients/ingredients.route') },
    { path: paths.ingredientNew, loader: requireRole(qc, ['coach']), lazy: () => import('./routes/ingredients/ingredient-new.route') },
    { path: paths.ingredient(), loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/ingredients/ingredient.route') },
    { path: paths.trays, lazy: () => import('./routes/trays/trays.route') },
    { path: paths.trayNew, loader: requireRole(qc, ['coach']), lazy: () => import('./routes/trays/tray-new.route') },
    { path: paths.tray(), lazy: () => import('./routes/trays/tray-detail.route') },
    { path: paths.shoppingThisWeek, loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/shopping/shopping-this-week.route') },
    { path: paths.shopping(), loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/shopping/shopping.route') },
    { path: paths.pantry, loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/shopping/pantry.route') },
    { path: paths.labelsThisWeek, loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/shopping/labels-this-week.route') },
    { path: paths.labels(), loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/shopping/labels.route') },
    { path: paths.clients, loader: requireRole(qc, ['coach']), lazy: () => import('./routes/clients/clients.route') },
    { path: paths.client(), loader: requireRole(qc, ['coach']), lazy: () => import('./routes/clients/client.route') },
    { path: paths.plates, loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/plates/plates.route') },
    { path: paths.weeks, loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/weeks/weeks.route') },
    { path: paths.week(), loader: requireRole(qc, ['coach']), lazy: () => import('./routes/weeks/week.route') },
    { path: paths.myPlates, loader: requireRole(qc, ['client']), lazy: () => import('./routes/my/my-plates.route') },
    { path: paths.myTargets, loader: requireRole(qc, ['client']), lazy: () => import('./routes/my/my-targets.route') },
    { path: paths.outbox, loader: requireRole(qc, ['coach']), lazy: () => import('./routes/outbox/outbox.route') },
    { path: paths.devMail, loader: requireRole(qc, ['coach']), lazy: () => import('./routes/outbox/dev-mail.route') },
    { path: paths.bakeRunPlanner, loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/bake-runs/bake-run-planner.route') },
    { path: paths.bakeRun(), loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/bake-runs/week-bake-run.route') },
    { path: paths.coolingLog, loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/bake-runs/cooling-log.route') },
    { path: paths.bakeRules, loader: requireRole(qc, ['coach', 'assistant']), lazy: () => import('./routes/bake-runs/bake-rules.route') },
  ];
}
