// Which pages each role reaches, and where each role lands after sign-in.
// The server's requireRole is what enforces access; this only shapes the menus.
import type { Role } from './roles';

export type NavItem = { href: string; label: string; roles: Role[] };

export const NAV_ITEMS: NavItem[] = [
  { href: '/jobs', label: 'My jobs', roles: ['technician'] },
  { href: '/trends/mine', label: 'My quality', roles: ['technician'] },
  { href: '/jobs', label: 'Jobs', roles: ['manager', 'admin'] },
  { href: '/queue', label: 'Queue', roles: ['reviewer', 'manager'] },
  { href: '/trends', label: 'Trends', roles: ['manager'] },
  { href: '/rubric', label: 'Rubric', roles: ['manager'] },
  { href: '/admin/users', label: 'Users', roles: ['admin'] },
  { href: '/mailbox', label: 'Mailbox', roles: ['admin'] },
];

const HOME: Record<Role, string> = {
  technician: '/jobs',
  reviewer: '/queue',
  manager: '/trends',
  admin: '/admin/users',
};

export function homeFor(role: Role): string {
  return HOME[role];
}

export function navFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => item.roles.includes(role));
}

export function canOpen(role: Role, href: string): boolean {
  return navFor(role).some((item) => href === item.href || href.startsWith(`${item.href}/`));
}
