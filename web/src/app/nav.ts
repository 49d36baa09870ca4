import type { Role } from '@upstroke/contracts';

export interface NavEntry {
  to: string;
  label: string;
  roles: Role[];
}

/** The main menu: each entry appears only for the roles that may use it. */
export const navEntries: NavEntry[] = [
  { to: '/', label: 'Board', roles: ['recorder', 'lead', 'quality'] },
  { to: '/trends', label: 'Trends', roles: ['quality', 'admin', 'lead'] },
  { to: '/review', label: 'Review queue', roles: ['quality'] },
  { to: '/admin', label: 'Admin', roles: ['admin'] },
];

/** Where a role lands after signing in. */
export function homeFor(role: Role): string {
  return role === 'admin' ? '/admin' : '/';
}
