import { HttpErrorResponse, HttpInterceptorFn, HttpRequest } from '@angular/common/http';
import { inject } from '@angular/core';
import { catchError, switchMap, throwError } from 'rxjs';

import { API_BASE_URL } from './api-base-url';
import { AuthService, SKIP_AUTH } from './auth';

/**
 * Sends the access token with every API request. When the API answers 401 to a request that
 * carried a token (it expired), trades the refresh cookie for a new one and retries once; if that
 * fails too, the session is over and the reader is signed out.
 *
 * Registered inside the error interceptor, so a 401 that a refresh recovers is never shown.
 */
export const authInterceptor: HttpInterceptorFn = (request, next) => {
  if (!request.url.startsWith(inject(API_BASE_URL)) || request.context.get(SKIP_AUTH)) {
    return next(request);
  }
  const auth = inject(AuthService);
  const token = auth.accessToken();
  if (token === null) {
    return next(request);
  }
  return next(withToken(request, token)).pipe(
    catchError((error: unknown) => {
      if (!(error instanceof HttpErrorResponse) || error.status !== 401) {
        return throwError(() => error);
      }
      return auth.refresh().pipe(
        catchError(() => {
          auth.endSession();
          return throwError(() => error);
        }),
        switchMap((session) => next(withToken(request, session.accessToken))),
      );
    }),
  );
};

function withToken<T>(request: HttpRequest<T>, token: string): HttpRequest<T> {
  return request.clone({ setHeaders: { Authorization: `Bearer ${token}` } });
}
