import { Routes } from '@angular/router';

/** The signed-in reader's own area; the parent route's guard keeps everyone else out. */
export const ACCOUNT_ROUTES: Routes = [
  {
    path: '',
    title: 'Account · Kelvindex',
    loadComponent: () => import('./account-page').then((m) => m.AccountPage),
  },
  {
    path: 'password',
    title: 'Change password · Kelvindex',
    loadComponent: () => import('../auth/change-password-page').then((m) => m.ChangePasswordPage),
  },
];
