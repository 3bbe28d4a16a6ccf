// The shell's navigation: each entry names the roles that see it (none listed: everyone).
import type { Role } from '@shared/auth/roles.js';

export interface NavItem {
  label: string;
  icon: string;
  link: string;
  roles?: Role[];
}

export const navItems: NavItem[] = [
  { label: 'Home', icon: 'home', link: '/' },
  { label: 'Users', icon: 'group', link: '/users', roles: ['admin'] },
  { label: 'Outbox', icon: 'outgoing_mail', link: '/outbox', roles: ['admin'] },
  { label: 'My account', icon: 'manage_accounts', link: '/account' },
];
