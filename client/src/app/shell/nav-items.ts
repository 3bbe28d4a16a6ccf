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
  { label: 'Sites', icon: 'agriculture', link: '/sites', roles: ['admin'] },
  { label: 'Outbox', icon: 'outgoing_mail', link: '/outbox', roles: ['admin'] },
  { label: 'Receiving', icon: 'local_shipping', link: '/receiving', roles: ['admin', 'receiving', 'storage', 'purchasing', 'veterinarian'] },
  { label: 'Purchase orders', icon: 'receipt_long', link: '/purchase-orders', roles: ['admin', 'purchasing', 'receiving', 'veterinarian'] },
  { label: 'Catalogue', icon: 'inventory_2', link: '/catalogue', roles: ['admin', 'purchasing'] },
  { label: 'Lots', icon: 'medication', link: '/lots', roles: ['admin', 'storage', 'purchasing', 'veterinarian', 'receiving'] },
  { label: 'Fridges', icon: 'kitchen', link: '/fridges', roles: ['admin', 'storage', 'veterinarian'] },
  { label: 'Daily check', icon: 'fact_check', link: '/daily-check', roles: ['admin', 'storage'] },
  { label: 'Purchasing', icon: 'event_upcoming', link: '/purchasing', roles: ['admin', 'purchasing', 'veterinarian'] },
  { label: 'Flocks', icon: 'egg', link: '/flocks', roles: ['admin', 'purchasing', 'veterinarian', 'crew'] },
  { label: 'Programmes', icon: 'vaccines', link: '/programmes', roles: ['admin', 'purchasing', 'veterinarian', 'crew'] },
  { label: 'Review', icon: 'rule', link: '/review', roles: ['veterinarian', 'storage', 'admin'] },
  { label: 'Day sheet', icon: 'event_available', link: '/vaccination-day', roles: ['crew', 'admin', 'veterinarian'] },
  { label: 'My account', icon: 'manage_accounts', link: '/account' },
];
