import { Routes } from '@angular/router';

import { signedInGuard } from './core/signed-in-guard';

// Every page is its own lazy chunk; the initial bundle holds only the shell.
export const routes: Routes = [
  {
    path: '',
    pathMatch: 'full',
    title: 'Kelvindex',
    loadComponent: () => import('./home/home-page').then((m) => m.HomePage),
  },
  {
    path: 'search',
    title: 'Search species · Kelvindex',
    loadComponent: () => import('./search/search-page').then((m) => m.SearchPage),
  },
  {
    path: 'species/:id',
    title: 'Species · Kelvindex',
    loadComponent: () => import('./species/species-page').then((m) => m.SpeciesPage),
  },
  {
    path: 'reactions',
    title: 'Reactions · Kelvindex',
    loadComponent: () => import('./reactions/reaction-page').then((m) => m.ReactionPage),
  },
  {
    path: 'sign-in',
    title: 'Sign in · Kelvindex',
    loadComponent: () => import('./auth/sign-in-page').then((m) => m.SignInPage),
  },
  {
    path: 'reset-password',
    title: 'Reset your password · Kelvindex',
    loadComponent: () => import('./auth/reset-password-page').then((m) => m.ResetPasswordPage),
  },
  {
    path: 'accept-invitation',
    title: 'Accept your invitation · Kelvindex',
    loadComponent: () => import('./auth/accept-invitation-page').then((m) => m.AcceptInvitationPage),
  },
  {
    path: 'account',
    canMatch: [signedInGuard],
    loadChildren: () => import('./account/account.routes').then((m) => m.ACCOUNT_ROUTES),
  },
  {
    path: 'not-allowed',
    title: 'Not allowed · Kelvindex',
    loadComponent: () => import('./not-allowed/not-allowed-page').then((m) => m.NotAllowedPage),
  },
  {
    path: '**',
    title: 'Page not found · Kelvindex',
    loadComponent: () => import('./not-found/not-found-page').then((m) => m.NotFoundPage),
  },
];
