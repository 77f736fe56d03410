import { HttpErrorResponse } from '@angular/common/http';
import { inject } from '@angular/core';
import { RedirectCommand, ResolveFn, Router } from '@angular/router';
import { catchError, map, of } from 'rxjs';

import { AuthService } from '../../core/auth';
import { Proposal } from './proposal';
import { ProposalsApi } from './proposals-api';

/**
 * Loads the proposal named by the route's `:id` for the page. A proposal the reader may not see
 * (a draft is its author's own business) or that does not exist shows the not-found page at the
 * same address. With `authorOnly`, a reader who did not write it is sent to its review page.
 */
export function proposalResolver(options: { authorOnly?: boolean } = {}): ResolveFn<Proposal | RedirectCommand> {
  return (route) => {
    const router = inject(Router);
    const auth = inject(AuthService);
    const id = route.paramMap.get('id') ?? '';
    return inject(ProposalsApi)
      .get(id)
      .pipe(
        map((proposal) => {
          if (options.authorOnly && proposal.author.id !== String(auth.user()?.id ?? '')) {
            return new RedirectCommand(router.createUrlTree(['/reviews', proposal.id]), { replaceUrl: true });
          }
          return proposal;
        }),
        catchError((error: unknown) => {
          if (error instanceof HttpErrorResponse && (error.status === 404 || error.status === 400)) {
            return of(new RedirectCommand(router.parseUrl('/not-found'), { skipLocationChange: true }));
          }
          throw error;
        }),
      );
  };
}
