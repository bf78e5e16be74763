import type { Role } from '@shared/schemas/auth.schema';
import { paths } from '@/config/paths';

export type NavGroupId = 'week' | 'kitchen' | 'shop' | 'mine' | 'account';

export interface NavItem {
  to: string;
  label: string;
  roles: Role[];
  group?: NavGroupId;
  /** The paths it stands for, when not simply `to` and below (a week's bake run is under Bake run, not Week board). */
  active?: RegExp;
}

/** Whether a navigation item stands for this path: its own pattern, else `to` and the paths below it. */
export function navItemActive(item: Pick<NavItem, 'to' | 'active'>, pathname: string): boolean {
  if (item.active) return item.active.test(pathname);
  if (item.to === '/') return pathname === '/';
  return pathname === item.to || pathname.startsWith(`${item.to}/`);
}

/** Groups of the side rail, in the order of the weekly rhythm: plan, bake, shop; then the account. */
export const NAV_GROUPS: { id: NavGroupId; label: string }[] = [
  { id: 'mine', label: 'My week' },
  { id: 'week', label: 'Plan' },
  { id: 'kitchen', label: 'Kitchen' },
  { id: 'shop', label: 'Shop & store' },
  { id: 'account', label: 'Workspace' },
];

/** Role-aware navigation: each page appears only for the roles that may open it. */
export const NAV: NavItem[] = [
  { to: paths.home, label: 'This week', roles: ['coach', 'assistant'], group: 'week' },
  { to: paths.weeks, label: 'Week board', roles: ['coach'], group: 'week', active: /^\/weeks(\/\d+)?\/?$/ },
  { to: paths.plates, label: 'Plates', roles: ['coach'], group: 'week' },
  { to: paths.clients, label: 'Clients', roles: ['coach'], group: 'week' },
  { to: paths.myPlates, label: 'My plates', roles: ['client'], group: 'mine' },
  { to: paths.myTargets, label: 'My targets', roles: ['client'], group: 'mine' },
  { to: paths.trays, label: 'Base trays', roles: ['coach', 'assistant'], group: 'kitchen' },
  { to: paths.bakeRunPlanner, label: 'Bake run', roles: ['coach', 'assistant'], group: 'kitchen', active: /^\/(bake-run|weeks\/\d+\/bake-run)\/?$/ },
  { to: paths.coolingLog, label: 'Cooling log', roles: ['coach', 'assistant'], group: 'kitchen' },
  { to: paths.bakeRules, label: 'Bake rules & ovens', roles: ['coach'], group: 'kitchen' },
  { to: paths.ingredients, label: 'Ingredients', roles: ['coach', 'assistant'], group: 'kitchen' },
  { to: paths.shoppingThisWeek, label: 'Shopping list', roles: ['coach', 'assistant'], group: 'shop', active: /^\/(shopping|weeks\/\d+\/shopping)\/?$/ },
  { to: paths.pantry, label: 'Pantry', roles: ['coach', 'assistant'], group: 'shop' },
  { to: paths.labelsThisWeek, label: 'Labels', roles: ['coach', 'assistant'], group: 'shop', active: /^\/(labels|weeks\/\d+\/labels)\/?$/ },
  { to: paths.outbox, label: 'Outbox', roles: ['coach'], group: 'account' },
  { to: paths.team, label: 'Team', roles: ['coach'], group: 'account' },
  { to: paths.settings, label: 'Settings', roles: ['coach', 'assistant', 'client'], group: 'account' },
];
