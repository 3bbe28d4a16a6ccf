// Top-level routes: sign-in outside the shell, every feature lazily inside it, and a not-found page.
import { Routes } from '@angular/router';
import { roleGuard, signedInGuard, signedOutGuard } from './core/auth/auth-guards';

export const routes: Routes = [
  {
    path: 'sign-in',
    canActivate: [signedOutGuard],
    title: 'Sign in · Vialyard',
    loadComponent: () => import('./pages/sign-in'),
  },
  {
    path: '',
    canActivate: [signedInGuard],
    loadComponent: () => import('./shell'),
    children: [
      { path: '', pathMatch: 'full', title: 'Home · Vialyard', loadComponent: () => import('./pages/home') },
      {
        path: 'users',
        canActivate: [roleGuard('admin')],
        title: 'Users · Vialyard',
        loadComponent: () => import('./pages/users'),
      },
      {
        path: 'sites',
        canActivate: [roleGuard('admin')],
        title: 'Sites · Vialyard',
        loadComponent: () => import('./pages/sites'),
      },
      {
        path: 'outbox',
        canActivate: [roleGuard('admin')],
        title: 'Outbox · Vialyard',
        loadComponent: () => import('./pages/outbox'),
      },
      {
        path: 'receiving',
        canActivate: [roleGuard('admin', 'receiving', 'storage', 'purchasing', 'veterinarian')],
        title: 'Receiving · Vialyard',
        loadComponent: () => import('./pages/receiving'),
      },
      {
        path: 'receiving/new',
        canActivate: [roleGuard('admin', 'receiving')],
        title: 'Receive a shipment · Vialyard',
        loadComponent: () => import('./pages/receive-shipment'),
      },
      {
        path: 'shipments/:shipmentId',
        canActivate: [roleGuard('admin', 'receiving', 'storage', 'purchasing', 'veterinarian')],
        title: 'Shipment · Vialyard',
        loadComponent: () => import('./pages/shipment'),
      },
      {
        path: 'purchase-orders',
        canActivate: [roleGuard('admin', 'purchasing', 'receiving', 'veterinarian')],
        title: 'Purchase orders · Vialyard',
        loadComponent: () => import('./pages/purchase-orders'),
      },
      {
        path: 'catalogue',
        canActivate: [roleGuard('admin', 'purchasing')],
        title: 'Catalogue · Vialyard',
        loadComponent: () => import('./pages/catalogue'),
      },
      {
        path: 'fridges',
        canActivate: [roleGuard('admin', 'storage', 'veterinarian')],
        title: 'Fridges · Vialyard',
        loadComponent: () => import('./pages/fridges'),
      },
      {
        path: 'fridges/:fridgeId',
        canActivate: [roleGuard('admin', 'storage', 'veterinarian')],
        title: 'Fridge · Vialyard',
        loadComponent: () => import('./pages/fridge'),
      },
      {
        path: 'fridges/:fridgeId/count',
        canActivate: [roleGuard('admin', 'storage', 'veterinarian')],
        title: 'Stock count · Vialyard',
        loadComponent: () => import('./pages/stock-count'),
      },
      {
        path: 'lots',
        canActivate: [roleGuard('admin', 'storage', 'purchasing', 'veterinarian', 'receiving')],
        title: 'Lots · Vialyard',
        loadComponent: () => import('./pages/lots'),
      },
      {
        path: 'lots/:lotId',
        canActivate: [roleGuard('admin', 'storage', 'purchasing', 'veterinarian', 'receiving')],
        title: 'Lot · Vialyard',
        loadComponent: () => import('./pages/lot'),
      },
      {
        path: 'fridges/:fridgeId/import',
        canActivate: [roleGuard('admin', 'storage')],
        title: 'Import a logger file · Vialyard',
        loadComponent: () => import('./pages/log-import'),
      },
      {
        path: 'daily-check',
        canActivate: [roleGuard('admin', 'storage')],
        title: 'Daily check · Vialyard',
        loadComponent: () => import('./pages/daily-check'),
      },
      {
        path: 'vaccination-day',
        canActivate: [roleGuard('admin', 'veterinarian', 'crew')],
        title: 'Day sheet · Vialyard',
        loadComponent: () => import('./pages/day-sheet'),
      },
      {
        path: 'vaccination-day/water-volumes',
        canActivate: [roleGuard('admin', 'veterinarian')],
        title: 'Water volumes · Vialyard',
        loadComponent: () => import('./pages/water-volumes'),
      },
      {
        path: 'vaccination-day/:vaccinationId',
        canActivate: [roleGuard('admin', 'veterinarian', 'crew')],
        title: 'Vaccination · Vialyard',
        loadComponent: () => import('./pages/vaccination-run'),
      },
      {
        path: 'flocks',
        canActivate: [roleGuard('admin', 'purchasing', 'veterinarian', 'crew')],
        title: 'Flocks · Vialyard',
        loadComponent: () => import('./pages/flocks'),
      },
      {
        path: 'flocks/:flockId',
        canActivate: [roleGuard('admin', 'purchasing', 'veterinarian', 'crew')],
        title: 'Flock · Vialyard',
        loadComponent: () => import('./pages/flock'),
      },
      {
        path: 'programmes',
        canActivate: [roleGuard('admin', 'purchasing', 'veterinarian', 'crew')],
        title: 'Programmes · Vialyard',
        loadComponent: () => import('./pages/programmes'),
      },
      {
        path: 'purchasing',
        canActivate: [roleGuard('admin', 'purchasing', 'veterinarian')],
        title: 'Purchasing · Vialyard',
        loadComponent: () => import('./pages/purchasing'),
      },
      {
        path: 'review',
        canActivate: [roleGuard('veterinarian', 'storage', 'admin')],
        title: 'Review · Vialyard',
        loadComponent: () => import('./pages/review'),
      },
      { path: 'notifications', title: 'Notifications · Vialyard', loadComponent: () => import('./pages/notifications') },
      { path: 'account', title: 'My account · Vialyard', loadComponent: () => import('./pages/account') },
      { path: '**', title: 'Not found · Vialyard', loadComponent: () => import('./pages/not-found') },
    ],
  },
];
