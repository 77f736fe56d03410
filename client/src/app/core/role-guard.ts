import { inject } from '@angular/core';
import { CanMatchFn, Router } from '@angular/router';

import { AuthService, Role } from './auth';
import { signInRedirect } from './signed-in-guard';

/**
 * A guard for an area that needs one of `roles`: anonymous readers are sent to sign in, signed-in
 * readers without the role to a page that says which role it takes. The API enforces the same
 * rule; this only keeps people from pages that would refuse them.
 */
export function roleGuard(...roles: Role[]): CanMatchFn {
  return async (_route, segments) => {
    const auth = inject(AuthService);
    const router = inject(Router);
    await auth.restoreSession();
    if (!auth.isSignedIn()) {
      return signInRedirect(router, segments);
    }
    return auth.hasAnyRole(roles) || router.createUrlTree(['/not-allowed'], { queryParams: { roles: roles.join(',') } });
  };
}
