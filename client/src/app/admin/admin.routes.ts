import { Routes } from '@angular/router';

/** Administration; the parent route lets in admins only. */
export const ADMIN_ROUTES: Routes = [
  {
    path: '',
    loadComponent: () => import('./admin-shell').then((m) => m.AdminShell),
    children: [
      { path: '', pathMatch: 'full', redirectTo: 'users' },
      { path: 'users', title: 'Users and roles · Kelvindex', loadComponent: () => import('./users-page').then((m) => m.UsersPage) },
      { path: 'api-keys', title: 'API keys · Kelvindex', loadComponent: () => import('./api-keys-page').then((m) => m.ApiKeysPage) },
      { path: 'audit', title: 'Audit trail · Kelvindex', loadComponent: () => import('./audit-page').then((m) => m.AuditPage) },
      { path: 'outbox', title: 'Outbox · Kelvindex', loadComponent: () => import('./outbox-page').then((m) => m.OutboxPage) },
    ],
  },
];
