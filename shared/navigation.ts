// Which pages each role reaches, and where each role lands after sign-in.
// The server's requireRole is what enforces access; this only shapes the menus.
import type { Role } from './roles';

// `openToAll`: shown to every role where the server opens it to everyone (the local mailbox in
// development); otherwise only to `roles`.
export type NavItem = { href: string; label: string; roles: Role[]; openToAll?: 'mailbox' };

export const NAV_ITEMS: NavItem[] = [
  { href: '/jobs', label: 'My jobs', roles: ['technician'] },
  { href: '/trends/mine', label: 'My quality', roles: ['technician'] },
  { href: '/jobs', label: 'Jobs', roles: ['manager', 'admin'] },
  { href: '/queue', label: 'Queue', roles: ['reviewer', 'manager'] },
  { href: '/trends', label: 'Trends', roles: ['manager'] },
  { href: '/rubric', label: 'Rubric', roles: ['manager'] },
  { href: '/kit', label: 'Kit and timing', roles: ['manager'] },
  { href: '/admin/users', label: 'Users', roles: ['admin'] },
  { href: '/mailbox', label: 'Mailbox', roles: ['admin'], openToAll: 'mailbox' },
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

export type NavOptions = { mailboxOpen?: boolean };

export function navFor(role: Role, options: NavOptions = {}): NavItem[] {
  return NAV_ITEMS.filter((item) => item.roles.includes(role) || (item.openToAll === 'mailbox' && options.mailboxOpen));
}

export function canOpen(role: Role, href: string, options: NavOptions = {}): boolean {
  return navFor(role, options).some((item) => href === item.href || href.startsWith(`${item.href}/`));
}
