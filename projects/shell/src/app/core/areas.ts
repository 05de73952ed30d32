import type { Role } from '@tubwright/kit';

/** The module elements the console loads on demand. */
export const MODULE_NAMES = ['planning', 'collection', 'orders'] as const;
export type ModuleName = (typeof MODULE_NAMES)[number];

/** Everything the side navigation can lead to: modules plus the owner's own pages. */
export type AreaName = ModuleName | 'users' | 'api-keys' | 'activity' | 'outbox';

export interface Area {
  name: AreaName;
  label: string;
  icon: string;
  /** What the area is for, in a few words (tooltips, "not available" page). */
  purpose: string;
}

export const AREAS: Record<AreaName, Area> = {
  planning: { name: 'planning', label: 'Planning', icon: 'straighten', purpose: 'tub models and rack plans' },
  collection: { name: 'collection', label: 'Collection', icon: 'pets', purpose: 'animals, feedings and breeding' },
  orders: { name: 'orders', label: 'Orders', icon: 'receipt_long', purpose: 'customers, quotes and deliveries' },
  users: { name: 'users', label: 'Users', icon: 'manage_accounts', purpose: 'who may sign in, and with which role' },
  'api-keys': { name: 'api-keys', label: 'API keys', icon: 'key', purpose: 'keys for the website widget and partners' },
  activity: { name: 'activity', label: 'Activity', icon: 'history', purpose: 'who changed what, and when' },
  outbox: { name: 'outbox', label: 'Outbox', icon: 'outgoing_mail', purpose: 'e-mail the shop has sent' },
};

/** Which areas each role may open, in the order its navigation lists them. The API enforces the same. */
const ACCESS: Record<Role, readonly AreaName[]> = {
  owner: ['planning', 'collection', 'orders', 'users', 'api-keys', 'activity', 'outbox'],
  builder: ['planning', 'orders'],
  keeper: ['collection'],
  sales: ['orders', 'planning'],
};

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  builder: 'Builder',
  keeper: 'Keeper',
  sales: 'Sales',
};

export function areasFor(role: Role | null): Area[] {
  return role ? (ACCESS[role] ?? []).map((name) => AREAS[name]) : [];
}

export function canUse(role: Role | null, area: AreaName): boolean {
  return !!role && (ACCESS[role] ?? []).includes(area);
}

/** Where a role lands after sign-in or on `/`. */
export function homeFor(role: Role | null): string {
  const first = areasFor(role)[0];
  return first ? `/${first.name}` : '/sign-in';
}

export function isModuleName(value: string): value is ModuleName {
  return (MODULE_NAMES as readonly string[]).includes(value);
}

export function isAreaName(value: string): value is AreaName {
  return Object.hasOwn(AREAS, value);
}
