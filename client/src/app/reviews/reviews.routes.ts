import { Routes } from '@angular/router';

import { roleGuard } from '../core/role-guard';
import { proposalResolver } from '../shared/proposals/proposal-resolver';

/**
 * Reviews. The queue is for reviewers (editors and admins may look); a proposal's review page is
 * open to everyone in the workflow, its author included, who sees why they cannot decide on it.
 */
export const REVIEW_ROUTES: Routes = [
  {
    path: '',
    pathMatch: 'full',
    canMatch: [roleGuard('reviewer', 'editor', 'admin')],
    title: 'Review queue · Kelvindex',
    loadComponent: () => import('./review-queue-page').then((m) => m.ReviewQueuePage),
  },
  {
    path: ':id',
    title: 'Review · Kelvindex',
    resolve: { proposal: proposalResolver() },
    loadComponent: () => import('./review-page').then((m) => m.ReviewPage),
  },
];
