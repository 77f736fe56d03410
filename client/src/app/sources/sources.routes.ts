import { Routes } from '@angular/router';

/** Sources management; the parent route lets in stewards and editors. */
export const SOURCE_ROUTES: Routes = [
  {
    path: '',
    title: 'Sources · Kelvindex',
    loadComponent: () => import('./sources-page').then((m) => m.SourcesPage),
  },
];
