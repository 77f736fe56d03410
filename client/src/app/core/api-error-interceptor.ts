import { HttpContextToken, HttpErrorResponse, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { catchError, throwError } from 'rxjs';

import { describeHttpError } from './api-error';
import { ErrorNotifier } from './error-notifier';

/**
 * Set to false on a request whose caller shows the failure itself (for example the health
 * panel on the home page), so the reader is not told twice.
 */
export const REPORT_HTTP_ERRORS = new HttpContextToken<boolean>(() => true);

/** Shows every failed HTTP request in a snackbar with the API's message, then rethrows it. */
export const apiErrorInterceptor: HttpInterceptorFn = (request, next) => {
  const notifier = inject(ErrorNotifier);
  return next(request).pipe(
    catchError((error: unknown) => {
      if (error instanceof HttpErrorResponse && request.context.get(REPORT_HTTP_ERRORS)) {
        notifier.notify(describeHttpError(error));
      }
      return throwError(() => error);
    }),
  );
};
