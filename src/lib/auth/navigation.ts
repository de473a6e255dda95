import type { Role } from './roles';

export interface NavigationLink {
  href: string;
  label: string;
  roles: readonly Role[];
}

// Only pages that exist are listed; each page checks the role again on the server.
export const NAVIGATION: NavigationLink[] = [
  { href: '/home', label: 'Home', roles: ['designer', 'checker', 'liaison', 'planning', 'admin'] },
  { href: '/schemes', label: 'Schemes', roles: ['designer', 'checker', 'liaison', 'planning', 'admin'] },
  { href: '/schemes/new', label: 'New scheme', roles: ['designer'] },
  { href: '/checks', label: 'Checks', roles: ['checker'] },
  { href: '/certificates', label: 'Certificates', roles: ['planning', 'admin', 'checker', 'liaison'] },
  { href: '/verify', label: 'Verify', roles: ['designer', 'checker', 'liaison', 'planning', 'admin'] },
  { href: '/liaison', label: 'Landowners', roles: ['liaison', 'admin', 'designer', 'checker'] },
  { href: '/admin/users', label: 'Users', roles: ['admin'] },
  { href: '/admin/audit', label: 'Audit trail', roles: ['admin'] },
  { href: '/admin/certificates', label: 'Revocation', roles: ['admin'] },
  { href: '/admin/outbox', label: 'Mail outbox', roles: ['admin'] },
];

export function navigationFor(role: Role): NavigationLink[] {
  return NAVIGATION.filter((link) => link.roles.includes(role));
}
