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
        path: 'outbox',
        canActivate: [roleGuard('admin')],
        title: 'Outbox · Vialyard',
        loadComponent: () => import('./pages/outbox'),
      },
      { path: 'account', title: 'My account · Vialyard', loadComponent: () => import('./pages/account') },
      { path: '**', title: 'Not found · Vialyard', loadComponent: () => import('./pages/not-found') },
    ],
  },
];
