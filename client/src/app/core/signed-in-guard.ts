import { inject } from '@angular/core';
import { CanMatchFn, Router, UrlSegment } from '@angular/router';

import { AuthService } from './auth';

/**
 * Lets a signed-in reader into the area; anyone else goes to the sign-in page, which brings
 * them back here afterwards (`/sign-in?returnUrl=…`).
 */
export const signedInGuard: CanMatchFn = async (_route, segments) => {
  const auth = inject(AuthService);
  const router = inject(Router);
  await auth.restoreSession();
  return auth.isSignedIn() || signInRedirect(router, segments);
};

/** A UrlTree to the sign-in page that returns to the address being navigated to. */
export function signInRedirect(router: Router, segments: readonly UrlSegment[]) {
  const target = router.currentNavigation()?.extractedUrl;
  const returnUrl = target ? router.serializeUrl(target) : '/' + segments.map((segment) => segment.path).join('/');
  return router.createUrlTree(['/sign-in'], { queryParams: { returnUrl } });
}
