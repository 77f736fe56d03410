import { Routes } from '@angular/router';

import { roleGuard } from './core/role-guard';
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
    path: 'proposals',
    canMatch: [roleGuard('steward', 'reviewer', 'editor', 'admin')],
    loadChildren: () => import('./proposals/proposals.routes').then((m) => m.PROPOSAL_ROUTES),
  },
  {
    path: 'reviews',
    canMatch: [roleGuard('steward', 'reviewer', 'editor', 'admin')],
    loadChildren: () => import('./reviews/reviews.routes').then((m) => m.REVIEW_ROUTES),
  },
  {
    path: 'imports',
    canMatch: [roleGuard('steward')],
    title: 'Import values · Kelvindex',
    loadComponent: () => import('./imports/import-page').then((m) => m.ImportPage),
  },
  {
    path: 'releases',
    loadChildren: () => import('./releases/releases.routes').then((m) => m.RELEASE_ROUTES),
  },
  {
    path: 'sources',
    canMatch: [roleGuard('steward', 'editor')],
    loadChildren: () => import('./sources/sources.routes').then((m) => m.SOURCE_ROUTES),
  },
  {
    path: 'admin',
    canMatch: [roleGuard('admin')],
    loadChildren: () => import('./admin/admin.routes').then((m) => m.ADMIN_ROUTES),
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
