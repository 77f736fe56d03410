import { Routes } from '@angular/router';

import { roleGuard } from '../core/role-guard';

/**
 * Releases: the list and the diff between any two, one release with its change log (watchers'
 * e-mails link here, so it is public like the releases themselves), and the editor's work on the
 * release in preparation.
 */
export const RELEASE_ROUTES: Routes = [
  {
    path: '',
    pathMatch: 'full',
    title: 'Releases · Kelvindex',
    loadComponent: () => import('./releases-page').then((m) => m.ReleasesPage),
  },
  {
    path: ':label',
    pathMatch: 'full',
    title: 'Release · Kelvindex',
    loadComponent: () => import('./release-page').then((m) => m.ReleasePage),
  },
  {
    path: ':label/edit',
    canMatch: [roleGuard('editor')],
    title: 'Assemble a release · Kelvindex',
    loadComponent: () => import('./release-workspace-page').then((m) => m.ReleaseWorkspacePage),
  },
];
