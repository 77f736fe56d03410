import { HttpErrorResponse } from '@angular/common/http';
import { ErrorHandler, Injectable, Injector, inject } from '@angular/core';

import { ErrorNotifier } from './error-notifier';

/**
 * Logs every uncaught error and tells the reader something failed. HTTP errors were already
 * shown by the API error interceptor, so they are only logged.
 */
@Injectable()
export class AppErrorHandler implements ErrorHandler {
  // Resolved on first use: the ErrorHandler is created before the overlay the snackbar needs.
  private readonly injector = inject(Injector);

  handleError(error: unknown): void {
    console.error(error);
    if (error instanceof HttpErrorResponse) {
      return;
    }
    this.injector
      .get(ErrorNotifier)
      .notify('Something went wrong on this page. Reload it and try again; if it keeps happening, tell your Kelvindex administrator.');
  }
}
