import { Routes } from '@angular/router';

import { roleGuard } from '../core/role-guard';
import { proposalResolver } from '../shared/proposals/proposal-resolver';

/**
 * The steward's proposals. The parent route lets in everyone in the workflow, because e-mails
 * link every person concerned to `/proposals/{id}`; a reader who did not write the proposal is
 * sent on to its review page by the resolver.
 */
export const PROPOSAL_ROUTES: Routes = [
  {
    path: '',
    pathMatch: 'full',
    canMatch: [roleGuard('steward')],
    title: 'Your proposals · Kelvindex',
    loadComponent: () => import('./my-proposals-page').then((m) => m.MyProposalsPage),
  },
  {
    path: ':id',
    title: 'Proposal · Kelvindex',
    resolve: { proposal: proposalResolver({ authorOnly: true }) },
    loadComponent: () => import('./proposal-editor').then((m) => m.ProposalEditor),
  },
];
