import type { Role } from '@shared/schemas/auth.schema';
import { paths } from '@/config/paths';

export interface NavItem {
  to: string;
  label: string;
  roles: Role[];
}

/** Role-aware navigation: each page appears only for the roles that may open it. */
export const NAV: NavItem[] = [
  { to: paths.home, label: 'This week', roles: ['coach', 'assistant'] },
  { to: paths.weeks, label: 'Week board', roles: ['coach'] },
  { to: paths.plates, label: 'Plates', roles: ['coach'] },
  { to: paths.clients, label: 'Clients', roles: ['coach'] },
  { to: paths.myPlates, label: 'My plates', roles: ['client'] },
  { to: paths.myTargets, label: 'My targets', roles: ['client'] },
  { to: paths.trays, label: 'Base trays', roles: ['coach', 'assistant'] },
  { to: paths.ingredients, label: 'Ingredients', roles: ['coach', 'assistant'] },
  { to: paths.bakeRunPlanner, label: 'Bake run', roles: ['coach', 'assistant'] },
  { to: paths.bakeRules, label: 'Bake rules & ovens', roles: ['coach'] },
  { to: paths.shoppingThisWeek, label: 'Shopping list', roles: ['coach', 'assistant'] },
  { to: paths.pantry, label: 'Pantry', roles: ['coach', 'assistant'] },
  { to: paths.labelsThisWeek, label: 'Labels', roles: ['coach', 'assistant'] },
  { to: paths.team, label: 'Team & clients', roles: ['coach'] },
  { to: paths.outbox, label: 'Outbox', roles: ['coach'] },
  { to: paths.settings, label: 'Settings', roles: ['coach', 'assistant', 'client'] },
];
