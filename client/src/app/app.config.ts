import { provideHttpClient, withInterceptors } from '@angular/common/http';
import {
  ApplicationConfig,
  ErrorHandler,
  inject,
  provideAppInitializer,
  provideBrowserGlobalErrorListeners,
  provideZonelessChangeDetection,
} from '@angular/core';
import { provideRouter, withComponentInputBinding } from '@angular/router';

import { routes } from './app.routes';
import { apiErrorInterceptor } from './core/api-error-interceptor';
import { AppErrorHandler } from './core/app-error-handler';
import { AuthService } from './core/auth';
import { authInterceptor } from './core/auth-interceptor';
import { provideAppIcons } from './core/icons';

export const appConfig: ApplicationConfig = {
  providers: [
    provideZonelessChangeDetection(),
    provideBrowserGlobalErrorListeners(),
    { provide: ErrorHandler, useClass: AppErrorHandler },
    provideRouter(routes, withComponentInputBinding()),
    // The error interceptor is outermost, so it only sees what the auth interceptor could not
    // recover (a 401 followed by a successful refresh and retry is never shown).
    provideHttpClient(withInterceptors([apiErrorInterceptor, authInterceptor])),
    provideAppIcons(),
    // Ask for a session in the background: public pages render at once, guards wait for it.
    provideAppInitializer(() => {
      void inject(AuthService).restoreSession();
    }),
  ],
};
